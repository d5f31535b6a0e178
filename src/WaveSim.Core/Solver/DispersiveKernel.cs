using WaveSim.Core.Lines;
using WaveSim.Core.Model;

namespace WaveSim.Core.Solver;

/// <summary>
/// The leapfrog updates inside one segment with frequency-dependent loss, realised from its pole-residue fit
/// (<see cref="RationalLoss"/>) with one auxiliary state per cell per pole.
/// </summary>
/// <remarks>
/// <para>Series: each term s·a/(s + p) is a resistor a in parallel with an inductor a/p, carrying the inductor current ψ with
/// dψ/dt = p·(I − ψ) and the voltage a·(I − ψ). Shunt: each term s·b/(s + q) is a resistor 1/b in series with a capacitor b/q
/// whose voltage w obeys dw/dt = q·(V − w), drawing b·(V − w). The states are integrated with the trapezoidal rule over the
/// same step and with the same half-step average, (x^{n+1} + x^n)/2, as the constant R and G of <see cref="SegmentKernel"/>;
/// eliminating the new state leaves, per term, a resistance a/(1 + p·dt/2) on the averaged current and a known history
/// a/(1 + p·dt/2)·ψ^n (and likewise for the shunt terms). This is the auxiliary-differential-equation treatment of dispersive
/// media (Taflove and Hagness, Computational Electrodynamics, 3rd ed. 2005, ch. 9) with the trapezoidal rule, equivalent to
/// trapezoidal recursive convolution (Luebbers and Hunsberger, IEEE Trans. AP-40(11):1297-1301, 1992).</para>
/// <para>Stability: the trapezoidal RL and RC terms are passive (A-stable; Dahlquist 1963) and only add dissipation on the
/// averaged unknowns, so the scheme is stable when the lossless leapfrog with the instantaneous L∞ + ΔL and C∞ is, i.e. at
/// Courant number ≤ 1 for the fastest wave. The grid plan sizes cells by <see cref="Segment.FrontDelay"/> (from C0·κ(∞) ≤ C∞
/// and L∞ ≤ L∞ + ΔL), so that holds for any fit.</para>
/// </remarks>
internal sealed class DispersiveKernel
{
    readonly double _ci1, _ci2, _ih, _cv1, _cv2, _vh;
    readonly int _ks, _kq;
    readonly double[] _sBeta, _sKeep, _sGain, _qBeta, _qKeep, _qGain;
    /// <summary>Series states ψ, [cell·K + k]; shunt states w, [node·K + k].</summary>
    readonly double[] _psi, _w;

    /// <summary>Builds the kernel and starts its states at the segment's present (DC) values.</summary>
    public DispersiveKernel(GridSegment seg, double dt)
    {
        var fit = seg.Dispersion!;
        double dz = seg.Dz;
        (_sBeta, _sKeep, _sGain) = Terms(fit.SeriesPoles, fit.SeriesResidues, dt);
        (_qBeta, _qKeep, _qGain) = Terms(fit.ShuntPoles, fit.ShuntResidues, dt);
        _ks = _sBeta.Length; _kq = _qBeta.Length;
        double rEff = fit.R + _sBeta.Sum(), gEff = fit.G + _qBeta.Sum();
        double li = fit.InstantInductance / dt + rEff / 2, cv = fit.InstantCapacitance / dt + gEff / 2;
        _ci1 = (fit.InstantInductance / dt - rEff / 2) / li; _ci2 = 1 / (dz * li); _ih = 1 / li;
        _cv1 = (fit.InstantCapacitance / dt - gEff / 2) / cv; _cv2 = 1 / (dz * cv); _vh = 1 / cv;
        // At DC every inductor carries the whole current and every capacitor holds the node voltage: no term is active.
        _psi = new double[seg.Cells * _ks];
        for (int c = 0; c < seg.Cells; c++) for (int k = 0; k < _ks; k++) _psi[c * _ks + k] = seg.I[c];
        _w = new double[(seg.Cells + 1) * _kq];
        for (int n = 0; n <= seg.Cells; n++) for (int k = 0; k < _kq; k++) _w[n * _kq + k] = seg.V[n];
    }

    /// <summary>Per term: β = r/(1 + α), and the state update x⁺ = keep·x⁻ + gain·(average), α = pole·dt/2.</summary>
    static (double[] Beta, double[] Keep, double[] Gain) Terms(double[] poles, double[] residues, double dt)
    {
        int n = poles.Length;
        var beta = new double[n]; var keep = new double[n]; var gain = new double[n];
        for (int k = 0; k < n; k++)
        {
            double a = poles[k] * dt / 2;
            beta[k] = residues[k] / (1 + a);
            keep[k] = (1 - a) / (1 + a);
            gain[k] = 2 * a / (1 + a);
        }
        return (beta, keep, gain);
    }

    /// <summary>Currents from n−1/2 to n+1/2 using the voltages at n; returns Σ I^{n−1/2}·I^{n+1/2}.</summary>
    public double UpdateCurrents(double[] v, double[] i)
    {
        int ks = _ks;
        double[] psi = _psi, beta = _sBeta, keep = _sKeep, gain = _sGain;
        double sum = 0;
        for (int c = 0; c < i.Length; c++)
        {
            int o = c * ks;
            double hist = 0;
            for (int k = 0; k < ks; k++) hist += beta[k] * psi[o + k];
            double old = i[c];
            double now = _ci1 * old + _ci2 * (v[c] - v[c + 1]) + _ih * hist;
            double avg = 0.5 * (old + now);
            for (int k = 0; k < ks; k++) psi[o + k] = keep[k] * psi[o + k] + gain[k] * avg;
            i[c] = now;
            sum += old * now;
        }
        return sum;
    }

    /// <summary>Interior node voltages from n to n+1 using the currents at n+1/2; both end nodes belong to junctions.</summary>
    public void UpdateVoltages(double[] v, double[] i)
    {
        int kq = _kq;
        double[] w = _w, beta = _qBeta, keep = _qKeep, gain = _qGain;
        for (int n = 1; n < i.Length; n++)
        {
            int o = n * kq;
            double hist = 0;
            for (int k = 0; k < kq; k++) hist += beta[k] * w[o + k];
            double old = v[n];
            double now = _cv1 * old + _cv2 * (i[n - 1] - i[n]) + _vh * hist;
            double avg = 0.5 * (old + now);
            for (int k = 0; k < kq; k++) w[o + k] = keep[k] * w[o + k] + gain[k] * avg;
            v[n] = now;
        }
    }

    /// <summary>
    /// The pole-residue fit of a segment's loss for a run: the band runs from 1/duration to 1/(the driver's shortest feature),
    /// capped at the grid's Nyquist frequency 1/(2 dt) and kept at least two decades wide.
    /// </summary>
    public static RationalLoss FitFor(Segment s, Scenario scenario, double dt)
    {
        double nyquist = 1 / (2 * dt);
        double feature = scenario.Source.ShortestFeature;
        double high = double.IsFinite(feature) && feature > 0 ? Math.Min(1 / feature, nyquist) : nyquist;
        double low = Math.Min(1 / scenario.Simulation.Duration, high / 100);
        return RationalLoss.Fit(s.Loss!, s.R, s.L, s.G, s.C, low, high);
    }
}
