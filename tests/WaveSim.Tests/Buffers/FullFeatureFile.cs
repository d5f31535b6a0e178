namespace WaveSim.Tests.Buffers;

/// <summary>
/// A buffer model file written for the tests from the keyword list of the IBIS standard (ANSI/EIA-656-B, version 5.0; the
/// keywords and their columns from memory), using every feature the reader supports: a second comment character, scale
/// suffixes and unit letters, NA corners, keywords in other cases and with underscores, the four reference keywords, all
/// five model types, package and per-pin parasitics, [Ramp] with R_load, waveforms with fixtures, and keywords and
/// sub-parameters the reader skips with a warning. Every number is invented.
/// </summary>
internal static class FullFeatureFile
{
    public const string Name = "full.ibs";

    public const string Text = """
| A file header comment in the default comment character.
[IBIS Ver]      5.0
[Comment Char]  #_char
# From here on '#' starts a comment and '|' is ordinary text.
[File Name]     full.ibs
[File Rev]      0.1
[Date]          2 December 2026
[Notes]         Free text, on
                more than one line | with a bar in it
[Component]     TESTPART
[Manufacturer]  Nobody in particular
[Package]
# variable  typ     min     max
R_pkg       0.3     0.2     NA
L_pkg       3nH     2nH     4nH
C_pkg       1pF     NA      1.5pF
[Pin]  signal_name  model_name  R_pin  L_pin  C_pin
1      DQ0          pp_io       0.5    2.5nH  0.8pF
2      DQ1          pp_io       NA     NA     NA
3      CLK          rx
4      VDD          POWER
5      VSS          GND
6      SDA          od
7      OE           tri
8      TX           out_only
9      SPARE        NC
[Model]         pp_io
Model_type      I/O
Polarity        Non-Inverting
Enable          Active-High
Vinl = 0.8V
Vinh = 2.0V
Vmeas = 1.5V
Vref = 0V
Cref = 10pF
Rref = 1kohm
C_comp          4pF     3pF     5pF
Vpeak = 1.0                       # a later-version sub-parameter: skipped with a warning
[Temperature Range]  25  100  0
[Voltage Range]      3.3V  3.0V  3.6V
[Pullup Reference]   3.3V  3.1V  3.5V
[Pulldown Reference] 0.1V  NA    0.2V
[GND_Clamp_Reference] 0V   0V    0V
[POWER Clamp Reference] 3.3V NA  NA
[pulldown]
# voltage  I(typ)    I(min)   I(max)
-3.3       -110mA    -80mA    NA
0          0         0        0
1.0        50mA      40mA     60mA
6.6        100mA     80mA     120mA
[PULLUP]
-3.3       90mA      70mA     110mA
0          0         0        0
1.0        -40mA     -30mA    -50mA
6.6        -80mA     -60mA    -100mA
[GND Clamp]
-3.3       -2A       NA       NA
-0.6       0         NA       NA
3.3        0         NA       NA
[POWER Clamp]
-3.3       1.5A      NA       NA
-0.6       0         NA       NA
3.3        0         NA       NA
[Ramp]
# dV/dt_r as swing/time, per corner
dV/dt_r         1.2/0.5n    1.0/0.8n    NA
dV/dt_f         1.1/400p    0.9/600p    1.3/300p
R_load = 25ohm
[Rising Waveform]
R_fixture = 50
V_fixture = 0
V_fixture_min = 0
V_fixture_max = 0
C_fixture = 2pF
# time    V(typ)   V(min)   V(max)
0         0        0        0
1n        1.5V     1.2V     NA
2n        1.65     1.4      1.8
[Rising Waveform]
R_fixture = 50
V_fixture = 3.3
V_fixture_min = 3.0
V_fixture_max = 3.6
L_fixture = 0
0         1.6      1.5      1.7
2n        3.3      3.0      3.6
[Falling Waveform]
R_fixture = 50
V_fixture = 3.3
0         3.3      3.0      3.6
1.5n      1.7      1.5      1.9
[Model]         rx
Model_type      Input
C_comp          2pF     NA      NA
Vinl = 0.8
Vinh = 2.0
[Voltage Range]  3.3  3.0  3.6
[GND Clamp]
-3.3  -1A  NA  NA
0     0    NA  NA
[Model]         od
Model_type      open_drain
C_comp          3pF  3pF  3pF
[Pulldown]
0     0     0     0
1     20mA  15mA  25mA
[Ramp]
dV/dt_r  1/1n  NA  NA
dV/dt_f  1/0.5n  NA  NA
[Model]         tri
Model_type      3-state
C_comp          3pF  NA  NA
[Voltage Range] 1.8V NA NA
[Pulldown]
0    0     NA  NA
1.8  30mA  NA  NA
[Pullup]
0    0     NA  NA
1.8  -30mA NA  NA
[Ramp]
dV/dt_r  0.6/0.3n  NA  NA
dV/dt_f  0.6/0.3n  NA  NA
[Model]         out_only
Model_type      Output
C_comp          3pF  NA  NA
[Voltage Range] 2.5V NA NA
[Pulldown]
0    0     NA  NA
2.5  30mA  NA  NA
[Pullup]
0    0     NA  NA
2.5  -30mA NA  NA
[Ramp]
dV/dt_r  0.9/0.3n  NA  NA
dV/dt_f  0.9/0.3n  NA  NA
[Rising Waveform]
R_fixture = 50
V_fixture = 0
0    0    NA  NA
1n   1.0  NA  NA
[End]
""";

    /// <summary>The 1-based line of the first line of <see cref="Text"/> that contains <paramref name="marker"/>.</summary>
    public static int LineOf(string text, string marker)
    {
        string[] lines = text.Split('\n');
        for (int i = 0; i < lines.Length; i++)
            if (lines[i].Contains(marker, StringComparison.Ordinal)) return i + 1;
        throw new ArgumentException($"'{marker}' is not in the text");
    }
}
