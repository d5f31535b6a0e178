using System.Globalization;
using System.Text.RegularExpressions;
using WaveSim.Core.Units;

namespace WaveSim.Core.Sweeps;

/// <summary>
/// A bound a point must meet to be chosen: <c>rx.overshoot&lt;10%</c>, <c>rx.settling&lt;=5ns</c>, <c>rx.noise_margin_high&gt;0.4V</c>.
/// Percent figures take "10%" or a bare 10; times and voltages need their unit; counts are bare numbers.
/// A point whose figure does not apply (empty cell) fails the limit.
/// </summary>
/// <param name="Target">The probe figure.</param>
/// <param name="Operator">One of &lt;, &lt;=, &gt;, &gt;=.</param>
/// <param name="Bound">The bound in the figure's own unit (percent for *_pct, SI otherwise).</param>
public sealed partial record SweepLimit(ProbeFigure Target, string Operator, double Bound)
{
    [GeneratedRegex(@"^\s*([^<>=]+?)\s*(<=|>=|<|>)\s*(.+?)\s*$")]
    private static partial Regex Shape();

    /// <summary>Reads PROBE.FIGURE OP VALUE.</summary>
    /// <exception cref="InputException">Malformed text, unknown probe or figure, or a value in the wrong unit (naming the <c>text</c> parameter).</exception>
    public static SweepLimit Parse(string text, IReadOnlyList<string> probes)
    {
        var m = Shape().Match(text);
        if (!m.Success) throw new InputException($"'{text}': expected PROBE.FIGURE<VALUE (or <=, >, >=), e.g. rx.overshoot<10%") { Parameter = "text" };
        var target = FigureSelector.ProbeAndFigure(m.Groups[1].Value, probes);
        string value = m.Groups[3].Value;
        double bound;
        try
        {
            bound = FigureSelector.Unit(target.Figure) switch
            {
                "%" => Quantity.ParseAny(value, Dimension.Percent, Dimension.Number) is var (v, d) && d == Dimension.Percent ? v * 100 : v,
                "V" => Quantity.Parse(value, Dimension.Voltage),
                "s" => Quantity.Parse(value, Dimension.Time),
                _ => Quantity.Parse(value, Dimension.Number),
            };
        }
        catch (UnitException ex) { throw new InputException($"'{text}': {ex.Message}") { Parameter = "text" }; }
        return new SweepLimit(target, m.Groups[2].Value, bound);
    }

    /// <summary>True when <paramref name="value"/> meets the bound; null (figure does not apply) never does.</summary>
    public bool IsMet(double? value) => value is { } v && Operator switch
    {
        "<" => v < Bound,
        "<=" => v <= Bound,
        ">" => v > Bound,
        _ => v >= Bound,
    };

    /// <summary>The limit as written with the resolved figure, e.g. "rx.overshoot_pct&lt;10".</summary>
    public override string ToString() => Target.Column + Operator + Bound.ToString("R", CultureInfo.InvariantCulture);
}
