using System.Numerics;

namespace WaveSim.Core.Measurements;

/// <summary>
/// Closed-form reflection step responses of lumped parts on a line, as a reflectometer with a linear-ramp edge and a
/// box-averaged layer grid sees them. The models the TDR analysis fits to a trace.
/// </summary>
/// <remarks>
/// <para>Each model is a step response ρ(t) = c0 + Σ cᵢ·exp(pᵢ·t) for t ≥ 0 (zero before), with Z the local line impedance,
/// a = L/Z and b = C·Z (both seconds). Reflection of a load Z_L on a line Z: Γ = (Z_L − Z)/(Z_L + Z) (Pozar, Microwave
/// Engineering, 4th ed., eq. 2.35); the step response is the inverse Laplace transform of Γ(s)/s.</para>
/// <list type="bullet">
/// <item>Series L, then shunt C, then the matched line: Z_in/Z = sa + 1/(1 + sb), so
/// Γ(s) = s·(a − b + ab·s) / (ab·s² + (a + b)·s + 2).</item>
/// <item>Shunt C, then series L: Y_in·Z = sb + 1/(1 + sa), so Γ(s) = s·(a − b − ab·s) / (ab·s² + (a + b)·s + 2).</item>
/// <item>Either alone (the other zero): series L ρ = +exp(−2t/a) (τ = L/2Z), shunt C ρ = −exp(−2t/b) (τ = ZC/2)
/// (ReferenceData/published-checks.md §11).</item>
/// <item>Capacitive end, Z_L = 1/(sC): Γ = (1 − s·ZC)/(1 + s·ZC), ρ = 1 − 2·exp(−t/τ), τ = Z·C (from −1 to +1).
/// Inductive end, Z_L = sL: Γ = (s·L/Z − 1)/(s·L/Z + 1), ρ = −1 + 2·exp(−t/τ), τ = L/Z (from +1 to −1).</item>
/// </list>
/// <para>The area ∫ρ dt of the pair is Γ(s)/s at s = 0 = (a − b)/2 = L/(2Z) − ZC/2: the two lobes cancel in the area, which
/// is why an area alone reads a connector of 12 nH and 2.5 pF on 75 Ω as 0.37 pF. Their shapes differ, which a fit of the
/// model above separates.</para>
/// <para>Instrument and grid: the incident edge is a linear 0-100 % ramp of length R centred on the arrival time t_s, and each
/// layer value is the mean over its step d, so the layer centred at t reads
/// [P(u + R/2 + d/2) − P(u + R/2 − d/2) − P(u − R/2 + d/2) + P(u − R/2 − d/2)] / (R·d), u = t − t_s, with P the double time
/// integral of ρ: P(t) = c0·t²/2 + Σ cᵢ·(exp(pᵢt) − 1 − pᵢt)/pᵢ² for t ≥ 0.</para>
/// </remarks>
public static class LumpedResponse
{
    /// <summary>A step response as a constant and complex exponential terms (their sum is real).</summary>
    /// <param name="Constant">c0, the level the response tends to.</param>
    /// <param name="Terms">(cᵢ, pᵢ) pairs, Re pᵢ &lt; 0.</param>
    public sealed record StepResponse(double Constant, IReadOnlyList<(Complex Coefficient, Complex Pole)> Terms);

    /// <summary>A series L and a shunt C at one place on a line (either may be zero).</summary>
    /// <param name="a">L/Z, s (≥ 0).</param>
    /// <param name="b">C·Z, s (≥ 0).</param>
    /// <param name="seriesFirst">True: the series L comes first from the instrument; false: the shunt C does.</param>
    /// <returns>The step response of the reflection (see the class remarks).</returns>
    public static StepResponse Pair(double a, double b, bool seriesFirst)
    {
        const double tiny = 1e-18;
        if (a <= tiny && b <= tiny) return new StepResponse(0, []);
        if (b <= tiny) return new StepResponse(0, [(1, -2 / a)]);
        if (a <= tiny) return new StepResponse(0, [(-1, -2 / b)]);
        double ab = a * b, sum = a + b;
        var poles = TransmissionPoles(a, b);   // the pair's two poles, the same as its transmission's
        double n0 = a - b, n1 = seriesFirst ? ab : -ab;
        (Complex, Complex) Term(Complex p) => ((n0 + n1 * p) / (2 * ab * p + sum), p);
        return new StepResponse(0, [Term(poles[0]), Term(poles[1])]);
    }

    /// <summary>A capacitive (ρ −1 → +1) or inductive (ρ +1 → −1) end with time constant <paramref name="tau"/>.</summary>
    /// <param name="capacitive">True for a C to ground, false for an L to ground.</param>
    /// <param name="tau">Z·C or L/Z, s. Must be positive.</param>
    /// <returns>The step response of the reflection.</returns>
    public static StepResponse End(bool capacitive, double tau) =>
        capacitive ? new StepResponse(1, [(-2, -1 / tau)]) : new StepResponse(-1, [(2, -1 / tau)]);

    /// <summary>
    /// <paramref name="response"/> seen through a first-order low-pass of time constant <paramref name="tauF"/>: the edge
    /// slowed by the parts and loss it passed on its way (see <see cref="Filtered(StepResponse, Complex)"/>).
    /// </summary>
    /// <param name="response">The step response.</param>
    /// <param name="tauF">τf, s; zero or less returns the response unchanged.</param>
    /// <returns>The filtered step response.</returns>
    public static StepResponse Filtered(StepResponse response, double tauF) =>
        tauF > 0 ? Filtered(response, new Complex(-1 / tauF, 0)) : response;

    /// <summary>
    /// <paramref name="response"/> seen through the unit-gain section −q/(s − q). Each term c·e^(pt) (the constant with
    /// p = 0) becomes k·(e^(pt) − e^(qt)) with k = c·q/(q − p), its convolution with the section's impulse response −q·e^(qt).
    /// A chain of such sections with conjugate poles is the transmission of the parts a step passed (<see cref="TransmissionPoles"/>).
    /// </summary>
    /// <param name="response">The step response.</param>
    /// <param name="pole">q, 1/s, with a negative real part.</param>
    /// <returns>The filtered step response.</returns>
    public static StepResponse Filtered(StepResponse response, Complex pole)
    {
        ArgumentNullException.ThrowIfNull(response);
        var terms = new List<(Complex, Complex)>();
        Complex atPole = -response.Constant;
        foreach (var (c, p0) in response.Terms)
        {
            Complex p = Near(p0, pole) ? p0 * (1 - TwinPoleOffset) : p0;   // equal poles: step off them
            Complex k = c * pole / (pole - p);
            terms.Add((k, p));
            atPole -= k;
        }
        terms.Add((atPole, pole));
        return new StepResponse(response.Constant, terms);
    }

    /// <summary>
    /// Poles of the one-way transmission of a series L and a shunt C at one place (either may be zero): with a = L/Z, b = C·Z,
    /// T(s) = 2/(ab·s² + (a + b)·s + 2) = Π −pᵢ/(s − pᵢ) over the roots pᵢ (1 + Γ for the shunt C alone, 1/(1 + s·a/2) for the
    /// series L alone). Its delay at low frequency is (a + b)/2, the τ of the parts.
    /// </summary>
    /// <param name="a">L/Z, s (≥ 0).</param>
    /// <param name="b">C·Z, s (≥ 0).</param>
    /// <returns>The poles, 1/s; none when both are zero.</returns>
    public static IReadOnlyList<Complex> TransmissionPoles(double a, double b)
    {
        const double tiny = 1e-18;
        if (a <= tiny && b <= tiny) return [];
        if (b <= tiny) return [new Complex(-2 / a, 0)];
        if (a <= tiny) return [new Complex(-2 / b, 0)];
        double ab = a * b, sum = a + b;
        Complex root = Complex.Sqrt(Discriminant(a, b));
        return [(-sum + root) / (2 * ab), (-sum - root) / (2 * ab)];
    }

    /// <summary>
    /// (a + b)² − 8ab, kept at least 1e-4·(a + b)² away from zero: at a double pole the two terms' coefficients grow without
    /// bound and cancel, which leaves the fit's difference quotients in rounding noise. The roots then differ by 1 %.
    /// </summary>
    static double Discriminant(double a, double b)
    {
        double sum = a + b, d = sum * sum - 8 * a * b, floor = 1e-4 * sum * sum;
        return Math.Abs(d) >= floor ? d : d < 0 ? -floor : floor;
    }

    /// <summary>Relative offset given to a repeated pole (a part passed twice): small for the response, large enough that
    /// the two terms' coefficients (about 1/offset) cancel without eating the fit's difference quotients.</summary>
    public const double TwinPoleOffset = 1e-3;

    static bool Near(Complex p, Complex q) => Complex.Abs(p - q) < 0.1 * TwinPoleOffset * Complex.Abs(q);

    /// <summary>The layer values a reflectometer records for <paramref name="response"/> arriving at <paramref name="arrivalS"/>.</summary>
    /// <param name="response">The step response.</param>
    /// <param name="arrivalS">Round-trip time at which the edge's 50 % point reaches the part, s.</param>
    /// <param name="rampS">Length of the incident edge's linear 0-100 % ramp, s.</param>
    /// <param name="layerS">Layer step d, s; layer k is centred on k·d.</param>
    /// <param name="first">First layer index.</param>
    /// <param name="count">Number of layers.</param>
    /// <returns>ρ of layers first … first + count − 1.</returns>
    public static double[] Layers(StepResponse response, double arrivalS, double rampS, double layerS, int first, int count)
    {
        ArgumentNullException.ThrowIfNull(response);
        double r = Math.Max(rampS, 1e-6 * layerS), d = layerS;
        var y = new double[count];
        for (int i = 0; i < count; i++)
        {
            double u = (first + i) * d - arrivalS;
            y[i] = (P(response, u + r / 2 + d / 2) - P(response, u + r / 2 - d / 2)
                    - P(response, u - r / 2 + d / 2) + P(response, u - r / 2 - d / 2)) / (r * d);
        }
        return y;
    }

    /// <summary>Double time integral of the step response from 0.</summary>
    static double P(StepResponse s, double t)
    {
        if (t <= 0) return 0;
        double sum = s.Constant * t * t / 2;
        foreach (var (c, p) in s.Terms)
        {
            Complex x = p * t;
            // (e^x − 1 − x)/p² loses every digit for small x: use its series there.
            Complex f = Complex.Abs(x) < 1e-2
                ? t * t * (0.5 + x / 6 + x * x / 24 + x * x * x / 120)
                : (Complex.Exp(x) - 1 - x) / (p * p);
            sum += (c * f).Real;
        }
        return sum;
    }
}
