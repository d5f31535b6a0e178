using WaveSim.Core.Model;

namespace WaveSim.Core.Solver;

/// <summary>
/// Reads the probes at every solver step and resamples onto the output instants without allocating.
/// A current is taken at the half steps on either side of the instant and averaged; inside a segment, over the half cells on either side of the node.
/// </summary>
internal sealed class ProbeSampler
{
    readonly Network _net;
    readonly (NodeRef Node, EdgeRef[] Edges, double Weight)[] _refs;
    readonly double[] _prevHalf, _prevV, _prevI, _lastV;
    readonly double[] _outTime;
    readonly double[][] _v, _i;
    readonly double _dt;
    long _row;
    double _prevT = double.NaN;

    public ProbeSampler(Network net, Scenario scenario, GridPlan plan, double[] junctionV, out double[] positions)
    {
        _net = net; _dt = plan.Dt; _junctionV = junctionV;
        _refs = Pick(net, scenario, out positions);
        int n = _refs.Length;
        _prevHalf = new double[n]; _prevV = new double[n]; _prevI = new double[n]; _lastV = new double[n];
        _outTime = OutputTimes(scenario, plan);
        _v = new double[n][]; _i = new double[n][];
        for (int p = 0; p < n; p++) { _v[p] = new double[_outTime.Length]; _i[p] = new double[_outTime.Length]; }
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
                    ? (0, first.Node, [new EdgeRef(-1, -1, net.SourceBranch)], 1)
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

    public double[] Times => _outTime;
    public double[][] Volts => _v;
    public double[][] Amps => _i;
    public bool Done => _row >= _outTime.Length;

    static double[] OutputTimes(Scenario s, GridPlan plan)
    {
        double h = s.Simulation.OutputStep ?? plan.Dt;
        var t = new double[plan.OutputRows];
        for (long k = 0; k < t.Length; k++) t[k] = Math.Min(k * h, s.Simulation.Duration);
        t[^1] = s.Simulation.Duration;
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
            sum += e.Branch >= 0 ? _net.Branches[e.Branch].Average : _net.Segments[e.Segment].I[e.Index];
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
            Emit(p, t, v, i);
            _prevHalf[p] = half;
            _lastV[p] = Voltage(p);
        }
        _prevT = t;
        while (_row < _outTime.Length && _outTime[_row] <= t + 1e-9 * _dt) _row++;
    }

    void Emit(int p, double t, double v, double i)
    {
        // Fill every output instant in (prevT, t] by linear interpolation between the last two solver samples.
        for (long r = _row; r < _outTime.Length && _outTime[r] <= t + 1e-9 * _dt; r++)
        {
            double tr = _outTime[r];
            if (double.IsNaN(_prevT) || tr >= t - 1e-9 * _dt) { _v[p][r] = v; _i[p][r] = i; continue; }
            double f = (tr - _prevT) / (t - _prevT);
            _v[p][r] = _prevV[p] + f * (v - _prevV[p]);
            _i[p][r] = _prevI[p] + f * (i - _prevI[p]);
        }
        _prevV[p] = v; _prevI[p] = i;
    }
}
