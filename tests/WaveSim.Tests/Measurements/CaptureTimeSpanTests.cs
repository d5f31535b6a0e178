using WaveSim.Core;
using WaveSim.Core.Measurements;

namespace WaveSim.Tests.Measurements;

/// <summary>
/// The unit-slip guard: a capture's time span far off the simulation's is warned about, and one that cannot mostly overlap the
/// simulated record is refused. The 10⁶ ratio and the half-overlap rule are ours (common practice, no source); the cases
/// below are built so that the arithmetic is plain: ns read as s multiplies a span by 10⁹, s read as ns divides it by 10⁹.
/// </summary>
public class CaptureTimeSpanTests
{
    static Capture Ramp(double t0, double t1, string column = "'time_ns'") =>
        new([t0, 0.5 * (t0 + t1), t1], [0, 0.5, 1], "/data/scope.csv") { TimeColumn = column };

    [Fact]
    public void A_capture_in_ns_read_as_seconds_is_warned_about_naming_the_file_and_the_time_column()
    {
        var warnings = CaptureTimeSpan.Warnings(Ramp(0, 8.7), 10e-9);   // 8.7 "s" against 10 ns: 8.7e8 times
        string w = Assert.Single(warnings);
        Assert.StartsWith("scope.csv time column 'time_ns': ", w);
        Assert.Contains("8.7e8 times", w);
    }

    [Fact]
    public void A_capture_in_seconds_read_as_ns_is_warned_about_too()
    {
        var warnings = CaptureTimeSpan.Warnings(Ramp(0, 8.7e-18, "1"), 10e-9);   // 8.7e-18 s against 10 ns: 1/1.15e9
        Assert.StartsWith("scope.csv time column 1: ", Assert.Single(warnings));
    }

    [Theory]
    [InlineData(8.7e-9)]     // the same scale
    [InlineData(5e-3)]       // 5e5 times: long, but inside the 1e6 band
    [InlineData(2e-14)]      // 1/5e5
    public void A_capture_on_the_simulations_scale_gives_no_warning(double span)
    {
        Assert.Empty(CaptureTimeSpan.Warnings(Ramp(0, span), 10e-9));
    }

    [Fact]
    public void A_capture_more_than_twice_as_long_as_the_simulation_is_refused_before_any_alignment()
    {
        var ex = Assert.Throws<InputException>(() => CaptureTimeSpan.RequireFits(Ramp(0, 8.7), 10e-9));
        Assert.StartsWith("scope.csv time column 'time_ns': the capture spans 8.7 s but the simulation only 10 ns", ex.Message);
        CaptureTimeSpan.RequireFits(Ramp(0, 20e-9), 10e-9);   // exactly twice: half can overlap
    }

    [Theory]
    // Fraction of [c0, c1] inside [0, 10 ns], by hand.
    [InlineData(6e-9, 12e-9, 4.0 / 6)]
    [InlineData(8e-9, 14e-9, 2.0 / 6)]
    [InlineData(-3e-9, 3e-9, 0.5)]
    [InlineData(2e-9, 5e-9, 1.0)]
    [InlineData(11e-9, 15e-9, 0.0)]
    public void The_overlap_fraction_is_the_share_of_the_capture_inside_the_record(double c0, double c1, double fraction)
    {
        Assert.Equal(fraction, CaptureTimeSpan.OverlapFraction(c0, c1, 0, 10e-9), 1e-12);
    }

    [Fact]
    public void Less_than_half_of_the_capture_inside_the_record_after_alignment_is_refused()
    {
        Capture c = Ramp(0, 6e-9);
        CaptureTimeSpan.RequireOverlap(c, 6e-9, 0, 10e-9);   // 6..12 ns: two thirds inside
        var ex = Assert.Throws<InputException>(() => CaptureTimeSpan.RequireOverlap(c, 8e-9, 0, 10e-9));   // 8..14 ns: one third
        Assert.Contains("only 33.3 % of the capture", ex.Message);
        Assert.StartsWith("scope.csv time column 'time_ns': ", ex.Message);
    }

    [Fact]
    public void The_reader_names_the_time_column_by_its_header_or_its_number()
    {
        using var named = new TempFile("a.csv", "time_ns,ch1\n0,0\n1,1\n2,1\n");
        Assert.Equal("'time_ns'", CaptureReader.Read(named.Path).TimeColumn);
        using var bare = new TempFile("b.csv", "0,0\n1,1\n2,1\n");
        Assert.Equal("1", CaptureReader.Read(bare.Path).TimeColumn);
    }
}
