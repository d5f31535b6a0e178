using WaveSim.Core;
using WaveSim.Core.Reports;

namespace WaveSim.Tests.Reports;

/// <summary>
/// How the report prints figures: SI prefixes for powers of 1000 (BIPM, The International System of Units, 9th ed. 2019,
/// Table 7), three significant digits, no exponent, and a time below half the solver's step printed as 0 (a rounding
/// residue: the run cannot resolve it; common practice, no source).
/// </summary>
public class ReportNumbersTests
{
    static readonly ReportNumbers Ps = new(1e-12);

    [Theory]
    [InlineData(-6.82e-23, "0 s")]      // the residue the multi-drop report printed as "-6.82E-08 fs"
    [InlineData(3e-15, "0 s")]          // 3 fs: below half a 1 ps step
    [InlineData(-4.9e-13, "0 s")]
    [InlineData(6e-13, "600 fs")]       // above half a step: kept
    [InlineData(1.23456e-9, "1.23 ns")]
    [InlineData(999.7e-9, "1 µs")]      // rounding carries to the next prefix
    [InlineData(-2.5e-9, "-2.5 ns")]
    [InlineData(4.5e-3, "4.5 ms")]
    public void Times_print_with_a_prefix_three_digits_and_a_residue_below_the_step_as_zero(double seconds, string expected) =>
        Assert.Equal(expected, Ps.S(seconds));

    [Theory]
    [InlineData(-0.0125, "-12.5 mV")]
    [InlineData(1.66667, "1.67 V")]
    [InlineData(7.2e-7, "720 nV")]
    [InlineData(0.0, "0 V")]
    [InlineData(2.18e-13, "0 V")]       // a settled residue, below 1 nV (common practice, no source)
    [InlineData(-3e-10, "0 V")]
    [InlineData(1.5e-9, "1.5 nV")]
    public void Voltages_print_with_a_prefix_and_three_digits(double volts, string expected) => Assert.Equal(expected, ReportNumbers.V(volts));

    [Theory]
    [InlineData(-0.04, "0.0 %")]        // no "-0.0"
    [InlineData(12.345, "12.3 %")]
    public void Percentages_keep_one_decimal_and_no_negative_zero(double pct, string expected) => Assert.Equal(expected, ReportNumbers.Pct(pct));

    [Fact]
    public void None_prints_as_a_dash() => Assert.Equal("-", Ps.S(null));

    [Fact]
    public void The_multidrop_report_prints_no_exponent_and_its_source_delay_as_zero()
    {
        var s = TestScenarios.Parse(File.ReadAllText(Repository.PathOf("scenarios", "multidrop-vtt.yaml")));
        var report = HtmlReport.Build(ReportInput.For(Simulate.Run(s, HtmlReport.RunOptions()), ""));
        var doc = HtmlReportTests.Parse(report.Html);
        var cells = doc.Descendants("td").Select(td => td.Value).ToList();
        Assert.DoesNotContain(cells, c => System.Text.RegularExpressions.Regex.IsMatch(c, @"\d[eE][+-]?\d"));
        var table = doc.Descendants("table").Single(t => (string?)t.Attribute("id") == "figures");
        var head = table.Elements("tr").First().Elements("th").Select(th => th.Value).ToList();
        var source = table.Elements("tr").Skip(1).Select(tr => tr.Elements("td").ToList()).First(r => r[1].Value == "source");
        // The source's own 50 % instant is the reference of every delay: its delay is 0 (up to rounding).
        Assert.Equal("0 s", source[head.IndexOf("delay 50 %")].Value);
    }
}
