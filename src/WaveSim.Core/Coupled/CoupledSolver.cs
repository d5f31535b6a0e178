using System.Diagnostics;
using MathNet.Numerics.LinearAlgebra;
using WaveSim.Core.Solver;

namespace WaveSim.Core.Coupled;

/// <summary>Runs the multiconductor leapfrog over the sections, the end networks and the joints, and records the probes.</summary>
internal sealed class CoupledSolver
{
    readonly CoupledScenario _s;
    readonly CoupledPlan _plan;
    readonly SectionGrid[] _grids;
    readonly EndNetwork _near, _far;
    readonly EndNetwork[] _joints;
    readonly int _n;
    readonly double[] _nearNow, _nearNext, _farNow, _farNext;

    public CoupledSolver(CoupledScenario s, CoupledPlan plan)
    {
        _s = s; _plan = plan; _n = s.Conductors.Count;
        double dt = plan.Dt;
        _grids = plan.Sections.Select(p => new SectionGrid(p.Section, p.Cells, dt)).ToArray();
        Matrix<double> Half(SectionGrid g, bool cap) => (cap ? g.Section.C : g.Section.G).ToMatrix() * (g.Dz / 2);
        _near = new EndNetwork("near", _n, Half(_grids[0], true), Half(_grids[0], false), s.Near, dt);
        _far = new EndNetwork("far", _n, Half(_grids[^1], true), Half(_grids[^1], false), s.Far, dt);
        _joints = Enumerable.Range(0, _grids.Length - 1).Select(k => new EndNetwork($"coupled[{k}]/coupled[{k + 1}] joint", _n,
            Half(_grids[k], true) + Half(_grids[k + 1], true), Half(_grids[k], false) + Half(_grids[k + 1], false), [], dt)).ToArray();
        _nearNow = new double[s.Near.Count]; _nearNext = new double[s.Near.Count];
        _farNow = new double[s.Far.Count]; _farNext = new double[s.Far.Count];
        Sources(s.Near, 0, _nearNow, initial: true); Sources(s.Far, 0, _farNow, initial: true);
        CoupledDcStart.Apply(_grids, _near, _far, _nearNow, _farNow);
    }

    static void Sources(IReadOnlyList<EndBranch> branches, double t, double[] into, bool initial = false)
    {
        for (int b = 0; b < branches.Count; b++)
            into[b] = branches[b].Source is { } src ? (initial ? src.InitialLevel : src.Value(t)) : 0;
    }

    public CoupledResult Run(bool trackEnergy, IReadOnlyList<double> snapshotTimes, IProgress<double>? progress, CancellationToken ct)
    {
        double dt = _plan.Dt;
        long steps = _plan.Steps;
        var probes = new ProbeReader(_s, _grids, _near, _far);
        int np = _s.Probes.Count;
        var vRec = new double[np][]; var iRec = new double[np][];
        for (int p = 0; p < np; p++) { vRec[p] = new double[steps + 1]; iRec[p] = new double[steps + 1]; }
        var prevHalf = new double[np];
        for (int p = 0; p < np; p++) prevHalf[p] = probes.HalfStepCurrent(p);
        double[]? energy = trackEnergy ? new double[steps + 1] : null;
        var snapT = snapshotTimes.Order().ToArray();
        var snaps = new List<(double, double[][])>(snapT.Length);
        int nextSnap = 0;
        long progressEvery = Math.Max(1, steps / 200), checkEvery = Math.Max(1, Math.Min(4096, 1_000_000 / Math.Max(1, (long)(_plan.CellUpdates / Math.Max(1, steps)))));
        var clock = Stopwatch.StartNew();
        var vNow = new double[np];
        for (long n = 0; n <= steps; n++)
        {
            double t = n * dt;
            while (nextSnap < snapT.Length && snapT[nextSnap] <= t + 0.5 * dt) { snaps.Add((snapT[nextSnap++], Profile())); }
            for (int p = 0; p < np; p++) vNow[p] = probes.Voltage(p);
            double product = 0;
            foreach (var g in _grids) product += g.UpdateCurrents(energy is not null);
            if (energy is not null)
            {
                double e = 0.5 * product + _near.StoredEnergy() + _far.StoredEnergy() + EndCapEnergy();
                foreach (var g in _grids) e += g.ElectricEnergy();
                energy[n] = e;
            }
            foreach (var g in _grids) g.UpdateVoltages();
            Sources(_s.Near, t + dt, _nearNext); Sources(_s.Far, t + dt, _farNext);
            var first = _grids[0]; var last = _grids[^1];
            _near.Step(first.Node(0), default, first.Cell(0), _nearNow, _nearNext);
            _far.Step(last.Node(last.Cells), last.Cell(last.Cells - 1), default, _farNow, _farNext);
            for (int j = 0; j < _joints.Length; j++)
            {
                var a = _grids[j]; var b = _grids[j + 1];
                var node = a.Node(a.Cells);
                _joints[j].Step(node, a.Cell(a.Cells - 1), b.Cell(0), [], []);
                node.CopyTo(b.Node(0));
            }
            _nearNext.CopyTo(_nearNow, 0); _farNext.CopyTo(_farNow, 0);
            for (int p = 0; p < np; p++)
            {
                double half = probes.HalfStepCurrent(p);
                vRec[p][n] = vNow[p];
                iRec[p][n] = 0.5 * (prevHalf[p] + half);
                prevHalf[p] = half;
            }
            if (n % checkEvery == 0) { ct.ThrowIfCancellationRequested(); CheckFinite(n + 1); }
            if (n % progressEvery == 0) progress?.Report((double)n / Math.Max(1, steps));
        }
        progress?.Report(1);
        CheckFinite(steps + 1);
        var sim = _s.Simulation;
        double h = sim.OutputStep ?? dt;
        var outTimes = Instants(h, sim.Duration);
        var figTimes = Instants(dt, sim.Duration);
        var traces = _s.Probes.Select((p, k) => new ProbeTrace(p.Name, Describe(p), probes.Position(k),
            Resample(vRec[k], dt, outTimes), Resample(iRec[k], dt, outTimes)) { FigureVolts = Resample(vRec[k], dt, figTimes) }).ToList();
        return new CoupledResult
        {
            Scenario = _s, Plan = _plan, Time = outTimes, FigureTime = figTimes, Probes = traces, Elapsed = clock.Elapsed,
            Energy = energy, Snapshots = snaps, Positions = Positions(),
        };
    }

    /// <summary>How a probe's place reads in outputs, e.g. "quiet/far" or "aggr-quiet/near".</summary>
    internal string Describe(CoupledProbe p)
    {
        string who = p.Minus is { } m ? $"{_s.Conductors[p.Conductor]}-{_s.Conductors[m]}" : _s.Conductors[p.Conductor];
        string where = p.Anchor switch { CoupledAnchor.Near => "near", CoupledAnchor.Far => "far", _ => Units.Quantity.Format(p.Distance, "m") };
        return who + "/" + where;
    }

    double EndCapEnergy()
    {
        double e = 0;
        void Add(ReadOnlySpan<double> v, Matrix<double> c)
        {
            for (int a = 0; a < _n; a++) for (int b = 0; b < _n; b++) e += 0.5 * v[a] * c[a, b] * v[b];
        }
        Add(_grids[0].Node(0), _grids[0].Section.C.ToMatrix() * (_grids[0].Dz / 2));
        Add(_grids[^1].Node(_grids[^1].Cells), _grids[^1].Section.C.ToMatrix() * (_grids[^1].Dz / 2));
        for (int j = 0; j + 1 < _grids.Length; j++)
            Add(_grids[j].Node(_grids[j].Cells), _grids[j].Section.C.ToMatrix() * (_grids[j].Dz / 2) + _grids[j + 1].Section.C.ToMatrix() * (_grids[j + 1].Dz / 2));
        return e;
    }

    double[] Positions()
    {
        var pos = new List<double> { 0 };
        double z = 0;
        foreach (var g in _grids) for (int k = 1; k <= g.Cells; k++) pos.Add(z + k * g.Dz);
        return [.. pos];
    }

    double[][] Profile()
    {
        var rows = new double[_n][];
        for (int a = 0; a < _n; a++)
        {
            var list = new List<double> { _grids[0].V[a] };
            foreach (var g in _grids) for (int k = 1; k <= g.Cells; k++) list.Add(g.V[k * _n + a]);
            rows[a] = [.. list];
        }
        return rows;
    }

    void CheckFinite(long step)
    {
        for (int s = 0; s < _grids.Length; s++)
            foreach (double x in _grids[s].V)
                if (!double.IsFinite(x))
                    throw new NumericalException($"the solution is not finite at step {step} in coupled[{s}]");
    }

    /// <summary>Output instants: every h from 0, the last at the duration (as the single-line record).</summary>
    internal static double[] Instants(double h, double duration)
    {
        double rows = Math.Floor(duration / h * (1 + GridPlan.RoundingTolerance)) + 1;
        if ((rows - 1) * h < duration * (1 - GridPlan.RoundingTolerance)) rows++;
        var t = new double[(long)rows];
        for (long k = 0; k < t.Length; k++) t[k] = Math.Min(k * h, duration);
        t[^1] = duration;
        return t;
    }

    /// <summary>Linear interpolation of the per-step record (sample n at n·dt) at the given instants.</summary>
    static double[] Resample(double[] rec, double dt, double[] times)
    {
        var r = new double[times.Length];
        for (int k = 0; k < times.Length; k++)
        {
            double x = times[k] / dt;
            long i = (long)Math.Floor(x + 1e-9);
            if (i >= rec.Length - 1) { r[k] = rec[^1]; continue; }
            double f = x - i;
            r[k] = f <= 1e-9 ? rec[i] : rec[i] + f * (rec[i + 1] - rec[i]);
        }
        return r;
    }
}
