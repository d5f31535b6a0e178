using System.Diagnostics;
using WaveSim.Core.Model;

namespace WaveSim.Core.Solver;

/// <summary>Runs the leapfrog time loop over a built network and records probes and snapshots.</summary>
internal sealed class LeapfrogSolver
{
    readonly Scenario _scenario;
    readonly GridPlan _plan;
    readonly Network _net;
    readonly SegmentKernel[] _kernels;
    readonly DispersiveKernel?[] _dispersive;
    readonly JunctionSystem _junctions;
    readonly double[] _jv;
    readonly double[]? _settled;
    readonly double[][] _segV, _segI;

    public LeapfrogSolver(Scenario scenario, GridPlan plan)
    {
        _scenario = scenario; _plan = plan;
        _net = NetworkBuilder.Build(scenario, plan);
        foreach (var s in _net.Segments) { s.V = new double[s.Cells + 1]; s.I = new double[s.Cells]; }
        _jv = new double[_net.Junctions.Count];
        _settled = SettledLevels(scenario);
        _net.Driver?.Hold(afterFirstEdge: false);
        DcOperatingPoint.Apply(_net, scenario.Source.InitialLevel, _jv);
        CopyEndVoltages();
        _kernels = _net.Segments.Select(s => new SegmentKernel(s, plan.Dt)).ToArray();
        _segV = _net.Segments.Select(s => s.V).ToArray();
        _segI = _net.Segments.Select(s => s.I).ToArray();
        _dispersive = _net.Segments.Select(s => s.Dispersion is null ? null : new DispersiveKernel(s, plan.Dt)).ToArray();
        _junctions = new JunctionSystem(_net, plan.Dt);
        _junctions.Bind(_jv);
        _junctions.StartParts();
    }

    public SimulationResult Run(SimulationOptions options, CancellationToken ct)
    {
        var sampler = new ProbeSampler(_net, _scenario, _plan, _jv, out double[] positions);
        var profiles = Profiles();
        var snapTimes = options.SnapshotTimes.OrderBy(t => t).ToArray();
        var snapshots = new List<ProfileSnapshot>(snapTimes.Length);
        int nextSnap = 0;
        double dt = _plan.Dt;
        var src = _scenario.Source;
        long steps = _plan.Steps;
        double[]? energy = options.TrackEnergy ? new double[steps + 1] : null;
        long progressEvery = Math.Max(1, steps / 200), checkEvery = Math.Max(1, Math.Min(4096, 1_000_000 / Math.Max(1, _plan.TotalCells)));
        var averages = options.TrackBranchAverages ? new BranchAccumulator(_net, _jv, src.Value(0)) : null;
        var clock = Stopwatch.StartNew();

        // Step n → n+1 for n = 0..steps (one step beyond the end, so the last instant's current has its half step after it).
        for (long n = 0; n <= steps; n++)
        {
            double t = n * dt;
            while (nextSnap < snapTimes.Length && snapTimes[nextSnap] <= t + 0.5 * dt)
                snapshots.Add(Snapshot(profiles, snapTimes[nextSnap++]));

            if (energy is null)
            {
                // A segment's voltage pass reads only its own currents, so both passes fuse per segment.
                for (int s = 0; s < _kernels.Length; s++)
                {
                    if (_dispersive[s] is { } dk)
                    {
                        dk.UpdateCurrents(_segV[s], _segI[s]);
                        dk.UpdateVoltages(_segV[s], _segI[s]);
                    }
                    else _kernels[s].Step(_segV[s], _segI[s]);
                }
            }
            else
            {
                double product = 0;
                for (int s = 0; s < _kernels.Length; s++)
                {
                    var seg = _net.Segments[s];
                    product += seg.Plan.Segment.L * seg.Dz * (_dispersive[s] is { } dk
                        ? dk.UpdateCurrents(seg.V, seg.I)
                        : _kernels[s].UpdateCurrentsTrackingProduct(seg.V, seg.I));
                }
                energy[n] = 0.5 * product + ElectricEnergy();
                for (int s = 0; s < _kernels.Length; s++)
                    if (_dispersive[s] is { } dk) dk.UpdateVoltages(_segV[s], _segI[s]);
                    else _kernels[s].UpdateVoltages(_segV[s], _segI[s]);
            }
            double next = src.Value(t + dt);
            _net.Driver?.At(t + dt);
            _junctions.Solve(src.Value(t), next);
            var x = _junctions.Voltages;
            for (int j = 0; j < _jv.Length; j++)
            {
                if (!double.IsFinite(x[j]))
                    throw new NumericalException($"the solution is not finite at step {n + 1} (t = {Units.Quantity.Format((n + 1) * dt, "s")}) at node '{_net.Junctions[j].Label}'");
                _jv[j] = x[j];
            }
            foreach (var seg in _net.Segments) { seg.V[0] = _jv[seg.Start]; seg.V[^1] = _jv[seg.End]; }
            sampler.AfterStep(n);
            if (n < steps) averages?.Add(dt, next);
            if (n % checkEvery == 0)
            {
                ct.ThrowIfCancellationRequested();
                CheckFinite(n + 1);
            }
            if (n % progressEvery == 0) options.Progress?.Report((double)n / steps);
        }
        options.Progress?.Report(1);
        CheckFinite(steps + 1);
        var probes = _scenario.Probes.Select((p, k) => new ProbeTrace(p.Name, p.Describe(), positions[k], sampler.Volts[k], sampler.Amps[k])
        {
            SettledVolts = _settled?[k],
            FigureVolts = sampler.FigureVolts[k],
        }).ToList();
        return new SimulationResult
        {
            Scenario = _scenario, Plan = _plan, Time = sampler.Times, FigureTime = sampler.FigureTimes, Probes = probes,
            Lines = profiles.Select(p => p.Profile).ToList(), Snapshots = snapshots, Elapsed = clock.Elapsed, Energy = energy,
            BranchAverages = averages?.Averages(steps * dt),
        };
    }

    /// <summary>
    /// Each probe's DC level with the driver held at the level its first edge goes to, or null for sources without one (or
    /// where that level has no DC solution). This is the level the edge settles to however long the record or the pulse is.
    /// </summary>
    double[]? SettledLevels(Scenario scenario)
    {
        if (scenario.Source.FirstEdgeLevel is not { } level) return null;
        if (_net.Driver is { } driver) { if (!driver.HasEdge) return null; driver.Hold(afterFirstEdge: true); }
        try { DcOperatingPoint.Apply(_net, level, _jv); }
        catch (InputException) { return null; }   // an ideal loop that only the edge drives: the figures estimate the level
        CopyEndVoltages();
        return ProbeSampler.VoltagesNow(_net, scenario, _jv);
    }

    /// <summary>
    /// Junctions at segment ends take the segment's end value, the DC ladder walked from its start (equal to the junction's DC
    /// voltage to rounding), so that a net without other junctions runs bit for bit as before; the rest keep the DC solve's value.
    /// </summary>
    void CopyEndVoltages()
    {
        foreach (var s in _net.Segments) { _jv[s.Start] = s.V[0]; _jv[s.End] = s.V[^1]; }
    }

    double ElectricEnergy()
    {
        double e = 0;
        for (int j = 0; j < _jv.Length; j++) e += 0.5 * _net.Junctions[j].C * _jv[j] * _jv[j];
        // The lumped parts' stored energy too (a receiver's C_comp and package), so the balance covers the whole net.
        foreach (var br in _net.Branches)
        {
            e += 0.5 * br.L * br.Current * br.Current;
            if (br.C is { } c) e += 0.5 * c * br.CapVoltage * br.CapVoltage;
        }
        foreach (var seg in _net.Segments)
        {
            double cdz = seg.Plan.Segment.C * seg.Dz;
            var v = seg.V;
            for (int k = 1; k < seg.Cells; k++) e += 0.5 * cdz * v[k] * v[k];
        }
        return e;
    }

    void CheckFinite(long step)
    {
        foreach (var seg in _net.Segments)
        {
            for (int k = 0; k < seg.V.Length; k++)
                if (!double.IsFinite(seg.V[k]))
                    throw new NumericalException($"the solution is not finite at step {step} in segment {seg.Plan.Where}, node {k} of {seg.Cells}");
        }
    }

    List<(LineProfile Profile, NodeRef[] Nodes)> Profiles() =>
        _net.Lines.Select(kv =>
        {
            var nodes = kv.Value.Nodes;
            var positions = new double[nodes.Count];
            var refs = new NodeRef[nodes.Count];
            for (int k = 0; k < nodes.Count; k++) { positions[k] = nodes.Position(k); refs[k] = nodes.Node(k); }
            return (new LineProfile(kv.Key, positions), refs);
        }).ToList();

    ProfileSnapshot Snapshot(List<(LineProfile Profile, NodeRef[] Nodes)> profiles, double t) =>
        new(t, profiles.Select(p => p.Nodes.Select(r => r.Junction >= 0 ? _jv[r.Junction] : _net.Segments[r.Segment].V[r.Index]).ToArray()).ToArray());
}
