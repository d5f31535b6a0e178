using MathNet.Numerics.RootFinding;
using WaveSim.Core.Units;

namespace WaveSim.Core.Lines;

public static partial class CrossSection
{
    const int ScanPoints = 160;

    /// <summary>
    /// Finds the value of <paramref name="freeDimension"/> that gives <paramref name="targetZ0"/>, the other values
    /// fixed: a log-spaced scan over a wide physical range brackets the root, then Brent's method
    /// (MathNet.Numerics.RootFinding.Brent) refines it to 1e-12 relative.
    /// </summary>
    /// <param name="spec">The cross-section; the free key may be absent (any value given is ignored).</param>
    /// <param name="freeDimension">A key from the kind's <see cref="LineKindInfo.Solvable"/> list.</param>
    /// <param name="targetZ0">Target impedance, ohm, &gt; 0; for a coupled pair, the differential impedance Zdiff.</param>
    /// <param name="frequencyHz">Frequency for R_ac and G of the result; null as in <see cref="Compute"/>.</param>
    /// <exception cref="InputException">The key cannot be solved for, or no value in the range gives the target.</exception>
    public static SynthesisResult Solve(CrossSectionSpec spec, string freeDimension, double targetZ0, double? frequencyHz = null)
    {
        LineKindInfo kind = CrossSectionCatalog.Find(spec.Kind, spec.Context);
        string free = kind.Solvable.FirstOrDefault(s => string.Equals(s, freeDimension?.Trim(), StringComparison.OrdinalIgnoreCase))
            ?? throw new InputException($"{spec.Context}: cannot solve {kind.Name} for '{freeDimension}'; solvable: {string.Join(", ", kind.Solvable)}");
        if (!(targetZ0 > 0) || !double.IsFinite(targetZ0))
            throw new InputException($"{spec.Context}: {spec.Label("z0")} must be > 0 ohm (got {targetZ0} ohm)");

        string what = kind.Pair ? "Zdiff" : "Z0";
        (double lo, double hi) = SearchRange(spec, kind.Name, free);
        // Checks every other value (and their relations) once, with the user's key names.
        Compute(spec.With(free, lo), frequencyHz);

        double G(double logX) => Math.Log(Compute(spec.With(free, Math.Exp(logX)), frequencyHz).Z0 / targetZ0);
        double a = Math.Log(lo), b = Math.Log(hi);
        double prevX = a, prevG = G(a), zMin = Math.Exp(prevG), zMax = zMin;
        for (int i = 1; i <= ScanPoints; i++)
        {
            double x = a + (b - a) * i / ScanPoints, g = G(x);
            zMin = Math.Min(zMin, Math.Exp(g)); zMax = Math.Max(zMax, Math.Exp(g));
            if (g == 0 || Math.Sign(g) != Math.Sign(prevG))
            {
                double root = g == 0 ? x : Brent.FindRoot(G, prevX, x, 1e-12, 200);
                double value = Math.Exp(root);
                return new SynthesisResult(free, value, Compute(spec.With(free, value), frequencyHz));
            }
            (prevX, prevG) = (x, g);
        }
        throw new InputException($"{spec.Context}: no {spec.Label(free)} between {FormatValue(free, lo)} and {FormatValue(free, hi)} gives {what} = {Quantity.Format(targetZ0, "ohm")}; "
                                 + $"{what} there spans {Quantity.Format(zMin * targetZ0, "ohm")} to {Quantity.Format(zMax * targetZ0, "ohm")}");
    }

    static (double Lo, double Hi) SearchRange(CrossSectionSpec spec, string kind, string free)
    {
        double Get(string k, double fallback = double.NaN)
        {
            foreach (var (key, v) in spec.Dimensions)
                if (string.Equals(key, k, StringComparison.OrdinalIgnoreCase)) return v;
            if (double.IsNaN(fallback))
                throw new InputException($"{spec.Context}: missing '{spec.Label(k)}' for {kind}; it is needed to solve for {spec.Label(free)}");
            return fallback;
        }
        const double Wide = 1e4, Tight = 1 + 1e-9;
        if (free == "er") return (1, 1e3);
        return (kind, free) switch
        {
            (CrossSectionCatalog.Microstrip, "width") => (Get("height") / Wide, Get("height") * Wide),
            (CrossSectionCatalog.Microstrip, "height") => (Get("width") / Wide, Get("width") * Wide),
            // Kirschning and Jansen's formulas stay finite for u = w/h in 0.01..100 (their stated range is 0.1..10).
            (CrossSectionCatalog.CoupledMicrostrip, "width") => (Get("height") / 100, Get("height") * 100),
            (CrossSectionCatalog.CoupledStripline, "width") => (Get("spacing") / Wide, Get("spacing") * Wide),
            (CrossSectionCatalog.Stripline, "width") => (Get("spacing") / Wide, Get("spacing") * Wide),
            (CrossSectionCatalog.Stripline, "spacing") =>
                (Math.Max(Get("width") / Wide, (Get("thickness", 0) + 2 * Math.Abs(Get("offset", 0))) * (1 + 1e-6)), Get("width") * Wide),
            (CrossSectionCatalog.Coax, "inner") => (Get("outer") / Wide, Get("outer") / Tight),
            (CrossSectionCatalog.Coax, "outer") => (Get("inner") * Tight, Get("inner") * Wide),
            (_, "diameter") => (Get("spacing") / Wide, Get("spacing") / Tight),
            (_, "spacing") => (Get("diameter") * Tight, Get("diameter") * Wide),
            _ => throw new InputException($"{spec.Context}: cannot solve {kind} for '{free}'"),
        };
    }
}
