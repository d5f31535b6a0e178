using WaveSim.Core.Units;

namespace WaveSim.Core.Buffers;

/// <summary>
/// The switching coefficients Ku(t), Kd(t) of a driver's edge, which blend its static pullup and pulldown tables into the
/// pin current while it switches (<see cref="BufferCurves.Current"/>).
/// </summary>
/// <remarks>
/// <para>With two waveforms of the edge into fixtures of different V_fixture, each instant gives two equations, one per
/// fixture i: the current the fixture drives into the pin, (V_fixture,i − V_i)/R_fixture,i − C_fixture,i·dV_i/dt, equals
/// the part's, Ku·I_pu(V_i) + Kd·I_pd(V_i) + I_clamps(V_i) + C_comp·dV_i/dt; the 2×2 system is solved by Cramer's rule
/// (the "two-equation method", general practice for these models, from memory). dV/dt is the central difference on the
/// union of both tables' instants; a waveform holds its end values outside its table.</para>
/// <para>With fewer than two such waveforms the ramp rule is used: Ku, Kd change linearly over the [Ramp] 20-80 % time
/// divided by 0.6 (the same slope stretched over the full swing; common practice, no source).</para>
/// </remarks>
public static class SwitchingCoefficients
{
    /// <summary>The ramp rule's stretch: the 20-80 % time covers 60 % of the swing (common practice, no source).</summary>
    public const double RampFraction = 0.6;

    /// <summary>The coefficients of one edge of <paramref name="model"/> in <paramref name="corner"/>.</summary>
    /// <param name="model">A driving model (not Input).</param>
    /// <param name="corner">The corner; the model must give it (<see cref="BufferModel.HasCorner"/>).</param>
    /// <param name="rising">True for the rising edge.</param>
    /// <exception cref="InputException">The model is an Input, lacks [Ramp] where the rule needs it, or lacks the corner.</exception>
    public static SwitchingTable For(BufferModel model, Corner corner, bool rising)
    {
        ArgumentNullException.ThrowIfNull(model);
        if (!model.Drives)
            throw new InputException($"{model.Source}:{model.Line}: [Model] {model.Name}: is an Input model; it does not switch");
        BufferCurves curves = model.Curves(corner);
        if (curves.Pulldown is null || (model.Type != BufferModelType.OpenDrain && curves.Pullup is null))
            throw new InputException($"{model.Source}:{model.Line}: [Model] {model.Name}: Model_type {model.TypeName} needs " +
                                     (model.Type == BufferModelType.OpenDrain ? "[Pulldown]" : "[Pullup] and [Pulldown]") + " to switch");
        IReadOnlyList<SwitchingWaveform> waves = rising ? model.RisingWaveforms : model.FallingWaveforms;
        string edge = rising ? "rising" : "falling";
        string keyword = rising ? "[Rising Waveform]" : "[Falling Waveform]";

        if (model.Type == BufferModelType.OpenDrain)
            return waves.Count > 0 ? OneSided(model, curves, waves, corner, rising) : Ramp(model, corner, rising, []);

        if (waves.Count == 0) return Ramp(model, corner, rising, []);
        var pair = BestPair(waves, corner);
        if (pair is null)
        {
            string why = waves.Count == 1
                ? $"one {keyword} (line {waves[0].Line}); the two-equation method needs two with different V_fixture"
                : $"every {keyword} has the same V_fixture; the two-equation method needs two that differ";
            return Ramp(model, corner, rising, [$"[Model] {model.Name}, {edge} edge: {why}, so the [Ramp] rule is used"]);
        }
        return TwoWaveforms(model, curves, pair.Value.A, pair.Value.B, corner, rising);
    }

    /// <summary>The ramp rule for one edge.</summary>
    static SwitchingTable Ramp(BufferModel model, Corner corner, bool rising, List<string> notes)
    {
        BufferRamp ramp = model.Ramp
            ?? throw new InputException($"{model.Source}:{model.Line}: [Model] {model.Name}: needs [Ramp] for its {(rising ? "rising" : "falling")} edge");
        double t = (rising ? ramp.Rising : ramp.Falling).DeltaT.At(corner) / RampFraction;
        double[] time = [0, t];
        // Rising: the pullup turns on and the pulldown off; an open drain only releases its pulldown.
        double[] on = rising ? [0, 1] : [1, 0];
        double[] off = rising ? [1, 0] : [0, 1];
        bool openDrain = model.Type == BufferModelType.OpenDrain;
        return new SwitchingTable(rising, corner, SwitchingMethod.Ramp, time, openDrain ? [0, 0] : on, off, notes);
    }

    /// <summary>The two waveforms whose typ V_fixture differ most (the first such pair in file order); null when none differ.</summary>
    static (SwitchingWaveform A, SwitchingWaveform B)? BestPair(IReadOnlyList<SwitchingWaveform> waves, Corner corner)
    {
        (SwitchingWaveform, SwitchingWaveform)? best = null;
        double spread = 0;
        for (int i = 0; i < waves.Count; i++)
            for (int j = i + 1; j < waves.Count; j++)
            {
                double d = Math.Abs(waves[i].VFixture.At(corner) - waves[j].VFixture.At(corner));
                if (d > spread) (spread, best) = (d, (waves[i], waves[j]));
            }
        return best;
    }

    /// <summary>A waveform of one corner on the given instants, with its central-difference slope.</summary>
    static (double[] V, double[] DvDt) Sample(SwitchingWaveform w, Corner corner, double[] time)
    {
        var pts = w.Table.At(corner);
        double[] x = pts.Select(p => p.X).ToArray(), y = pts.Select(p => p.Y).ToArray();
        double[] v = time.Select(t => SwitchingTable.Hold(x, y, t)).ToArray();
        var d = new double[time.Length];
        for (int k = 0; k < time.Length; k++)
        {
            int a = Math.Max(0, k - 1), b = Math.Min(time.Length - 1, k + 1);
            d[k] = b > a ? (v[b] - v[a]) / (time[b] - time[a]) : 0;
        }
        return (v, d);
    }

    static double[] UnionTimes(IEnumerable<SwitchingWaveform> waves, Corner corner) =>
        waves.SelectMany(w => w.Table.At(corner).Select(p => p.X)).Distinct().Order().ToArray();

    /// <summary>The current the fixture drives into the pin less what the clamps and C_comp take: Ku·I_pu + Kd·I_pd must supply it.</summary>
    static double Demand(SwitchingWaveform w, BufferCurves c, Corner corner, double v, double dvdt) =>
        (w.VFixture.At(corner) - v) / w.RFixture - w.CFixture * dvdt - c.CComp * dvdt - c.ClampCurrent(v);

    static SwitchingTable TwoWaveforms(BufferModel model, BufferCurves c, SwitchingWaveform a, SwitchingWaveform b, Corner corner, bool rising)
    {
        double[] time = UnionTimes([a, b], corner);
        var (va, da) = Sample(a, corner, time);
        var (vb, db) = Sample(b, corner, time);
        IvCurve up = c.Pullup!, down = c.Pulldown!;
        var ku = new double[time.Length];
        var kd = new double[time.Length];
        int singular = 0;
        double lastU = rising ? 0 : 1, lastD = rising ? 1 : 0; // the state before the edge, until a solvable instant
        for (int k = 0; k < time.Length; k++)
        {
            double ra = Demand(a, c, corner, va[k], da[k]), rb = Demand(b, c, corner, vb[k], db[k]);
            double ua = up.Current(va[k]), ub = up.Current(vb[k]), pa = down.Current(va[k]), pb = down.Current(vb[k]);
            double det = ua * pb - ub * pa;
            double scale = (Math.Abs(ua) + Math.Abs(ub)) * (Math.Abs(pa) + Math.Abs(pb));
            if (!(Math.Abs(det) > 1e-9 * scale) || scale == 0)
            {
                singular++;
                (ku[k], kd[k]) = (lastU, lastD);
                continue;
            }
            // Cramer's rule for [ua pa; ub pb]·[Ku; Kd] = [ra; rb].
            ku[k] = lastU = (ra * pb - rb * pa) / det;
            kd[k] = lastD = (ua * rb - ub * ra) / det;
        }
        var notes = new List<string>();
        if (singular > 0)
            notes.Add($"[Model] {model.Name}, {(rising ? "rising" : "falling")} edge: at {singular} of {time.Length} instants both fixtures give the same " +
                      "pullup-to-pulldown current ratio, so those instants repeat the previous coefficients");
        notes.Insert(0, $"[Model] {model.Name}, {(rising ? "rising" : "falling")} edge: two-equation method from the waveforms into " +
                        $"{a.Describe(corner)} (line {a.Line}) and {b.Describe(corner)} (line {b.Line})");
        return new SwitchingTable(rising, corner, SwitchingMethod.TwoWaveforms, time, ku, kd, notes);
    }

    static SwitchingTable OneSided(BufferModel model, BufferCurves c, IReadOnlyList<SwitchingWaveform> waves, Corner corner, bool rising)
    {
        double[] time = UnionTimes(waves, corner);
        var samples = waves.Select(w => Sample(w, corner, time)).ToArray();
        IvCurve down = c.Pulldown!;
        var kd = new double[time.Length];
        double last = rising ? 1 : 0;
        int singular = 0;
        for (int k = 0; k < time.Length; k++)
        {
            // Least squares over the waveforms of Kd·I_pd(V_i) = demand_i: Kd = Σ demand·I_pd / Σ I_pd².
            double num = 0, den = 0, scale = 0;
            for (int i = 0; i < waves.Count; i++)
            {
                double p = down.Current(samples[i].V[k]);
                num += Demand(waves[i], c, corner, samples[i].V[k], samples[i].DvDt[k]) * p;
                den += p * p;
                scale = Math.Max(scale, Math.Abs(p));
            }
            if (!(den > 0) || Math.Sqrt(den) < 1e-12 * Math.Max(scale, 1e-30)) { kd[k] = last; singular++; continue; }
            kd[k] = last = num / den;
        }
        var notes = new List<string>
        {
            $"[Model] {model.Name}, {(rising ? "rising" : "falling")} edge: pulldown coefficient from {waves.Count} waveform(s) " +
            $"({string.Join(", ", waves.Select(w => w.Describe(corner)))}) by least squares",
        };
        if (singular > 0) notes.Add($"[Model] {model.Name}: at {singular} instants the pulldown carries no current, so those repeat the previous coefficient");
        return new SwitchingTable(rising, corner, SwitchingMethod.OneSided, time, new double[time.Length], kd, notes);
    }

    /// <summary>A one-line description of how a table was made, for listings.</summary>
    public static string Describe(SwitchingTable table)
    {
        ArgumentNullException.ThrowIfNull(table);
        string span = Quantity.Format(table.Time[^1] - table.Time[0], "s", 3);
        return table.Method switch
        {
            SwitchingMethod.Ramp => $"ramp rule over {span}",
            SwitchingMethod.TwoWaveforms => $"two-equation method, {table.Time.Length} instants over {span}",
            _ => $"one-sided least squares, {table.Time.Length} instants over {span}",
        };
    }
}
