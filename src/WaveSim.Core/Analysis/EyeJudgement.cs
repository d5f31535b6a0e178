using WaveSim.Core.Units;

namespace WaveSim.Core.Analysis;

/// <summary>A bit pattern's eye, as judged: open beyond the thresholds when the probe has them, else at the mid level.</summary>
/// <param name="Figures">The eye's figures, or null when there is no eye.</param>
/// <param name="Note">Why there is no eye.</param>
public sealed record EyeJudgement(EyeFigures? Figures, string? Note)
{
    /// <summary>Why the eye fails (closed, or none), or null when it is open.</summary>
    public string? Failure()
    {
        if (Figures is not { } f) return "no eye: " + (Note ?? "the record is too short");
        double? height = f.HasThresholds ? f.EyeHeightThresholdsV : f.EyeHeightV, width = f.HasThresholds ? f.EyeWidthThresholdsS : f.EyeWidthS;
        string against = f.HasThresholds ? " against the thresholds" : "";
        if (!(height > 0)) return $"eye closed{against} (height {(height is { } h ? Quantity.Format(h, "V", 3) : "-")})";
        if (!(width > 0)) return $"eye closed{against} (no width)";
        return null;
    }
}
