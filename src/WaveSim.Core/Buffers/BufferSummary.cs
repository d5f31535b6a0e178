using System.Text.Json.Nodes;
using WaveSim.Core.Units;

namespace WaveSim.Core.Buffers;

/// <summary>What <c>wavesim buffers</c> reports about a file: its components, pins and models, as JSON and as text lines.</summary>
public static class BufferSummary
{
    /// <summary>
    /// The file as one JSON object (SI units): version, components [{name, manufacturer, package, pins}], models [{name, type,
    /// corners, c_comp_F, voltage_range_V, tables, waveforms, per corner the output resistances and the switching method}],
    /// warnings.
    /// </summary>
    public static JsonObject Json(BufferFile file, IReadOnlyList<BufferModel> models, IReadOnlyList<Corner> corners)
    {
        ArgumentNullException.ThrowIfNull(file);
        ArgumentNullException.ThrowIfNull(models);
        ArgumentNullException.ThrowIfNull(corners);
        var components = new JsonArray(file.Components.Select(c => (JsonNode)new JsonObject
        {
            ["name"] = c.Name,
            ["manufacturer"] = c.Manufacturer,
            ["package"] = c.Package is { } p
                ? new JsonObject { ["r_pkg_ohm"] = Triple(p.R), ["l_pkg_H"] = Triple(p.L), ["c_pkg_F"] = Triple(p.C) }
                : null,
            ["pins"] = new JsonArray(c.Pins.Select(pin => (JsonNode)new JsonObject
            {
                ["pin"] = pin.Name, ["signal"] = pin.Signal, ["model"] = pin.Model,
                ["r_pin_ohm"] = pin.R, ["l_pin_H"] = pin.L, ["c_pin_F"] = pin.C,
            }).ToArray()),
        }).ToArray());
        var list = new JsonArray(models.Select(m => (JsonNode)ModelJson(m, corners)).ToArray());
        return new JsonObject
        {
            ["file"] = file.Source,
            ["ibis_version"] = file.Version,
            ["components"] = components,
            ["models"] = list,
            ["warnings"] = new JsonArray(file.Warnings.Select(w => (JsonNode)JsonValue.Create(w)!).ToArray()),
        };
    }

    static JsonObject ModelJson(BufferModel m, IReadOnlyList<Corner> wanted)
    {
        var o = new JsonObject
        {
            ["name"] = m.Name,
            ["type"] = m.TypeName,
            ["line"] = m.Line,
            ["corners"] = new JsonArray(m.Corners.Select(c => (JsonNode)JsonValue.Create(Name(c))!).ToArray()),
            ["c_comp_F"] = Triple(m.CComp),
            ["voltage_range_V"] = m.VoltageRange is { } vr ? Triple(vr) : null,
            ["vinl_V"] = m.Vinl, ["vinh_V"] = m.Vinh, ["vmeas_V"] = m.Vmeas,
            ["tables"] = new JsonArray(Tables(m).Select(t => (JsonNode)JsonValue.Create(t)!).ToArray()),
            ["rising_waveforms"] = m.RisingWaveforms.Count,
            ["falling_waveforms"] = m.FallingWaveforms.Count,
        };
        var per = new JsonObject();
        foreach (Corner c in wanted.Where(m.HasCorner))
        {
            BufferCurves curves = m.Curves(c);
            var co = new JsonObject
            {
                ["r_out_high_ohm"] = curves.OutputResistanceHigh,
                ["r_out_low_ohm"] = curves.OutputResistanceLow,
            };
            if (m.Drives)
                foreach (bool rising in new[] { true, false })
                {
                    SwitchingTable t = SwitchingCoefficients.For(m, c, rising);
                    co[rising ? "rising" : "falling"] = new JsonObject
                    {
                        ["method"] = t.Method switch { SwitchingMethod.Ramp => "ramp", SwitchingMethod.TwoWaveforms => "two_waveforms", _ => "one_sided" },
                        ["duration_s"] = t.Time[^1] - t.Time[0],
                        ["instants"] = t.Time.Length,
                        ["notes"] = new JsonArray(t.Notes.Select(n => (JsonNode)JsonValue.Create(n)!).ToArray()),
                    };
                }
            per[Name(c)] = co;
        }
        o["by_corner"] = per;
        return o;
    }

    /// <summary>The text listing: components with their pins, then each model with its type, corners and what it holds.</summary>
    public static IReadOnlyList<string> Lines(BufferFile file, IReadOnlyList<BufferModel> models, IReadOnlyList<Corner> corners)
    {
        ArgumentNullException.ThrowIfNull(file);
        ArgumentNullException.ThrowIfNull(models);
        ArgumentNullException.ThrowIfNull(corners);
        var lines = new List<string> { $"{file.Source}: IBIS {file.Version}, {file.Components.Count} component(s), {file.Models.Count} model(s)" };
        foreach (BufferComponent c in file.Components)
        {
            lines.Add($"component {c.Name}" + (c.Manufacturer is { Length: > 0 } mf ? $" ({mf})" : ""));
            if (c.Package is { } p)
                lines.Add($"  package R {Quantity.Format(p.R.Typ, "Ω", 3)}, L {Quantity.Format(p.L.Typ, "H", 3)}, C {Quantity.Format(p.C.Typ, "F", 3)} (typ)");
            foreach (BufferPin pin in c.Pins)
                lines.Add($"  pin {pin.Name,-6} {pin.Signal,-12} {pin.Model}");
        }
        foreach (BufferModel m in models)
        {
            lines.Add($"model {m.Name}: {m.TypeName}, corners {string.Join("/", m.Corners.Select(Name))}, C_comp {Quantity.Format(m.CComp.Typ, "F", 3)}" +
                      (m.VoltageRange is { } vr ? $", supply {Quantity.Format(vr.Typ, "V", 3)}" : "") +
                      $"; {string.Join(", ", Tables(m))}");
            foreach (Corner c in corners.Where(m.HasCorner))
            {
                BufferCurves curves = m.Curves(c);
                var parts = new List<string>();
                if (curves.OutputResistanceHigh is { } rh) parts.Add($"R_out high {Quantity.Format(rh, "Ω", 3)}");
                if (curves.OutputResistanceLow is { } rl) parts.Add($"R_out low {Quantity.Format(rl, "Ω", 3)}");
                if (m.Drives)
                    foreach (bool rising in new[] { true, false })
                        parts.Add($"{(rising ? "rising" : "falling")}: {SwitchingCoefficients.Describe(SwitchingCoefficients.For(m, c, rising))}");
                if (parts.Count > 0) lines.Add($"  {Name(c),-3}  {string.Join("; ", parts)}");
            }
        }
        return lines;
    }

    /// <summary>The notes of every edge's switching (fall-backs to the ramp rule and why), for the warning stream.</summary>
    public static IEnumerable<string> SwitchingNotes(IReadOnlyList<BufferModel> models, IReadOnlyList<Corner> corners)
    {
        ArgumentNullException.ThrowIfNull(models);
        ArgumentNullException.ThrowIfNull(corners);
        return models.Where(m => m.Drives)
            .SelectMany(m => corners.Where(m.HasCorner).SelectMany(c => new[] { true, false }.Select(r => SwitchingCoefficients.For(m, c, r))))
            .Where(t => t.Method == SwitchingMethod.Ramp)
            .SelectMany(t => t.Notes)
            .Distinct();
    }

    static IEnumerable<string> Tables(BufferModel m)
    {
        if (m.Pullup is not null) yield return "[Pullup]";
        if (m.Pulldown is not null) yield return "[Pulldown]";
        if (m.GndClamp is not null) yield return "[GND Clamp]";
        if (m.PowerClamp is not null) yield return "[POWER Clamp]";
        if (m.Ramp is not null) yield return "[Ramp]";
        if (m.RisingWaveforms.Count > 0) yield return $"{m.RisingWaveforms.Count} rising waveform(s)";
        if (m.FallingWaveforms.Count > 0) yield return $"{m.FallingWaveforms.Count} falling waveform(s)";
    }

    static JsonObject Triple(CornerValue v) => new() { ["typ"] = v.Typ, ["min"] = v.Min, ["max"] = v.Max };

    static string Name(Corner c) => c.ToString().ToLowerInvariant();
}
