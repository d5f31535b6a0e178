using WaveSim.Core.Model;

namespace WaveSim.Core.Solver;

/// <summary>
/// An upper bound on how far the leapfrog's numerical dispersion moves a source edge that has travelled once along a path of
/// segments, as a fraction of the swing.
/// </summary>
/// <remarks>
/// <para>On a uniform lossless grid with Courant number S = v·dt/dz a wave of angular frequency ω travels with the numerical
/// wavenumber k̃ of sin(ωdt/2)/(v·dt) = sin(k̃dz/2)/dz (Taflove and Hagness, Computational Electrodynamics, 3rd ed. 2005,
/// ch. 2; ReferenceData/published-checks.md §9), where the exact line has k = ω/v. After n cells the grid's wave differs from the
/// exact one by H(ω) = exp(−j(k̃ − k)·n·dz); above the cut-off sin(ωdt/2) = S it does not propagate, and |H − 1| is taken as 1.</para>
/// <para>An edge of unit swing whose derivative has the spectrum F(ω) (unit area) then differs from the exact edge by at most
/// (1/π)∫₀^{π/dt} |F(ω)|·|H(ω) − 1|/ω dω at any instant (the inverse Fourier integral bounded by its magnitude). For a linear
/// ramp of length T, F = sin(ωT/2)/(ωT/2); for the Gaussian-filtered step, F = exp(−(ωσ)²/2). The bound ignores loss,
/// junctions and later reflections; it lies above the peak error seen, by about 2 times for a linear ramp and by more for the
/// smooth Gaussian-filtered step.</para>
/// </remarks>
public static class DispersionBound
{
    /// <summary>Quadrature points over (0, π/dt).</summary>
    const int Points = 4000;

    /// <summary>The bound for one pass of an edge with derivative spectrum <paramref name="spectrum"/> along <paramref name="path"/>.</summary>
    /// <param name="spectrum">|F(ω)|, the edge derivative's spectrum normalised to 1 at ω = 0.</param>
    /// <param name="path">The segments passed, with their cells and Courant numbers.</param>
    /// <param name="dt">The time step, s.</param>
    public static double OnePass(Func<double, double> spectrum, IReadOnlyList<SegmentPlan> path, double dt)
    {
        var groups = Groups(path);
        double wMax = Math.PI / dt, dw = wMax / Points, sum = 0;
        for (int i = 0; i < Points; i++)
        {
            double w = (i + 0.5) * dw, f = spectrum(w);
            if (f < 1e-12) continue;
            double phase = 0;
            bool cut = false;
            foreach (var (courant, cells) in groups)
            {
                double lag = PhaseLagPerCell(courant, w * dt);
                if (double.IsNaN(lag)) { cut = true; break; }
                phase += cells * lag;
            }
            double miss = cut ? 1 : 2 * Math.Abs(Math.Sin(phase / 2));
            sum += f * miss / w * dw;
        }
        return sum / Math.PI;
    }

    /// <summary>Most groups of Courant numbers a path is summed over: beyond it the quadrature's cost grew with the path's length.</summary>
    const int MaxGroups = 256;

    /// <summary>
    /// The path's segments below Courant number 1 as (Courant number, cells): one per segment up to <see cref="MaxGroups"/>, else
    /// in bins of 1e-4 in S with the cell-weighted mean S of each, so a path of 100,000 segments costs a few hundred per point
    /// (the lag per cell is smooth in S: a bin shifts the phase by under 1e-4 of itself, far inside a warning's rough bound).
    /// </summary>
    static List<(double Courant, double Cells)> Groups(IReadOnlyList<SegmentPlan> path)
    {
        var below = path.Where(p => p.Courant < 1).ToList();
        if (below.Count <= MaxGroups) return below.Select(p => (p.Courant, (double)p.Cells)).ToList();
        return below.GroupBy(p => Math.Round(p.Courant * 1e4))
            .Select(g =>
            {
                double cells = g.Sum(p => (double)p.Cells);
                return (g.Sum(p => p.Courant * p.Cells) / cells, cells);
            }).ToList();
    }

    /// <summary>
    /// k̃·dz − k·dz, the phase the grid's wave falls behind the exact one per cell at Courant number <paramref name="courant"/> and
    /// ω·dt = <paramref name="omegaDt"/>, from sin(ωdt/2)/S = sin(k̃dz/2) and k·dz = ωdt/S; NaN above the cut-off, where the grid's
    /// wave does not propagate.
    /// </summary>
    public static double PhaseLagPerCell(double courant, double omegaDt)
    {
        double x = Math.Sin(omegaDt / 2) / courant;
        return x >= 1 ? double.NaN : 2 * Math.Asin(x) - omegaDt / courant;
    }

    /// <summary>|F(ω)| of a linear 0-100 % ramp of length <paramref name="ramp"/>, s.</summary>
    public static Func<double, double> LinearRamp(double ramp) => w =>
    {
        double a = w * ramp / 2;
        return a < 1e-9 ? 1 : Math.Abs(Math.Sin(a) / a);
    };

    /// <summary>|F(ω)| of the Gaussian-filtered step of 10-90 % time <paramref name="tenNinety"/>, s.</summary>
    public static Func<double, double> GaussianStep(double tenNinety)
    {
        double sigma = tenNinety / SourceWaveform.GaussianTenNinetyOverSigma;
        return w => Math.Exp(-0.5 * (w * sigma) * (w * sigma));
    }

    /// <summary>
    /// Every path from the source to a line end ("load", "stub/load"), as the segments it passes in order; the branches'
    /// segments follow the plan's order (main line first, each branch where it hangs).
    /// </summary>
    public static IReadOnlyList<(string End, IReadOnlyList<SegmentPlan> Path)> Paths(Scenario s, GridPlan plan)
    {
        var paths = new List<(string, IReadOnlyList<SegmentPlan>)>();
        int next = 0;
        void Walk(IReadOnlyList<LineElement> line, string prefix, List<SegmentPlan> before)
        {
            var path = new List<SegmentPlan>(before);
            foreach (var e in line)
            {
                if (e is Segment) path.Add(plan.Segments[next++]);
                else if (e is Branch b) Walk(b.Line, prefix + b.Name + "/", path);
            }
            paths.Add((prefix + "load", path));
        }
        Walk(s.Line, "", []);
        return paths;
    }
}
