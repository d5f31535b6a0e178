using WaveSim.Core.Buffers;

namespace WaveSim.Core.Model;

/// <summary>
/// A buffer model used at a pin of the net (a receiver's load, later a driver): the model as read from its file, the corner
/// the run takes, and the package parasitics of the component whose pins name the model.
/// </summary>
/// <param name="File">The file as the scenario writes it (relative to the scenario file), for descriptions.</param>
/// <param name="Model">The [Model], every corner kept, so a variant may change <paramref name="Corner"/>.</param>
/// <param name="Corner">The corner whose columns the run takes.</param>
/// <param name="Package">The component's [Package] (R_pkg, L_pkg in series from the pin to the pad, C_pkg at the pin); null
/// when the file gives none.</param>
public sealed record BufferSpec(string File, BufferModel Model, Corner Corner, PackageParasitics? Package)
{
    /// <summary>The corner as the scenario writes it: typ, min or max.</summary>
    public string CornerName => Corner.ToString().ToLowerInvariant();

    /// <summary>The model's laws of the pad voltage in <see cref="Corner"/>.</summary>
    public BufferCurves Curves => Model.Curves(Corner);

    /// <summary>R_pkg of the corner (Ω); 0 without a package.</summary>
    public double PackageR => Package?.R.At(Corner) ?? 0;

    /// <summary>L_pkg of the corner (H); 0 without a package.</summary>
    public double PackageL => Package?.L.At(Corner) ?? 0;

    /// <summary>C_pkg of the corner (F); 0 without a package.</summary>
    public double PackageC => Package?.C.At(Corner) ?? 0;

    /// <summary>
    /// The receiver's I-V law at the pad: [GND Clamp] plus [POWER Clamp] in pad voltage, summed on the union of their points
    /// (exact: the sum of two piecewise-linear laws is linear between the union's points, and beyond the ends its slope is the
    /// sum of the end slopes); null when the model has no clamp.
    /// </summary>
    public IvCurve? ClampLaw()
    {
        var c = Curves;
        IvCurve?[] laws = [c.GndClamp, c.PowerClamp];
        var present = laws.OfType<IvCurve>().ToArray();
        if (present.Length == 0) return null;
        if (present.Length == 1) return present[0];
        var v = present.SelectMany(l => l.Voltages).Distinct().Order().ToArray();
        return IvCurve.Create(v.Select(x => (x, c.ClampCurrent(x))).ToArray(), $"{Model.Source}: [Model] {Model.Name}: clamps");
    }

    /// <summary>
    /// The driver's effective output resistance (Ω) for termination design: the mean of its small-signal resistances near the
    /// high and the low level (1/slope of the I-V curves there, <see cref="BufferCurves.OutputResistanceHigh"/> and
    /// <see cref="BufferCurves.OutputResistanceLow"/>), the one it has where only one is defined; null when neither is.
    /// </summary>
    public double? OutputResistance
    {
        get
        {
            var c = Curves;
            double?[] r = [c.OutputResistanceHigh, c.OutputResistanceLow];
            var known = r.OfType<double>().ToArray();
            return known.Length == 0 ? null : known.Average();
        }
    }

    /// <summary>What a plan listing shows of the buffer: model, type and corner, then its levels and edges (a driver) or its
    /// thresholds (a receiver), C_comp and the package.</summary>
    public IReadOnlyList<string> Summary(bool driver)
    {
        static string V(double v) => Units.Quantity.Format(v, "V", 3);
        var c = Curves;
        var lines = new List<string> { $"{Describe()}: Model_type {Model.TypeName}, corner {CornerName}" };
        if (driver)
        {
            string high = c.Pullup is not null ? V(c.HighReference) : "open drain";
            lines.Add($"levels {V(c.LowReference)} / {high}; output resistance {R(c.OutputResistanceHigh)} near the high level, {R(c.OutputResistanceLow)} near the low");
            if (Model.Ramp is { } ramp)
                lines.Add($"[Ramp] 20-80 %: rise {V(ramp.Rising.DeltaV.At(Corner))} in {Units.Quantity.Format(ramp.Rising.DeltaT.At(Corner), "s", 3)}, " +
                          $"fall {V(ramp.Falling.DeltaV.At(Corner))} in {Units.Quantity.Format(ramp.Falling.DeltaT.At(Corner), "s", 3)}");
        }
        else if (Model.Vinh is { } vinh && Model.Vinl is { } vinl)
            lines.Add($"thresholds Vinh {V(vinh)}, Vinl {V(vinl)}");
        lines.Add($"C_comp {Units.Quantity.Format(c.CComp, "F", 3)}" + (Package is null ? ", no package"
            : $", package R {Units.Quantity.Format(PackageR, "Ω", 3)}, L {Units.Quantity.Format(PackageL, "H", 3)}, C {Units.Quantity.Format(PackageC, "F", 3)}"));
        return lines;
    }

    static string R(double? r) => r is { } x ? Units.Quantity.Format(x, "Ω", 3) : "none";

    /// <summary>Every buffer of <paramref name="s"/> with where it sits (source, load, BRANCH/load) and whether it drives.</summary>
    public static IEnumerable<(string At, BufferSpec Buffer, bool Driver)> Of(Scenario s)
    {
        ArgumentNullException.ThrowIfNull(s);
        if (s.Source.Buffer is { } d) yield return ("source", d, true);
        foreach (var x in Loads(s.Line, s.Load, "")) yield return x;
    }

    static IEnumerable<(string, BufferSpec, bool)> Loads(IReadOnlyList<LineElement> line, LoadSpec load, string prefix)
    {
        if (load.Buffer is { } b) yield return (prefix + "load", b, false);
        foreach (var br in line.OfType<Branch>())
            foreach (var x in Loads(br.Line, br.Load, prefix + br.Name + "/")) yield return x;
    }

    /// <summary>A short text such as "buffer demo33_in (typ) from demo33.ibs".</summary>
    public string Describe() => $"buffer {Model.Name} ({CornerName}) from {File}";
}
