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

    /// <summary>A short text such as "buffer demo33_in (typ) from demo33.ibs".</summary>
    public string Describe() => $"buffer {Model.Name} ({CornerName}) from {File}";
}
