using System.Globalization;
using WaveSim.Core.Model;
using WaveSim.Core.Scenarios;
using WaveSim.Core.Units;

namespace WaveSim.Core.Fitting;

/// <summary>A scenario value left free in a fit, with its start and bounds in SI.</summary>
/// <param name="KeyPath">Where it sits, e.g. <c>line[0].segment.z0</c>.</param>
/// <param name="Start">Starting value (the scenario's, or the geometric mean of the bounds when the key is absent).</param>
/// <param name="Lower">Lower bound.</param>
/// <param name="Upper">Upper bound, above <paramref name="Lower"/>.</param>
/// <param name="Dimension">What the value is; a segment's delay is fitted per length or as the whole segment's time, as written.</param>
public sealed record FreeParameter(string KeyPath, double Start, double Lower, double Upper, Dimension Dimension)
{
    /// <summary>Ratio of the default bounds to the start: [start / 3, start × 3].</summary>
    public const double DefaultBoundRatio = 3.0;

    /// <summary>The SI unit the value is written with, e.g. "ohm", "s/m", "F" ("" for a plain number).</summary>
    public string Unit => ScenarioKeys.Unit(Dimension);

    /// <summary>Reads <c>KEY</c> or <c>KEY=MIN..MAX</c> (bounds with units, e.g. <c>load.c=0.5pF..5pF</c>).</summary>
    /// <remarks>The start is the scenario's current value at the key (<see cref="ScenarioValues.Read"/>), in the dimension the
    /// scenario writes it in. Without bounds they are [start/3, start×3], which needs a positive start. A key the scenario does
    /// not write needs bounds; it starts at their geometric mean (their midpoint when the lower bound is not positive).
    /// Messages start with the key path.</remarks>
    /// <param name="document">The scenario as read: the model, and the text that says which keys are written and how.</param>
    /// <param name="spec">The text KEY or KEY=MIN..MAX; errors name this parameter (<see cref="InputException.Parameter"/>).</param>
    /// <returns>The parameter.</returns>
    /// <exception cref="InputException">Malformed text, a key the scenario cannot vary, a unit of the wrong kind, bounds out of
    /// order, or a start outside them.</exception>
    public static FreeParameter Parse(ScenarioDocument document, string spec)
    {
        ArgumentNullException.ThrowIfNull(document);
        ArgumentNullException.ThrowIfNull(spec);
        string text = spec.Trim();
        int eq = text.IndexOf('=');
        string key = (eq < 0 ? text : text[..eq]).Trim();
        string? range = eq < 0 ? null : text[(eq + 1)..].Trim();
        if (key.Length == 0)
            throw new InputException($"'{spec}': expected KEY or KEY=MIN..MAX, e.g. line[0].segment.z0 or load.c=0.5pF..5pF") { Parameter = "spec" };

        Scenario scenario = document.Scenario;
        ScenarioKey info;
        try { info = ScenarioValues.KeyAt(scenario, key); }   // the key must name a value the scenario can vary
        catch (InputException ex) when (ex.Parameter is null) { throw new InputException(ex.Message) { Parameter = "spec" }; }
        Dimension[] dims = [.. info.Dimensions];
        double? start = null;
        Dimension? dim = null;
        if (document.Written(key) is { } written)
        {
            try { dim = Quantity.ParseAny(written, dims).Dimension; }
            catch (UnitException ex) { throw new InputException($"{key}: the scenario's value cannot be fitted: {ex.Message}") { Parameter = "spec" }; }
            try { start = ScenarioValues.Read(scenario, key, dim); }
            catch (InputException ex) when (ex.Parameter is null) { throw new InputException(ex.Message) { Parameter = "spec" }; }
        }

        double lower, upper;
        if (range is null)
        {
            if (start is not { } s0)
                throw new InputException($"{key}: the scenario has no value there; give bounds, e.g. {key}=MIN..MAX") { Parameter = "spec" };
            if (!(s0 > 0))
                throw new InputException($"{key}: the start value {Show(s0)} is not positive, so default bounds [start/3, start*3] do not apply; give bounds, e.g. {key}=MIN..MAX") { Parameter = "spec" };
            lower = s0 / DefaultBoundRatio;
            upper = s0 * DefaultBoundRatio;
        }
        else
        {
            int dots = range.IndexOf("..", StringComparison.Ordinal);
            if (dots < 0)
                throw new InputException($"{key}: bounds '{range}' are not MIN..MAX, e.g. {key}=0.5pF..5pF") { Parameter = "spec" };
            Dimension[] boundDims = dim is { } fixedDim ? [fixedDim] : dims;
            (lower, Dimension d1) = Bound(range[..dots], key, boundDims);
            (upper, Dimension d2) = Bound(range[(dots + 2)..], key, boundDims);
            if (d1 != d2)
                throw new InputException($"{key}: the bounds are of different kinds ({d1.Describe()} and {d2.Describe()})") { Parameter = "spec" };
            dim ??= d1;
            if (!(upper > lower))
                throw new InputException($"{key}: the upper bound {Show(upper)} must be above the lower bound {Show(lower)}") { Parameter = "spec" };
        }

        double startValue = start ?? (lower > 0 ? Math.Sqrt(lower * upper) : 0.5 * (lower + upper));
        if (startValue < lower || startValue > upper)
            throw new InputException($"{key}: the scenario's value {Show(startValue)} lies outside the bounds {Show(lower)}..{Show(upper)}") { Parameter = "spec" };
        return new FreeParameter(key, startValue, lower, upper, dim!.Value);
    }

    static (double, Dimension) Bound(string text, string key, Dimension[] dims)
    {
        try { return Quantity.ParseAny(text.Trim(), dims); }
        catch (UnitException ex) { throw new InputException($"{key}: bound {ex.Message}") { Parameter = "spec" }; }
    }

    static string Show(double x) => x.ToString("G6", CultureInfo.InvariantCulture);
}
