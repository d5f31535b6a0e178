using WaveSim.Core.Measurements;

namespace WaveSim.Tests.Measurements;

/// <summary>
/// Reflectometer traces of lumped parts synthesised from their circuit equations, integrated numerically (classical
/// fourth-order Runge-Kutta), independently of the closed forms the analysis fits.
/// </summary>
/// <remarks>
/// The line arriving at the part is its Thevenin equivalent: twice the incident wave behind Z (the incident wave v_i and a
/// source of impedance Z; Pozar, Microwave Engineering, 4th ed., Sec. 2.3, from memory). The reflected wave is the node
/// voltage less v_i. The port sees the incident ramp plus the reflection delayed by the round trip to the part.
/// </remarks>
internal static class LumpedCircuitTrace
{
    /// <summary>What sits at the far place.</summary>
    public enum Part
    {
        /// <summary>Series L, then shunt C, then the line continues matched.</summary>
        SeriesLThenShuntC,

        /// <summary>Shunt C, then series L, then the line continues matched.</summary>
        ShuntCThenSeriesL,

        /// <summary>The line ends in a C to ground.</summary>
        EndC,

        /// <summary>The line ends in an L to ground.</summary>
        EndL,

        /// <summary>A shunt C alone, the line continuing matched.</summary>
        ShuntC,

        /// <summary>The line ends open.</summary>
        Open,
    }

    /// <summary>
    /// A port record: 1 V incident as a linear 0-100 % ramp of <paramref name="rise"/>·1.25 centred on t0 = 2 ns, the part at
    /// <paramref name="atM"/> on a line of <paramref name="z"/> (the reference) at velocity <paramref name="v"/>, sampled every
    /// <paramref name="step"/> until <paramref name="after"/> past the part's round trip.
    /// </summary>
    public static ReflectometerTrace Make(Part part, double z, double l, double c, double atM, double v, double rise,
        double step = 1e-12, double after = 8e-9, double noise = 0, int seed = 1)
    {
        double ramp = 1.25 * rise, t0 = 2e-9, roundTrip = 2 * atM / v;
        double Incident(double t) => Math.Clamp((t - (t0 - ramp / 2)) / ramp, 0, 1);
        int n = (int)Math.Ceiling((t0 + roundTrip + after) / step);
        var time = new double[n];
        var volts = new double[n];
        // State: x0 = L current, x1 = C voltage (as the part needs).
        double[] Derivative(double t, double[] x)
        {
            double vi = Incident(t);
            return part switch
            {
                Part.SeriesLThenShuntC => [(2 * vi - x[0] * z - x[1]) / l, (x[0] - x[1] / z) / c],
                Part.ShuntCThenSeriesL => [(x[1] - x[0] * z) / l, ((2 * vi - x[1]) / z - x[0]) / c],
                Part.EndC => [0, (2 * vi - x[1]) / (z * c)],
                Part.EndL => [(2 * vi - x[0] * z) / l, 0],
                Part.ShuntC => [0, ((2 * vi - x[1]) / z - x[1] / z) / c],
                _ => [0, 0],
            };
        }
        double Reflected(double t, double[] x)
        {
            double vi = Incident(t);
            double node = part switch
            {
                Part.SeriesLThenShuntC or Part.EndL => 2 * vi - x[0] * z,
                Part.Open => 2 * vi,
                _ => x[1],
            };
            return node - vi;
        }
        // The part's reflection on its own time axis (the incident wave reaching it at time τ is Incident(τ)).
        var reflected = new double[n];
        double[] s = [0, 0];
        for (int k = 0; k < n; k++)
        {
            double t = k * step;
            reflected[k] = Reflected(t, s);
            double[] k1 = Derivative(t, s);
            double[] k2 = Derivative(t + step / 2, [s[0] + step / 2 * k1[0], s[1] + step / 2 * k1[1]]);
            double[] k3 = Derivative(t + step / 2, [s[0] + step / 2 * k2[0], s[1] + step / 2 * k2[1]]);
            double[] k4 = Derivative(t + step, [s[0] + step * k3[0], s[1] + step * k3[1]]);
            s = [s[0] + step / 6 * (k1[0] + 2 * k2[0] + 2 * k3[0] + k4[0]), s[1] + step / 6 * (k1[1] + 2 * k2[1] + 2 * k3[1] + k4[1])];
        }
        double[] hiss = noise > 0 ? SyntheticCapture.Noise(n, noise, seed) : new double[n];
        for (int k = 0; k < n; k++)
        {
            double t = k * step;
            time[k] = t;
            // Delay the reflection by the round trip, interpolating between samples.
            double back = (t - roundTrip) / step;
            int j = (int)Math.Floor(back);
            double r = j < 0 ? 0 : j + 1 >= n ? reflected[^1] : reflected[j] + (back - j) * (reflected[j + 1] - reflected[j]);
            volts[k] = Incident(t) + r + hiss[k];
        }
        return new ReflectometerTrace(time, volts, t0, 1.0, 0, ramp, z);
    }
}
