using System.Globalization;
using System.Text;
using CsCheck;

namespace WaveSim.Tests.Properties;

/// <summary>A random passive net, described independently of the product's model so the tests can solve it on their own.</summary>
internal sealed record RandomNet(double Rs, double Rise, double Resolution, IReadOnlyList<RandomItem> Line, RandomLoad Load)
{
    public static readonly Gen<RandomLoad> LoadGen = Gen.OneOf(
        Gen.Const(new RandomLoad(null, null, null, false)),
        Gen.Const(new RandomLoad(null, null, null, true)),
        Gen.Double[10, 1000].Select(r => new RandomLoad(r, null, null, false)),
        Gen.Select(Gen.Double[10, 1000], Gen.Double[0.1, 5]).Select((r, c) => new RandomLoad(r, c * 1e-12, null, false)),
        Gen.Double[0.1, 5].Select(c => new RandomLoad(null, c * 1e-12, null, false)),
        Gen.Select(Gen.Double[20, 500], Gen.Double[1, 10]).Select((r, l) => new RandomLoad(r, null, l * 1e-9, false)));

    static readonly Gen<RandomItem> SegmentGen =
        Gen.Select(Gen.Double[20, 120], Gen.Double[0.05, 0.3], Gen.Double[10, 300], Gen.OneOf(Gen.Const(0.0), Gen.Double[0, 20]))
           .Select((z0, td, len, r) => (RandomItem)new RandomSegment(z0, td * 1e-9, len * 1e-3, ZeroBelow(r, 1e-3)));

    /// <summary>
    /// The generator's doubles reach down to 1e-300; the loader refuses magnitudes below each dimension's sensible range
    /// (1e-9 ohm/m, 1e-6 ohm, 1e-15 H), so a value too small to matter is written as the zero it stands for.
    /// </summary>
    static double ZeroBelow(double x, double floor) => x < floor ? 0 : x;

    static readonly Gen<RandomItem> LumpedGen = Gen.OneOf(
        Gen.Select(Gen.Double[10, 1000], Gen.Double[0.1, 5]).Select((r, c) => (RandomItem)new RandomShunt(r, c * 1e-12)),
        Gen.Double[10, 1000].Select(r => (RandomItem)new RandomShunt(r, null)),
        Gen.Double[0.1, 5].Select(c => (RandomItem)new RandomShunt(null, c * 1e-12)),
        Gen.Select(Gen.Double[0, 50], Gen.Double[0, 5]).Select((r, l) => (RandomItem)new RandomSeries(ZeroBelow(r, 1e-3), Math.Max(l, 1e-3) * 1e-9)));

    static readonly Gen<RandomItem> BranchGen =
        Gen.Select(SegmentGen, LoadGen).Select((s, l) => (RandomItem)new RandomBranch([s], l));

    /// <summary>1 to 4 segments, each optionally followed by a lumped part or a branch.</summary>
    public static readonly Gen<RandomNet> Gen_ =
        Gen.Select(SegmentGen.Array[1, 4], Gen.OneOf(LumpedGen, BranchGen, Gen.Const<RandomItem>(new RandomNothing())).Array[4],
                   Gen.Double[0.5, 2], Gen.Double[100, 400], Gen.Int[6, 12], LoadGen)
           .Select((segs, extras, rsFactor, rise, res, load) =>
           {
               var items = new List<RandomItem>();
               for (int i = 0; i < segs.Length; i++)
               {
                   items.Add(segs[i]);
                   if (extras[i] is not RandomNothing) items.Add(extras[i]);
               }
               return new RandomNet(rsFactor * ((RandomSegment)segs[0]).Z0, rise * 1e-12, res, items, load);
           });

    public IEnumerable<RandomSegment> AllSegments() => Segments(Line);

    static IEnumerable<RandomSegment> Segments(IEnumerable<RandomItem> line) =>
        line.SelectMany(i => i switch { RandomSegment s => [s], RandomBranch b => Segments(b.Line), _ => Array.Empty<RandomSegment>() });

    /// <summary>A duration long enough for reflections (|Γ_S| ≤ 1/3) and lumped time constants to die out.</summary>
    public double SettleDuration()
    {
        double roundTrip = 2 * AllSegments().Sum(s => s.Delay);
        return 40 * roundTrip + 12 * 5e-12 * 1500 + 10e-9;
    }

    public string Yaml(double duration, string waveform = "step")
    {
        var b = new StringBuilder();
        string F(double x) => x.ToString("R", CultureInfo.InvariantCulture);
        b.AppendLine($"source: {{ waveform: {waveform}, high: 1 V, rise: {F(Rise)} s, resistance: {F(Rs)} ohm{(waveform == "pulse" ? $", width: {F(3 * Rise)} s" : "")} }}");
        b.AppendLine("line:");
        WriteLine(b, Line, "  ", F);
        b.AppendLine("load: " + LoadYaml(Load, F));
        b.AppendLine("probes: [ { name: src, at: source }, { name: rx, at: load } ]");
        b.AppendLine($"simulation: {{ duration: {F(duration)} s, resolution: {F(Resolution)} }}");
        return b.ToString();
    }

    static void WriteLine(StringBuilder b, IEnumerable<RandomItem> line, string indent, Func<double, string> F)
    {
        int n = 0;
        foreach (var item in line)
        {
            switch (item)
            {
                case RandomSegment s:
                    b.AppendLine($"{indent}- segment: {{ length: {F(s.Length)} m, z0: {F(s.Z0)} ohm, delay: {F(s.Delay)} s, r: {F(s.R)} ohm/m }}");
                    break;
                case RandomShunt sh:
                    b.AppendLine($"{indent}- shunt: {{ {Parts(sh.R, null, sh.C, F)} }}");
                    break;
                case RandomSeries se:
                    b.AppendLine($"{indent}- series: {{ {Parts(se.R, se.L > 0 ? se.L : null, null, F)} }}");
                    break;
                case RandomBranch br:
                    b.AppendLine($"{indent}- branch:");
                    b.AppendLine($"{indent}    name: b{n++}_{b.Length}");
                    b.AppendLine($"{indent}    line:");
                    WriteLine(b, br.Line, indent + "      ", F);
                    b.AppendLine($"{indent}    load: {LoadYaml(br.Load, F)}");
                    break;
            }
        }
    }

    static string Parts(double? r, double? l, double? c, Func<double, string> F) => string.Join(", ", new[]
    {
        r is { } x ? $"r: {F(x)} ohm" : null, l is { } y ? $"l: {F(y)} H" : null, c is { } z ? $"c: {F(z)} F" : null,
    }.Where(s => s != null));

    static string LoadYaml(RandomLoad l, Func<double, string> F) =>
        l.Short ? "short" : l.R is null && l.C is null && l.L is null ? "open" : "{ " + Parts(l.R, l.L, l.C, F) + " }";

    public override string ToString() => Yaml(SettleDuration());
}

internal abstract record RandomItem;
internal sealed record RandomNothing : RandomItem;
internal sealed record RandomSegment(double Z0, double Delay, double Length, double R) : RandomItem;
internal sealed record RandomShunt(double? R, double? C) : RandomItem;
internal sealed record RandomSeries(double R, double L) : RandomItem;
internal sealed record RandomBranch(IReadOnlyList<RandomItem> Line, RandomLoad Load) : RandomItem;
internal sealed record RandomLoad(double? R, double? C, double? L, bool Short);
