using WaveSim.Core.Buffers;
using WaveSim.Core.Units;
using YamlDotNet.RepresentationModel;

namespace WaveSim.Core.Scenarios;

/// <summary>
/// Reads an <c>iv:</c> key: a list of <c>[V, I]</c> pairs with units (<c>[-0.6 V, -50 mA]</c>), V strictly increasing. A
/// table, not a number, so it has no entry in <see cref="ScenarioKeys"/> and cannot be swept or fitted by key path.
/// </summary>
internal static class IvTable
{
    /// <summary>The table under <c>iv</c> in <paramref name="m"/>; null when the key is absent.</summary>
    /// <exception cref="ScenarioException">Not a list of pairs, a value without its unit, fewer than two points, or a voltage
    /// that does not exceed the one before it; the message names the file, line, column and the point's key.</exception>
    public static IvCurve? Read(YamlMap m)
    {
        var node = m.Node("iv");
        if (node is null) return null;
        string key = m.Join("iv");
        if (node is not YamlSequenceNode seq)
            throw m.Error(node, key, "expected a list of [V, I] pairs with units, e.g. [[-0.6 V, -50 mA], [0 V, 0 A], [0.6 V, 50 mA]]");
        var points = new List<(double, double)>(seq.Children.Count);
        for (int k = 0; k < seq.Children.Count; k++)
        {
            var item = seq.Children[k];
            string at = $"{key}[{k}]";
            if (item is not YamlSequenceNode pair || pair.Children.Count != 2 || pair.Children.Any(c => c is not YamlScalarNode))
                throw m.Error(item, at, "expected one pair [V, I] with units, e.g. [0.7 V, 10 mA]");
            double v = Value(m, pair.Children[0], at + " voltage", Dimension.Voltage);
            double i = Value(m, pair.Children[1], at + " current", Dimension.Current);
            if (points.Count > 0 && !(v > points[^1].Item1))
                throw m.Error(item, at, $"voltage {Quantity.Format(v, "V")} does not exceed the point before it ({Quantity.Format(points[^1].Item1, "V")}); the voltages must increase strictly");
            points.Add((v, i));
        }
        if (points.Count < 2)
            throw m.Error(node, key, $"needs at least two [V, I] points, got {points.Count}");
        try { return IvCurve.Create(points, key); }
        catch (InputException ex) { throw m.Error(node, key, ex.Message); }
    }

    static double Value(YamlMap m, YamlNode node, string what, Dimension dim)
    {
        try { return Quantity.ParseAny(((YamlScalarNode)node).Value ?? "", dim).Value; }
        catch (UnitException ex) { throw m.Error(node, what, ex.Message); }
    }
}
