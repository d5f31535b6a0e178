using WaveSim.Core.Model;
using WaveSim.Core.Units;

namespace WaveSim.Core.Scenarios;

/// <summary>One change of a variant: the value (SI) to write at a key path and the dimension it is given in.</summary>
/// <param name="KeyPath">E.g. <c>line[0].segment.z0</c>.</param>
/// <param name="Value">The SI value (a fraction for a percentage).</param>
/// <param name="Dimension">What the value is: a segment's delay may be per length or the whole segment's time.</param>
public readonly record struct KeyChange(string KeyPath, double Value, Dimension Dimension);

/// <summary>
/// Reads and replaces scenario values by key path (<c>source.rise</c>, <c>line[2].segment.z0</c>, <c>load.r</c>,
/// <c>line[0].shunt.c</c>, <c>line[1].branch.load.c</c>, <c>load.receiver.vih</c>, <c>simulation.resolution</c>): the one way
/// sweeps, fits and other variants are made. A new scenario is returned and the original is left as it was. Every value is
/// checked as the loader checks it (the key's dimensions and sign from <see cref="ScenarioKeys"/>, the dimension's sensible
/// range, and the rules that tie values together in <see cref="ScenarioRules"/>); a refusal is an <see cref="InputException"/>
/// whose message starts with the key path.
/// </summary>
/// <remarks>
/// A segment keeps what the key does not name: a new <c>z0</c> keeps its delay per length, a new <c>delay</c>, <c>velocity</c>
/// or <c>eps_eff</c> keeps its z0, a new <c>l</c> keeps its c and the other way round, and a new <c>length</c> keeps every
/// per-length value (so its delay grows with it). A delay given as a time is the whole segment's. A <c>fall</c> never written
/// follows <c>rise</c>, as in a file. <c>frequency</c> sets a source's period. A geometry's keys
/// (<c>line[0].segment.geometry.width</c>) derive the segment again from its cross-section, and the keys of its <c>loss</c>
/// mapping fit its loss model again. Values that are names or texts, and a PRBS order, are not variable by key path.
/// </remarks>
public static class ScenarioValues
{
    /// <summary>The value at <paramref name="keyPath"/> in SI, in <paramref name="dimension"/> (the key's preferred one when null); null when the scenario has none there.</summary>
    /// <exception cref="InputException">The path does not name a numeric value of this scenario, or the dimension is not one the key takes.</exception>
    public static double? Read(Scenario scenario, string keyPath, Dimension? dimension = null)
    {
        ArgumentNullException.ThrowIfNull(scenario);
        var path = KeyPath.Parse(keyPath);
        var (place, key) = Locate(scenario, path);
        var d = dimension ?? key.Preferred;
        if (!key.Dimensions.Contains(d)) throw new InputException($"{path}: takes {Expected(key)}, not {d.Describe()}");
        return ReadAt(place.Scope, place.Get(scenario), key.Key, d);
    }

    /// <summary>The key <paramref name="keyPath"/> names in this scenario: its dimensions and sign (a geometry's keys depend on its kind).</summary>
    /// <exception cref="InputException">The path does not name a numeric value of this scenario.</exception>
    public static ScenarioKey KeyAt(Scenario scenario, string keyPath)
    {
        ArgumentNullException.ThrowIfNull(scenario);
        return Locate(scenario, KeyPath.Parse(keyPath)).Item2;
    }

    /// <summary>The scenario with the value at <paramref name="keyPath"/> read from <paramref name="text"/> (e.g. "33 ohm").</summary>
    /// <exception cref="InputException">A bad path, a value of the wrong kind or out of range, or a variant the loader would refuse.</exception>
    public static Scenario With(Scenario scenario, string keyPath, string text)
    {
        ArgumentNullException.ThrowIfNull(scenario);
        ArgumentNullException.ThrowIfNull(text);
        var path = KeyPath.Parse(keyPath);
        var (_, key) = Locate(scenario, path);
        (double value, Dimension d) parsed;
        try { parsed = Quantity.ParseAny(text, [.. key.Dimensions]); }
        catch (UnitException ex) { throw new InputException($"{path}: {ex.Message}"); }
        return With(scenario, [new KeyChange(path.Text, parsed.value, parsed.d)]);
    }

    /// <summary>The scenario with one value replaced.</summary>
    /// <exception cref="InputException">See <see cref="With(Scenario, IEnumerable{KeyChange})"/>.</exception>
    public static Scenario With(Scenario scenario, string keyPath, double value, Dimension dimension) =>
        With(scenario, [new KeyChange(keyPath, value, dimension)]);

    /// <summary>
    /// The scenario with every change applied in order; the rules between values are checked once all are in, so changes that
    /// only fit together (a longer period with a wider pulse) are accepted together.
    /// </summary>
    /// <exception cref="InputException">A bad path, a value of the wrong kind or out of range, or a variant the loader would refuse.</exception>
    public static Scenario With(Scenario scenario, IEnumerable<KeyChange> changes)
    {
        ArgumentNullException.ThrowIfNull(scenario);
        ArgumentNullException.ThrowIfNull(changes);
        var checks = new List<Action<Scenario>>();
        var s = scenario;
        foreach (var change in changes)
        {
            if (BufferCorners.IsCornerKey(change.KeyPath)) { s = BufferCorners.With(s, change.KeyPath, change.Value); continue; }
            var path = KeyPath.Parse(change.KeyPath);
            var (place, key) = Locate(s, path);
            Check(path, key, change.Value, change.Dimension);
            s = place.Set(s, WriteAt(path, place.Scope, place.Get(s), key.Key, change.Value, change.Dimension));
            checks.Add(Afterwards(path, place, key.Key));
        }
        foreach (var check in checks) check(s);
        return s;
    }

    /// <summary>Where a value sits: the mapping that holds it (a source, segment, lumped parts, load, receiver or run settings).</summary>
    sealed record Place(string Scope, Func<Scenario, object> Get, Func<Scenario, object, Scenario> Set);

    static (Place, ScenarioKey) Locate(Scenario s, KeyPath path)
    {
        var parts = path.Parts;
        var top = parts[0];
        Place place;
        int next;
        switch (top.Name)
        {
            case "source" or "simulation" when top.Index is null:
                place = top.Name == "source"
                    ? new Place("source", x => x.Source, (x, o) => x with { Source = (SourceSpec)o })
                    : new Place("simulation", x => x.Simulation, (x, o) => x with { Simulation = (SimulationSpec)o });
                next = 1;
                break;
            case "load" when top.Index is null:
                (place, next) = LoadPlace(s, path, 1, x => x.Load, (x, l) => x with { Load = l });
                break;
            case "line" when top.Index is not null:
                (place, next) = LinePlace(s, path, 0, x => x.Line, (x, l) => x with { Line = l });
                break;
            case "title" or "probes":
                throw NotNumeric(path, top.Name);
            default:
                throw new InputException($"{path}: no '{top}' in a scenario; expected source, line[N], load or simulation");
        }
        if (place.Scope == "segment" && next == parts.Length - 2 && parts[next] is { Name: "geometry" or "loss", Index: null } inner)
        {
            var seg = (Segment)place.Get(s);
            if (inner.Name == "loss" && seg.Loss is not { Inputs.Count: > 0 })
                throw new InputException(seg.Derived is not null
                    ? $"{path}: the segment's loss comes from its geometry; vary the geometry's keys"
                    : $"{path}: the segment has no 'loss' mapping in the scenario");
            place = place with { Scope = inner.Name };
            next++;
        }
        if (next != parts.Length - 1)
        {
            string at = path.Prefix(Math.Min(next + 1, parts.Length));
            throw next >= parts.Length
                ? new InputException($"{path}: names a whole mapping; add the key to change, e.g. {path}.r")
                : new InputException($"{path}: '{at}' is not a value of the scenario: {Beyond(place.Scope, parts[next].Name)}");
        }
        var last = parts[^1];
        if (last.Index is not null) throw new InputException($"{path}: '{last.Name}' is a single value, not a list");
        if (place.Scope == "geometry") return (place, GeometryKey(path, (Segment)place.Get(s), last.Name));
        var key = ScenarioKeys.Find(place.Scope, last.Name);
        if (key is null)
        {
            var allowed = Allowed(place.Scope);
            if (allowed.Contains(last.Name)) throw NotNumeric(path, last.Name);
            throw new InputException($"{path}: unknown key '{last.Name}'; expected one of: {string.Join(", ", allowed)}");
        }
        return (place, key);
    }

    static string Beyond(string scope, string name) => $"'{name}' holds no mapping here{(scope == "segment" ? " (a segment holds geometry.KEY and loss.KEY)" : "")}";

    /// <summary>A key of a segment's geometry: its dimension is the cross-section kind's (<see cref="Lines.CrossSectionCatalog"/>).</summary>
    static ScenarioKey GeometryKey(KeyPath path, Segment seg, string name)
    {
        if (seg.Derived is null)
            throw new InputException($"{path}: '{path.Prefix(path.Parts.Length - 2)}' is given by z0 and a delay or by l and c, not by a geometry");
        if (name == "kind") throw NotNumeric(path, name);
        var d = SegmentGeometry.InputDimension(seg, name)
            ?? throw new InputException($"{path}: unknown key '{name}' for {seg.Derived.Kind}; expected one of: {string.Join(", ", SegmentGeometry.InputKeys(seg))}");
        return new ScenarioKey("geometry", SegmentGeometry.InputKeys(seg).First(k => string.Equals(k, name, StringComparison.OrdinalIgnoreCase)), [d], KeySign.Any);
    }

    static InputException NotNumeric(KeyPath path, string name) =>
        new($"{path}: '{name}' is not a number; only numeric values can be varied by key path");

    static string[] Allowed(string scope) => scope switch
    {
        "source" => ScenarioLoader.SourceKeys,
        "segment" => ScenarioLoader.SegmentKeys,
        "shunt" or "series" => ScenarioLoader.LumpedKeys,
        "load" => ScenarioLoader.LoadKeys,
        "receiver" => ScenarioLoader.ReceiverKeys,
        "simulation" => ScenarioLoader.SimulationKeys,
        _ => [],
    };

    /// <summary>The load at parts[<paramref name="at"/> − 1] (<c>load</c> of the scenario or of a branch), then its key or its receiver.</summary>
    static (Place, int) LoadPlace(Scenario s, KeyPath path, int at, Func<Scenario, LoadSpec> get, Func<Scenario, LoadSpec, Scenario> set)
    {
        string where = path.Prefix(at);
        if (get(s).Short)
            throw new InputException($"{path}: the load is a short; write it as a mapping in the scenario to vary its parts");
        if (at < path.Parts.Length && path.Parts[at] is { Name: "receiver", Index: null })
        {
            if (get(s).Receiver is null)
                throw new InputException($"{path}: '{where}' has no receiver thresholds; give {where}.receiver with vih and vil in the scenario first");
            return (new Place("receiver", x => get(x).Receiver!, (x, o) => set(x, get(x) with { Receiver = (ReceiverThresholds)o })), at + 1);
        }
        return (new Place("load", x => get(x), (x, o) => set(x, (LoadSpec)o)), at);
    }

    /// <summary>The item parts[<paramref name="at"/>] names (<c>line[2]</c>), then its kind and what lies inside it.</summary>
    static (Place, int) LinePlace(Scenario s, KeyPath path, int at, Func<Scenario, IReadOnlyList<LineElement>> getLine,
        Func<Scenario, IReadOnlyList<LineElement>, Scenario> setLine)
    {
        var part = path.Parts[at];
        string linePath = path.Prefix(at) is { Length: > 0 } p ? p + "." + part.Name : part.Name;
        int index = part.Index!.Value;
        var line = getLine(s);
        if (index >= line.Count)
            throw new InputException($"{path}: '{linePath}' has no item [{index}] (it has {line.Count}, counted from 0)");
        if (at + 1 >= path.Parts.Length)
            throw new InputException($"{path}: names a whole item; add the key to change, e.g. {path}.segment.z0");
        var element = line[index];
        string kind = element switch { Segment => "segment", Shunt => "shunt", Model.Series => "series", _ => "branch" };
        var named = path.Parts[at + 1];
        if (named.Name != kind || named.Index is not null)
            throw new InputException($"{path}: item [{index}] of '{linePath}' is a {kind}, not {(named.Name is "segment" or "shunt" or "series" or "branch" ? "a " + named.Name : "'" + named + "'")}");
        LineElement Get(Scenario x) => getLine(x)[index];
        Scenario Set(Scenario x, LineElement e) => setLine(x, [.. getLine(x).Take(index), e, .. getLine(x).Skip(index + 1)]);
        switch (element)
        {
            case Segment:
                return (new Place("segment", x => Get(x), (x, o) => Set(x, (Segment)o)), at + 2);
            case Shunt:
                return (new Place("shunt", x => ((Shunt)Get(x)).Parts, (x, o) => Set(x, new Shunt((LumpedParts)o))), at + 2);
            case Model.Series:
                return (new Place("series", x => ((Model.Series)Get(x)).Parts, (x, o) => Set(x, new Model.Series((LumpedParts)o))), at + 2);
        }
        Branch B(Scenario x) => (Branch)Get(x);
        int inner = at + 2;
        if (inner < path.Parts.Length && path.Parts[inner] is { Name: "line", Index: not null })
            return LinePlace(s, path, inner, x => B(x).Line, (x, l) => Set(x, B(x) with { Line = l }));
        if (inner < path.Parts.Length && path.Parts[inner] is { Name: "load", Index: null })
            return LoadPlace(s, path, inner + 1, x => B(x).Load, (x, l) => Set(x, B(x) with { Load = l }));
        if (inner < path.Parts.Length && path.Parts[inner].Name == "name") throw NotNumeric(path, "name");
        throw new InputException($"{path}: a branch holds 'line[N]…' and 'load…'; expected e.g. {path.Prefix(at + 2)}.load.c");
    }

    static string Expected(ScenarioKey key) => string.Join(" or ", key.Dimensions.Select(d => d.Describe()));

    /// <summary>The checks of one value on its own: its kind, range and sign, and the bounds a key has of its own.</summary>
    static void Check(KeyPath path, ScenarioKey key, double value, Dimension d)
    {
        string written = ScenarioKeys.Format(value, d);
        if (!key.Dimensions.Contains(d))
        {
            string units = string.Join("; ", key.Dimensions.Select(x => x.Examples()));
            throw new InputException(d == Dimension.Number
                ? $"{path}: '{written}' has no unit; expected {Expected(key)} ({units})"
                : $"{path}: '{written}' is {d.Describe()}, not {Expected(key)} ({units})");
        }
        if (!double.IsFinite(value)) throw new InputException($"{path}: '{written}' is not a finite number");
        try { Quantity.CheckRange(written, value, d); }
        catch (UnitException ex) { throw new InputException($"{path}: {ex.Message}"); }
        if (key.Sign == KeySign.Positive && !(value > 0)) throw new InputException($"{path}: {ScenarioRules.Positive(written)}");
        if (key.Sign == KeySign.NonNegative && value < 0) throw new InputException($"{path}: {ScenarioRules.NonNegative(written)}");
        if (key.Key is "eps_eff" or "resolution" && value < 1) throw new InputException($"{path}: {ScenarioRules.AtLeastOne(value)}");
        if (key.Key == "velocity" && ScenarioRules.FasterThanLight(value)) throw new InputException($"{path}: '{written}' is faster than light");
    }

    static double? ReadAt(string scope, object owner, string key, Dimension d) => owner switch
    {
        Segment o when scope == "geometry" => o.Derived!.Inputs.TryGetValue(key, out double x) ? x : null,
        Segment o when scope == "loss" => o.Loss!.Inputs.TryGetValue(key, out double x) ? x : null,
        SourceSpec o => key switch
        {
            "low" => o.Low, "high" => o.High, "rise" => o.Rise, "fall" => o.Fall, "delay" => o.Delay, "width" => o.Width,
            "period" => o.Period > 0 ? o.Period : null, "frequency" => o.Period > 0 ? 1 / o.Period : null,
            "bit_time" => o.BitTime > 0 ? o.BitTime : null, "resistance" => o.Resistance,
            _ => null,
        },
        Segment o => key switch
        {
            "length" => o.Length, "z0" => o.Z0, "delay" => d.PerLength ? o.Delay / o.Length : o.Delay, "velocity" => o.Velocity,
            "eps_eff" => Math.Pow(Quantity.SpeedOfLight / o.Velocity, 2), "r" => o.R, "g" => o.G, "l" => o.L, "c" => o.C,
            _ => null,
        },
        LumpedParts o => key switch { "r" => o.R, "l" => o.L, "c" => o.C, _ => null },
        LoadSpec o => key switch { "r" => o.R, "to" => o.To, "c" => o.C, "l" => o.L, _ => null },
        ReceiverThresholds o => key switch { "vih" => o.Vih, "vil" => o.Vil, _ => null },
        SimulationSpec o => key switch { "duration" => o.Duration, "output_step" => o.OutputStep, "resolution" => o.Resolution, _ => null },
        _ => null,
    };

    static object WriteAt(KeyPath path, string scope, object owner, string key, double v, Dimension d) => owner switch
    {
        Segment o when scope == "geometry" => SegmentGeometry.Rebuild(o, path, key, v),
        Segment o when scope == "loss" => SegmentLoss.Rebuild(o, path, key, v),
        SourceSpec o => key switch
        {
            "low" => o with { Low = v }, "high" => o with { High = v }, "rise" => o with { Rise = v }, "fall" => o with { Fall = v },
            "delay" => o with { Delay = v }, "width" => o with { Width = v }, "period" => o with { Period = v },
            "frequency" => o with { Period = 1 / v }, "bit_time" => o with { BitTime = v }, "resistance" => o with { Resistance = v },
            _ => throw Unsupported(path),
        },
        Segment o => WriteSegment(path, o, key, v, d),
        LumpedParts o => key switch { "r" => o with { R = v }, "l" => o with { L = v }, "c" => o with { C = v }, _ => throw Unsupported(path) },
        LoadSpec o => key switch { "r" => o with { R = v }, "to" => o with { To = v }, "c" => o with { C = v }, "l" => o with { L = v }, _ => throw Unsupported(path) },
        ReceiverThresholds o => key switch { "vih" => o with { Vih = v }, "vil" => o with { Vil = v }, _ => throw Unsupported(path) },
        SimulationSpec o => key switch
        {
            "duration" => o with { Duration = v }, "output_step" => o with { OutputStep = v }, "resolution" => o with { Resolution = v },
            _ => throw Unsupported(path),
        },
        _ => throw Unsupported(path),
    };

    static InputException Unsupported(KeyPath path) => new($"{path}: this value cannot be varied by key path");

    static Segment WriteSegment(KeyPath path, Segment o, string key, double v, Dimension d)
    {
        if (o.Derived is { } origin && key != "length")
        {
            if (key is not ("r" or "g"))
                throw new InputException($"{path}: a segment given by geometry takes its impedance and delay from it; vary its geometry, length, r or g");
            if (origin.FrequencyLoss)
                throw new InputException($"{path}: with 'loss: frequency' the resistance and conductance come from the geometry");
            return SegmentGeometry.Rebuild(o, path, key, v);   // an r or g beside a geometry replaces the derived one
        }
        if (key == "r" && o.Loss?.SkinCorner is not null)
            throw new InputException($"{path}: the resistance is given in the segment's 'loss' (r_dc, r_skin), so it cannot be given as 'r' too");
        if (key == "g" && o.Loss?.Dielectric is not null)
            throw new InputException($"{path}: the dielectric loss is given in the segment's 'loss' (tand, er, at), so it cannot be given as 'g' too");
        double tau = Math.Sqrt(o.L * o.C), z0 = o.Z0;
        Segment WithTau(double t) => o with { L = z0 * t, C = t / z0 };
        return key switch
        {
            "length" => o with { Length = v },
            "z0" => o with { L = v * tau, C = tau / v },
            "delay" => WithTau(d.PerLength ? v : v / o.Length),
            "velocity" => WithTau(1 / v),
            "eps_eff" => WithTau(Math.Sqrt(v) / Quantity.SpeedOfLight),
            "r" => o with { R = v },
            "g" => o with { G = v },
            "l" => o with { L = v },
            "c" => o with { C = v },
            _ => throw Unsupported(path),
        };
    }

    /// <summary>The rules between values that a change can break, checked on the finished variant.</summary>
    static Action<Scenario> Afterwards(KeyPath path, Place place, string key) => place.Scope switch
    {
        "source" => s => SourceRules(path, s.Source),
        "receiver" => s =>
        {
            var rx = (ReceiverThresholds)place.Get(s);
            if (ScenarioRules.ThresholdOrder(rx.Vih, rx.Vil) is { } why) throw new InputException($"{path}: {why}");
        },
        "load" when key == "to" => s =>
        {
            if (((LoadSpec)place.Get(s)).R is null)
                throw new InputException($"{path}: 'to' is the voltage the load resistor returns to: give 'r' too");
        },
        "segment" when key is "l" or "c" => s =>
        {
            var seg = (Segment)place.Get(s);
            if (ScenarioRules.FasterThanLight(seg.L, seg.C) is { } why) throw new InputException($"{path}: {why}");
        },
        "segment" when key == "length" => s => ProbesOnTheLine(path, s),
        _ => _ => { },
    };

    static void SourceRules(KeyPath path, SourceSpec src)
    {
        string? why = src.Waveform switch
        {
            WaveformKind.Gaussian when !(src.Width > 0) => "source.width must be greater than zero for a gaussian",
            WaveformKind.Trapezoid => ScenarioRules.TrapezoidMisfit(src.Rise, src.Width, src.Fall, src.Period) is { } m ? "source.period: " + m : null,
            WaveformKind.Bits => ScenarioRules.BitEdgeMisfit(src.Rise, src.Fall, src.BitTime) is { } m ? "source.bit_time: " + m : null,
            _ => null,
        };
        if (why is not null) throw new InputException($"{path}: {why}");
    }

    /// <summary>A probe at a distance must still lie on its line once a segment is shorter.</summary>
    static void ProbesOnTheLine(KeyPath path, Scenario s)
    {
        for (int i = 0; i < s.Probes.Count; i++)
        {
            var p = s.Probes[i];
            if (p.Anchor != ProbeAnchor.Distance) continue;
            IReadOnlyList<LineElement> line = s.Line;
            foreach (string b in p.BranchPath) line = line.OfType<Branch>().First(x => x.Name == b).Line;
            double total = line.OfType<Segment>().Sum(x => x.Length);
            if (p.Distance > total * (1 + 1e-9))
                throw new InputException($"{path}: probes[{i}] ('{p.Name}') at {Quantity.Format(p.Distance, "m")} would lie outside the line, which is then {Quantity.Format(total, "m")} long");
        }
    }
}
