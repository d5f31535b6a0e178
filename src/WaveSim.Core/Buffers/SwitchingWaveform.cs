namespace WaveSim.Core.Buffers;

/// <summary>
/// A [Rising Waveform] or [Falling Waveform]: the pin voltage against time of the driver switching into a fixture, a resistor
/// R_fixture to V_fixture with C_fixture from the pin to ground.
/// </summary>
/// <param name="Rising">True for [Rising Waveform].</param>
/// <param name="RFixture">R_fixture (Ω).</param>
/// <param name="VFixture">V_fixture, with V_fixture_min and V_fixture_max as its corners (V).</param>
/// <param name="CFixture">C_fixture (F); 0 when not given.</param>
/// <param name="Table">Time (s) against pin voltage (V) per corner.</param>
/// <param name="Line">The keyword's line.</param>
public sealed record SwitchingWaveform(bool Rising, double RFixture, CornerValue VFixture, double CFixture, CornerTable Table, int Line)
{
    /// <summary>A short description for lists and legends, e.g. "50 Ω to 3.3 V".</summary>
    public string Describe(Corner corner) =>
        $"{Units.Quantity.Format(RFixture, "Ω", 3)} to {Units.Quantity.Format(VFixture.At(corner), "V", 3)}";
}
