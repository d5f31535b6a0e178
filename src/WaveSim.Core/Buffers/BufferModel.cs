namespace WaveSim.Core.Buffers;

/// <summary>
/// One [Model] of a buffer model file, as read: its type, thresholds, C_comp, voltage references, I-V tables, [Ramp] and
/// switching waveforms, each with its typ/min/max columns. <see cref="Curves"/> turns the tables of one corner into laws of
/// the pin voltage.
/// </summary>
public sealed record BufferModel
{
    /// <summary>The file the model was read from, for messages.</summary>
    public required string Source { get; init; }

    /// <summary>The model name.</summary>
    public required string Name { get; init; }

    /// <summary>Model_type.</summary>
    public required BufferModelType Type { get; init; }

    /// <summary>The [Model] keyword's line.</summary>
    public required int Line { get; init; }

    /// <summary>C_comp (F): the die capacitance from the pad to ground.</summary>
    public required CornerValue CComp { get; init; }

    /// <summary>Polarity (Non-Inverting or Inverting), as written; null when not given.</summary>
    public string? Polarity { get; init; }

    /// <summary>True when <see cref="Polarity"/> is Inverting: the pin goes low where the input goes high.</summary>
    public bool Inverts => string.Equals(Polarity?.Trim(), "Inverting", StringComparison.OrdinalIgnoreCase);

    /// <summary>Enable (Active-High or Active-Low), as written; null when not given.</summary>
    public string? Enable { get; init; }

    /// <summary>Vinl (V): the highest input voltage read as low.</summary>
    public double? Vinl { get; init; }

    /// <summary>Vinh (V): the lowest input voltage read as high.</summary>
    public double? Vinh { get; init; }

    /// <summary>Vmeas (V): the level at which the driver's timing is measured.</summary>
    public double? Vmeas { get; init; }

    /// <summary>Vref (V): the voltage Rref returns to in the timing test load.</summary>
    public double? Vref { get; init; }

    /// <summary>Cref (F): the capacitance of the timing test load.</summary>
    public double? Cref { get; init; }

    /// <summary>Rref (Ω): the resistance of the timing test load.</summary>
    public double? Rref { get; init; }

    /// <summary>[Voltage Range] (V): the supply, per corner.</summary>
    public CornerValue? VoltageRange { get; init; }

    /// <summary>[Pullup Reference] (V); when absent the pullup refers to <see cref="VoltageRange"/>.</summary>
    public CornerValue? PullupReference { get; init; }

    /// <summary>[Pulldown Reference] (V); when absent the pulldown refers to 0 V.</summary>
    public CornerValue? PulldownReference { get; init; }

    /// <summary>[GND Clamp Reference] (V); when absent the ground clamp refers to 0 V.</summary>
    public CornerValue? GndClampReference { get; init; }

    /// <summary>[POWER Clamp Reference] (V); when absent the power clamp refers to <see cref="VoltageRange"/>.</summary>
    public CornerValue? PowerClampReference { get; init; }

    /// <summary>[Pulldown]: current into the pin against pin voltage minus the pulldown reference.</summary>
    public CornerTable? Pulldown { get; init; }

    /// <summary>[Pullup]: current into the pin against the pullup reference minus the pin voltage.</summary>
    public CornerTable? Pullup { get; init; }

    /// <summary>[GND Clamp]: current into the pin against pin voltage minus the ground-clamp reference.</summary>
    public CornerTable? GndClamp { get; init; }

    /// <summary>[POWER Clamp]: current into the pin against the power-clamp reference minus the pin voltage.</summary>
    public CornerTable? PowerClamp { get; init; }

    /// <summary>[Ramp], required for every driving model.</summary>
    public BufferRamp? Ramp { get; init; }

    /// <summary>[Rising Waveform] tables in file order.</summary>
    public IReadOnlyList<SwitchingWaveform> RisingWaveforms { get; init; } = [];

    /// <summary>[Falling Waveform] tables in file order.</summary>
    public IReadOnlyList<SwitchingWaveform> FallingWaveforms { get; init; } = [];

    /// <summary>True when the model has an I-V table its type uses (clamps always; the pulldown, and the pullup of a
    /// push-pull driver, when it drives). A receiver may have none: C_comp only.</summary>
    public bool HasIvTables => GndClamp is not null || PowerClamp is not null
        || (Drives && (Pulldown is not null || (Type != BufferModelType.OpenDrain && Pullup is not null)));

    /// <summary>True for every type that drives the pin (all but Input).</summary>
    public bool Drives => Type != BufferModelType.Input;

    /// <summary>The voltage the pullup refers to in <paramref name="corner"/> (V).</summary>
    public double PullupReferenceAt(Corner corner) => (PullupReference ?? VoltageRange)?.At(corner)
        ?? throw new InputException($"{Source}:{Line}: [Model] {Name}: needs [Voltage Range] or [Pullup Reference]");

    /// <summary>The voltage the pulldown refers to in <paramref name="corner"/> (V).</summary>
    public double PulldownReferenceAt(Corner corner) => PulldownReference?.At(corner) ?? 0;

    /// <summary>The voltage the ground clamp refers to in <paramref name="corner"/> (V).</summary>
    public double GndClampReferenceAt(Corner corner) => GndClampReference?.At(corner) ?? 0;

    /// <summary>The voltage the power clamp refers to in <paramref name="corner"/> (V).</summary>
    public double PowerClampReferenceAt(Corner corner) => (PowerClampReference ?? VoltageRange)?.At(corner)
        ?? throw new InputException($"{Source}:{Line}: [Model] {Name}: needs [Voltage Range] or [POWER Clamp Reference]");

    /// <summary>The Model_type keyword as the standard writes it.</summary>
    public string TypeName => Type switch
    {
        BufferModelType.Input => "Input",
        BufferModelType.Output => "Output",
        BufferModelType.InputOutput => "I/O",
        BufferModelType.ThreeState => "3-state",
        _ => "Open_drain",
    };

    /// <summary>
    /// True when the file gives <paramref name="corner"/> somewhere in this model: typ always; min or max when any table, C_comp,
    /// voltage, ramp or fixture of the model has a number (not NA) in that column.
    /// </summary>
    public bool HasCorner(Corner corner)
    {
        if (corner == Corner.Typ) return true;
        CornerValue?[] values = [CComp, VoltageRange, PullupReference, PulldownReference, GndClampReference, PowerClampReference];
        if (values.Any(v => v is { } x && x.Has(corner))) return true;
        CornerTable?[] tables = [Pulldown, Pullup, GndClamp, PowerClamp];
        if (tables.Any(t => t is not null && t.Has(corner))) return true;
        if (Ramp is { } r && (r.Rising.DeltaT.Has(corner) || r.Falling.DeltaT.Has(corner))) return true;
        return RisingWaveforms.Concat(FallingWaveforms).Any(w => w.Table.Has(corner) || w.VFixture.Has(corner));
    }

    /// <summary>The corners the file gives for this model (<see cref="HasCorner"/>), typ first.</summary>
    public IReadOnlyList<Corner> Corners => [.. Enum.GetValues<Corner>().Where(HasCorner)];

    /// <summary>Checks that the model gives <paramref name="corner"/>.</summary>
    /// <exception cref="InputException">Every entry of that column is NA or absent.</exception>
    public void RequireCorner(Corner corner)
    {
        if (!HasCorner(corner))
            throw new InputException($"{Source}:{Line}: [Model] {Name}: has no {corner.ToString().ToLowerInvariant()} corner " +
                                     $"(every {corner.ToString().ToLowerInvariant()} column is NA); corners given: " +
                                     string.Join(", ", Corners.Select(c => c.ToString().ToLowerInvariant())));
    }

    /// <summary>The model's laws of the pin voltage in <paramref name="corner"/> (<see cref="BufferCurves"/>).</summary>
    /// <exception cref="InputException">The model does not give the corner.</exception>
    public BufferCurves Curves(Corner corner)
    {
        RequireCorner(corner);
        IvCurve? up = Pullup is null ? null : Referred(Pullup, corner, PullupReferenceAt(corner), fromReference: true);
        IvCurve? down = Pulldown is null ? null : Referred(Pulldown, corner, PulldownReferenceAt(corner), fromReference: false);
        IvCurve? gnd = GndClamp is null ? null : Referred(GndClamp, corner, GndClampReferenceAt(corner), fromReference: false);
        IvCurve? power = PowerClamp is null ? null : Referred(PowerClamp, corner, PowerClampReferenceAt(corner), fromReference: true);
        double high = Pullup is null ? double.NaN : PullupReferenceAt(corner);
        return new BufferCurves(corner, up, down, gnd, power, CComp.At(corner), high, PulldownReferenceAt(corner));
    }

    /// <summary>
    /// A table in pin voltage: a table against pin minus reference shifts by the reference; one against reference minus pin
    /// ([Pullup], [POWER Clamp], as the standard defines them) is mirrored, V_pin = V_ref − V_table, and read backwards.
    /// </summary>
    IvCurve Referred(CornerTable table, Corner corner, double reference, bool fromReference)
    {
        var points = table.At(corner).Select(p => (fromReference ? reference - p.X : reference + p.X, p.Y));
        if (fromReference) points = points.Reverse();
        return IvCurve.Create([.. points], $"{Source}:{table.Line}: [Model] {Name}: {table.Keyword} ({corner.ToString().ToLowerInvariant()})");
    }
}
