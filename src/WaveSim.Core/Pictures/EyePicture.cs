using WaveSim.Core.Analysis;
using WaveSim.Core.Rendering;
using WaveSim.Core.Units;

namespace WaveSim.Core.Pictures;

/// <summary>The eye picture of one probe.</summary>
public static class EyePicture
{
    /// <summary>The eye of <paramref name="e"/> as PNG bytes (the receiver's thresholds drawn when known); null without a diagram.</summary>
    public static byte[]? RenderPng(string title, ProbeEye e, int width, int height)
    {
        ArgumentNullException.ThrowIfNull(e);
        if (e.Diagram is not { } d) return null;
        var lines = e.Thresholds is { } t
            ? new List<ReferenceLine> { new(t.Vih, "VIH " + Quantity.Format(t.Vih, "V", 3)), new(t.Vil, "VIL " + Quantity.Format(t.Vil, "V", 3)) }
            : [];
        var f = d.Figures;
        string figures = f.EyeHeightV is { } h && f.EyeWidthS is { } w
            ? $": eye {Quantity.Format(h, "V", 3)} × {(w / d.BitTimeS).ToString("0.00", System.Globalization.CultureInfo.InvariantCulture)} UI"
            : ": eye closed";
        return EyePlot.RenderPng($"{title} — {e.Probe.Name}{figures}", d.Traces.Select(x => (x.T, x.V)).ToList(), d.BitTimeS, width, height,
            new EyePlotOptions { Thresholds = lines, Opening = Opening(d) });
    }

    /// <summary>
    /// The measured opening as a box: from the highest "0" to the lowest "1" at the bit centre (the eye height), and the
    /// eye width drawn centred on the bit centre (the width is measured there; its exact ends are not kept). Null when closed.
    /// </summary>
    static EyeOpening? Opening(EyeDiagram d)
    {
        var f = d.Figures;
        if (f.EyeHeightV is not { } h || f.EyeWidthS is not { } w || !(h > 0) || !(w > 0)) return null;
        double lowestOne = double.PositiveInfinity, highestZero = double.NegativeInfinity;
        foreach (var tr in d.Traces)
        {
            int k = Array.IndexOf(tr.T, d.BitTimeS);
            if (k < 0) continue;
            double v = tr.V[k];
            if (v > f.MidLevelV) lowestOne = Math.Min(lowestOne, v); else highestZero = Math.Max(highestZero, v);
        }
        if (!double.IsFinite(lowestOne) || !double.IsFinite(highestZero)) return null;
        return new EyeOpening(d.BitTimeS - w / 2, d.BitTimeS + w / 2, highestZero, lowestOne,
            $"opening {Quantity.Format(h, "V", 3)} × {(w / d.BitTimeS).ToString("0.00", System.Globalization.CultureInfo.InvariantCulture)} UI");
    }
}
