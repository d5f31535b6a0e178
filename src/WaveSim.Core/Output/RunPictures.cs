using WaveSim.Core.Model;
using WaveSim.Core.Rendering;
using WaveSim.Core.Solver;
using WaveSim.Core.Units;
using RLineElement = WaveSim.Core.Rendering.LineElement;

namespace WaveSim.Core.Output;

/// <summary>Turns a run's result into the rendering library's plain data: waveform charts, line layouts, frames and the space-time map.</summary>
public static class RunPictures
{
    /// <summary>Rows of the space-time map recorded during a run: enough for a picture, bounded memory.</summary>
    public const int SpaceTimeRows = 480;

    /// <summary>The snapshot instants a run needs for <paramref name="frames"/> frames and the space-time map.</summary>
    public static double[] SnapshotTimes(Scenario s, int frames)
    {
        double d = s.Simulation.Duration;
        var times = Enumerable.Range(0, SpaceTimeRows).Select(k => d * k / (SpaceTimeRows - 1));
        if (frames > 0) times = times.Concat(FrameTimes(s, frames));
        return times.Distinct().Order().ToArray();
    }

    /// <summary>N evenly spaced instants from 0 to the duration.</summary>
    public static double[] FrameTimes(Scenario s, int frames) =>
        Enumerable.Range(0, frames).Select(k => frames == 1 ? 0 : s.Simulation.Duration * k / (frames - 1)).ToArray();

    /// <summary>The waveform chart: every probe's voltage, and with <paramref name="currents"/> a second panel of currents.</summary>
    public static ChartSpec Waveforms(SimulationResult r, bool currents)
    {
        var panels = new List<ChartPanel>
        {
            new("Voltage", "V", r.Probes.Select(p => new Rendering.Series(p.Name, r.Time, p.Volts)).ToList()),
        };
        if (currents) panels.Add(new ChartPanel("Current", "A", r.Probes.Select(p => new Rendering.Series(p.Name, r.Time, p.Amps)).ToList()));
        return new ChartSpec(r.Scenario.Title, "Time", "s", panels);
    }

    /// <summary>The line's layout for frames and the space-time map, in the scenario's own length unit.</summary>
    public static LineLayout Layout(SimulationResult r)
    {
        var s = r.Scenario;
        var pieces = new List<LinePiece>();
        var elements = new List<RLineElement> { new(0, LineElementKind.Source, "source" + (s.Source.Resistance > 0 ? " " + Quantity.Format(s.Source.Resistance, "Ω") : "")) };
        var offsets = new Dictionary<string, double> { [""] = 0 };
        Walk(s.Line, s.Load, "", 0, elements, offsets);
        foreach (var line in r.Lines)
        {
            double off = offsets.TryGetValue(line.Path, out double o) ? o : 0;
            pieces.Add(new LinePiece(line.Path.Length == 0 ? "line" : line.Path, line.Positions.Select(x => x + off).ToArray()));
        }
        return new LineLayout(pieces, s.LengthUnit, s.LengthFactor, elements);
    }

    static void Walk(IReadOnlyList<Model.LineElement> line, LoadSpec load, string path, double start, List<RLineElement> elements, Dictionary<string, double> offsets)
    {
        double pos = start;
        bool main = path.Length == 0;
        foreach (var e in line)
        {
            switch (e)
            {
                case Segment seg:
                    if (main) elements.Add(new RLineElement(pos, LineElementKind.SegmentBoundary, "Z0 " + Quantity.Format(seg.Z0, "Ω", 3)));
                    pos += seg.Length;
                    break;
                case Shunt sh:
                    if (main) elements.Add(new RLineElement(pos, LineElementKind.Shunt, sh.Parts.Describe()));
                    break;
                case Model.Series se:
                    if (main) elements.Add(new RLineElement(pos, LineElementKind.Series, se.Parts.Describe()));
                    break;
                case Branch b:
                    string sub = main ? b.Name : path + "/" + b.Name;
                    offsets[sub] = pos;
                    if (main) elements.Add(new RLineElement(pos, LineElementKind.Branch, b.Name));
                    Walk(b.Line, b.Load, sub, pos, elements, offsets);
                    break;
            }
        }
        if (main) elements.Add(new RLineElement(pos, LineElementKind.Load, "load " + load.Describe()));
    }

    /// <summary>The snapshots at the frame instants, as the renderer's type.</summary>
    public static IReadOnlyList<LineSnapshot> Frames(SimulationResult r, int frames)
    {
        var wanted = FrameTimes(r.Scenario, frames);
        return wanted.Select(t =>
        {
            var snap = r.Snapshots.MinBy(x => Math.Abs(x.Time - t))!;
            return new LineSnapshot(t, snap.Volts);
        }).ToList();
    }

    /// <summary>A voltage range that holds every snapshot, padded by 5 %, the same for every frame.</summary>
    public static (double Min, double Max) VoltageRange(SimulationResult r)
    {
        double lo = r.Scenario.Source.InitialLevel, hi = lo;
        foreach (var s in r.Snapshots)
            foreach (var v in s.Volts)
                foreach (double x in v) { lo = Math.Min(lo, x); hi = Math.Max(hi, x); }
        if (hi - lo < 1e-12) { hi = lo + 1; }
        double pad = 0.05 * (hi - lo);
        return (lo - pad, hi + pad);
    }

    /// <summary>Renders the space-time map of the main line.</summary>
    public static byte[] SpaceTime(SimulationResult r, int width, int height)
    {
        var layout = Layout(r);
        double[] times = r.Snapshots.Select(s => s.Time).ToArray();
        double[][] rows = r.Snapshots.Select(s => s.Volts[0]).ToArray();
        var (lo, hi) = VoltageRange(r);
        double reference = Math.Clamp(r.Scenario.Source.InitialLevel, lo, hi);
        return SpaceTimeRenderer.RenderPng(layout with { Pieces = [layout.Pieces[0]] }, times, rows, reference, lo, hi, width, height);
    }
}
