namespace WaveSim.Core.Buffers;

/// <summary>One row of a component's [Pin] list.</summary>
/// <param name="Name">The pin name (a number or a ball name).</param>
/// <param name="Signal">The signal name.</param>
/// <param name="Model">The model name: a [Model] of the file, a [Model Selector], or POWER, GND or NC.</param>
/// <param name="R">R_pin (Ω), when given and not NA: replaces R_pkg for this pin.</param>
/// <param name="L">L_pin (H), when given and not NA.</param>
/// <param name="C">C_pin (F), when given and not NA.</param>
/// <param name="Line">The row's line.</param>
public sealed record BufferPin(string Name, string Signal, string Model, double? R, double? L, double? C, int Line)
{
    /// <summary>True when the pin names one of the reserved words POWER, GND or NC rather than a model.</summary>
    public bool IsReserved => BufferFile.ReservedModelNames.Contains(Model);
}
