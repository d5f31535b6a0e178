using MathNet.Numerics.Interpolation;
using WaveSim.Core.Units;

namespace WaveSim.Core.Measurements;

/// <summary>
/// Turns a reflectometer trace into an impedance profile, segments of one impedance and lumped elements.
/// </summary>
/// <remarks>
/// <para>Layer step: half the incident edge's 10-90 % rise time, or the trace's sample interval if that is coarser. An edge
/// cannot resolve anything finer, and fewer layers keep noise from piling up through the recursion. Each layer's ρ is the
/// mean of the trace over its step (a box filter: the smoothing at the edge's own time scale, and the anti-alias filter of
/// the resampling onto the uniform layer grid that <see cref="LayerPeeling"/> needs). The incident ramp is subtracted
/// before, so ρ is the reflected wave alone.</para>
/// <para>Profile: <see cref="LayerPeeling.Profile"/>; the naive Z0ref(1+ρ)/(1-ρ) alongside. The profile stops where the
/// impedance passes 10 × or 1/10 of the reference (an open or a short end; beyond, the recursion only amplifies noise).</para>
/// <para>Lumped elements: <see cref="LumpedDiscontinuities.Find"/> on ρ, with a threshold of 1 % or six times the noise,
/// whichever is larger; excursions up to 12 rise times long are lumped whatever their shape (a short section of line is,
/// electrically), longer ones up to 60 rise times only when a lumped model fits them closely; every excursion must peak at
/// twice the threshold. Each is fitted by <see cref="LumpedFit"/> as a series L, a shunt C or a pair of both at one place;
/// a pair whose parts are both resolvable is reported as both, at the fitted arrival (an L-C doublet's area alone is the
/// difference of the parts). A single part keeps its value from the area, and its position is the centroid of the
/// excursion less its time constant τ (Z0·C/2 or L/(2·Z0)): the centroid of the response −exp(−t/τ) lies τ after the
/// arrival, and the box and ramp are centred.</para>
/// <para>End: <see cref="ReactiveEndFit"/> recognises a capacitive or inductive end by its exponential approach to ±1 and
/// reports it as one load; the profile and the segments stop where its reflection starts. Rules: docs/tdr.md.</para>
/// <para>Segments: <see cref="ImpedanceSegments.Group"/> with a tolerance of 2.5 % of Z0ref; then layers inside lumped
/// excursions and pieces shorter than v·rise (the edge's spatial extent, out and back) are given to their neighbours, the
/// neighbours joined when they agree, and each segment's impedance is the median of its layers (robust to the few
/// transition layers an edge leaves at each end). A stretch shorter than the lumped window between two stretches that
/// agree is absorbed into them: it is either a lumped element (reported as such) or ringing left by one.</para>
/// <para>Delays of lumped elements: a step passing a shunt C or series L is delayed by about its τ each way, which layer
/// peeling cannot undo, so everything beyond reads v·τ too far; the reported positions of later segments and elements are
/// moved back by that much (the per-layer arrays keep the plain distance v·t/2).</para>
/// </remarks>
public static class TdrAnalysis
{
    /// <summary>Most layers analysed; a longer record is analysed with a coarser step (the recursion costs O(N²)).</summary>
    public const int MaxLayers = 8000;

    /// <summary>Segment tolerance as a fraction of the reference impedance: 0.025.</summary>
    public const double SegmentTolerance = 0.025;

    /// <summary>Analyses <paramref name="trace"/>.</summary>
    /// <param name="trace">The port record and its incident step.</param>
    /// <param name="velocityMps">Propagation velocity for distances, m/s. Must be positive.</param>
    /// <param name="layerStepS">Layer step, s; null for the default (see the class remarks).</param>
    /// <returns>The profile, segments and lumped elements.</returns>
    /// <exception cref="InputException">The record is too short after the reference plane.</exception>
    /// <exception cref="NumericalException">Layer peeling fails at the very first layer.</exception>
    public static TdrResult Analyse(ReflectometerTrace trace, double velocityMps, double? layerStepS = null)
    {
        ArgumentNullException.ThrowIfNull(trace);
        if (!(velocityMps > 0) || velocityMps > Quantity.SpeedOfLight * (1 + 1e-9))
            throw new InputException($"the velocity must be positive and at most the speed of light, got {velocityMps} m/s");
        double[] t = trace.Time, v = trace.Volts;
        var warnings = new List<string>();
        double sampleStep = MedianStep(t);
        double dt = layerStepS ?? Math.Max(trace.RiseS / 2, sampleStep);
        if (!(dt > 0) || !double.IsFinite(dt))
            throw new InputException($"the layer step must be a positive time, got {dt} s");
        double span = t[^1] - trace.ReferenceTimeS;
        if (span / dt > MaxLayers)
        {
            dt = span / MaxLayers;
            warnings.Add($"the record holds more than {MaxLayers} layers; analysed with a coarser layer step of {Quantity.Format(dt, "s")}");
        }
        int count = (int)Math.Floor((span - dt / 2) / dt) + 1;
        if (count < 8)
            throw new InputException($"the record after the incident edge is too short: {count} layer(s) of {Quantity.Format(dt, "s")}; record longer");

        // Box means of the reflected wave over each layer step.
        var spline = LinearSpline.InterpolateSorted(t, v);
        int sub = Math.Max(8, 2 * (int)Math.Ceiling(dt / sampleStep));
        var time = new double[count];
        var rho = new double[count];
        var port = new double[count];
        for (int k = 0; k < count; k++)
        {
            double centre = trace.ReferenceTimeS + k * dt;
            double sumV = 0, sumR = 0;
            for (int j = 0; j < sub; j++)
            {
                double x = centre - dt / 2 + (j + 0.5) * dt / sub;
                double y = x <= t[0] ? v[0] : x >= t[^1] ? v[^1] : spline.Interpolate(x);
                sumV += y;
                sumR += (y - trace.BaselineV - trace.Incident(x)) / trace.IncidentV;
            }
            time[k] = k * dt;
            port[k] = sumV / sub;
            rho[k] = sumR / sub;
        }
        double[] distance = time.Select(x => velocityMps * x / 2).ToArray();
        double z0 = trace.ReferenceOhm;
        double[] naive = rho.Select(r => StepReflectometry.ImpedanceOf(r, z0)).ToArray();

        var (layers, end, stop) = PeelUntilEnd(rho, z0);

        double sigma = NoiseOfRho(trace, dt, sampleStep);
        double threshold = Math.Max(0.01, 6 * sigma);
        int maxWidth = Math.Max(8, (int)Math.Ceiling(12 * trace.RiseS / dt));
        var excursions = FindExcursions(rho, stop, dt, z0, velocityMps, threshold, sigma, maxWidth, trace.RampS, trace.RiseS);

        // A capacitive or inductive end: its slow approach to ±1 is one load, not a chain of segments.
        double? endValue = null;
        double endArrival = stop * dt;
        var reactive = ReactiveEndFit.Find(rho, dt, trace.RampS, trace.RiseS, z0, threshold, sigma, excursions.Select(e => e.Found).ToList(),
            excursions.Select(e => TransmissionPoles(e.Found, e.Fit, rho, dt, z0, velocityMps)).ToList());
        if (reactive is not null)
        {
            end = reactive.Capacitive ? TdrEnd.Capacitive : TdrEnd.Inductive;
            endValue = reactive.Value;
            endArrival = reactive.ArrivalS;
            stop = Math.Min(stop, reactive.FirstLayer);
            for (int k = stop; k < layers.Length; k++) layers[k] = double.NaN;
            excursions = excursions.Where(e => e.Found.EndIndex < stop).ToList();
        }
        var lumped = excursions.SelectMany(e => Lumped(e.Found, e.Fit, rho, dt, z0, velocityMps)).ToList();
        var segments = Segments(layers, stop, excursions.Select(e => e.Found).ToList(), dt, velocityMps, trace.RiseS, SegmentTolerance * z0, maxWidth);
        if (reactive is not null && segments.Count > 0)
            segments = [.. segments.Take(segments.Count - 1), segments[^1] with { EndM = velocityMps * endArrival / 2 }];
        double endM;
        (segments, lumped, endM) = UndoLumpedDelays(segments, lumped, velocityMps, velocityMps * endArrival / 2);
        if (end == TdrEnd.Open)
            warnings.Add($"the profile ends in an open (or far higher impedance) at {Quantity.Format(endM, "m")}");
        else if (end == TdrEnd.Short)
            warnings.Add($"the profile ends in a short (or far lower impedance) at {Quantity.Format(endM, "m")}");
        return new TdrResult(z0, velocityMps, dt, trace.IncidentV, trace.RiseS, time, distance, port, rho, naive, layers,
            segments, lumped, end, endM, warnings, endValue);
    }

    /// <summary>
    /// Lumped excursions before <paramref name="stop"/> that peak at twice the threshold or more, each with its fit: those that
    /// return within 12 rise times (short enough to be lumped whatever their shape, as before), then longer ones up to 60 rise
    /// times that the lumped models fit closely (RMS residual at most 10 % of the excursion's peak plus twice the noise), which a
    /// section of line does not.
    /// </summary>
    static List<(LumpedDiscontinuity Found, LumpedFit.Outcome Fit)> FindExcursions(double[] rho, int stop, double dt, double z0,
        double velocity, double threshold, double sigma, int maxWidth, double ramp, double rise)
    {
        var kept = new List<(LumpedDiscontinuity, LumpedFit.Outcome)>();
        LumpedFit.Outcome FitOf(LumpedDiscontinuity e) => LumpedFit.Fit(rho, e.StartIndex, e.EndIndex, e.BaselineRho, dt, ramp, threshold);
        double Peak(LumpedDiscontinuity e)
        {
            double peak = 0;
            for (int k = e.StartIndex; k <= e.EndIndex; k++) peak = Math.Max(peak, Math.Abs(rho[k] - e.BaselineRho));
            return peak;
        }
        // An excursion must peak at twice the threshold: fainter ones are as likely ghosts of the stronger reflections around
        // them (a part's reflection bounced between it and a step), which the layer peeling removes from the profile but which
        // remain in ρ.
        foreach (var e in LumpedDiscontinuities.Find(rho[..stop], dt, z0, velocity, threshold, maxWidth))
            if (Peak(e) >= 2 * threshold)
                kept.Add((e, FitOf(e)));
        int wide = Math.Max(maxWidth, (int)Math.Ceiling(60 * rise / dt));
        foreach (var e in LumpedDiscontinuities.Find(rho[..stop], dt, z0, velocity, threshold, wide))
        {
            if (e.EndIndex - e.StartIndex < maxWidth || kept.Any(k => e.StartIndex <= k.Item1.EndIndex + 3 && k.Item1.StartIndex <= e.EndIndex + 3))
                continue;
            double peak = Peak(e);
            if (peak < 2 * threshold)
                continue;
            var fit = FitOf(e);
            if (fit.Rms <= 0.1 * peak + 2 * sigma)
                kept.Add((e, fit));
        }
        return kept.OrderBy(k => k.Item1.StartIndex).ToList();
    }

    /// <summary>Layer peeling up to an open or short end (or the first layer where the recursion breaks down).</summary>
    static (double[] Ohms, TdrEnd End, int Stop) PeelUntilEnd(double[] rho, double z0)
    {
        ImpedanceProfile? Try(int length)
        {
            try { return LayerPeeling.Profile(rho[..length], z0); }
            catch (NumericalException) { return null; }
        }
        ImpedanceProfile? profile = Try(rho.Length);
        if (profile is null)
        {
            int good = 0, bad = rho.Length;   // causal: a prefix peels to the same first layers
            while (bad - good > 1)
            {
                int mid = (good + bad) / 2;
                if (Try(mid) is null) bad = mid; else good = mid;
            }
            if (good == 0)
                throw new NumericalException("layer peeling broke down at the reference plane: the first reflection is ±1 (open or short at the port)");
            profile = Try(good)!;
        }
        var ohms = Enumerable.Repeat(double.NaN, rho.Length).ToArray();
        TdrEnd end = profile.Impedance.Length < rho.Length ? TdrEnd.Open : TdrEnd.Record;
        int stop = profile.Impedance.Length;
        for (int k = 0; k < profile.Impedance.Length; k++)
        {
            double z = profile.Impedance[k];
            if (z > 10 * z0 || z < z0 / 10)
            {
                end = z > 10 * z0 ? TdrEnd.Open : TdrEnd.Short;
                stop = k;
                break;
            }
            ohms[k] = z;
        }
        if (end == TdrEnd.Open && stop == profile.Impedance.Length && rho[Math.Min(stop, rho.Length - 1)] < 0)
            end = TdrEnd.Short;   // broke down heading for -1
        return (ohms, end, Math.Max(stop, 1));
    }

    /// <summary>Standard deviation of one layer's ρ from the noise of the baseline before the edge.</summary>
    static double NoiseOfRho(ReflectometerTrace trace, double dt, double sampleStep)
    {
        double[] t = trace.Time, v = trace.Volts;
        double before = trace.ReferenceTimeS - trace.RampS;
        var head = new List<double>();
        for (int i = 0; i < t.Length && t[i] < before; i++) head.Add(v[i]);
        if (head.Count < 3)
            return 0;
        double mean = head.Average();
        double sd = Math.Sqrt(head.Sum(x => (x - mean) * (x - mean)) / (head.Count - 1));
        return sd / trace.IncidentV / Math.Sqrt(Math.Max(1, dt / sampleStep));
    }

    /// <summary>Transmission poles of the parts an excursion is read as: a pair's from its fit, a single part's from its τ.</summary>
    static IReadOnlyList<System.Numerics.Complex> TransmissionPoles(LumpedDiscontinuity e, LumpedFit.Outcome fit, double[] rho, double dt, double z0, double velocity) =>
        fit.Pair
            ? LumpedResponse.TransmissionPoles(fit.A, fit.B)
            : Lumped(e, fit, rho, dt, z0, velocity).Select(l => new System.Numerics.Complex(-1 / l.TauS, 0)).ToList();

    static IEnumerable<TdrLumped> Lumped(LumpedDiscontinuity e, LumpedFit.Outcome fit, double[] rho, double dt, double z0, double velocity)
    {
        double baseline = e.BaselineRho;
        double zLocal = StepReflectometry.ImpedanceOf(baseline, z0);
        if (fit.Pair)
        {
            // Both parts from the fit, placed at the fitted arrival: the doublet's zero crossing lies later by a time set by L and C
            // (123 ps for 12 nH and 2.5 pF on 75 ohm), not by the edge.
            double atPair = Math.Max(0, velocity * fit.ArrivalS / 2);
            var l = new TdrLumped(LumpedKind.SeriesInductance, atPair, fit.A * zLocal, e.AreaS, fit.A / 2, true);
            var c = new TdrLumped(LumpedKind.ShuntCapacitance, atPair, fit.B / zLocal, e.AreaS, fit.B / 2, true);
            return fit.SeriesFirst ? [l, c] : [c, l];
        }
        double sum = 0, moment = 0;
        for (int k = e.StartIndex; k <= e.EndIndex; k++)
        {
            double d = rho[k] - baseline;
            sum += d;
            moment += d * k * dt;
        }
        double centroid = sum != 0 ? moment / sum : e.TimeS;
        // Time constant of the element as seen on a line of the local impedance (first-order, as in LumpedDiscontinuities).
        double tau = e.Kind == LumpedKind.ShuntCapacitance ? zLocal * e.Value / 2 : e.Value / (2 * zLocal);
        double at = Math.Max(0, velocity * (centroid - tau) / 2);
        return [new TdrLumped(e.Kind, at, e.Value, e.AreaS, tau)];
    }

    /// <summary>
    /// Moves everything beyond each lumped element back by v·τ: the element delays the step by about τ on the way out and
    /// again on the way back, which would otherwise read as v·τ of extra line.
    /// </summary>
    static (IReadOnlyList<ImpedanceSegment>, List<TdrLumped>, double EndM) UndoLumpedDelays(IReadOnlyList<ImpedanceSegment> segments,
        List<TdrLumped> lumped, double velocity, double endM)
    {
        var ordered = lumped.OrderBy(l => l.AtM).ToList();
        double Shift(double x) => ordered.Where(l => l.AtM < x - 1e-12).Sum(l => velocity * l.TauS);
        var movedSegments = segments.Select(s => new ImpedanceSegment(s.StartM - Shift(s.StartM), s.EndM - Shift(s.EndM), s.Z0Ohm)).ToList();
        var movedLumped = ordered.Select(l => l with { AtM = l.AtM - Shift(l.AtM) }).ToList();
        return (movedSegments, movedLumped, endM - Shift(endM));
    }

    static IReadOnlyList<ImpedanceSegment> Segments(double[] ohms, int stop, IReadOnlyList<LumpedDiscontinuity> excursions,
        double dt, double velocity, double rise, double tolerance, int lumpedLayers)
    {
        double[] z = ohms[..stop];
        // Layers inside a lumped excursion belong to the line around it: give them the level before it.
        foreach (var e in excursions)
            for (int k = e.StartIndex; k <= Math.Min(e.EndIndex + 3, stop - 1); k++)
                z[k] = e.StartIndex > 0 ? z[e.StartIndex - 1] : z[k];

        var grouped = ImpedanceSegments.Group(new ImpedanceProfile(new double[z.Length], z, 0), dt, velocity, tolerance);
        double layerM = velocity * dt / 2;
        var pieces = grouped.Select(s => (Start: (int)Math.Round(s.StartM / layerM), End: (int)Math.Round(s.EndM / layerM))).ToList();

        int minLayers = Math.Max(2, (int)Math.Ceiling(2 * rise / dt));
        while (pieces.Count > 1)
        {
            int shortest = -1;
            for (int i = 0; i < pieces.Count; i++)
                if (pieces[i].End - pieces[i].Start < minLayers && (shortest < 0 || pieces[i].End - pieces[i].Start < pieces[shortest].End - pieces[shortest].Start))
                    shortest = i;
            if (shortest < 0)
                break;
            var p = pieces[shortest];
            pieces.RemoveAt(shortest);
            int mid = (p.Start + p.End) / 2;
            if (shortest > 0 && shortest < pieces.Count)
            {
                pieces[shortest - 1] = (pieces[shortest - 1].Start, mid);
                pieces[shortest] = (mid, pieces[shortest].End);
            }
            else if (shortest > 0)
                pieces[shortest - 1] = (pieces[shortest - 1].Start, p.End);
            else
                pieces[0] = (p.Start, pieces[0].End);
            MergeAgreeing(pieces, z, tolerance);
        }
        MergeAgreeing(pieces, z, tolerance);

        // A short stretch between two of the same impedance is ringing (or a lumped element, found separately): absorb it.
        for (int i = 1; i + 1 < pieces.Count;)
        {
            bool brief = pieces[i].End - pieces[i].Start < lumpedLayers;
            if (brief && Math.Abs(Median(z, pieces[i - 1].Start, pieces[i - 1].End) - Median(z, pieces[i + 1].Start, pieces[i + 1].End)) <= tolerance)
            {
                int mid = (pieces[i].Start + pieces[i].End) / 2;
                pieces[i - 1] = (pieces[i - 1].Start, mid);
                pieces[i + 1] = (mid, pieces[i + 1].End);
                pieces.RemoveAt(i);
                MergeAgreeing(pieces, z, tolerance);
                i = 1;
            }
            else i++;
        }
        return pieces.Select(p => new ImpedanceSegment(p.Start * layerM, p.End * layerM, Median(z, p.Start, p.End))).ToList();
    }

    static void MergeAgreeing(List<(int Start, int End)> pieces, double[] z, double tolerance)
    {
        for (int i = 0; i + 1 < pieces.Count;)
        {
            if (Math.Abs(Median(z, pieces[i].Start, pieces[i].End) - Median(z, pieces[i + 1].Start, pieces[i + 1].End)) <= tolerance)
            {
                pieces[i] = (pieces[i].Start, pieces[i + 1].End);
                pieces.RemoveAt(i + 1);
            }
            else i++;
        }
    }

    static double Median(double[] z, int start, int end)
    {
        var part = z[start..end].Where(double.IsFinite).Order().ToArray();
        if (part.Length == 0) return double.NaN;
        return part.Length % 2 == 1 ? part[part.Length / 2] : 0.5 * (part[part.Length / 2 - 1] + part[part.Length / 2]);
    }

    static double MedianStep(double[] t)
    {
        var d = new double[t.Length - 1];
        for (int i = 0; i < d.Length; i++) d[i] = t[i + 1] - t[i];
        Array.Sort(d);
        return d[d.Length / 2];
    }
}
