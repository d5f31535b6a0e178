using MathNet.Numerics.LinearAlgebra;

namespace WaveSim.Core.Coupled;

/// <summary>
/// The DC operating point of the grid with every source at its initial level: the resistive network of all conductors
/// (the per-cell R and G of the grid itself, inductors shorted, capacitors open), so that the leapfrog starts at rest.
/// </summary>
/// <remarks>
/// The grid's steady state satisfies V_{k+1} = V_k − R·dz·I_k along each section and I_k = I_{k−1} − G·dz·V_k at each node
/// (the update with the time derivatives zero): a chain, marched once per unit input to give the 2N × 2N matrix from the
/// near node's voltages and injected currents to the far node's. The end networks' equations close the system, which is
/// solved in the least-squares sense so that a conductor left floating at DC (no path to the reference) rests at the
/// smallest voltages that fit, zero when nothing drives it.
/// </remarks>
internal static class CoupledDcStart
{
    public static void Apply(SectionGrid[] grids, EndNetwork near, EndNetwork far, double[] nearSources, double[] farSources)
    {
        int n = grids[0].N;
        // The chain: columns are the far node's (V, arriving I) for a unit V0 or a unit injected current at the near node.
        var m = Matrix<double>.Build.Dense(2 * n, 2 * n);
        for (int col = 0; col < 2 * n; col++)
        {
            var v = new double[n]; var i = new double[n];
            if (col < n) v[col] = 1; else i[col - n] = 1;
            March(grids, v, i, fill: false);
            for (int a = 0; a < n; a++) { m[a, col] = v[a]; m[n + a, col] = i[a]; }
        }
        int bn = near.Branches.Length, bf = far.Branches.Length;
        int size = 2 * n + bn + bf;
        var a2 = Matrix<double>.Build.Dense(size, size);
        var rhs = Vector<double>.Build.Dense(size);
        // Unknowns: V0 (n), Vfar (n), near branch currents (bn), far branch currents (bf).
        int V0 = 0, VF = n, BN = 2 * n, BF = 2 * n + bn;
        var gFar = EndConductance(grids[^1], last: true);
        for (int r = 0; r < n; r++)
        {
            // Vfar = M_VV·V0 + M_VI·Inear, with Inear the current the near branches deliver.
            a2[r, VF + r] = 1;
            for (int c = 0; c < n; c++) a2[r, V0 + c] -= m[r, c];
            for (int b = 0; b < bn; b++) a2[r, BN + b] -= Incidence(near.Branches[b], m, r, n, rowOffset: 0);
            // Far KCL: arriving − Gfar·Vfar = current into the far branches.
            int k = n + r;
            for (int c = 0; c < n; c++) { a2[k, V0 + c] += m[n + r, c]; a2[k, VF + c] -= gFar[r, c]; }
            for (int b = 0; b < bn; b++) a2[k, BN + b] += Incidence(near.Branches[b], m, r, n, rowOffset: n);
            for (int b = 0; b < bf; b++)
            {
                if (far.Branches[b].At == r) a2[k, BF + b] -= 1;
                if (far.Branches[b].To == r) a2[k, BF + b] += 1;
            }
        }
        void Law(int row, int vOffset, int bCol, EndBranch br, double vs)
        {
            if (br.C is not null) { a2[row, bCol] = 1; return; }   // open at DC
            a2[row, vOffset + br.At] += 1;
            if (br.To is { } to) a2[row, vOffset + to] -= 1;
            a2[row, bCol] -= br.R;
            rhs[row] = vs;
        }
        for (int b = 0; b < bn; b++) Law(2 * n + b, V0, BN + b, near.Branches[b], nearSources[b]);
        for (int b = 0; b < bf; b++) Law(2 * n + bn + b, VF, BF + b, far.Branches[b], farSources[b]);

        var x = a2.Svd(computeVectors: true).Solve(rhs);
        double scale = Math.Max(1, rhs.AbsoluteMaximum());
        if (!x.All(double.IsFinite) || (a2 * x - rhs).AbsoluteMaximum() > 1e-6 * scale)
            throw new InputException("near, far: the end networks have no DC operating point (an ideal source loop, or sources in conflict through zero-resistance branches)");

        var v0 = new double[n]; var inj = new double[n];
        for (int c = 0; c < n; c++) v0[c] = x[V0 + c];
        var bnI = Enumerable.Range(0, bn).Select(b => x[BN + b]).ToArray();
        for (int c = 0; c < n; c++) inj[c] = near.Into(c, bnI);
        March(grids, v0, inj, fill: true);
        Start(near, bnI, grids[0].Node(0), nearSources);
        Start(far, Enumerable.Range(0, bf).Select(b => x[BF + b]).ToArray(), grids[^1].Node(grids[^1].Cells), farSources);
    }

    static double Incidence(EndBranch br, Matrix<double> m, int r, int n, int rowOffset)
    {
        // Column of the near branch current in Inear: −1 into node At, +1 into node To; mapped through the chain's current columns.
        double s = -m[rowOffset + r, n + br.At];
        if (br.To is { } to) s += m[rowOffset + r, n + to];
        return s;
    }

    static void Start(EndNetwork net, double[] currents, ReadOnlySpan<double> v, double[] sources)
    {
        for (int b = 0; b < currents.Length; b++)
        {
            var br = net.Branches[b];
            net.Current[b] = net.Average[b] = currents[b];
            if (br.C is not null)
                net.CapVoltage[b] = v[br.At] - (br.To is { } to ? v[to] : 0) - sources[b] - br.R * currents[b];
        }
    }

    /// <summary>The half cells' conductance at a section's first or last node, G·dz/2.</summary>
    static Matrix<double> EndConductance(SectionGrid g, bool last) => g.Section.G.ToMatrix() * (g.Dz / 2);

    /// <summary>
    /// Walks the DC chain from the near node: <paramref name="v"/> and <paramref name="i"/> hold the near node's voltages and the
    /// current injected into it on entry, the far node's voltages and the current arriving at it on return; with
    /// <paramref name="fill"/> the grid's node voltages and half-cell currents are set on the way.
    /// </summary>
    static void March(SectionGrid[] grids, double[] v, double[] i, bool fill)
    {
        int n = v.Length;
        var leave = new double[n];
        for (int s = 0; s < grids.Length; s++)
        {
            var g = grids[s];
            var gz = g.Section.G; var rz = g.Section.R;
            for (int k = 0; k < g.Cells; k++)
            {
                // Node k: the conductance of its half cells (k = 0: this section's half, plus the previous section's at a joint).
                for (int a = 0; a < n; a++)
                {
                    double gv = 0;
                    for (int b = 0; b < n; b++)
                    {
                        double gab = gz[a, b] * (k == 0 ? g.Dz / 2 : g.Dz);
                        if (k == 0 && s > 0) gab += grids[s - 1].Section.G[a, b] * grids[s - 1].Dz / 2;
                        gv += gab * v[b];
                    }
                    leave[a] = i[a] - gv;
                }
                if (fill) { v.CopyTo(g.Node(k)); leave.CopyTo(g.I.AsSpan(k * n, n)); }
                var next = new double[n];
                for (int a = 0; a < n; a++)
                {
                    double dv = 0;
                    for (int b = 0; b < n; b++) dv += rz[a, b] * g.Dz * leave[b];
                    next[a] = v[a] - dv;
                }
                next.CopyTo(v, 0);
                leave.CopyTo(i, 0);
            }
            if (fill) v.CopyTo(g.Node(g.Cells));
            if (fill && s + 1 < grids.Length) v.CopyTo(grids[s + 1].Node(0));
        }
    }
}
