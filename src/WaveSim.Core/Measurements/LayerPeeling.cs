using System.Globalization;

namespace WaveSim.Core.Measurements;

/// <summary>
/// Impedance profile from a step reflectometer trace by layer peeling (discrete inverse scattering), correcting
/// for the multiple reflections between discontinuities and for the transmission loss through earlier steps.
/// </summary>
/// <remarks>
/// <para>Method: layer peeling of a Goupillaud (equal one-way delay) lossless layered medium, as in A. M. Bruckstein
/// and T. Kailath, "Inverse scattering for discrete transmission-line models", SIAM Review 29(3):359-389, 1987.</para>
/// <para>Model and assumptions:</para>
/// <list type="bullet">
/// <item>The line is a stack of lossless layers of equal one-way delay τ; one sample of the input is one round trip
/// 2τ, so the profile is piecewise constant on a grid of τ (distance v·Δt/2 per sample).</item>
/// <item>The instrument's source is matched to the reference Z0: nothing re-reflects at the instrument.</item>
/// <item>The incident edge is an ideal step. A real rise time smears each step over a few layers and shows up as
/// intermediate layers; loss shows up as a slow drift.</item>
/// </list>
/// <para>Recursion. Voltage waves at the top of layer k: D (down-going) and U (up-going), as sequences in round-trip
/// time. At the start D = δ (the incident impulse) and U = h, the impulse response h[n] = ρ[n] - ρ[n-1]. Causality
/// makes the first arrival up equal r_k times the first arrival down, so r_k = U[0] / D[0]. Crossing the interface
/// inverts its scattering relations U = r·D + (1-r)·U', D' = (1+r)·D - r·U' (U', D' just below):
/// D' = (D - r·U) / (1 - r), U' = (U - r·D) / (1 - r). Moving down through the layer delays D by τ and advances U
/// by τ; re-timing to the next interface's first arrival leaves D as it is and shifts U one sample earlier. Then
/// Z_k = Z_(k-1)·(1 + r_k) / (1 - r_k). Cost O(N²).</para>
/// </remarks>
public static class LayerPeeling
{
    /// <summary>Recovers one layer per sample of a reflection step response.</summary>
    /// <param name="rho">Reflection step response ρ[n] = v_r / v_inc, one sample per layer round trip; ρ[0] is the
    /// value just after the edge reaches the reference plane (see <see cref="StepReflectometry.Reflection"/>).</param>
    /// <param name="referenceOhms">Reference impedance Z0, Ω. Default 50. Must be positive.</param>
    /// <returns>Reflection coefficient and impedance of each layer.</returns>
    /// <exception cref="NumericalException">A recovered reflection coefficient leaves (-1, 1): the trace is not the step
    /// response of a lossless line (an open or short, strong loss, noise or a slow edge).</exception>
    public static ImpedanceProfile Profile(double[] rho, double referenceOhms = 50.0)
    {
        ArgumentNullException.ThrowIfNull(rho);
        if (!(referenceOhms > 0) || double.IsInfinity(referenceOhms))
            throw new InputException($"the reference impedance must be positive, got {referenceOhms} ohm");
        int n = rho.Length;
        if (n == 0)
            throw new InputException("layer peeling needs at least one sample");
        for (int i = 0; i < n; i++)
            if (!double.IsFinite(rho[i]))
                throw new InputException($"the reflection trace has a non-finite value at sample {i}");

        var down = new double[n];
        var up = new double[n];
        down[0] = 1.0;
        up[0] = rho[0];
        for (int i = 1; i < n; i++)
            up[i] = rho[i] - rho[i - 1];

        var r = new double[n];
        var z = new double[n];
        double zPrev = referenceOhms;
        int length = n;   // valid samples left in down/up
        for (int k = 0; k < n; k++)
        {
            double rk = up[0] / down[0];
            if (!(Math.Abs(rk) < 1))
                throw new NumericalException(
                    $"layer peeling broke down at layer {k}: reflection {rk.ToString("G4", CultureInfo.InvariantCulture)} is outside (-1, 1); " +
                    "the trace is not the step response of a lossless line (open, short, loss, noise or a slow edge)");
            r[k] = rk;
            zPrev = zPrev * (1 + rk) / (1 - rk);
            z[k] = zPrev;

            // Cross the interface, then shift the up-going wave one round trip earlier.
            double scale = 1.0 / (1 - rk);
            for (int i = 0; i < length; i++)
            {
                double d = down[i], u = up[i];
                down[i] = (d - rk * u) * scale;
                up[i] = (u - rk * d) * scale;
            }
            // up[0] is now zero up to rounding (nothing has come back from below yet).
            for (int i = 0; i + 1 < length; i++)
                up[i] = up[i + 1];
            length--;
        }
        return new ImpedanceProfile(r, z, referenceOhms);
    }
}
