using WaveSim.Core.Model;
using WaveSim.Core.Units;

namespace WaveSim.Core.Solver;

/// <summary>Which source edges a grid widens to its shortest carried edge (<see cref="GridPlan.MinimumEdge"/>).</summary>
public static class EdgeLimit
{
    /// <summary>Whether the waveform has ramped edges given by <c>rise</c> and <c>fall</c> (step, pulse, trapezoid, bits).</summary>
    public static bool HasRampedEdges(SourceSpec s) =>
        s.Waveform is WaveformKind.Step or WaveformKind.Pulse or WaveformKind.Trapezoid or WaveformKind.Bits;

    /// <summary>The source's edges shorter than the plan's minimum edge, by key (<c>source.rise</c>, <c>source.fall</c>) and 10-90 time.</summary>
    public static IReadOnlyList<(string Key, double TenNinety)> WidenedEdges(SourceSpec s, GridPlan plan)
    {
        var list = new List<(string, double)>();
        if (!HasRampedEdges(s)) return list;
        if (s.Rise < plan.MinimumEdge) list.Add(("source.rise", s.Rise));
        if (s.Waveform != WaveformKind.Step && s.Fall < plan.MinimumEdge && s.Fall != s.Rise) list.Add(("source.fall", s.Fall));
        return list;
    }

    /// <summary>"an ideal (0 s) edge" or "1 ps".</summary>
    public static string Describe(double tenNinety) => tenNinety > 0 ? Quantity.Format(tenNinety, "s") : "an ideal (0 s) edge";
}
