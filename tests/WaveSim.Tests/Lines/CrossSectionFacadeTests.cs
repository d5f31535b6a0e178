using WaveSim.Core;
using WaveSim.Core.Lines;

namespace WaveSim.Tests.Lines;

/// <summary>The facade: reading text, impossible input, range warnings, synthesis.</summary>
public class CrossSectionFacadeTests
{
    static Dictionary<string, string> Geometry(params (string K, string V)[] kv) => kv.ToDictionary(p => p.K, p => p.V);

    [Fact]
    public void Reads_a_scenario_geometry_and_gives_per_length_RLGC()
    {
        var spec = CrossSection.FromDictionary(Geometry(("kind", "microstrip"), ("width", "8 mil"), ("height", "5 mil"),
            ("er", "4.2"), ("thickness", "1.4mil"), ("tand", "0.02"), ("at", "1 GHz")), "board.yaml geometry");
        Assert.Equal(8 * 25.4e-6, spec.Dimensions["width"], 15);
        var p = CrossSection.Compute(spec);
        Assert.Equal(1e9, p.FrequencyHz);
        // L = Z0 sqrt(ee)/c, C = sqrt(ee)/(c Z0) (Pozar Ch. 2; ReferenceData/published-checks.md §6): L/C = Z0^2, LC = ee/c^2.
        Close.Rel(p.Z0 * p.Z0, p.L / p.C, 1e-12);
        Close.Rel(p.EpsEff / Math.Pow(LineConstants.SpeedOfLight, 2), p.L * p.C, 1e-12);
        Assert.True(p.RAc > p.RDc && p.G > 0);
        // G = omega C tan d_eff, the filling factor below 1 for a partly filled line.
        Assert.True(p.LossTangent < 0.02 && p.LossTangent > 0.015);
        Close.Rel(2 * Math.PI * 1e9 * p.C * p.LossTangent, p.G, 1e-12);
        // An explicit frequency overrides "at".
        Assert.Equal(2 * p.G, CrossSection.Compute(spec, 2e9).G, 12);
    }

    [Fact]
    public void Resistivity_accepts_a_plain_number_or_an_ohm_metre_suffix()
    {
        foreach (string text in new[] { "1.72e-8", "1.72e-8 ohm m", "1.72e-8 Ω·m" })
        {
            var spec = CrossSection.FromDictionary("coax", Geometry(("inner", "1mm"), ("outer", "3mm"), ("er", "1"), ("resistivity", text)), "x");
            Close.Rel(1.72e-8, spec.Dimensions["resistivity"], 1e-15);
        }
    }

    [Theory]
    [InlineData("width", "-1 mil", "xsection: --width must be > 0 (got -1 mil)")]
    [InlineData("er", "0.5", "xsection: --er must be >= 1 (got 0.5)")]
    [InlineData("thickness", "-1um", "xsection: --thickness must be >= 0 (got -1um)")]
    [InlineData("tand", "-0.01", "xsection: --tand must be >= 0 (got -0.01)")]
    public void Impossible_microstrip_values_name_the_option(string key, string value, string message)
    {
        var raw = Geometry(("width", "8mil"), ("height", "5mil"), ("er", "4.2"));
        raw[key] = value;
        var spec = CrossSection.FromDictionary("microstrip", raw, "xsection", k => "--" + k);
        var ex = Assert.Throws<InputException>(() => CrossSection.Compute(spec));
        Assert.Equal(message, ex.Message);
    }

    [Fact]
    public void Impossible_relations_are_named()
    {
        InputException Fail(string kind, params (string, string)[] kv) =>
            Assert.Throws<InputException>(() => CrossSection.Compute(CrossSection.FromDictionary(kind, Geometry(kv), "geometry")));
        Assert.Equal("geometry: outer must be larger than inner (1mm) (got 1mm)",
            Fail("coax", ("inner", "1mm"), ("outer", "1mm"), ("er", "2")).Message);
        Assert.StartsWith("geometry: spacing must be larger than diameter",
            Fail("wires", ("diameter", "1mm"), ("spacing", "0.5mm"), ("er", "1")).Message);
        Assert.StartsWith("geometry: offset must keep the strip between the planes",
            Fail("stripline", ("width", "0.1mm"), ("spacing", "1mm"), ("er", "4"), ("offset", "0.5mm")).Message);
        Assert.StartsWith("geometry: thickness must be less than spacing",
            Fail("stripline", ("width", "0.1mm"), ("spacing", "1mm"), ("thickness", "1mm"), ("er", "4")).Message);
    }

    [Fact]
    public void Unknown_and_missing_keys_list_the_accepted_ones()
    {
        var unknown = Assert.Throws<InputException>(() =>
            CrossSection.FromDictionary(Geometry(("kind", "coax"), ("inner", "1mm"), ("outer", "3mm"), ("er", "2"), ("height", "1mm")), "s.yaml line 3"));
        Assert.Equal("s.yaml line 3: unknown key 'height' for coax; accepted: inner, outer, er, tand, at, resistivity", unknown.Message);
        var missing = Assert.Throws<InputException>(() => CrossSection.FromDictionary("coax", Geometry(("inner", "1mm"), ("er", "2")), "xsection", k => "--" + k));
        Assert.Equal("xsection: missing '--outer' for coax (required: --inner, --outer, --er)", missing.Message);
        var kind = Assert.Throws<InputException>(() => CrossSection.FromDictionary(Geometry(("kind", "waveguide")), "g"));
        Assert.Equal("g: unknown line kind 'waveguide'; expected one of microstrip, stripline, coax, wires, twisted, coupled-microstrip, coupled-stripline", kind.Message);
        var unit = Assert.Throws<InputException>(() => CrossSection.FromDictionary("coax", Geometry(("inner", "1 GHz"), ("outer", "3mm"), ("er", "2")), "g"));
        Assert.StartsWith("g: inner: '1 GHz' is a frequency, not a length", unit.Message);
        Assert.DoesNotContain('\n', unit.Message);
    }

    [Fact]
    public void Warns_outside_the_stated_ranges()
    {
        LineParameters Ms(string w, string h, string t) => CrossSection.Compute(CrossSection.FromDictionary("microstrip",
            Geometry(("width", w), ("height", h), ("thickness", t), ("er", "4.4")), "g"));
        Assert.Empty(Ms("0.3mm", "0.2mm", "35um").Warnings);
        // Hammerstad and Jensen 1980: eps_eff 0.2 % for 0.01 <= u <= 100.
        Assert.Contains(Ms("0.001mm", "0.2mm", "1um").Warnings, w => w.Contains("outside 0.01..100"));
        Assert.Contains(Ms("300mm", "2mm", "35um").Warnings, w => w.Contains("outside 0.01..100"));
        Assert.Contains(Ms("0.3mm", "0.1mm", "35um").Warnings, w => w.Contains("thickness/height"));
        Assert.Contains(Ms("0.3mm", "0.2mm", "0").Warnings, w => w.Contains("perfect conductor"));
        var coax = CrossSection.Compute(CrossSection.FromDictionary("coax", Geometry(("inner", "3.04mm"), ("outer", "7mm"), ("er", "1"), ("at", "30 GHz")), "g"));
        Assert.Contains(coax.Warnings, w => w.Contains("TE11"));
        var wires = CrossSection.Compute(CrossSection.FromDictionary("wires", Geometry(("diameter", "1mm"), ("spacing", "1.5mm"), ("er", "1")), "g"));
        Assert.Contains(wires.Warnings, w => w.Contains("proximity"));
    }

    [Theory]
    [InlineData("microstrip", "width", "height=0.2mm;thickness=35um;er=4.3")]
    [InlineData("microstrip", "height", "width=0.3mm;er=4.3")]
    [InlineData("stripline", "width", "spacing=0.5mm;thickness=17um;er=4.0;offset=0.05mm")]
    [InlineData("stripline", "spacing", "width=0.15mm;thickness=17um;er=4.0")]
    [InlineData("coax", "inner", "outer=3mm;er=2.25")]
    [InlineData("wires", "diameter", "spacing=2mm;er=1")]
    [InlineData("twisted", "spacing", "diameter=0.5mm;er=3;pitch=20mm")]
    [InlineData("microstrip", "er", "width=0.3mm;height=0.2mm")]
    public void Synthesis_round_trip_gives_50_ohm(string kind, string free, string given)
    {
        var raw = given.Split(';').Select(p => p.Split('=')).ToDictionary(p => p[0], p => p[1]);
        var spec = CrossSection.FromDictionary(kind, raw, "g", freeDimension: free);
        double target = kind == "wires" || kind == "twisted" ? 100 : 50;
        if (free == "er") target = 40;
        SynthesisResult s = CrossSection.Solve(spec, free, target);
        double analysed = CrossSection.Compute(spec.With(free, s.Value)).Z0;
        Assert.InRange(analysed, target * (1 - 1e-6), target * (1 + 1e-6));
    }

    [Fact]
    public void Synthesis_without_a_solution_says_so()
    {
        // Hammerstad and Jensen: a 1 kohm microstrip is beyond any width from h/1e4 to 1e4 h.
        var spec = CrossSection.FromDictionary("microstrip", Geometry(("height", "0.2mm"), ("er", "4.3")), "xsection", k => "--" + k, "width");
        var ex = Assert.Throws<InputException>(() => CrossSection.Solve(spec, "width", 1000));
        Assert.StartsWith("xsection: no --width between", ex.Message);
        Assert.Contains("gives Z0 = 1 kohm", ex.Message);
        var bad = Assert.Throws<InputException>(() => CrossSection.Solve(spec, "tand", 50));
        Assert.Equal("xsection: cannot solve microstrip for 'tand'; solvable: width, height, er", bad.Message);
    }

    [Fact]
    public void Catalog_lists_every_key_once()
    {
        var names = CrossSectionCatalog.AllKeys.Select(k => k.Name).ToList();
        Assert.Equal(names.Distinct().Count(), names.Count);
        Assert.Contains("offset", names);
        Assert.Contains("resistivity", names);
        foreach (var kind in CrossSectionCatalog.Kinds)
            Assert.All(kind.Solvable, s => Assert.Contains(kind.Dimensions, d => d.Name == s && d.Required));
    }
}
