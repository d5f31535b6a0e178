using WaveSim.Core.Model;

namespace WaveSim.Core.Coupled;

/// <summary>A Thevenin source on one conductor: the single-line waveform, optionally mirrored between its levels.</summary>
/// <param name="Spec">The waveform, levels, edges and output resistance.</param>
/// <param name="Invert">When true the source starts at <c>high</c> and its edges go to <c>low</c>: v'(t) = high + low − v(t).</param>
public sealed record CoupledSource(SourceSpec Spec, bool Invert = false)
{
    /// <summary>The open-circuit voltage at <paramref name="t"/>, V.</summary>
    public double Value(double t)
    {
        double v = Spec.Value(t);
        return Invert ? Spec.High + Spec.Low - v : v;
    }

    /// <summary>The level before the first edge (the DC start's), V.</summary>
    public double InitialLevel => Invert ? Spec.High + Spec.Low - Spec.InitialLevel : Spec.InitialLevel;

    /// <summary>The swing between the levels, V (for crosstalk in percent).</summary>
    public double Swing => Math.Abs(Spec.High - Spec.Low);
}
