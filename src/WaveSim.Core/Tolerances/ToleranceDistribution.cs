using System.Globalization;
using WaveSim.Core.Scenarios;
using WaveSim.Core.Units;

namespace WaveSim.Core.Tolerances;

/// <summary>What a varied key's values are drawn from.</summary>
public enum DistributionKind
{
    /// <summary>Normal (Gaussian) with a mean and a standard deviation; its corners are mean ± 3σ.</summary>
    Normal,
    /// <summary>Uniform between a minimum and a maximum; its corners are the two ends.</summary>
    Uniform,
    /// <summary>One of a list of values, each equally likely; every value is a corner.</summary>
    Choice,
}

/// <summary>
/// A distribution of one key's values in SI. Written <c>normal(MEAN, SIGMA)</c>, <c>uniform(MIN..MAX)</c>,
/// <c>tol(10%)</c> (uniform ±10 % of the scenario's value), <c>tol(10%, normal)</c> (normal around the scenario's value with
/// σ = tolerance / 3: common practice, no source) or a list <c>a,b,c</c> (a discrete choice). Values take units as
/// <c>sweep</c> does: on each value, or once after the last (<c>normal(50, 2.5 ohm)</c>, <c>uniform(45..55 ohm)</c>).
/// </summary>
/// <param name="Kind">The shape.</param>
/// <param name="Dimension">What the values are (<see cref="Dimension.Percent"/> values are fractions).</param>
/// <param name="Parameters">Normal: mean, σ. Uniform: min, max. Choice: the values. Unresolved tolerance: the fraction.</param>
public sealed record ToleranceDistribution(DistributionKind Kind, Dimension Dimension, IReadOnlyList<double> Parameters)
{
    /// <summary>A tolerance still to be applied to the scenario's value (<see cref="Resolve"/>); null once resolved.</summary>
    public double? ToleranceFraction { get; init; }

    /// <summary>
    /// The names of a named choice's values (a buffer's corner: typ, min, max), indexed by the value's code; null for numbers.
    /// <see cref="Parameters"/> then holds the codes of the listed names in the listed order.
    /// </summary>
    public IReadOnlyList<string>? Choices { get; init; }

    /// <summary>Largest number of values in a discrete choice.</summary>
    public const int MaxChoices = 1000;

    /// <summary>σ of <c>tol(X, normal)</c> as a fraction of X: the tolerance read as a ±3σ band (common practice, no source).</summary>
    public const double SigmasPerTolerance = 3;

    /// <summary>How many σ from the mean a normal's corners lie.</summary>
    public const double CornerSigmas = 3;

    /// <summary>Reads a distribution; an error names the <c>text</c> parameter and quotes <paramref name="whole"/>.</summary>
    /// <param name="text">The distribution as written, e.g. <c>normal(50ohm, 2.5ohm)</c>.</param>
    /// <param name="whole">The whole KEY=DIST text, for messages.</param>
    /// <exception cref="InputException">Malformed text, mixed units, a negative σ, min above max, a tolerance of 0 or less.</exception>
    public static ToleranceDistribution Parse(string text, string whole)
    {
        string t = text.Trim();
        int open = t.IndexOf('(');
        if (open > 0 && t.EndsWith(')'))
        {
            string name = t[..open].Trim().ToLowerInvariant();
            string inner = t[(open + 1)..^1];
            return name switch
            {
                "normal" => Normal(inner, whole),
                "uniform" => Uniform(inner, whole),
                "tol" => Tolerance(inner, whole),
                _ => throw Bad(whole, $"unknown distribution '{name}'; expected normal(MEAN, SIGMA), uniform(MIN..MAX), tol(10%), tol(10%, normal) or a list a,b,c"),
            };
        }
        var items = t.Split(',');
        if (items.Length < 2) throw Bad(whole, "expected normal(MEAN, SIGMA), uniform(MIN..MAX), tol(10%), tol(10%, normal) or a list of two or more values a,b,c");
        if (items.Length > MaxChoices) throw Bad(whole, $"more than {MaxChoices} values");
        var (values, dim) = Sweeps.SweepAxis.ReadValues(whole, items);
        return new ToleranceDistribution(DistributionKind.Choice, dim, values);
    }

    /// <summary>
    /// Reads a list of names (<c>typ,min,max</c>) as a choice whose values are the names' codes, their index in
    /// <paramref name="names"/>; an error names the <c>text</c> parameter.
    /// </summary>
    /// <param name="text">The list as written.</param>
    /// <param name="whole">The whole KEY=DIST text, for messages.</param>
    /// <param name="names">Every name the key takes, in code order.</param>
    /// <param name="what">What one name is, for messages (e.g. "corner").</param>
    /// <exception cref="InputException">A distribution other than a list, fewer than two names, or a name not in <paramref name="names"/>.</exception>
    public static ToleranceDistribution ParseNames(string text, string whole, IReadOnlyList<string> names, string what)
    {
        ArgumentNullException.ThrowIfNull(text);
        ArgumentNullException.ThrowIfNull(names);
        string expected = string.Join(",", names);
        if (text.Contains('(')) throw Bad(whole, $"a {what} is a name, so the key takes a list such as {expected}, not a distribution");
        var items = text.Split(',', StringSplitOptions.TrimEntries);
        if (items.Length < 2) throw Bad(whole, $"expected a list of two or more names, e.g. {expected}");
        if (items.Length > MaxChoices) throw Bad(whole, $"more than {MaxChoices} values");
        var codes = new double[items.Length];
        for (int i = 0; i < items.Length; i++)
        {
            int code = names.ToList().FindIndex(n => n.Equals(items[i], StringComparison.OrdinalIgnoreCase));
            if (code < 0) throw Bad(whole, $"'{items[i]}' is not a {what}; expected {string.Join(", ", names)}");
            codes[i] = code;
        }
        return new ToleranceDistribution(DistributionKind.Choice, Dimension.Number, codes) { Choices = names };
    }

    /// <summary>A value as montecarlo.csv and summary.json write it: a named choice's name; null for a number.</summary>
    public string? Name(double value) => Choices is { } c && value >= 0 && value < c.Count && value == Math.Floor(value) ? c[(int)value] : null;

    /// <summary>
    /// The number a value ranks by in the sensitivity (Spearman) and the scatter: a named choice's position in the listed
    /// order (0 for the first name listed), −1 for a name not listed (only a corner run's nominal can be one); the value itself for numbers.
    /// </summary>
    public double RankValue(double value) => Choices is null ? value : Parameters.ToList().IndexOf(value);

    static ToleranceDistribution Normal(string inner, string whole)
    {
        var items = inner.Split(',');
        if (items.Length != 2) throw Bad(whole, "normal takes two values: normal(MEAN, SIGMA), e.g. normal(50ohm, 2.5ohm)");
        var (v, dim) = Sweeps.SweepAxis.ReadValues(whole, items);
        if (!(v[1] >= 0)) throw Bad(whole, $"the standard deviation {Show(v[1], dim)} is negative; it must be 0 or more");
        return new ToleranceDistribution(DistributionKind.Normal, dim, v);
    }

    static ToleranceDistribution Uniform(string inner, string whole)
    {
        int dots = inner.IndexOf("..", StringComparison.Ordinal);
        if (dots < 0) throw Bad(whole, "uniform takes a range: uniform(MIN..MAX), e.g. uniform(45..55 ohm)");
        var (v, dim) = Sweeps.SweepAxis.ReadValues(whole, [inner[..dots], inner[(dots + 2)..]]);
        if (v[0] > v[1]) throw Bad(whole, $"the minimum {Show(v[0], dim)} is above the maximum {Show(v[1], dim)}");
        return new ToleranceDistribution(DistributionKind.Uniform, dim, v);
    }

    static ToleranceDistribution Tolerance(string inner, string whole)
    {
        var items = inner.Split(',', StringSplitOptions.TrimEntries);
        bool normal = items.Length == 2 && items[1].Equals("normal", StringComparison.OrdinalIgnoreCase);
        bool uniform = items.Length == 2 && items[1].Equals("uniform", StringComparison.OrdinalIgnoreCase);
        if (items.Length is < 1 or > 2 || (items.Length == 2 && !normal && !uniform))
            throw Bad(whole, "expected tol(10%), tol(10%, normal) or tol(10%, uniform)");
        double f;
        try { f = Quantity.Parse(items[0], Dimension.Percent); }
        catch (UnitException) { throw Bad(whole, $"the tolerance '{items[0]}' must be a percentage, e.g. 10%"); }
        if (!(f > 0) || !double.IsFinite(f)) throw Bad(whole, $"the tolerance '{items[0]}' must be greater than 0 %");
        return new ToleranceDistribution(normal ? DistributionKind.Normal : DistributionKind.Uniform, Dimension.Number, []) { ToleranceFraction = f };
    }

    /// <summary>
    /// The distribution with a tolerance applied to <paramref name="nominal"/> (the scenario's value, in
    /// <paramref name="dimension"/>): uniform from nominal·(1 − t) to nominal·(1 + t), or normal with mean nominal and
    /// σ = |nominal|·t / 3. A distribution without a tolerance is returned as it is.
    /// </summary>
    /// <param name="nominal">The scenario's value.</param>
    /// <param name="dimension">The dimension the key takes the value in.</param>
    /// <param name="sign">The key's sign rule: a uniform tolerance of 100 % or more is refused on a positive key, over 100 % on a non-negative one.</param>
    /// <param name="name">The key, for messages.</param>
    /// <exception cref="InputException">A tolerance whose range crosses the key's sign rule.</exception>
    public ToleranceDistribution Resolve(double nominal, Dimension dimension, KeySign sign, string name)
    {
        if (ToleranceFraction is not { } t) return this;
        if (Kind == DistributionKind.Uniform && nominal > 0 && ((sign == KeySign.Positive && t >= 1) || (sign == KeySign.NonNegative && t > 1)))
            throw new InputException($"{name}: a tolerance of {Show(t, Dimension.Percent)} reaches {(t > 1 ? "below zero" : "zero")}, but the value must {(sign == KeySign.Positive ? "be greater than zero" : "not be negative")}") { Parameter = "keys" };
        return Kind == DistributionKind.Uniform
            ? new ToleranceDistribution(Kind, dimension, [Math.Min(nominal * (1 - t), nominal * (1 + t)), Math.Max(nominal * (1 - t), nominal * (1 + t))])
            : new ToleranceDistribution(Kind, dimension, [nominal, Math.Abs(nominal) * t / SigmasPerTolerance]);
    }

    /// <summary>One value drawn with <paramref name="rng"/>: uniform as min + (max − min)·u, normal as mean + σ·z (Box-Muller), a choice as value ⌊n·u⌋.</summary>
    public double Draw(ref SplitMix64 rng) => Kind switch
    {
        DistributionKind.Normal => Parameters[0] + Parameters[1] * rng.NextNormal(),
        DistributionKind.Uniform => Parameters[0] + (Parameters[1] - Parameters[0]) * rng.NextUnit(),
        _ => Parameters[Math.Min((int)(rng.NextUnit() * Parameters.Count), Parameters.Count - 1)],
    };

    /// <summary>The middle of the distribution: a normal's mean, a uniform's midpoint, a choice's first value (the nominal of a key the scenario leaves unset).</summary>
    public double Centre => Kind switch
    {
        DistributionKind.Normal => Parameters[0],
        DistributionKind.Uniform => (Parameters[0] + Parameters[1]) / 2,
        _ => Parameters[0],
    };

    /// <summary>The corner values: min and max of a uniform, mean ± 3σ of a normal, every value of a choice.</summary>
    public IReadOnlyList<double> Ends() => Kind switch
    {
        DistributionKind.Normal => [Parameters[0] - CornerSigmas * Parameters[1], Parameters[0] + CornerSigmas * Parameters[1]],
        DistributionKind.Uniform => [Parameters[0], Parameters[1]],
        _ => Parameters,
    };

    /// <summary>The distribution as text with SI values, e.g. "normal(50 ohm, 2.5 ohm)".</summary>
    public override string ToString()
    {
        if (ToleranceFraction is { } t)
            return $"tol({(t * 100).ToString("R", CultureInfo.InvariantCulture)}%, {(Kind == DistributionKind.Normal ? "normal" : "uniform")})";
        return Kind switch
        {
            DistributionKind.Normal => $"normal({Show(Parameters[0], Dimension)}, {Show(Parameters[1], Dimension)})",
            DistributionKind.Uniform => $"uniform({Show(Parameters[0], Dimension)}..{Show(Parameters[1], Dimension)})",
            _ => string.Join(",", Parameters.Select(p => Name(p) ?? Show(p, Dimension))),
        };
    }

    /// <summary>The distribution for a person to read: values to 4 significant digits with prefixes ("normal(55 Ω, 1.833 Ω)").</summary>
    public string Describe()
    {
        if (ToleranceFraction is not null) return ToString();
        string Read(double v) => Dimension == Dimension.Percent ? ScenarioKeys.Format(v, Dimension) : Quantity.Format(v, Dimension.SiUnit.Replace("ohm", "Ω", StringComparison.Ordinal)).TrimEnd();
        return Kind switch
        {
            DistributionKind.Normal => $"normal({Read(Parameters[0])}, {Read(Parameters[1])})",
            DistributionKind.Uniform => $"uniform({Read(Parameters[0])}..{Read(Parameters[1])})",
            _ => string.Join(",", Parameters.Select(p => Name(p) ?? Read(p))),
        };
    }

    static string Show(double v, Dimension d) => ScenarioKeys.Format(v, d);

    static InputException Bad(string whole, string why) => new($"'{whole}': {why}") { Parameter = "text" };
}
