using MathNet.Numerics.LinearAlgebra;

namespace WaveSim.Core.Solver;

/// <summary>
/// Sets the network to its DC operating point with the driver at its initial level: capacitors open, inductors shorted,
/// each segment a ladder of its own discrete R and G, so that the leapfrog starts in exact equilibrium and nothing rings at start-up.
/// </summary>
internal static class DcOperatingPoint
{
    /// <summary>A tiny leak to ground at every junction, S, so that sections cut off by series capacitors settle at 0 V instead of being undefined.</summary>
    const double Gmin = 1e-15;

    /// <summary>A resistance put in every 0 ohm DC path on a second try, ohm: a loop of ideal parts has no defined DC current otherwise.</summary>
    const double Rmin = 1e-9;

    /// <summary>
    /// Puts the network at its DC operating point: the grid arrays, the lumped branches' states and every junction's voltage in
    /// <paramref name="junctionV"/>, including junctions no segment ends at (between the driver and a series part, between two
    /// series parts, behind a series part at a load), whose voltage a segment's end cannot mirror.
    /// </summary>
    public static void Apply(Network net, double sourceLevel, double[] junctionV)
    {
        var x = Solve(net, sourceLevel, 0);
        if (x is null)
        {
            x = Solve(net, sourceLevel, Rmin);
            if (x is null || x.Any(v => Math.Abs(v) > 1e6))
                throw new InputException("the driver's initial level drives an unlimited DC current through a loop with no resistance (0 ohm driver, lossless line, shorted load?): give the driver or the load a resistance");
        }
        Store(net, sourceLevel, x);
        for (int j = 0; j < net.Junctions.Count; j++) junctionV[j] = x[j];
    }

    /// <summary>
    /// The DC solution with the driver at <paramref name="sourceLevel"/> (for static power): every junction's voltage and every
    /// lumped branch's current (from A to B), without touching the grid arrays.
    /// </summary>
    public static (double[] JunctionVolts, double[] BranchCurrents) Solution(Network net, double sourceLevel)
    {
        var x = Solve(net, sourceLevel, 0) ?? Solve(net, sourceLevel, Rmin)
            ?? throw new InputException("the network has no defined DC solution (a loop with no resistance?): give the driver or the load a resistance");
        int nj = net.Junctions.Count, nb = net.Branches.Count;
        return (x.SubVector(0, nj).ToArray(), x.SubVector(nj, nb).ToArray());
    }

    static Vector<double>? Solve(Network net, double sourceLevel, double rmin)
    {
        int nj = net.Junctions.Count, nb = net.Branches.Count, ns = net.Segments.Count;
        int n = nj + nb + 2 * ns;
        var a = Matrix<double>.Build.Dense(n, n);
        var rhs = Vector<double>.Build.Dense(n);
        for (int j = 0; j < nj; j++) a[j, j] = net.Junctions[j].G + Gmin;
        for (int b = 0; b < nb; b++)
        {
            var br = net.Branches[b];
            int row = nj + b;
            if (br.A >= 0) a[br.A, row] += 1;
            if (br.B >= 0) a[br.B, row] -= 1;
            if (br.C is not null) { a[row, row] = 1; continue; } // no DC current through a capacitor
            if (br.A >= 0) a[row, br.A] = 1;
            if (br.B >= 0) a[row, br.B] = -1;
            a[row, row] = -Math.Max(br.R, rmin);
            if (br.DrivenA) rhs[row] -= sourceLevel;
            if (br.B < 0) rhs[row] += br.FixedB;
        }
        for (int s = 0; s < ns; s++)
        {
            var seg = net.Segments[s];
            int i0 = nj + nb + 2 * s, iEnd = i0 + 1;
            a[seg.Start, i0] += 1;
            a[seg.End, iEnd] -= 1;
            var (va, ia) = Propagate(seg, 1, 0);
            var (vb, ib) = Propagate(seg, 0, 1);
            vb = Math.Min(vb, -rmin);
            // [V_end; I_end] = [[va, vb], [ia, ib]] [V_start; I_0]
            a[i0, seg.End] = 1; a[i0, seg.Start] = -va; a[i0, i0] = -vb;
            a[iEnd, iEnd] = 1; a[iEnd, seg.Start] = -ia; a[iEnd, i0] = -ib;
        }
        Vector<double> x;
        try { x = a.Solve(rhs); }
        catch (Exception ex) when (ex is not OutOfMemoryException) { return null; }
        if (x.Any(v => !double.IsFinite(v)) || (a * x - rhs).AbsoluteMaximum() > 1e-9 * (1 + rhs.AbsoluteMaximum()))
            return null;
        return x;
    }

    static void Store(Network net, double sourceLevel, Vector<double> x)
    {
        int nj = net.Junctions.Count, nb = net.Branches.Count, ns = net.Segments.Count;

        for (int b = 0; b < nb; b++)
        {
            var br = net.Branches[b];
            br.Current = br.Average = x[nj + b];
            double va = br.DrivenA ? sourceLevel : br.A >= 0 ? x[br.A] : 0;
            double vb = br.B >= 0 ? x[br.B] : br.FixedB;
            br.CapVoltage = br.C is null ? 0 : va - vb;
        }
        for (int s = 0; s < ns; s++)
        {
            var seg = net.Segments[s];
            Fill(seg, x[seg.Start], x[nj + nb + 2 * s]);
        }
    }

    /// <summary>Walks the discrete DC ladder of a segment from its start voltage and first half-cell current.</summary>
    static (double V, double I) Propagate(GridSegment seg, double v, double i)
    {
        var s = seg.Plan.Segment;
        double rdz = s.R * seg.Dz, gdz = s.G * seg.Dz;
        for (int k = 0; k < seg.Cells; k++)
        {
            v -= rdz * i;
            if (k < seg.Cells - 1) i -= gdz * v;
        }
        return (v, i);
    }

    static void Fill(GridSegment seg, double v, double i)
    {
        var s = seg.Plan.Segment;
        double rdz = s.R * seg.Dz, gdz = s.G * seg.Dz;
        seg.V[0] = v;
        for (int k = 0; k < seg.Cells; k++)
        {
            seg.I[k] = i;
            v -= rdz * i;
            seg.V[k + 1] = v;
            if (k < seg.Cells - 1) i -= gdz * v;
        }
    }
}
