using System.Text.Json.Nodes;
using WaveSim.Core.Model;
using WaveSim.Core.Solver;

namespace WaveSim.Core.Analysis;

/// <summary>One probe's eye diagram, or why there is none.</summary>
/// <param name="Probe">The probe.</param>
/// <param name="Diagram">The folded traces and figures; null when the record is too short for one window after the skip.</param>
/// <param name="Thresholds">The receiver's thresholds at a load probe that has them, else null.</param>
/// <param name="FirstBitStartS">Instant bit 0 begins at the probe: the source's delay plus the line delay to the probe, moved to centre the eye between the crossings (<see cref="RunEyes.AlignedStart"/>), s.</param>
/// <param name="SkipS">Start-up time left out, s.</param>
/// <param name="Note">Why <paramref name="Diagram"/> is null.</param>
public sealed record ProbeEye(ProbeTrace Probe, EyeDiagram? Diagram, ReceiverThresholds? Thresholds, double FirstBitStartS, double SkipS, string? Note)
{
    /// <summary>The eye object of summary.json: the eye figures (threshold variants with thresholds), the bits folded and the skip.</summary>
    public JsonObject ToJsonObject()
    {
        var o = Diagram?.Figures.ToJsonObject() ?? new JsonObject { ["eye_height_V"] = null, ["eye_width_s"] = null };
        o["bits_analysed"] = Diagram?.Figures.TraceCount ?? 0;
        o["first_bit_start_s"] = FirstBitStartS;
        o["skip_s"] = SkipS;
        if (Note is not null) o["note"] = Note;
        return o;
    }
}
