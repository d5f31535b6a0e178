namespace WaveSim.Tests.Measurements;

/// <summary>
/// Forward model for the reflectometry tests: the lattice (bounce) diagram of a stack of lossless layers of equal
/// one-way delay τ (a Goupillaud layered medium), stepped in time one τ at a time. At every interface the arriving
/// down-going wave a and up-going wave b scatter by the textbook voltage-wave relations (Pozar eq. 2.35 for
/// Γ = (Z2 - Z1)/(Z2 + Z1); transmission 1 + Γ): up = Γ·a + (1 - Γ)·b, down = (1 + Γ)·a - Γ·b.
/// This is a direct simulation, independent of the peeling code it checks.
/// </summary>
internal static class BounceLattice
{
    /// <summary>
    /// Reflection step response ρ[n] seen at the reference plane, one sample per round trip 2τ (sample n holds
    /// everything that came back by time 2nτ), for a unit incident step from a matched source.
    /// </summary>
    /// <param name="referenceOhms">Impedance of the instrument and its cable.</param>
    /// <param name="layerOhms">Impedance of each layer, from the reference plane outwards.</param>
    /// <param name="terminationOhms">Impedance beyond the last layer (a matched, infinitely long line).</param>
    public static double[] StepResponse(double referenceOhms, double[] layerOhms, double terminationOhms)
    {
        int layers = layerOhms.Length;
        // Interface i sits between medium i (above; 0 = reference) and medium i+1 (below; layers+1 = termination).
        var z = new double[layers + 2];
        z[0] = referenceOhms;
        layerOhms.CopyTo(z, 1);
        z[layers + 1] = terminationOhms;
        var gamma = new double[layers + 1];
        for (int i = 0; i <= layers; i++)
            gamma[i] = (z[i + 1] - z[i]) / (z[i + 1] + z[i]);

        var downOut = new double[layers + 1];   // sent down into medium i+1 from interface i, last tick
        var upOut = new double[layers + 1];     // sent up into medium i from interface i, last tick
        var rho = new double[layers];
        int ticks = 2 * (layers - 1);
        for (int tick = 0; tick <= ticks; tick++)
        {
            var newDown = new double[layers + 1];
            var newUp = new double[layers + 1];
            for (int i = 0; i <= layers; i++)
            {
                double a = i == 0 ? 1.0 : downOut[i - 1];     // unit step from the instrument
                double b = i == layers ? 0.0 : upOut[i + 1];  // nothing returns from the matched termination
                newUp[i] = gamma[i] * a + (1 - gamma[i]) * b;
                newDown[i] = (1 + gamma[i]) * a - gamma[i] * b;
            }
            downOut = newDown;
            upOut = newUp;
            if (tick % 2 == 0)
                rho[tick / 2] = upOut[0];   // the reflected wave reaching the instrument
        }
        return rho;
    }
}
