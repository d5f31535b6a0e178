using WaveSim.Core.Analysis;
using WaveSim.Core.Model;
using WaveSim.Core.Units;

namespace WaveSim.Core.Terminations;

/// <summary>
/// Sizes each termination strategy for the user's net and makes the modified copy of the scenario that carries it.
/// The rules are common practice (no source): series R = Z0 − R_driver at the driver; parallel R = Z0 to 0 V at the load;
/// Thevenin R1 = Z0·Vcc/Vt to the supply and R2 = Z0·Vcc/(Vcc − Vt) to ground (R1 ∥ R2 = Z0, open-circuit level Vt);
/// RC: R = Z0 in series with C, R·C at least three round trips of the line. Z0 is the first segment's. The first design is
/// always the net as drawn; each other one says what it changes in it (adds, replaces or removes), so no strategy silently
/// stands in for the user's own termination.
/// </summary>
public static class TerminationPlanner
{
    /// <summary>Every strategy, in the order of <see cref="TerminationKind"/>.</summary>
    /// <exception cref="InputException">The load is a short, or the Thevenin level is outside the supply range.</exception>
    public static IReadOnlyList<TerminationDesign> Design(Scenario s, TerminationOptions? options = null)
    {
        options ??= new TerminationOptions();
        if (s.Load.Short) throw new InputException("the load is a short to ground; there is nothing to terminate");
        if (!(options.RcRoundTrips >= 1)) throw new InputException($"RC termination: R·C must be at least one round trip (got {options.RcRoundTrips})");
        var seg = s.Line.OfType<Segment>().First();
        double z0 = seg.Z0;
        return [AsDrawn(s), None(s), Series(s, z0, options), Parallel(s, z0, options), Thevenin(s, z0, options), Rc(s, z0, options)];
    }

    /// <summary>The main line's one-way delay (sum of its segments), s.</summary>
    public static double LineDelay(Scenario s) => s.Line.OfType<Segment>().Sum(x => x.Delay);

    static TerminationDesign AsDrawn(Scenario s) => new(TerminationKind.AsDrawn, [], s, s.Load.R is not null ? "the load as drawn: " + s.Load.Describe() : null);

    static TerminationDesign None(Scenario s)
    {
        if (s.Load.R is null) return new(TerminationKind.None, [], null, "the same as the net as drawn, which has no load resistor");
        var load = s.Load with { R = null, To = 0 };
        return new(TerminationKind.None, [], Titled(s with { Load = load }, "no termination"), $"removes the load resistor {LoadResistor(s)} as drawn");
    }

    static TerminationDesign Series(Scenario s, double z0, TerminationOptions o)
    {
        // A buffer driver's resistance is its I-V curves' small-signal resistance near its levels (BufferSpec.OutputResistance).
        double rd = s.Source.Buffer is { } b ? b.OutputResistance ?? 0 : s.Source.Resistance;
        if (rd >= z0)
            return new(TerminationKind.Series, [], null,
                $"the driver's resistance {Quantity.Format(rd, "Ω", 3)} is already at or above Z0 {Quantity.Format(z0, "Ω", 3)}");
        var r = Resistor("series_r_ohm", "R series", z0 - rd, o.Series);
        var line = new List<LineElement> { new Model.Series(new LumpedParts(R: r.Used)) };
        line.AddRange(s.Line);
        return new(TerminationKind.Series, [r], Titled(s with { Line = line }, "series " + Quantity.Format(r.Used, "Ω", 3)), Adds(s, "adds a series resistor at the driver"));
    }

    static TerminationDesign Parallel(Scenario s, double z0, TerminationOptions o)
    {
        var r = Resistor("parallel_r_ohm", "R to 0 V", z0, o.Series);
        var load = s.Load with { R = r.Used, To = 0 };
        return new(TerminationKind.Parallel, [r], Titled(s with { Load = load }, "parallel " + Quantity.Format(r.Used, "Ω", 3)), Replaced(s, "adds a resistor to 0 V at the load"));
    }

    static TerminationDesign Thevenin(Scenario s, double z0, TerminationOptions o)
    {
        double vcc = Math.Max(s.Source.Low, s.Source.High);   // the supply is the higher level, also for a driver idling high
        double vt = o.TheveninLevelV ?? 0.5 * (s.Source.Low + s.Source.High);
        if (!(vcc > 0) || !(vt > 0 && vt < vcc))
        {
            if (o.TheveninLevelV is not null)
                throw new InputException($"{Quantity.Format(vt, "V", 3)} must lie between 0 V and the source high {Quantity.Format(vcc, "V", 3)}") { Parameter = nameof(TerminationOptions.TheveninLevelV) };
            return new(TerminationKind.Thevenin, [], null, $"the Thevenin level {Quantity.Format(vt, "V", 3)} is not between ground and the supply {Quantity.Format(vcc, "V", 3)}");
        }
        var r1 = Resistor("thevenin_r1_ohm", "R1 to supply", z0 * vcc / vt, o.Series);
        var r2 = Resistor("thevenin_r2_ohm", "R2 to ground", z0 * vcc / (vcc - vt), o.Series);
        // The pair is simulated as its Thevenin equivalent: R1 ∥ R2 returning to Vcc·R2/(R1 + R2).
        double req = r1.Used * r2.Used / (r1.Used + r2.Used), veq = vcc * r2.Used / (r1.Used + r2.Used);
        var load = s.Load with { R = req, To = veq };
        var variant = Titled(s with { Load = load }, $"Thevenin {Quantity.Format(r1.Used, "Ω", 3)} / {Quantity.Format(r2.Used, "Ω", 3)}");
        return new(TerminationKind.Thevenin, [r1, r2], variant, Replaced(s, "adds a resistor pair at the load")) { SupplyV = vcc, TargetTheveninV = vt, TheveninV = veq };
    }

    static TerminationDesign Rc(Scenario s, double z0, TerminationOptions o)
    {
        var r = Resistor("rc_r_ohm", "R", z0, o.Series);
        double roundTrip = 2 * LineDelay(s);
        double cMin = o.RcRoundTrips * roundTrip / r.Used;
        double c = AtLeast(cMin, PreferredSeries.E24);
        var cap = new TerminationPart("rc_c_F", "C", "F", cMin, c, null, c);
        var line = s.Line.ToList();
        line.Add(new Shunt(new LumpedParts(R: r.Used, C: c)));
        var variant = Titled(s with { Line = line }, $"RC {Quantity.Format(r.Used, "Ω", 3)} + {Quantity.Format(c, "F", 3)}");
        return new(TerminationKind.Rc, [r, cap], variant, Adds(s, "adds R and C in series to ground at the end of the line"));
    }

    static string Replaced(Scenario s, string otherwise) => s.Load.R is not null ? $"replaces the load resistor {LoadResistor(s)} as drawn" : otherwise;

    static string Adds(Scenario s, string what) => s.Load.R is not null ? $"{what}; keeps the load resistor {LoadResistor(s)} as drawn" : what;

    static string LoadResistor(Scenario s) =>
        Quantity.Format(s.Load.R ?? 0, "Ω", 3) + (s.Load.To != 0 ? " to " + Quantity.Format(s.Load.To, "V", 3) : " to 0 V");

    static Scenario Titled(Scenario s, string what) => s with { Title = $"{s.Title} ({what})" };

    static TerminationPart Resistor(string column, string label, double ideal, PreferredSeries series)
    {
        double e24 = PreferredValues.Nearest(ideal, PreferredSeries.E24), e96 = PreferredValues.Nearest(ideal, PreferredSeries.E96);
        return new TerminationPart(column, label, "Ω", ideal, e24, e96, series == PreferredSeries.E24 ? e24 : e96);
    }

    /// <summary>The smallest value of the series at or above <paramref name="value"/> (any decade).</summary>
    public static double AtLeast(double value, PreferredSeries series)
    {
        if (!(value > 0) || !double.IsFinite(value)) throw new InputException($"cannot choose a preferred value for {value}");
        var table = PreferredValues.Table(series);
        int digits = series == PreferredSeries.E24 ? 1 : 2;
        int decade = (int)Math.Floor(Math.Log10(value));
        double best = double.PositiveInfinity;
        for (int d = decade - 1; d <= decade + 1; d++)
            foreach (int printed in table)
            {
                int k = d - digits;
                double candidate = k >= 0 ? printed * Math.Pow(10, k) : printed / Math.Pow(10, -k);
                if (candidate >= value * (1 - 1e-12) && candidate < best) best = candidate;
            }
        return best;
    }
}
