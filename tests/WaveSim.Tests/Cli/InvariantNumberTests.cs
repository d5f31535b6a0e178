using System.Globalization;

namespace WaveSim.Tests.Cli;

/// <summary>
/// Numbers are written the invariant way (issue 14, "Smaller"): no "-0" in probes.csv, and a decimal point, not the
/// user's decimal comma, in what a command prints (common practice, no source: machine-readable output does not depend
/// on the locale).
/// </summary>
public class InvariantNumberTests
{
    const string Scenario = """
        title: invariant
        source: { waveform: pulse, low: 0 V, high: 5 V, rise: 1 ns, width: 4 ns, delay: 1 ns, resistance: 20 ohm }
        line:
          - segment: { length: 0.5 m, z0: 75 ohm, velocity: 0.66 c, r: 0.08 ohm/m }
        load: { r: 10 kohm, c: 100 pF }
        probes: [ { name: drv, at: source }, { name: far, at: load } ]
        simulation: { duration: 20 ns, output_step: 0.5 ns }

        """;

    [Fact]
    public void Probes_csv_has_no_negative_zero()
    {
        // The driver's level at t = 0 came out as -0 (a product with a negative zero) and was written "-0".
        using var cli = new CliRunner();
        var (code, _, err) = CliRunner.Run("run", cli.Write("s.yaml", Scenario), "--out", cli.PathOf("out"));
        Assert.True(code == 0, err);
        var fields = File.ReadLines(Path.Combine(cli.PathOf("out"), "probes.csv")).Skip(1).SelectMany(l => l.Split(','));
        Assert.DoesNotContain("-0", fields);
    }

    [Fact]
    public void A_decimal_comma_locale_changes_nothing_a_command_prints()
    {
        using var cli = new CliRunner();
        string file = cli.Write("s.yaml", Scenario);
        var (_, invariantOut, _) = CliRunner.Run("check", file);
        var saved = CultureInfo.CurrentCulture;
        var comma = (CultureInfo)CultureInfo.InvariantCulture.Clone();
        comma.NumberFormat.NumberDecimalSeparator = ",";
        comma.NumberFormat.NumberGroupSeparator = ".";
        try
        {
            CultureInfo.CurrentCulture = comma;
            var (code, localOut, err) = CliRunner.Run("check", file);
            Assert.True(code == 0, err);
            Assert.Equal(invariantOut, localOut);
        }
        finally { CultureInfo.CurrentCulture = saved; }
    }
}
