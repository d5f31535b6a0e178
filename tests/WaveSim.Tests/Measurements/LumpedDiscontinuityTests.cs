using WaveSim.Core.Measurements;

namespace WaveSim.Tests.Measurements;

/// <summary>
/// Lumped elements from the area of a reflection excursion. Model and check values (Laplace transform, as in Bogatin's TDR chapter): ReferenceData/published-checks.md §11,
/// "TDR relations": shunt C on a matched line, rho(t) = -exp(-t/tau), tau = Z0*C/2, C = -2A/Z0; series L,
/// rho(t) = +exp(-t/tau), tau = L/(2*Z0), L = 2*Z0*A; "the area does not depend on rise time"; case 1 pF in 50 ohm
/// (A = -25 ps) and 1 nH (A = +10 ps).
/// </summary>
public class LumpedDiscontinuityTests
{
    const double Z0 = 50;
    const double Velocity = 2e8;   // m/s

    /// <summary>rho of an element at round-trip time t0 seen with an ideal step (rise = 0) or a linear 0-100 % ramp.</summary>
    static double[] Trace(double sign, double tau, double t0, double rise, double dt, int n)
    {
        var rho = new double[n];
        for (int k = 0; k < n; k++)
        {
            double t = k * dt - t0;
            if (t < 0)
                continue;
            rho[k] = rise == 0
                ? sign * Math.Exp(-t / tau)
                // exp(-t/tau) convolved with the ramp's derivative, a box of height 1/rise on [0, rise]
                : sign * (tau / rise) * (Math.Exp(-Math.Max(0, t - rise) / tau) - Math.Exp(-t / tau));
        }
        return rho;
    }

    [Fact]
    public void One_picofarad_shunt_C_on_a_50_ohm_line_is_sized_within_10_percent()
    {
        double c = 1e-12, tau = Z0 * c / 2;   // 25 ps
        double[] rho = Trace(-1, tau, t0: 200e-12, rise: 0, dt: 1e-12, n: 600);

        // At 1 ps per sample the decay lasts about 130 samples before it is back within the noise band.
        var d = Assert.Single(LumpedDiscontinuities.Find(rho, 1e-12, Z0, Velocity, maxWidthSamples: 200));

        Assert.Equal(LumpedKind.ShuntCapacitance, d.Kind);
        Assert.InRange(d.Value, 0.9e-12, 1.1e-12);
        Assert.InRange(d.AreaS, -27.5e-12, -22.5e-12);   // A = -25 ps
        Assert.Equal(Velocity * 200e-12 / 2, d.DistanceM, 1e-9);   // distance = v*t/2 at the dip's bottom
    }

    [Fact]
    public void Shunt_C_seen_with_a_200_ps_edge_gives_the_same_value()
    {
        double c = 1e-12, tau = Z0 * c / 2;
        double[] rho = Trace(-1, tau, t0: 200e-12, rise: 200e-12, dt: 5e-12, n: 300);

        Assert.InRange(rho.Min(), -0.126, -0.124);   // rho_min ~ -Z0*C/(2*tr) = -0.125 (ReferenceData/published-checks.md §11): the trace is right
        var d = Assert.Single(LumpedDiscontinuities.Find(rho, 5e-12, Z0, Velocity));
        Assert.Equal(LumpedKind.ShuntCapacitance, d.Kind);
        Assert.InRange(d.Value, 0.9e-12, 1.1e-12);
    }

    [Fact]
    public void One_nanohenry_series_L_is_sized_within_10_percent()
    {
        double l = 1e-9, tau = l / (2 * Z0);   // 10 ps
        double[] rho = Trace(+1, tau, t0: 100e-12, rise: 200e-12, dt: 5e-12, n: 200);

        Assert.InRange(rho.Max(), 0.049, 0.051);   // peak +L/(2*Z0*tr) = 0.05 (ReferenceData/published-checks.md §11)
        var d = Assert.Single(LumpedDiscontinuities.Find(rho, 5e-12, Z0, Velocity));
        Assert.Equal(LumpedKind.SeriesInductance, d.Kind);
        Assert.InRange(d.Value, 0.9e-9, 1.1e-9);
    }

    [Fact]
    public void A_change_of_impedance_is_not_taken_for_a_lumped_element()
    {
        // 50 -> 75 ohm step (rho 0 -> 0.2, Pozar eq. 2.35; ReferenceData/published-checks.md §11) with a 10-sample edge: it never returns to its old level.
        var rho = new double[200];
        for (int k = 0; k < rho.Length; k++)
            rho[k] = 0.2 * Math.Clamp((k - 50) / 10.0, 0, 1);

        Assert.Empty(LumpedDiscontinuities.Find(rho, 5e-12, Z0, Velocity));
    }
}
