using WaveSim.Core.Model;

namespace WaveSim.Core.Solver;

/// <summary>
/// Reads the probes at every solver step and resamples onto the output instants without allocating.
/// A current is taken at the half steps on either side of the instant and averaged; inside a segment, over the half cells on either side of the node.
/// When the output step is coarser than <see cref="GridPlan.FigureStep"/>, the voltages also go to a second, finer record for
/// the signal figures, so that thinning the CSV does not move a peak or a crossing.
/// </summary>
internal sealed class ProbeSampler
{
    /// <summary>Values at fixed instants, filled by linear interpolation between solver samples; currents optional.</summary>
    sealed class Record(double[] time, int probes, bool currents)
    {
        public readonly double[] Time = time;
        public readonly double[][] V = Alloc(probes, time.Length);
        public readonly double[][]? I = currents ? Alloc(probes, time.Length) : null;
        public long Row;

        static double[][] Alloc(int n, int length)
        {
            var a = new double[n][];
            for (int p = 0; p < n; p++) a[p] = new double[length];
            return a;
        }
    }

    readonly Network _net;
    readonly (NodeRef Node, EdgeRef[] Edges, double Weight)[] _refs;
    readonly double[] _prevHalf, _prevV, _prevI, _lastV;
    readonly Record _out;
    readonly Record? _fig;
    readonly double _dt;
    double _prevT = double.NaN;

    public ProbeSampler(Network net, Scenario scenario, GridPlan plan, double[] junctionV, out double[] positions)
    {
        _net = net; _dt = plan.Dt; _junctionV = junctionV;
        _refs = Pick(net, scenario, out positions);
        int n = _refs.Length;
        _prevHalf = new double[n]; _prevV = new double[n]; _prevI = new double[n]; _lastV = new double[n];
        double duration = scenario.Simulation.Duration;
        _out = new Record(Instants(scenario.Simulation.OutputStep ?? plan.Dt, plan.OutputRows, duration), n, currents: true);
        if (plan.FigureStep is { } hf) _fig = new Record(Instants(hf, plan.FigureRows, duration), n, currents: false);
        for (int p = 0; p < n; p++) { _prevHalf[p] = HalfStepCurrent(p); _lastV[p] = Voltage(p); }
    }

    /// <summary>Every probe's voltage in the network's present state (e.g. a DC operating point), without recording anything.</summary>
    public static double[] VoltagesNow(Network net, Scenario scenario, double[] junctionV) =>
        Pick(net, scenario, out _).Select(r => VoltageAt(net, junctionV, r.Node)).ToArray();

    /// <summary>The grid node each probe reads and the edges whose currents it averages, with its snapped position.</summary>
    static (NodeRef Node, EdgeRef[] Edges, double Weight)[] Pick(Network net, Scenario scenario, out double[] positions)
    {
        int n = scenario.Probes.Count;
        var refs = new (NodeRef, EdgeRef[], double)[n];
        positions = new double[n];
        for (int p = 0; p < n; p++)
        {
            var spec = scenario.Probes[p];
            var line = net.Lines[string.Join("/", spec.BranchPath)];
            (double pos, NodeRef node, EdgeRef[] edges, double w) pick;
            if (spec.Anchor == ProbeAnchor.Source)
            {
                var first = line.Nodes[0];
                pick = spec.BranchPath.Count == 0
                    ? (0, first.Node, net.SourceShunt >= 0 ? [new EdgeRef(-1, -1, net.SourceBranch), new EdgeRef(-1, -1, net.SourceShunt)] : [new EdgeRef(-1, -1, net.SourceBranch)], 1)
                    : (0, first.Node, first.Downstream, 1);
            }
            else if (spec.Anchor == ProbeAnchor.Load)
            {
                var last = line.Nodes[^1];
                pick = (last.Position, last.Node, last.Downstream, 1);
            }
            else
            {
                // Nearest node; where a series part repeats a position, the first entry is the side toward the source.
                int best = 0;
                for (int k = 1; k < line.Nodes.Count; k++)
                    if (Math.Abs(line.Nodes.Position(k) - spec.Distance) < Math.Abs(line.Nodes.Position(best) - spec.Distance) - 1e-15)
                        best = k;
                var e = line.Nodes[best];
                bool both = e.Upstream.Length > 0 && e.Downstream.Length > 0;
                pick = (e.Position, e.Node, both ? [.. e.Upstream, .. e.Downstream] : [.. e.Upstream, .. e.Downstream], both ? 0.5 : 1);
            }
            positions[p] = pick.pos;
            refs[p] = (pick.node, pick.edges, pick.w);
        }
        return refs;
    }

    readonly double[] _junctionV;

    public double[] Times => _out.Time;
    public double[][] Volts => _out.V;
    public double[][] Amps => _out.I!;
    /// <summary>Instants of the figure record: <see cref="Times"/> unless the output step is coarser than the figures need.</summary>
    public double[] FigureTimes => (_fig ?? _out).Time;
    /// <summary>Voltages of the figure record, per probe.</summary>
    public double[][] FigureVolts => (_fig ?? _out).V;

    static double[] Instants(double h, long rows, double duration)
    {
        var t = new double[rows];
        for (long k = 0; k < t.Length; k++) t[k] = Math.Min(k * h, duration);
        t[^1] = duration;
        return t;
    }

    double Voltage(int p) => VoltageAt(_net, _junctionV, _refs[p].Node);

    static double VoltageAt(Network net, double[] junctionV, NodeRef node) =>
        node.Junction >= 0 ? junctionV[node.Junction] : net.Segments[node.Segment].V[node.Index];

    double HalfStepCurrent(int p)
    {
        var (_, edges, w) = _refs[p];
        double sum = 0;
        foreach (var e in edges)
            sum += e.Branch >= 0 ? _net.Branches[e.Branch].Average
                : e.Branch <= -2 ? _net.Nonlinear[-2 - e.Branch].Average
                : _net.Segments[e.Segment].I[e.Index];
        return sum * w;
    }

    /// <summary>Call after each step n→n+1 with t = n·dt: the voltages at step n were kept, the currents at n+1/2 are fresh.</summary>
    public void AfterStep(long n)
    {
        double t = n * _dt;
        for (int p = 0; p < _refs.Length; p++)
        {
            double half = HalfStepCurrent(p);
            double v = _lastV[p], i = 0.5 * (_prevHalf[p] + half);
            Emit(_out, p, t, v, i);
            if (_fig is not null) Emit(_fig, p, t, v, i);
            _prevV[p] = v; _prevI[p] = i;
            _prevHalf[p] = half;
            _lastV[p] = Voltage(p);
        }
        _prevT = t;
        Advance(_out, t);
        if (_fig is not null) Advance(_fig, t);
    }

    void Advance(Record rec, double t)
    {
        while (rec.Row < rec.Time.Length && rec.Time[rec.Row] <= t + 1e-9 * _dt) rec.Row++;
    }

    void Emit(Record rec, int p, double t, double v, double i)
    {
        // Fill every instant in (prevT, t] by linear interpolation between the last two solver samples.
        double[] time = rec.Time, vs = rec.V[p];
        double[]? cs = rec.I?[p];
        for (long r = rec.Row; r < time.Length && time[r] <= t + 1e-9 * _dt; r++)
        {
            double tr = time[r];
            if (double.IsNaN(_prevT) || tr >= t - 1e-9 * _dt) { vs[r] = v; if (cs is not null) cs[r] = i; continue; }
            double f = (tr - _prevT) / (t - _prevT);
            vs[r] = _prevV[p] + f * (v - _prevV[p]);
            if (cs is not null) cs[r] = _prevI[p] + f * (i - _prevI[p]);
        }
    }
}
