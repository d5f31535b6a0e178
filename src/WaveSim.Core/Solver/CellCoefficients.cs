namespace WaveSim.Core.Solver;

/// <summary>
/// Leapfrog coefficients that vary along a segment: Ci1, Ci2 for each half cell (length n), Cv1, Cv2 for each node (length n+1;
/// the two end entries are not used, those nodes belong to junctions).
/// </summary>
internal sealed class CellCoefficients
{
    public readonly double[] Ci1, Ci2, Cv1, Cv2;

    public CellCoefficients(double[] ci1, double[] ci2, double[] cv1, double[] cv2)
    {
        Ci1 = ci1; Ci2 = ci2; Cv1 = cv1; Cv2 = cv2;
    }

    /// <summary>Every cell of an n-cell segment with the same coefficients.</summary>
    public static CellCoefficients Uniform(int cells, double ci1, double ci2, double cv1, double cv2) =>
        new(Fill(cells, ci1), Fill(cells, ci2), Fill(cells + 1, cv1), Fill(cells + 1, cv2));

    /// <summary>Throws unless the arrays fit a segment of <paramref name="cells"/> cells.</summary>
    public void Check(int cells)
    {
        if (Ci1.Length != cells || Ci2.Length != cells || Cv1.Length != cells + 1 || Cv2.Length != cells + 1)
            throw new ArgumentException($"per-cell coefficients must have {cells} current and {cells + 1} voltage entries");
    }

    static double[] Fill(int n, double x)
    {
        var a = new double[n];
        Array.Fill(a, x);
        return a;
    }
}
