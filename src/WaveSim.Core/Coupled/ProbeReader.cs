namespace WaveSim.Core.Coupled;

/// <summary>
/// Reads a coupled probe's voltage at a node and its current at the half step: at the near end the current the near
/// branches deliver into the conductor, at the far end the current into the far branches, inside a section the mean of
/// the half cells on either side of the node (positive toward the far end). A between probe reads V_a − V_b and (I_a − I_b)/2.
/// </summary>
internal sealed class ProbeReader
{
    readonly SectionGrid[] _grids;
    readonly EndNetwork _near, _far;
    readonly (int Grid, int Node, CoupledAnchor Where, double Position)[] _at;
    readonly CoupledProbe[] _probes;
    readonly int _n;

    public ProbeReader(CoupledScenario s, SectionGrid[] grids, EndNetwork near, EndNetwork far)
    {
        _grids = grids; _near = near; _far = far; _n = s.Conductors.Count;
        _probes = [.. s.Probes];
        _at = _probes.Select(p => Locate(p)).ToArray();
    }

    (int, int, CoupledAnchor, double) Locate(CoupledProbe p)
    {
        if (p.Anchor == CoupledAnchor.Near) return (0, 0, CoupledAnchor.Near, 0);
        double length = _grids.Sum(g => g.Section.Length);
        if (p.Anchor == CoupledAnchor.Far) return (_grids.Length - 1, _grids[^1].Cells, CoupledAnchor.Far, length);
        // The nearest node; a joint is read as the first node of the later section.
        int bestG = 0, bestK = 0;
        double best = double.PositiveInfinity, z0 = 0, at = 0;
        for (int g = 0; g < _grids.Length; g++)
        {
            for (int k = 0; k <= _grids[g].Cells; k++)
            {
                double z = z0 + k * _grids[g].Dz;
                if (Math.Abs(z - p.Distance) < best - 1e-15) { best = Math.Abs(z - p.Distance); bestG = g; bestK = k; at = z; }
            }
            z0 += _grids[g].Section.Length;
        }
        if (bestG == 0 && bestK == 0) return (0, 0, CoupledAnchor.Near, 0);
        if (bestG == _grids.Length - 1 && bestK == _grids[^1].Cells) return (bestG, bestK, CoupledAnchor.Far, at);
        if (bestK == _grids[bestG].Cells) { bestG++; bestK = 0; }
        return (bestG, bestK, CoupledAnchor.Distance, at);
    }

    /// <summary>The probe's position along the conductors after snapping to the grid, m.</summary>
    public double Position(int p) => _at[p].Position;

    public double Voltage(int p)
    {
        var (g, k, _, _) = _at[p];
        var node = _grids[g].Node(k);
        var pr = _probes[p];
        return pr.Minus is { } m ? node[pr.Conductor] - node[m] : node[pr.Conductor];
    }

    public double HalfStepCurrent(int p)
    {
        var pr = _probes[p];
        double a = Current(p, pr.Conductor);
        return pr.Minus is { } m ? 0.5 * (a - Current(p, m)) : a;
    }

    double Current(int p, int c)
    {
        var (g, k, where, _) = _at[p];
        switch (where)
        {
            case CoupledAnchor.Near: return _near.Into(c, _near.Average);
            case CoupledAnchor.Far: return -_far.Into(c, _far.Average);
        }
        var grid = _grids[g];
        double right = grid.I[k * _n + c];
        double left = k > 0 ? grid.I[(k - 1) * _n + c] : _grids[g - 1].I[(_grids[g - 1].Cells - 1) * _n + c];
        return 0.5 * (left + right);
    }
}
