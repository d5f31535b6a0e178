using WaveSim.Core.Model;
using WaveSim.Core.Units;

namespace WaveSim.Core.Scenarios;

/// <summary>Reads a probe's <c>at</c>: source, load, a distance, or BRANCH/... with the same choices on a branch.</summary>
internal static class ProbeLocation
{
    public static ProbeSpec Resolve(string name, string at, Scenario scenario, Func<string, Exception> error)
    {
        var parts = at.Split('/');
        var path = parts[..^1];
        IReadOnlyList<LineElement> line = scenario.Line;
        foreach (string b in path)
        {
            var branch = AllBranches(line).FirstOrDefault(x => x.Name == b)
                ?? throw error($"no branch named '{b}' on {(line == scenario.Line ? "the main line" : "that branch")}; branches there: {string.Join(", ", AllBranches(line).Select(x => x.Name).DefaultIfEmpty("none"))}");
            line = branch.Line;
        }
        string where = parts[^1].Trim();
        if (where == "source") return new ProbeSpec(name, path, ProbeAnchor.Source);
        if (where == "load") return new ProbeSpec(name, path, ProbeAnchor.Load);
        double d;
        try { d = Quantity.Parse(where, Dimension.Length); }
        catch (UnitException ex)
        { throw error($"'{at}' is not a probe location: expected source, load, a distance such as 75 mm, or BRANCH/load, BRANCH/DISTANCE ({ex.Message})"); }
        double total = line.OfType<Segment>().Sum(s => s.Length);
        if (d < 0 || d > total * (1 + 1e-9))
            throw error($"{Quantity.Format(d, "m")} is outside the line, which is {Quantity.Format(total, "m")} long");
        return new ProbeSpec(name, path, ProbeAnchor.Distance, Math.Min(d, total));
    }

    static IEnumerable<Branch> AllBranches(IReadOnlyList<LineElement> line) => line.OfType<Branch>();
}
