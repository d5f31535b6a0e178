using WaveSim.Core.Model;

namespace WaveSim.Core.Analysis;

/// <summary>Where a probe sits in the net: the load at the end of its line, its receiver, its delay from the driver.</summary>
public static class NetPaths
{
    /// <summary>The load at the end of the line reached by <paramref name="path"/> (branch names from the main line).</summary>
    public static LoadSpec LoadOf(Scenario s, IReadOnlyList<string> path)
    {
        var load = s.Load;
        IReadOnlyList<LineElement> line = s.Line;
        foreach (string name in path)
        {
            var b = line.OfType<Branch>().First(x => x.Name == name);
            line = b.Line; load = b.Load;
        }
        return load;
    }

    /// <summary>The receiver thresholds of the load a probe sits at, or null (not at a load, or a load without a receiver).</summary>
    public static ReceiverThresholds? ReceiverAt(Scenario s, ProbeSpec probe) =>
        probe.Anchor == ProbeAnchor.Load ? LoadOf(s, probe.BranchPath).Receiver : null;

    /// <summary>Sum of the delays of every segment of a line and its branches, s.</summary>
    public static double TotalDelay(IReadOnlyList<LineElement> line) => line.Sum(e => e switch
    {
        Segment s => s.Delay,
        Branch b => TotalDelay(b.Line),
        _ => 0,
    });

    /// <summary>The one-way segment delay from the driver to the probe's position, s (lumped parts add none).</summary>
    public static double DelayTo(Scenario s, ProbeSpec p) => DelayTo(s.Line, p, 0);

    static double DelayTo(IReadOnlyList<LineElement> line, ProbeSpec p, int depth)
    {
        bool here = depth == p.BranchPath.Count;
        double t = 0, pos = 0;
        foreach (var e in line)
        {
            switch (e)
            {
                case Segment s:
                    if (here && p.Anchor == ProbeAnchor.Source) return t;
                    if (here && p.Anchor == ProbeAnchor.Distance && p.Distance <= pos + s.Length)
                        return t + s.Delay * (p.Distance - pos) / s.Length;
                    t += s.Delay; pos += s.Length;
                    break;
                case Branch b when !here && b.Name == p.BranchPath[depth]:
                    return t + DelayTo(b.Line, p, depth + 1);
            }
        }
        return t;
    }
}
