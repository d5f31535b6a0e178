namespace WaveSim.Tests.Measurements;

/// <summary>Test waveforms: a smooth step and seeded Gaussian noise.</summary>
internal static class SyntheticCapture
{
    /// <summary>Logistic step 0 → amplitude, 50 % at <paramref name="t50"/>, time constant <paramref name="tau"/>.</summary>
    public static double Step(double t, double t50, double tau, double amplitude) =>
        amplitude / (1 + Math.Exp(-(t - t50) / tau));

    /// <summary>Gaussian samples (Box-Muller) of standard deviation <paramref name="sigma"/>, reproducible from <paramref name="seed"/>.</summary>
    public static double[] Noise(int count, double sigma, int seed)
    {
        var random = new Random(seed);
        var noise = new double[count];
        for (int i = 0; i < count; i++)
        {
            double u1 = 1.0 - random.NextDouble();
            double u2 = random.NextDouble();
            noise[i] = sigma * Math.Sqrt(-2 * Math.Log(u1)) * Math.Cos(2 * Math.PI * u2);
        }
        return noise;
    }

    public static double Rms(IEnumerable<double> x) => Math.Sqrt(x.Average(v => v * v));
}
