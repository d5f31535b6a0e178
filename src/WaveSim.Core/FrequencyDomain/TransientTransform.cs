using System.Numerics;
using MathNet.Numerics.IntegralTransforms;
using WaveSim.Core.Model;

namespace WaveSim.Core.FrequencyDomain;

/// <summary>
/// The time response by the numerical Laplace transform (Wilcox, "Numerical Laplace transformation and inversion",
/// Int. J. Electr. Eng. Educ. 15, 1978; Wedepohl's damped-FFT form; both from memory): the driver's change from its initial
/// level, u(t) = Vs(t) − Vs(0⁻), is sampled on [0, W), multiplied by e^(−σt), transformed with the FFT, multiplied by each
/// probe's transfer evaluated at s = σ + jω, transformed back and multiplied by e^(σt).
/// </summary>
/// <remarks>
/// Why it works: the inverse DFT returns the damped response summed over its periodic repeats,
/// y(t)e^(−σt) + y(t+W)e^(−σ(t+W)) + …, so after undoing the damping the wrap-around error is about e^(−σW)·|y|, whatever
/// the network does after W (lossless lines, whose poles sit on the jω axis, ring for ever and are handled the same way).
/// Here W = <see cref="WindowFactor"/> × the last instant asked for and σ = ln(1/<see cref="Aliasing"/>)/W, so the
/// wrap-around is 1e-6 of the response; the rounding error of the damped samples is amplified by at most
/// e^(σ·W/2) = 1e6^(1/2) = 1e3, which leaves it near 1e-13 (errors local in time, such as at the corners of the driver's
/// edges, are damped and restored together and keep their size).
/// The sample step is at most a twentieth of the driver's shortest feature (its 10-90 % edge, width or period), so the edge
/// is band-limited well inside the transform's band; an ideal edge (no rise time) is not band-limited and shows ringing
/// (the Gibbs effect) of the size of one sample step. When the instants asked for are evenly spaced from 0 the step divides
/// their spacing, so they are read straight off the transform samples.
/// </remarks>
internal sealed class TransientTransform
{
    /// <summary>The transform window over the last instant asked for.</summary>
    public const double WindowFactor = 2;
    /// <summary>Wrap-around allowed, as a fraction of the response.</summary>
    public const double Aliasing = 1e-6;
    /// <summary>Samples per shortest feature of the driver's waveform.</summary>
    public const double SamplesPerFeature = 20;
    /// <summary>Bounds on the number of transform samples (powers of two); above the upper bound the step is widened.</summary>
    public const int MinPoints = 1 << 10, MaxPoints = 1 << 19;

    public required double Step { get; init; }
    public required int Points { get; init; }
    public required double Damping { get; init; }

    public static TransientTransform For(Scenario scenario, double[] times) =>
        For(scenario, times.DefaultIfEmpty(0).Max(), UniformStep(times));

    /// <summary>The transform for instants up to <paramref name="lastTime"/>, evenly spaced by <paramref name="uniformStep"/> from 0 if given.</summary>
    public static TransientTransform For(Scenario scenario, double lastTime, double? uniformStep)
    {
        double feature = scenario.Source.ShortestFeature;
        if (!double.IsFinite(feature) || feature <= 0)
            feature = AllSegments(scenario.Line).Min(s => s.Delay);
        double span = Math.Max(lastTime, 1e-15);
        double wanted = Math.Min(feature / SamplesPerFeature, span / 256);
        // Instants on a uniform grid from 0 (the leapfrog's outputs) are made transform samples, so no interpolation
        // error enters at the corners of the driver's edges; other instants are interpolated linearly.
        if (uniformStep is { } h) wanted = h / Math.Ceiling(h / wanted * (1 - 1e-9));
        double dt = Math.Max(wanted, WindowFactor * span / MaxPoints);
        int n = MinPoints;
        while (n * dt < WindowFactor * span * (1 - 1e-12) && n < MaxPoints) n <<= 1;
        double window = n * dt;
        return new TransientTransform { Step = dt, Points = n, Damping = Math.Log(1 / Aliasing) / window };
    }

    /// <summary>The spacing h when times[k] = k·h from 0 (the last instant may fall short, as a run's duration does); else null.</summary>
    static double? UniformStep(double[] times)
    {
        if (times.Length < 3 || times[0] != 0) return null;
        double h = times[1];
        if (!(h > 0)) return null;
        for (int k = 2; k < times.Length - 1; k++)
            if (Math.Abs(times[k] - k * h) > 1e-9 * h) return null;
        return h;
    }

    /// <summary>Each probe's change from the DC operating point at <paramref name="times"/>: volts then amps, [probe][instant].</summary>
    public (double[][] Volts, double[][] Amps) Run(SourceSpec source, Circuit circuit, double[] times)
    {
        int n = Points, half = n / 2, probes = circuit.Probes.Count;
        double dt = Step, sigma = Damping;
        var spectrum = new Complex[n];
        for (int k = 0; k < n; k++)
            spectrum[k] = (source.Value(k * dt) - source.InitialLevel) * Math.Exp(-sigma * k * dt);
        Fourier.Forward(spectrum, FourierOptions.Matlab);

        // Transfers at s = σ + jω for ω ≥ 0; the negative frequencies are their conjugates (real responses).
        var hv = new Complex[probes][];
        var hi = new Complex[probes][];
        for (int p = 0; p < probes; p++) { hv[p] = new Complex[half + 1]; hi[p] = new Complex[half + 1]; }
        var v = new Complex[probes];
        var i = new Complex[probes];
        var solver = new NodalSolver(circuit);
        for (int k = 0; k <= half; k++)
        {
            var s = new Complex(sigma, 2 * Math.PI * k / (n * dt));
            FrequencyDomainSolver.Transfer(solver, circuit, s, v, i);
            for (int p = 0; p < probes; p++) { hv[p][k] = v[p]; hi[p][k] = i[p]; }
        }

        var volts = new double[probes][];
        var amps = new double[probes][];
        var work = new Complex[n];
        for (int p = 0; p < probes; p++)
            (volts[p], amps[p]) = Invert(spectrum, hv[p], hi[p], work, times);
        return (volts, amps);
    }

    /// <summary>
    /// Both real responses from one inverse FFT: with A and B the spectra of real signals a and b, the inverse of A + jB is a + jb.
    /// </summary>
    (double[] A, double[] B) Invert(Complex[] input, Complex[] ha, Complex[] hb, Complex[] work, double[] times)
    {
        int n = Points, half = n / 2;
        var j = Complex.ImaginaryOne;
        for (int k = 0; k <= half; k++) work[k] = (ha[k] + j * hb[k]) * input[k];
        for (int k = 1; k < half; k++) work[n - k] = (Complex.Conjugate(ha[k]) + j * Complex.Conjugate(hb[k])) * input[n - k];
        // The Nyquist bin pairs with itself: keep only its real-signal part (Re of each transfer) so nothing leaks between a and b.
        work[half] = (ha[half].Real + j * hb[half].Real) * input[half];
        Fourier.Inverse(work, FourierOptions.Matlab);
        var a = new double[times.Length];
        var b = new double[times.Length];
        for (int r = 0; r < times.Length; r++)
        {
            double x = times[r] / Step;
            double nearest = Math.Round(x);
            if (Math.Abs(x - nearest) < 1e-6) x = nearest;
            int k = Math.Min((int)Math.Floor(x), n - 2);
            double f = x - k;
            double g0 = Math.Exp(Damping * k * Step), g1 = Math.Exp(Damping * (k + 1) * Step);
            a[r] = work[k].Real * g0 + f * (work[k + 1].Real * g1 - work[k].Real * g0);
            b[r] = work[k].Imaginary * g0 + f * (work[k + 1].Imaginary * g1 - work[k].Imaginary * g0);
        }
        return (a, b);
    }

    static IEnumerable<Segment> AllSegments(IReadOnlyList<LineElement> line) =>
        line.SelectMany(e => e switch
        {
            Segment s => [s],
            Branch b => AllSegments(b.Line),
            _ => Enumerable.Empty<Segment>(),
        });
}
