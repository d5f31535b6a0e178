namespace WaveSim.Core.Measurements;

/// <summary>A short dip or bump in a reflection trace, read as one lumped element.</summary>
/// <param name="Kind">Shunt C (dip) or series L (bump).</param>
/// <param name="TimeS">Round-trip time of the excursion's extreme, s, from the reference plane.</param>
/// <param name="DistanceM">Distance of that point from the reference plane, m (v·t/2).</param>
/// <param name="AreaS">∫(ρ - baseline) dt over the excursion, s.</param>
/// <param name="Value">The element: farads for a shunt C, henries for a series L.</param>
/// <param name="StartIndex">First sample of the excursion.</param>
/// <param name="EndIndex">Last sample of the excursion.</param>
/// <param name="BaselineRho">ρ of the settled level before it.</param>
public sealed record LumpedDiscontinuity(LumpedKind Kind, double TimeS, double DistanceM, double AreaS, double Value, int StartIndex, int EndIndex,
    double BaselineRho = 0);
