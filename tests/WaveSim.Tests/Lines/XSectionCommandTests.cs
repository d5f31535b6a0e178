using System.Text.Json;
using WaveSim.Cli;

namespace WaveSim.Tests.Lines;

/// <summary>The `xsection` command, run in-process.</summary>
public class XSectionCommandTests
{
    [Fact]
    public void Coax_json_matches_Pozar_Table_2_1()
    {
        var (code, output, err) = CliRunner.Run("xsection", "coax", "--inner", "0.81mm", "--outer", "2.95mm", "--er", "2.25", "--json");
        Assert.Equal(0, code);
        Assert.Equal("", err);
        using var doc = JsonDocument.Parse(output);
        var root = doc.RootElement;
        // Pozar Table 2.1: Z0 = 59.958/sqrt(er) ln(D/d), C = 2 pi eps0 er/ln(D/d).
        Close.Rel(59.958 / 1.5 * Math.Log(2.95 / 0.81), root.GetProperty("z0_ohm").GetDouble(), 1e-5, "Z0");
        Close.Rel(2 * Math.PI * 8.8542e-12 * 2.25 / Math.Log(2.95 / 0.81), root.GetProperty("c_F_per_m").GetDouble(), 1e-4, "C");
        Close.Rel(1.5 / 299_792_458.0, root.GetProperty("delay_s_per_m").GetDouble(), 1e-12, "delay");
        foreach (string key in new[] { "eps_eff", "l_H_per_m", "r_dc_ohm_per_m" })
            Assert.True(root.GetProperty(key).GetDouble() > 0, key);
        Assert.Equal(0, root.GetProperty("warnings").GetArrayLength());
        Assert.False(root.TryGetProperty("r_ac_ohm_per_m", out _));
    }

    [Fact]
    public void RG58_in_inches_gives_the_table_impedance()
    {
        // C2 (M): RG-58, MIL-C-17 nominal dimensions from common cable tables: d = 0.032 in, D = 0.116 in,
        // er = 2.25: Z0 = 51.48 ohm. Tol 0.1 % on the formula.
        var (code, output, _) = CliRunner.Run("xsection", "coax", "--inner", "0.032 in", "--outer", "0.116in", "--er", "2.25", "--at", "100MHz", "--json");
        Assert.Equal(0, code);
        var root = JsonDocument.Parse(output).RootElement;
        Close.Rel(51.48, root.GetProperty("z0_ohm").GetDouble(), 1e-3);
        Assert.True(root.GetProperty("r_ac_ohm_per_m").GetDouble() > root.GetProperty("r_dc_ohm_per_m").GetDouble());
        Assert.Equal(0, root.GetProperty("g_S_per_m").GetDouble());
    }

    [Fact]
    public void Synthesis_prints_the_solved_width_in_metres()
    {
        // Round trip through the command line: the width found for 50 ohm analyses back to 50 ohm.
        var (code, output, _) = CliRunner.Run("xsection", "microstrip", "--height", "5mil", "--er", "4.2", "--thickness", "0.7mil", "--z0", "50 ohm", "--json");
        Assert.Equal(0, code);
        var root = JsonDocument.Parse(output).RootElement;
        double w = root.GetProperty("width_m").GetDouble();
        Assert.InRange(root.GetProperty("z0_ohm").GetDouble(), 50 - 1e-6, 50 + 1e-6);
        var (code2, output2, _) = CliRunner.Run("xsection", "microstrip", "--width", w.ToString("R", System.Globalization.CultureInfo.InvariantCulture) + " m",
                                      "--height", "5mil", "--er", "4.2", "--thickness", "0.7mil", "--json");
        Assert.Equal(0, code2);
        Assert.InRange(JsonDocument.Parse(output2).RootElement.GetProperty("z0_ohm").GetDouble(), 50 - 1e-6, 50 + 1e-6);
    }

    [Fact]
    public void Table_output_and_warnings_on_stderr()
    {
        var (code, output, err) = CliRunner.Run("xsection", "microstrip", "--width", "8mil", "--height", "5mil", "--er", "4.2", "--thickness", "1.4mil", "--tand", "0.02", "--at", "1GHz");
        Assert.Equal(0, code);
        Assert.Contains("Z0", output);
        Assert.Contains("R at 1 GHz", output);
        Assert.StartsWith("warning: --thickness/--height", err);
    }

    [Theory]
    [InlineData("xsection: --width must be > 0 (got -1mil)", "xsection", "microstrip", "--width", "-1mil", "--height", "5mil", "--er", "4.2")]
    [InlineData("xsection: missing '--er' for microstrip", "xsection", "microstrip", "--width", "8mil", "--height", "5mil")]
    [InlineData("xsection: --z0 solves for one dimension, but --width, --height are missing", "xsection", "microstrip", "--er", "4", "--z0", "50ohm")]
    [InlineData("xsection: --width: '8 parsecs' has an unknown unit", "xsection", "microstrip", "--width", "8 parsecs", "--height", "5mil", "--er", "4")]
    public void Bad_input_is_one_line_and_exit_2(string start, params string[] args)
    {
        var (code, output, err) = CliRunner.Run(args);
        Assert.Equal(ExitCodes.BadInput, code);
        Assert.Equal("", output);
        Assert.StartsWith("error: " + start, err);
        Assert.Single(err.TrimEnd().Split('\n'));
    }
}
