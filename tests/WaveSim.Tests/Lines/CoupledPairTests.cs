using System.Text.Json;
using WaveSim.Core;
using WaveSim.Core.Lines;

namespace WaveSim.Tests.Lines;

/// <summary>Coupled pairs through the <see cref="CrossSection"/> facade and the `xsection` command.</summary>
public class CoupledPairTests
{
    static Dictionary<string, string> Geometry(params (string K, string V)[] kv) => kv.ToDictionary(p => p.K, p => p.V);

    static CrossSectionSpec Stripline(params (string K, string V)[] extra) =>
        CrossSection.FromDictionary("coupled-stripline", Geometry(new[] { ("width", "0.1mm"), ("gap", "0.15mm"), ("spacing", "0.3mm"), ("er", "4.2") }
            .Where(d => extra.All(e => e.K != d.Item1)).Concat(extra).ToArray()), "g");

    [Fact]
    public void Differential_and_common_lines_follow_the_mode_decomposition()
    {
        // Symmetric pair (Paul, Analysis of Multiconductor Transmission Lines, 2nd ed. 2008, from memory; Pozar Sec. 7.6):
        // Zdiff = 2 Z0o, Zcomm = Z0e/2, k = (Z0e - Z0o)/(Z0e + Z0o); differential L and R double, C halves; common the reverse.
        foreach (var spec in new[]
        {
            Stripline(("thickness", "17um"), ("tand", "0.02"), ("at", "1GHz")),
            CrossSection.FromDictionary("coupled-microstrip", Geometry(("width", "0.12mm"), ("gap", "0.15mm"), ("height", "0.1mm"),
                ("thickness", "35um"), ("er", "4.2"), ("tand", "0.02"), ("at", "1GHz")), "g"),
        })
        {
            var p = CrossSection.ComputePair(spec);
            Assert.Equal(2 * p.Z0Odd, p.Zdiff, 12);
            Assert.Equal(p.Z0Even / 2, p.Zcomm, 12);
            Assert.Equal((p.Z0Even - p.Z0Odd) / (p.Z0Even + p.Z0Odd), p.Coupling, 12);
            Assert.InRange(p.Coupling, 0, 1);
            LineParameters d = p.Differential, c = p.Common;
            Close.Rel(p.Zdiff, d.Z0, 1e-12); Close.Rel(p.Odd.EpsEff, d.EpsEff, 1e-12);
            Close.Rel(2 * p.Odd.L, d.L, 1e-12); Close.Rel(p.Odd.C / 2, d.C, 1e-12);
            Close.Rel(2 * p.Odd.RAc, d.RAc, 1e-12); Close.Rel(p.Odd.G / 2, d.G, 1e-12);
            Close.Rel(p.Zcomm, c.Z0, 1e-12); Close.Rel(p.Even.EpsEff, c.EpsEff, 1e-12);
            Close.Rel(p.Even.L / 2, c.L, 1e-12); Close.Rel(2 * p.Even.C, c.C, 1e-12);
            Close.Rel(p.Even.RDc / 2, c.RDc, 1e-12);
            // One strip's DC resistance rho/(w t), annealed copper 1.7241e-8 ohm m (IACS; ReferenceData/published-checks.md §4).
            Close.Rel(1.7241e-8 / (spec.Dimensions["width"] * spec.Dimensions["thickness"]), p.Odd.RDc, 1e-12);
            // Compute on a pair kind is the differential line, so synthesis targets Zdiff.
            Assert.Equal(d.Z0, CrossSection.Compute(spec).Z0);
            Assert.Same(p.Warnings, d.Warnings);
        }
    }

    [Theory]
    [InlineData("coupled-stripline", "gap=0.15mm;spacing=0.3mm;thickness=17um;er=4.2", 100)]
    [InlineData("coupled-stripline", "gap=0.1mm;spacing=0.5mm;er=3.5", 85)]
    [InlineData("coupled-microstrip", "gap=0.15mm;height=0.1mm;er=4.2", 100)]
    [InlineData("coupled-microstrip", "gap=0.2mm;height=0.2mm;er=3.0;thickness=35um", 90)]
    public void Synthesis_finds_the_width_for_a_differential_impedance(string kind, string given, double target)
    {
        var raw = given.Split(';').Select(p => p.Split('=')).ToDictionary(p => p[0], p => p[1]);
        var spec = CrossSection.FromDictionary(kind, raw, "g", freeDimension: "width");
        SynthesisResult s = CrossSection.Solve(spec, "width", target);
        Assert.InRange(CrossSection.ComputePair(spec.With("width", s.Value)).Zdiff, target * (1 - 1e-6), target * (1 + 1e-6));
    }

    [Theory]
    [InlineData("gap", "-0.1mm", "g: gap must be > 0 (got -0.1mm)")]
    [InlineData("gap", "0", "g: gap must be > 0 (got 0)")]
    [InlineData("width", "-1mm", "g: width must be > 0 (got -1mm)")]
    [InlineData("thickness", "0.4mm", "g: thickness must be less than spacing (0.3mm) (got 0.4mm)")]
    [InlineData("er", "0.5", "g: er must be >= 1 (got 0.5)")]
    public void Bad_input_is_a_one_line_error_naming_the_key(string key, string value, string message)
    {
        var ex = Assert.Throws<InputException>(() => CrossSection.ComputePair(Stripline((key, value))));
        Assert.Equal(message, ex.Message);
        Assert.DoesNotContain('\n', ex.Message);
    }

    [Fact]
    public void Missing_gap_and_single_line_kinds_are_clear_errors()
    {
        var missing = Assert.Throws<InputException>(() => CrossSection.FromDictionary("coupled-microstrip",
            Geometry(("width", "0.1mm"), ("height", "0.1mm"), ("er", "4")), "xsection", k => "--" + k));
        Assert.Equal("xsection: missing '--gap' for coupled-microstrip (required: --width, --gap, --height, --er)", missing.Message);
        var single = Assert.Throws<InputException>(() => CrossSection.ComputePair(
            CrossSection.FromDictionary("microstrip", Geometry(("width", "0.1mm"), ("height", "0.1mm"), ("er", "4")), "g")));
        Assert.StartsWith("g: microstrip is a single line, not a coupled pair; pair kinds: coupled-microstrip, coupled-stripline", single.Message);
        var offset = Assert.Throws<InputException>(() => Stripline(("offset", "0.01mm")));
        Assert.Contains("unknown key 'offset' for coupled-stripline", offset.Message);
    }

    [Fact]
    public void Range_warnings_name_the_keys()
    {
        var ms = CrossSection.ComputePair(CrossSection.FromDictionary("coupled-microstrip",
            Geometry(("width", "0.1mm"), ("gap", "2mm"), ("height", "0.1mm"), ("thickness", "35um"), ("er", "4")), "g", k => "--" + k));
        Assert.Contains(ms.Warnings, w => w.StartsWith("--gap/--height = 20 is outside 0.1..10"));
        Assert.Contains(ms.Warnings, w => w.Contains("zero-thickness strips") && w.Contains("--thickness"));
        var sl = CrossSection.ComputePair(Stripline(("width", "0.05mm"), ("thickness", "35um")));
        Assert.Contains(sl.Warnings, w => w.StartsWith("width/spacing = 0.167 is below 0.35"));
        Assert.Contains(sl.Warnings, w => w.StartsWith("thickness/spacing = 0.117 is above 0.1"));
        Assert.Empty(CrossSection.ComputePair(Stripline(("width", "0.12mm"), ("thickness", "17um"))).Warnings);
    }

    [Fact]
    public void Xsection_json_of_the_Pozar_coupler_pair()
    {
        // Pozar, Microwave Engineering, 4th ed., Sec. 7.6, 20 dB stripline coupler (from memory): b = 0.32 cm, er = 2.20,
        // W/b = 0.809, S/b = 0.306 for Z0e = 55.28 and Z0o = 45.23 ohm, read from a graph (1 %).
        var (code, output, err) = CliRunner.Run("xsection", "coupled-stripline", "--width", "2.589mm", "--gap", "0.9792mm", "--spacing", "3.2mm", "--er", "2.2", "--json");
        Assert.Equal(0, code);
        Assert.Contains("perfect conductors", err);
        var root = JsonDocument.Parse(output).RootElement;
        Close.Rel(55.28, root.GetProperty("z0_even_ohm").GetDouble(), 0.01, "Z0e");
        Close.Rel(45.23, root.GetProperty("z0_odd_ohm").GetDouble(), 0.01, "Z0o");
        Assert.Equal(2.2, root.GetProperty("eps_eff_even").GetDouble(), 12);
        Assert.Equal(2.2, root.GetProperty("eps_eff_odd").GetDouble(), 12);
        Assert.Equal(2 * root.GetProperty("z0_odd_ohm").GetDouble(), root.GetProperty("z_diff_ohm").GetDouble(), 9);
        Assert.Equal(root.GetProperty("z0_even_ohm").GetDouble() / 2, root.GetProperty("z_comm_ohm").GetDouble(), 9);
        Assert.Equal(root.GetProperty("z_diff_ohm").GetDouble(), root.GetProperty("differential").GetProperty("z0_ohm").GetDouble(), 9);
        Assert.Equal(root.GetProperty("z_comm_ohm").GetDouble(), root.GetProperty("common").GetProperty("z0_ohm").GetDouble(), 9);
        // Stripline: delay sqrt(er)/c in both modes (tpd = sqrt(ee)/c; ReferenceData/published-checks.md §12).
        Close.Rel(Math.Sqrt(2.2) / 299_792_458.0, root.GetProperty("differential").GetProperty("delay_s_per_m").GetDouble(), 1e-12);
        Close.Check(0.1, root.GetProperty("coupling").GetDouble(), 0, 2, "coupling");
    }

    [Fact]
    public void Xsection_solves_the_width_for_Zdiff_and_prints_a_table()
    {
        var (code, output, _) = CliRunner.Run("xsection", "coupled-microstrip", "--gap", "6mil", "--height", "4mil", "--er", "4.2", "--z0", "100 ohm", "--json");
        Assert.Equal(0, code);
        var root = JsonDocument.Parse(output).RootElement;
        Assert.True(root.GetProperty("width_m").GetDouble() > 0);
        Assert.InRange(root.GetProperty("z_diff_ohm").GetDouble(), 100 - 1e-6, 100 + 1e-6);
        Assert.True(root.GetProperty("eps_eff_even").GetDouble() > root.GetProperty("eps_eff_odd").GetDouble());

        var (code2, table, _) = CliRunner.Run("xsection", "coupled-microstrip", "--width", "5mil", "--gap", "6mil", "--height", "4mil", "--er", "4.2");
        Assert.Equal(0, code2);
        foreach (string row in new[] { "Z0 even", "Z0 odd", "eps_eff even", "eps_eff odd", "Zdiff", "Zcomm", "coupling k", "differential delay", "common C" })
            Assert.Contains(row, table);

        var (bad, _, err) = CliRunner.Run("xsection", "coupled-stripline", "--width", "0.1mm", "--gap", "-1mm", "--spacing", "0.3mm", "--er", "4");
        Assert.NotEqual(0, bad);
        Assert.Contains("--gap must be > 0 (got -1mm)", err);
        Assert.Single(err.Trim().Split('\n'));
    }
}
