using WaveSim.Core.Analysis;

namespace WaveSim.Core.Sweeps;

/// <summary>Signal figures read back from their numbers (a CSV row): the inverse of <see cref="SignalFigures.GetNumber"/> for every name in <see cref="SignalFigures.FigureNames"/>.</summary>
public static class FigureNumbers
{
    /// <summary>Figures whose <see cref="SignalFigures.GetNumber"/> gives <paramref name="numbers"/>, one per <see cref="SignalFigures.FigureNames"/> entry in order (null where a figure does not apply).</summary>
    /// <exception cref="ArgumentException">Not one number per figure name.</exception>
    public static SignalFigures ToFigures(IReadOnlyList<double?> numbers)
    {
        ArgumentNullException.ThrowIfNull(numbers);
        if (numbers.Count != SignalFigures.FigureNames.Count) throw new ArgumentException($"expected {SignalFigures.FigureNames.Count} numbers", nameof(numbers));
        double? N(string name) => numbers[SignalFigures.FigureNames.ToList().IndexOf(name)];
        return new SignalFigures
        {
            LowV = N("low_V"), HighV = N("high_V"), OvershootPct = N("overshoot_pct"), UndershootPct = N("undershoot_pct"),
            AboveHighV = N("above_high_V"), BelowLowV = N("below_low_V"), RingbackV = N("ringback_V"), Rise1090S = N("rise_10_90_s"),
            Fall9010S = N("fall_90_10_s"), Delay50S = N("delay_50_s"), SettlingS = N("settling_s"),
            Monotonic = N("monotonic") is { } m ? m != 0 : null,
            ThresholdCrossings = N("threshold_crossings") is { } c ? (int)c : 0,
            NoiseMarginHighV = N("noise_margin_high_V"), NoiseMarginLowV = N("noise_margin_low_V"),
        };
    }
}
