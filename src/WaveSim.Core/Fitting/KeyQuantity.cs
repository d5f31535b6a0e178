using WaveSim.Core.Scenarios;
using WaveSim.Core.Units;

namespace WaveSim.Core.Fitting;

/// <summary>The physical dimension of the value at a scenario key path, for reading start values and bounds.</summary>
public static class KeyQuantity
{
    /// <summary>The dimensions a value at <paramref name="keyPath"/> may be written in, preferred first.</summary>
    /// <remarks>Mirrors <see cref="ScenarioEditor.SiUnit"/>: a segment's delay is either per length (ns/m) or the whole segment's (ns).</remarks>
    /// <param name="keyPath">A key path such as <c>line[0].segment.delay</c> or <c>load.c</c>.</param>
    /// <returns>One or two dimensions.</returns>
    public static Dimension[] Dimensions(string keyPath)
    {
        ArgumentNullException.ThrowIfNull(keyPath);
        string key = keyPath[(keyPath.LastIndexOf('.') + 1)..];
        bool inSegment = keyPath.Contains(".segment.", StringComparison.Ordinal);
        return key switch
        {
            "z0" or "resistance" => [Dimension.Resistance],
            "r" => [inSegment ? Dimension.ResistancePerLength : Dimension.Resistance],
            "l" => [inSegment ? Dimension.InductancePerLength : Dimension.Inductance],
            "c" => [inSegment ? Dimension.CapacitancePerLength : Dimension.Capacitance],
            "g" => [Dimension.ConductancePerLength],
            "length" => [Dimension.Length],
            "delay" when inSegment => [Dimension.DelayPerLength, Dimension.Time],
            "velocity" => [Dimension.Velocity],
            "eps_eff" or "resolution" => [Dimension.Number],
            "low" or "high" or "to" or "vih" or "vil" => [Dimension.Voltage],
            "frequency" => [Dimension.Frequency],
            _ => [Dimension.Time],
        };
    }

    /// <summary>The SI unit to write a value of dimension <paramref name="d"/> with, as <see cref="ScenarioEditor.Format"/> expects.</summary>
    /// <param name="d">The dimension.</param>
    /// <returns>A unit text such as "ohm", "s/m" or "" for a plain number.</returns>
    public static string Unit(Dimension d) =>
        d.Kind == BaseKind.Percent ? "" : d.SiUnit;   // a percentage is written as a plain number of percent
}
