using WaveSim.Core.Lines;

namespace WaveSim.Tests.Lines;

/// <summary>Skin depth and AC resistance of copper (Pozar; CRC Handbook resistivity), as restated in ReferenceData/published-checks.md §4.</summary>
public class SkinEffectTests
{
    const double Crc = 1.678e-8;     // Copper rho = 1.678e-8 ohm m (20 C, CRC Handbook)
    const double Iacs = 1.7241e-8;   // IACS annealed standard 1.7241e-8

    [Theory]
    // rho = 1.678e-8 (IACS in brackets); tolerance 0.1 % (or the printed rounding):
    // 1 MHz 65.2 um [66.1]; 100 MHz 6.52 um [6.61]; 1 GHz 2.06 um [2.09].
    [InlineData(1e6, 65.2, 66.1, 1)]
    [InlineData(100e6, 6.52, 6.61, 2)]
    [InlineData(1e9, 2.06, 2.09, 2)]
    public void Skin_depth_table(double f, double umCrc, double umIacs, int decimals)
    {
        Close.Check(umCrc, SkinEffect.SkinDepth(f, Crc) * 1e6, 1e-3, decimals, "CRC");
        Close.Check(umIacs, SkinEffect.SkinDepth(f, Iacs) * 1e6, 1e-3, decimals, "IACS");
        Close.Check(umIacs, SkinEffect.SkinDepth(f) * 1e6, 1e-3, decimals, "default copper is IACS");
    }

    [Fact]
    public void Skin_depth_from_conductivity_form()
    {
        // delta = 1/sqrt(pi f mu0 sigma) with sigma = 5.8e7 S/m (= 1/1.7241e-8 to 0.001 %): the IACS column.
        Close.Check(2.09, SkinEffect.SkinDepthFromConductivity(1e9, 5.8e7) * 1e6, 1e-3, 2, "1 GHz");
        Close.Check(66.1, SkinEffect.SkinDepthFromConductivity(1e6, 5.8e7) * 1e6, 1e-3, 1, "1 MHz");
        Close.Rel(SkinEffect.SkinDepth(1e8, 1 / 5.8e7), SkinEffect.SkinDepthFromConductivity(1e8, 5.8e7), 1e-12);
    }

    [Fact]
    public void Surface_resistance_table()
    {
        // 100 MHz: Rs 2.57 mohm; 1 GHz: 8.14 mohm [8.25]; 10 GHz 25.7 mohm. Pozar's Rs = 0.026 ohm at 10 GHz
        // (26.06 mohm at 5.813e7 S/m).
        Close.Check(2.57, SkinEffect.SurfaceResistance(1e8, Crc) * 1e3, 1e-3, 2, "100 MHz");
        Close.Check(8.14, SkinEffect.SurfaceResistance(1e9, Crc) * 1e3, 1e-3, 2, "1 GHz");
        Close.Check(8.25, SkinEffect.SurfaceResistance(1e9, Iacs) * 1e3, 1e-3, 2, "1 GHz IACS");
        Close.Check(26.06, SkinEffect.SurfaceResistance(1e10, 1 / 5.813e7) * 1e3, 1e-3, 2, "Pozar 10 GHz");
    }

    [Fact]
    public void Trace_resistance_dc_and_ac()
    {
        // Trace w = 0.2 mm, t = 35 um (1 oz): Rdc = 2.397 ohm/m; delta = t at 3.47 MHz.
        // Rs/w = 4.07 ohm/m (10 MHz), 12.87 (100 MHz), 40.7 (1 GHz), 128.7 (10 GHz); R(4f) = 2R(f).
        var p = CrossSection.Compute(new CrossSectionSpec("microstrip", new Dictionary<string, double>
            { ["width"] = 0.2e-3, ["height"] = 0.2e-3, ["thickness"] = 35e-6, ["er"] = 4.3, ["resistivity"] = Crc }));
        Close.Check(2.397, p.RDc, 1e-3, 3, "Rdc");
        Close.Check(3.47e6, Crc / (Math.PI * LineConstants.Mu0 * 35e-6 * 35e-6), 1e-3, -1, "delta = t");
        Close.Check(4.07, p.ResistanceAt(10e6), 1e-3, 2, "10 MHz");
        Close.Check(12.87, p.ResistanceAt(100e6), 1e-3, 2, "100 MHz");
        Close.Check(40.7, p.ResistanceAt(1e9), 1e-3, 1, "1 GHz");
        Close.Check(128.7, p.ResistanceAt(10e9), 1e-3, 1, "10 GHz");
        Close.Rel(2 * p.ResistanceAt(1e9), p.ResistanceAt(4e9), 1e-12, "R(4f) = 2R(f)");
        // Never below R_dc: at 100 kHz Rs/w is under R_dc.
        Assert.Equal(p.RDc, p.ResistanceAt(1e5));
        Assert.Equal(p.RDc, p.ResistanceAt(0));
    }

    [Fact]
    public void Round_wire_resistance()
    {
        // Wire, 1 mm diameter, 1 MHz: Rdc = 21.36 mohm/m, Rac = 81.9 mohm/m (ratio a/(2 delta) = 3.83).
        // A pair has two wires in the loop: per-wire values are half the line's.
        var p = CrossSection.Compute(new CrossSectionSpec("wires", new Dictionary<string, double>
            { ["diameter"] = 1e-3, ["spacing"] = 10e-3, ["er"] = 1, ["resistivity"] = Crc }), 1e6);
        Close.Check(21.36e-3, p.RDc / 2, 1e-3, 5, "Rdc per wire");
        Close.Check(81.9e-3, p.RAc / 2, 1e-3, 4, "Rac per wire");
        Close.Check(3.83, 0.5e-3 / (2 * SkinEffect.SkinDepth(1e6, Crc)), 1e-3, 2, "a/(2 delta)");
    }
}
