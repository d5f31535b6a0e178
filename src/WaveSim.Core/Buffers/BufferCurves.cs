namespace WaveSim.Core.Buffers;

/// <summary>
/// A buffer model in one corner as laws of the pin (pad) voltage, each current positive into the pin: the pin current of a
/// driver is Ku·I_pullup(V) + Kd·I_pulldown(V) + I_gnd_clamp(V) + I_power_clamp(V) + C_comp·dV/dt, with C_comp from the pad
/// to ground and Ku, Kd the switching coefficients (<see cref="SwitchingCoefficients"/>).
/// </summary>
/// <param name="Corner">The corner.</param>
/// <param name="Pullup">The pullup against pin voltage; null when the model has none.</param>
/// <param name="Pulldown">The pulldown against pin voltage; null when the model has none.</param>
/// <param name="GndClamp">The ground clamp against pin voltage; null when the model has none.</param>
/// <param name="PowerClamp">The power clamp against pin voltage; null when the model has none.</param>
/// <param name="CComp">C_comp (F).</param>
/// <param name="HighReference">The pullup reference (V), the level the driver pulls up to; NaN without a pullup.</param>
/// <param name="LowReference">The pulldown reference (V), the level the driver pulls down to.</param>
public sealed record BufferCurves(Corner Corner, IvCurve? Pullup, IvCurve? Pulldown, IvCurve? GndClamp, IvCurve? PowerClamp,
                                  double CComp, double HighReference, double LowReference)
{
    /// <summary>The clamps' current into the pin at <paramref name="voltage"/> (A); 0 without clamps.</summary>
    public double ClampCurrent(double voltage) =>
        (GndClamp?.Current(voltage) ?? 0) + (PowerClamp?.Current(voltage) ?? 0);

    /// <summary>The static pin current (A) with the switching coefficients <paramref name="ku"/> and <paramref name="kd"/>.</summary>
    public double Current(double voltage, double ku, double kd) =>
        ku * (Pullup?.Current(voltage) ?? 0) + kd * (Pulldown?.Current(voltage) ?? 0) + ClampCurrent(voltage);

    /// <summary>
    /// The driver's small-signal output resistance at its high level (Ω): 1 / (dI/dV of pullup plus clamps) at the pullup
    /// reference, where the pullup table starts; null without a pullup or where the slope is not positive.
    /// </summary>
    public double? OutputResistanceHigh => Pullup is null ? null : Inverse(Pullup.SlopeAround(HighReference) + ClampSlope(HighReference));

    /// <summary>
    /// The driver's small-signal output resistance at its low level (Ω): 1 / (dI/dV of pulldown plus clamps) at the pulldown
    /// reference; null without a pulldown or where the slope is not positive.
    /// </summary>
    public double? OutputResistanceLow => Pulldown is null ? null : Inverse(Pulldown.SlopeAround(LowReference) + ClampSlope(LowReference));

    double ClampSlope(double v) => (GndClamp?.SlopeAround(v) ?? 0) + (PowerClamp?.SlopeAround(v) ?? 0);

    static double? Inverse(double slope) => slope > 0 && double.IsFinite(slope) ? 1 / slope : null;
}
