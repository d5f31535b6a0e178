namespace WaveSim.Core.Solver;

/// <summary>
/// Integrates every lumped branch's i² and the v and v² at its A node over the run on the solver's own steps, for the average
/// power in terminations. The current is the branch's step-average current (the unknown its trapezoidal update solves for),
/// squared and weighted by the step; the voltages are the junctions' whole-step values, by the trapezoidal rule.
/// </summary>
internal sealed class BranchAccumulator
{
    readonly Network _net;
    readonly double[] _jv;
    readonly double[] _i2, _v, _v2, _prevV;

    public BranchAccumulator(Network net, double[] junctionV, double sourceNow)
    {
        _net = net; _jv = junctionV;
        int nb = net.Branches.Count;
        _i2 = new double[nb]; _v = new double[nb]; _v2 = new double[nb];
        _prevV = new double[nb];
        for (int b = 0; b < nb; b++)
        {
            var br = net.Branches[b];
            double va = br.A >= 0 ? _jv[br.A] : br.DrivenA ? sourceNow : 0;
            _prevV[b] = va;
        }
    }

    /// <summary>Adds one step of length <paramref name="dt"/>, after the junctions and branches have advanced to its end.</summary>
    public void Add(double dt, double sourceNext)
    {
        for (int b = 0; b < _net.Branches.Count; b++)
        {
            var br = _net.Branches[b];
            double va = br.A >= 0 ? _jv[br.A] : br.DrivenA ? sourceNext : 0;
            _i2[b] += dt * br.Average * br.Average;
            _v[b] += 0.5 * dt * (_prevV[b] + va);
            _v2[b] += 0.5 * dt * (_prevV[b] * _prevV[b] + va * va);
            _prevV[b] = va;
        }
    }

    /// <summary>The averages over <paramref name="duration"/> seconds.</summary>
    public IReadOnlyList<BranchAverage> Averages(double duration) =>
        _net.Branches.Select((br, b) => new BranchAverage(br.Label, br.R, _i2[b] / duration, _v[b] / duration, _v2[b] / duration)).ToArray();
}
