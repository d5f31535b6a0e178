using CsCheck;
using WaveSim.Core.Buffers;
using WaveSim.Tests.Properties;

namespace WaveSim.Tests.Buffers;

/// <summary>
/// Passivity of random I-V tables, P = V·I ≥ 0 (a part that never delivers energy; the definition of a passive one-port,
/// e.g. Desoer &amp; Kuh, Basic Circuit Theory, ch. on energy and passivity; from memory; ReferenceData/buffers.md §5).
/// </summary>
/// <remarks>
/// What is checked, precisely. The generated tables hold the point (0, 0); points right of it have V &gt; 0 and I ≥ 0, points
/// left of it V &lt; 0 and I ≤ 0; and both end segments have a slope ≥ 0 (the generator raises the last current to at least
/// the one before it, and lowers the first to at most the one after it). For each such table: <see cref="IvCurve.IsPassive"/>
/// is true, and I(V)·V ≥ 0 exactly (no tolerance) at every point, every midpoint, ±1e-9 V around the origin, and 200
/// voltages spread over ten times the table's span on each side, which covers the extrapolation. The counter-property
/// breaks one condition at a time (a current of the wrong sign, all currents shifted so I(0) ≠ 0, a falling end segment)
/// and checks that IsPassive is false and that a voltage with I·V &lt; 0 is found among those samples or at the crossing of
/// the falling end's line.
/// </remarks>
public class IvCurvePassivityProperties
{
    public static TheoryData<string> Seeds => PropertySeeds.Rows(PropertySeeds.Numbered(60));

    static readonly Gen<(double Gap, double Current)[]> Side = Gen.Select(Gen.Double[0.01, 2], Gen.Double[0, 1]).Array[0, 6];

    static readonly Gen<(double, double)[]> PassiveGen = Gen.Select(Side, Side).Where(t => t.Item1.Length + t.Item2.Length > 0).Select((right, left) =>
    {
        var pts = new List<(double V, double I)> { (0, 0) };
        double v = 0;
        foreach (var (gap, i) in right) pts.Add((v += gap, i));
        v = 0;
        foreach (var (gap, i) in left) pts.Insert(0, (v -= gap, -i));
        // End slopes ≥ 0: the last current at least the one before it, the first at most the one after it.
        int n = pts.Count;
        if (pts[n - 1].I < pts[n - 2].I) pts[n - 1] = (pts[n - 1].V, pts[n - 2].I);
        if (pts[0].I > pts[1].I) pts[0] = (pts[0].V, pts[1].I);
        return pts.ToArray();
    });

    static IEnumerable<double> Samples(IvCurve c)
    {
        double lo = c.Voltages[0], hi = c.Voltages[^1], span = Math.Max(hi - lo, 1e-3);
        foreach (double v in c.Voltages) yield return v;
        for (int k = 0; k + 1 < c.Voltages.Count; k++) yield return 0.5 * (c.Voltages[k] + c.Voltages[k + 1]);
        yield return 1e-9;
        yield return -1e-9;
        for (int k = 0; k <= 100; k++)
        {
            yield return lo - 10 * span * k / 100.0;
            yield return hi + 10 * span * k / 100.0;
        }
    }

    static bool Passive((double, double)[] pts)
    {
        IvCurve c = IvCurve.Create(pts, "random");
        if (!c.IsPassive) throw new Xunit.Sdk.XunitException($"IsPassive is false for {Show(pts)}");
        foreach (double v in Samples(c))
            if (c.Current(v) * v < 0) throw new Xunit.Sdk.XunitException($"I·V = {c.Current(v) * v} < 0 at V = {v} for {Show(pts)}");
        return true;
    }

    static bool Broken(((double, double)[] Pts, int How, double Amount) x)
    {
        var pts = ((double V, double I)[])x.Pts.Clone();
        int origin = Array.FindIndex(pts, p => p.V == 0);
        double witness = double.NaN;
        switch (x.How)
        {
            case 0: // a point of the wrong sign
                int k = origin + 1 < pts.Length ? origin + 1 : origin - 1;
                pts[k] = (pts[k].V, -Math.Sign(pts[k].V) * x.Amount);
                break;
            case 1: // every current shifted: I(0) ≠ 0
                for (int j = 0; j < pts.Length; j++) pts[j] = (pts[j].V, pts[j].I + x.Amount);
                break;
            default: // the right end falls
                int n = pts.Length;
                pts[n - 1] = (pts[n - 1].V, pts[n - 2].I - x.Amount);
                double s = (pts[n - 1].I - pts[n - 2].I) / (pts[n - 1].V - pts[n - 2].V);
                witness = pts[n - 1].V + 2 * Math.Abs(pts[n - 1].I / s) + 1; // past where the falling line crosses I = 0
                break;
        }
        IvCurve c = IvCurve.Create(pts, "random");
        if (c.IsPassive) throw new Xunit.Sdk.XunitException($"IsPassive is true for the active table {Show(pts)}");
        bool found = Samples(c).Append(witness).Where(double.IsFinite).Any(v => c.Current(v) * v < 0);
        if (!found) throw new Xunit.Sdk.XunitException($"no voltage with I·V < 0 found for {Show(pts)}");
        return true;
    }

    static readonly Gen<((double, double)[], int, double)> BrokenGen = Gen.Select(PassiveGen, Gen.Int[0, 2], Gen.Double[0.01, 1]);

    static string Show((double V, double I)[] pts) => string.Join(" ", pts.Select(p => $"[{p.V:G6}, {p.I:G6}]"));

    [Theory, MemberData(nameof(Seeds))]
    public void Tables_through_the_origin_in_the_first_and_third_quadrants_never_deliver_energy(string seed) =>
        Assert.True(Passive(PropertySeeds.Replay(PassiveGen, seed)));

    [Theory, MemberData(nameof(Seeds))]
    public void Breaking_one_condition_makes_a_table_that_delivers_energy_somewhere(string seed) =>
        Assert.True(Broken(PropertySeeds.Replay(BrokenGen, seed)));

    [SkippableFact]
    public void Soak_passive_tables() => PropertySeeds.Explore(PassiveGen, Passive);

    [SkippableFact]
    public void Soak_broken_tables() => PropertySeeds.Explore(BrokenGen, Broken);
}
