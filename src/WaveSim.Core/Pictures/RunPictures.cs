using WaveSim.Core.Analysis;
using WaveSim.Core.Model;
using WaveSim.Core.Rendering;
using WaveSim.Core.Solver;
using WaveSim.Core.Units;

namespace WaveSim.Core.Pictures;

/// <summary>Turns a run's result into the rendering library's plain data: waveform charts, line layouts, frames and the space-time map.</summary>
public static class RunPictures
{
    /// <summary>Records whose source has more edges than this are drawn in part by default (common practice, no source).</summary>
    public const int MaxEdgesDrawnWhole = 50;

    /// <summary>Source edges a long record's default window holds, after the start-up.</summary>
    public const int EdgesShown = 10;

    /// <summary>The waveform chart of the whole record: every probe's voltage, and with <paramref name="currents"/> a second panel of currents.</summary>
    public static ChartSpec Waveforms(RunOutcome run, bool currents) =>
        Waveforms(run, new WaveformOptions { Currents = currents, Window = TimeWindow.Whole }).Chart;

    /// <summary>
    /// The waveform chart: the chosen probes' voltages (with the receiver's VIH and VIL as lines where a drawn probe sits at
    /// a load with a <c>receiver</c>), optionally their currents, over the chosen or default time window.
    /// </summary>
    /// <exception cref="InputException">An unknown probe name, or a window outside the record.</exception>
    public static WaveformPicture Waveforms(RunOutcome run, WaveformOptions options)
    {
        ArgumentNullException.ThrowIfNull(run);
        ArgumentNullException.ThrowIfNull(options);
        var r = run.Result;
        var s = r.Scenario;
        int[] chosen = ProbeIndices(s, options.Probes);
        var specs = chosen.Select(i => s.Probes[i]).ToList();
        // The middles of the source's edges, found once per run on the figure record (RunOutcome.SourceEdges).
        double[] edges = run.SourceEdges.Select(e => e.SourceMidS).ToArray();
        double t0 = r.Time[0], t1 = r.Time[^1];
        bool limited = false;
        TimeWindow window;
        if (options.Window is { } w)
        {
            w.CheckAgainst(s.Simulation.Duration);
            window = w.IsWhole ? new TimeWindow(t0, t1) : new TimeWindow(Math.Max(w.Start, t0), Math.Min(w.Stop, t1));
            if (!(window.Stop > window.Start)) throw new InputException($"the window {w.Describe()} holds no recorded instant");
        }
        else
        {
            window = DefaultWindow(r, specs, edges, out limited);
        }

        int first = Math.Max(0, WaveformMath.LowerBound(r.Time, window.Start) - 1), last = Math.Min(r.Time.Length - 1, WaveformMath.LowerBound(r.Time, window.Stop));
        double[] Cut(double[] v) => v[first..(last + 1)];
        double[] time = Cut(r.Time);
        var probes = chosen.Select(i => r.Probes[i]).ToList();
        var voltages = new ChartPanel("Voltage", "V", probes.Select(p => new Rendering.PlotSeries(p.Name, time, Cut(p.Volts))).ToList())
        {
            ReferenceLines = Thresholds(s, specs, options.Probes is null),
        };
        var panels = new List<ChartPanel> { voltages };
        if (options.Currents) panels.Add(new ChartPanel("Current", "A", probes.Select(p => new Rendering.PlotSeries(p.Name, time, Cut(p.Amps))).ToList()));
        double reach = specs.Count == 0 ? 0 : specs.Max(p => NetPaths.DelayTo(s, p));
        int shown = edges.Count(e => e >= window.Start && e + reach <= window.Stop);
        string title = limited ? $"{s.Title} (first {shown} of {edges.Length} source edges)" : s.Title;
        var chart = new ChartSpec(title, "Time", "s", panels) { XRange = new AxisRange(window.Start, window.Stop) };
        return new WaveformPicture(chart, window, limited, edges.Length, shown);
    }

    /// <summary>
    /// The default window: the whole record, or for a source of more than <see cref="MaxEdgesDrawnWhole"/> edges, from the
    /// record's start (the start-up) to halfway between edge <see cref="EdgesShown"/> and the next, plus the line delay to the
    /// farthest drawn probe, so every drawn probe shows those edges arrive.
    /// </summary>
    static TimeWindow DefaultWindow(SimulationResult r, IReadOnlyList<ProbeSpec> drawn, double[] edges, out bool limited)
    {
        double t0 = r.Time[0], t1 = r.Time[^1];
        limited = false;
        if (edges.Length <= MaxEdgesDrawnWhole) return new TimeWindow(t0, t1);
        double delay = drawn.Count == 0 ? 0 : drawn.Max(p => NetPaths.DelayTo(r.Scenario, p));
        double stop = 0.5 * (edges[EdgesShown - 1] + edges[EdgesShown]) + delay;
        if (!(stop < t1)) return new TimeWindow(t0, t1);
        limited = true;
        return new TimeWindow(t0, stop);
    }

    /// <summary>Indices into the scenario's probes of <paramref name="names"/> (all probes when null).</summary>
    /// <exception cref="InputException">A name that is no probe of the scenario, or an empty list.</exception>
    public static int[] ProbeIndices(Scenario s, IReadOnlyList<string>? names)
    {
        if (names is null) return Enumerable.Range(0, s.Probes.Count).ToArray();
        string known = string.Join(", ", s.Probes.Select(p => p.Name));
        if (names.Count == 0) throw new InputException($"expected one or more probe names separated by commas ({known})");
        var list = new List<int>();
        foreach (string n in names)
        {
            int i = s.Probes.ToList().FindIndex(p => p.Name == n);
            if (i < 0) throw new InputException($"unknown probe '{n}'; expected one of {known}");
            if (!list.Contains(i)) list.Add(i);
        }
        return list.ToArray();
    }

    /// <summary>
    /// VIH and VIL lines of the receivers at the drawn probes' loads. When the probes were not chosen and none sits at a
    /// receiver, the main load's receiver is drawn anyway. Several different receivers are told apart by probe name.
    /// </summary>
    static List<ReferenceLine> Thresholds(Scenario s, IReadOnlyList<ProbeSpec> drawn, bool allProbes)
    {
        var found = new List<(ReceiverThresholds Rx, string Where)>();
        foreach (var p in drawn)
            if (p.Anchor == ProbeAnchor.Load && NetPaths.LoadOf(s, p.BranchPath).Receiver is { } rx) found.Add((rx, p.Name));
        if (found.Count == 0 && allProbes && s.Load.Receiver is { } main) found.Add((main, "load"));
        var distinct = found.GroupBy(f => (f.Rx.Vih, f.Rx.Vil)).ToList();
        var lines = new List<ReferenceLine>();
        foreach (var g in distinct)
        {
            string who = distinct.Count > 1 ? " (" + string.Join(", ", g.Select(f => f.Where)) + ")" : "";
            lines.Add(new ReferenceLine(g.Key.Vih, $"VIH {Quantity.Format(g.Key.Vih, "V", 3)}{who}") { Colour = Palette.Threshold });
            lines.Add(new ReferenceLine(g.Key.Vil, $"VIL {Quantity.Format(g.Key.Vil, "V", 3)}{who}") { Colour = Palette.Threshold });
        }
        return lines;
    }

    /// <summary>
    /// The line's layout for frames and the space-time map, in the scenario's own length unit: the main line and each branch
    /// as a piece, with their elements (on the piece they sit on) and the probes.
    /// </summary>
    public static LineLayout Layout(SimulationResult r)
    {
        var s = r.Scenario;
        var pieces = new List<LinePiece>();
        var pieceOf = new Dictionary<string, int>();
        for (int i = 0; i < r.Lines.Count; i++) pieceOf[r.Lines[i].Path] = i;
        var elements = new List<NetMark> { new(0, NetMarkKind.Source, "source" + (s.Source.Resistance > 0 ? " " + Quantity.Format(s.Source.Resistance, "Ω") : "")) };
        var offsets = new Dictionary<string, double> { [""] = 0 };
        Walk(s.Line, s.Load, "", 0, elements, offsets, pieceOf);
        foreach (var line in r.Lines)
        {
            double off = offsets.TryGetValue(line.Path, out double o) ? o : 0;
            pieces.Add(new LinePiece(line.Path.Length == 0 ? "line" : line.Path, line.Positions.Select(x => x + off).ToArray()));
        }
        for (int i = 0; i < s.Probes.Count && i < r.Probes.Count; i++)
        {
            string path = string.Join("/", s.Probes[i].BranchPath);
            if (!pieceOf.TryGetValue(path, out int piece)) continue;
            double off = offsets.TryGetValue(path, out double o) ? o : 0;
            elements.Add(new NetMark(r.Probes[i].Position + off, NetMarkKind.Probe, r.Probes[i].Name) { Piece = piece });
        }
        return new LineLayout(pieces, s.LengthUnit, s.LengthFactor, elements);
    }

    static void Walk(IReadOnlyList<Model.LineElement> line, LoadSpec load, string path, double start, List<NetMark> elements,
                     Dictionary<string, double> offsets, Dictionary<string, int> pieceOf)
    {
        double pos = start;
        int piece = pieceOf.TryGetValue(path, out int k) ? k : 0;
        void Add(double at, NetMarkKind kind, string label) => elements.Add(new NetMark(at, kind, label) { Piece = piece });
        foreach (var e in line)
        {
            switch (e)
            {
                case Segment seg:
                    Add(pos, NetMarkKind.SegmentBoundary, "Z0 " + Quantity.Format(seg.Z0, "Ω", 3));
                    pos += seg.Length;
                    break;
                case Shunt sh:
                    Add(pos, NetMarkKind.Shunt, sh.Parts.Describe());
                    break;
                case Model.Series se:
                    Add(pos, NetMarkKind.Series, se.Parts.Describe());
                    break;
                case Branch b:
                    string sub = path.Length == 0 ? b.Name : path + "/" + b.Name;
                    offsets[sub] = pos;
                    Add(pos, NetMarkKind.Branch, b.Name);
                    Walk(b.Line, b.Load, sub, pos, elements, offsets, pieceOf);
                    break;
            }
        }
        Add(pos, NetMarkKind.Load, "load " + load.Describe());
    }

    /// <summary>The snapshots nearest the frame instants (<see cref="RunOutcome.FrameTimes"/>), as the renderer's type.</summary>
    public static IReadOnlyList<LineSnapshot> Frames(SimulationResult r, IReadOnlyList<double> frameTimes)
    {
        return frameTimes.Select(t =>
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
        return SpaceTimeRenderer.RenderPng(layout with { Pieces = [layout.Pieces[0]], Elements = [.. layout.Elements.Where(e => e.Piece == 0)] }, times, rows, reference, lo, hi, width, height);
    }
}
