namespace WaveSim.Core.Solver;

/// <summary>
/// The leapfrog updates inside one uniform segment, with its coefficients computed once.
/// </summary>
/// <remarks>
/// Telegrapher's equations ∂v/∂z = −R i − L ∂i/∂t, ∂i/∂z = −G v − C ∂v/∂t on a staggered (Yee) grid: voltages on nodes at whole
/// steps, currents on half cells at half steps (Yee, IEEE Trans. AP-14, 1966; for lines, Paul, Analysis of Multiconductor
/// Transmission Lines, 2nd ed. 2008). The loss terms are averaged over the step, (x^{n+1}+x^n)/2, which keeps the update
/// stable for any R and G.
/// </remarks>
internal sealed class SegmentKernel
{
    public readonly double Ci1, Ci2, Cv1, Cv2;

    public SegmentKernel(GridSegment seg, double dt)
    {
        var s = seg.Plan.Segment;
        double dz = seg.Dz;
        double li = s.L / dt + s.R / 2, cv = s.C / dt + s.G / 2;
        Ci1 = (s.L / dt - s.R / 2) / li;
        Ci2 = 1 / (dz * li);
        Cv1 = (s.C / dt - s.G / 2) / cv;
        Cv2 = 1 / (dz * cv);
    }

    /// <summary>
    /// A whole step n → n+1 of this segment's interior: currents to n+1/2, then voltages to n+1, in one fused vectorised sweep
    /// (<see cref="LeapfrogKernel"/>); bit for bit the same as <see cref="UpdateCurrentsTrackingProduct"/> followed by <see cref="UpdateVoltages"/>.
    /// </summary>
    public void Step(double[] v, double[] i) => LeapfrogKernel.Step(v, i, Ci1, Ci2, Cv1, Cv2);

    /// <summary>Currents from n−1/2 to n+1/2 using the voltages at n, returning Σ I^{n−1/2}·I^{n+1/2} for the energy the staggered grid conserves.</summary>
    public double UpdateCurrentsTrackingProduct(double[] v, double[] i)
    {
        double a = Ci1, b = Ci2, sum = 0;
        for (int k = 0; k < i.Length; k++)
        {
            double old = i[k];
            i[k] = LeapfrogKernel.Current(old, v[k], v[k + 1], a, b);
            sum += old * i[k];
        }
        return sum;
    }

    /// <summary>Interior node voltages from n to n+1 using the currents at n+1/2; both end nodes belong to junctions.</summary>
    public void UpdateVoltages(double[] v, double[] i)
    {
        double a = Cv1, b = Cv2;
        int n = i.Length;
        for (int k = 1; k < n; k++) v[k] = LeapfrogKernel.Voltage(v[k], i[k - 1], i[k], a, b);
    }
}
