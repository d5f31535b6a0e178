using WaveSim.Core.Model;

namespace WaveSim.Core.Solver;

/// <summary>
/// The DC level at every load probe with the driver held at one level: the network's DC solution (capacitors open, inductors
/// shorted, line resistance included). It is the level an edge settles to, exactly, however long the record.
/// </summary>
internal static class LoadDcLevels
{
    /// <summary>One value per probe of <paramref name="s"/>: the DC level at a load probe, NaN elsewhere; null when the network has no DC solution.</summary>
    public static double[]? At(Scenario s, GridPlan plan, double level)
    {
        var net = NetworkBuilder.Build(s, plan);
        double[] volts;
        try { volts = DcOperatingPoint.Solution(net, level).JunctionVolts; }
        catch (InputException) { return null; }
        return s.Probes.Select(p => p.Anchor == ProbeAnchor.Load ? volts[net.Lines[string.Join("/", p.BranchPath)].EndJunction] : double.NaN).ToArray();
    }
}
