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
            // Singular with every DC path as given: a loop of ideal parts (a 0 ohm driver into a shorted lossless line) has no
            // defined current, and with Rmin in each such path the current comes out absurd; anything else singular says so.
            x = Solve(net, sourceLevel, Rmin)
                ?? throw new InputException("the network has no defined DC operating point (its equations are singular): check the parts for a node held at two voltages");
            if (x.Any(v => Math.Abs(v) > 1e6))
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
        net.Driver?.HoldLevel(sourceLevel);   // a buffer driver: settled in the state of that level
        var x = Solve(net, sourceLevel, 0) ?? Solve(net, sourceLevel, Rmin)
            ?? throw new InputException("the network has no defined DC solution (a loop with no resistance?): give the driver or the load a resistance");
        int nj = net.Junctions.Count, nb = net.Branches.Count;
        return (x[..nj], x[nj..(nj + nb)]);
    }

    static double[]? Solve(Network net, double sourceLevel, double rmin)
    {
        int nj = net.Junctions.Count, nb = net.Branches.Count, ns = net.Segments.Count;
        int n = nj + nb + 2 * ns;
        var a = new List<(int Row, int Col, double Value)>(nj + 5 * nb + 8 * ns);
        var rhs = new double[n];
        for (int j = 0; j < nj; j++) a.Add((j, j, net.Junctions[j].G + Gmin));
        for (int b = 0; b < nb; b++)
        {
            var br = net.Branches[b];
            int row = nj + b;
            if (br.A >= 0) a.Add((br.A, row, 1));
            if (br.B >= 0) a.Add((br.B, row, -1));
            if (br.C is not null) { a.Add((row, row, 1)); continue; } // no DC current through a capacitor
            if (br.A >= 0) a.Add((row, br.A, 1));
            if (br.B >= 0) a.Add((row, br.B, -1));
            a.Add((row, row, -Math.Max(br.R, rmin)));
            if (br.DrivenA) rhs[row] -= sourceLevel;
            if (br.B < 0) rhs[row] += br.FixedB;
        }
        for (int s = 0; s < ns; s++)
        {
            var seg = net.Segments[s];
            int i0 = nj + nb + 2 * s, iEnd = i0 + 1;
            a.Add((seg.Start, i0, 1));
            a.Add((seg.End, iEnd, -1));
            if (IsLong(seg))
            {
                // I_0 = Y11 V_start + Y12 V_end; I_end = −(Y12 V_start + Y11 V_end): bounded however long and lossy the ladder.
                var (y11, y12) = Admittance(seg);
                a.Add((i0, i0, 1)); a.Add((i0, seg.Start, -y11)); a.Add((i0, seg.End, -y12));
                a.Add((iEnd, iEnd, 1)); a.Add((iEnd, seg.Start, y12)); a.Add((iEnd, seg.End, y11));
                continue;
            }
            var (va, ia) = Propagate(seg, 1, 0);
            var (vb, ib) = Propagate(seg, 0, 1);
            vb = Math.Min(vb, -rmin);
            // [V_end; I_end] = [[va, vb], [ia, ib]] [V_start; I_0]
            a.Add((i0, seg.End, 1)); a.Add((i0, seg.Start, -va)); a.Add((i0, i0, -vb));
            a.Add((iEnd, iEnd, 1)); a.Add((iEnd, seg.Start, -ia)); a.Add((iEnd, i0, -ib));
        }
        var lu = SparseLu<double>.Factor(n, a, Math.Abs);
        if (lu is null) return null;
        var x = new double[n];
        lu.Solve(rhs, x);
        if (x.Any(v => !double.IsFinite(v))) return null;
        // The residual, row by row against the row's own scale, so that a tiny current next to a large voltage still counts.
        var res = (double[])rhs.Clone();
        var scale = new double[n];
        foreach (var (r, c, v) in a) { res[r] -= v * x[c]; scale[r] = Math.Max(scale[r], Math.Abs(v * x[c])); }
        for (int r = 0; r < n; r++)
            if (Math.Abs(res[r]) > 1e-9 * (scale[r] + Math.Abs(rhs[r])) && Math.Abs(res[r]) > 1e-9 * (1 + Math.Abs(rhs[r])))
                return null;
        if (net.Nonlinear.Count > 0) AddParts(net, lu, n, x);
        return x;
    }

    /// <summary>
    /// Adds the nonlinear parts' DC currents to the linear solution <paramref name="x"/> (found with no part current): the
    /// network seen from the k parts (one solve per part with a unit current through it), the k part equations solved by
    /// Newton's method from the linear solution, and, if that fails, by source stepping (every source and offset scaled by
    /// λ from 0 to 1, each stage started from the last; Nagel, SPICE2, UC Berkeley ERL-M520, 1975, §4), then the parts'
    /// currents through the response columns.
    /// </summary>
    static void AddParts(Network net, SparseLu<double> lu, int n, double[] x)
    {
        var parts = net.Nonlinear;
        int k = parts.Count;
        var w = new double[k][];
        var m = new double[k, k];
        var e = new double[n];
        for (int q = 0; q < k; q++)
        {
            Array.Clear(e);
            if (parts[q].A >= 0) e[parts[q].A] -= 1;
            if (parts[q].B >= 0) e[parts[q].B] += 1;
            w[q] = new double[n];
            lu.Solve(e, w[q]);
            for (int p = 0; p < k; p++) m[p, q] = Across(w[q], parts[p]);
        }
        var eq = new PartEquations(parts, m, 1);
        var full = new double[k];
        for (int p = 0; p < k; p++) full[p] = Across(x, parts[p]) - parts[p].Offset;
        var v = (double[])full.Clone();
        if (!eq.Solve(full, v) && !SourceStepping(eq, full, v))
            throw new NumericalException($"the DC operating point with the I-V parts was not found (Newton's method and source stepping both failed at '{parts[0].Label}')");
        for (int q = 0; q < k; q++)
        {
            double i = parts[q].Law.Current(v[q], out _);
            parts[q].Average = i;
            for (int r = 0; r < n; r++) x[r] += i * w[q][r];
        }
    }

    /// <summary>Source stepping: λ from 0 to 1 in steps halved on failure (down to 1e-6) and doubled on success.</summary>
    static bool SourceStepping(PartEquations eq, double[] full, double[] v)
    {
        int k = full.Length;
        var v0 = new double[k];
        var trial = new double[k];
        Array.Clear(v);
        if (!eq.Solve(v0, v)) return false;
        double lambda = 0, h = 0.05;
        while (lambda < 1)
        {
            double next = Math.Min(1, lambda + h);
            for (int p = 0; p < k; p++) v0[p] = next * full[p];
            Array.Copy(v, trial, k);
            if (eq.Solve(v0, trial)) { Array.Copy(trial, v, k); lambda = next; h = Math.Min(0.5, 2 * h); }
            else if ((h /= 2) < 1e-6) return false;
        }
        return true;
    }

    static double Across(double[] x, NonlinearPart p) => (p.A >= 0 ? x[p.A] : 0) - (p.B >= 0 ? x[p.B] : 0);

    /// <summary>
    /// Whether walking the segment's ladder from one end would amplify rounding by more than cosh(5) ≈ 74: its total discrete
    /// attenuation n·2·asinh(√(r·g)·dz/2) above 5 (the image attenuation of a symmetric ladder section; Guillemin,
    /// Communication Networks vol. II, 1935). Such a segment enters the DC solve by its admittance parameters instead.
    /// </summary>
    static bool IsLong(GridSegment seg)
    {
        var s = seg.Plan.Segment;
        double x = Math.Sqrt(s.R * seg.Dz * s.G * seg.Dz);
        return seg.Cells * 2 * Math.Asinh(x / 2) > 5;
    }

    /// <summary>
    /// Y11 (= Y22, the ladder is symmetric) and Y12 of the segment's discrete ladder (n series r·dz, n − 1 interior shunts g·dz),
    /// built cell by cell by joining two-ports at a node: every term is a sum of positive conductances, so nothing overflows
    /// and Y12 decays to 0 on a very lossy line instead of the chain form's e^(αl) growing past the range of a double.
    /// </summary>
    static (double Y11, double Y12) Admittance(GridSegment seg)
    {
        var s = seg.Plan.Segment;
        double y = 1 / (s.R * seg.Dz), g = s.G * seg.Dz;
        double y22 = y, y12 = -y;
        for (int k = 1; k < seg.Cells; k++)
        {
            double d = y22 + g + y;
            y12 = y12 * (y / d);
            y22 = y * ((y22 + g) / d);
        }
        return (y22, y12);
    }

    static void Store(Network net, double sourceLevel, double[] x)
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
            if (IsLong(seg)) FillBetween(seg, x[seg.Start], x[seg.End]);
            else Fill(seg, x[seg.Start], x[nj + nb + 2 * s]);
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

    /// <summary>
    /// The ladder's node voltages between fixed end voltages, by the tridiagonal solve of each interior node's KCL
    /// (−V[k−1] + (2 + r·g·dz²) V[k] − V[k+1] = 0; Thomas algorithm, stable for a diagonally dominant system), and its
    /// half-cell currents from Ohm's law: walking from one end would grow rounding like e^(αl).
    /// </summary>
    static void FillBetween(GridSegment seg, double va, double vb)
    {
        var s = seg.Plan.Segment;
        double rdz = s.R * seg.Dz, diag = 2 + rdz * s.G * seg.Dz;
        int n = seg.Cells;
        var v = seg.V;
        var c = seg.I;   // scratch for the forward sweep's multipliers, overwritten by the currents below
        v[0] = va; v[n] = vb;
        double prev = va;
        for (int k = 1; k < n; k++)
        {
            double m = diag + (k > 1 ? c[k - 1] : 0);
            c[k] = -1 / m;
            prev = (prev + (k == n - 1 ? vb : 0)) / m;
            v[k] = prev;
        }
        for (int k = n - 2; k >= 1; k--) v[k] -= c[k] * v[k + 1];
        for (int k = 0; k < n; k++) seg.I[k] = (v[k] - v[k + 1]) / rdz;
    }
}
