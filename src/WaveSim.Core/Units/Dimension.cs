namespace WaveSim.Core.Units;

/// <summary>The base physical kinds a scenario quantity can carry.</summary>
public enum BaseKind
{
    /// <summary>A plain number with no unit.</summary>
    Number,
    /// <summary>Volts (V).</summary>
    Voltage,
    /// <summary>Amperes (A).</summary>
    Current,
    /// <summary>Seconds (s).</summary>
    Time,
    /// <summary>Hertz (Hz).</summary>
    Frequency,
    /// <summary>Ohms (ohm, Ω).</summary>
    Resistance,
    /// <summary>Siemens (S).</summary>
    Conductance,
    /// <summary>Farads (F).</summary>
    Capacitance,
    /// <summary>Henries (H).</summary>
    Inductance,
    /// <summary>Metres (m), inches (in), mils (mil), feet (ft).</summary>
    Length,
    /// <summary>Watts (W).</summary>
    Power,
    /// <summary>Metres per second, or a fraction of the speed of light (c).</summary>
    Velocity,
    /// <summary>A ratio written with a percent sign (%), stored as a fraction.</summary>
    Percent,
}

/// <summary>
/// A dimension: a base kind, optionally per unit length (e.g. ohm/m, ns/m, pF/in).
/// </summary>
/// <param name="Kind">The base kind of the numerator.</param>
/// <param name="PerLength">True when the quantity is per unit length (SI: per metre).</param>
public readonly record struct Dimension(BaseKind Kind, bool PerLength = false)
{
    /// <summary>Volts.</summary>
    public static readonly Dimension Voltage = new(BaseKind.Voltage);
    /// <summary>Amperes.</summary>
    public static readonly Dimension Current = new(BaseKind.Current);
    /// <summary>Seconds.</summary>
    public static readonly Dimension Time = new(BaseKind.Time);
    /// <summary>Hertz.</summary>
    public static readonly Dimension Frequency = new(BaseKind.Frequency);
    /// <summary>Ohms.</summary>
    public static readonly Dimension Resistance = new(BaseKind.Resistance);
    /// <summary>Siemens.</summary>
    public static readonly Dimension Conductance = new(BaseKind.Conductance);
    /// <summary>Farads.</summary>
    public static readonly Dimension Capacitance = new(BaseKind.Capacitance);
    /// <summary>Henries.</summary>
    public static readonly Dimension Inductance = new(BaseKind.Inductance);
    /// <summary>Metres.</summary>
    public static readonly Dimension Length = new(BaseKind.Length);
    /// <summary>Watts.</summary>
    public static readonly Dimension Power = new(BaseKind.Power);
    /// <summary>Metres per second.</summary>
    public static readonly Dimension Velocity = new(BaseKind.Velocity);
    /// <summary>A plain number.</summary>
    public static readonly Dimension Number = new(BaseKind.Number);
    /// <summary>A percentage, stored as a fraction (10 % = 0.1).</summary>
    public static readonly Dimension Percent = new(BaseKind.Percent);
    /// <summary>Ohms per metre.</summary>
    public static readonly Dimension ResistancePerLength = new(BaseKind.Resistance, true);
    /// <summary>Siemens per metre.</summary>
    public static readonly Dimension ConductancePerLength = new(BaseKind.Conductance, true);
    /// <summary>Farads per metre.</summary>
    public static readonly Dimension CapacitancePerLength = new(BaseKind.Capacitance, true);
    /// <summary>Henries per metre.</summary>
    public static readonly Dimension InductancePerLength = new(BaseKind.Inductance, true);
    /// <summary>Seconds per metre (a delay per length).</summary>
    public static readonly Dimension DelayPerLength = new(BaseKind.Time, true);

    /// <summary>
    /// The magnitudes accepted for a value of this dimension, SI (zero is always accepted; the sign is checked where it
    /// matters). Null for plain numbers and percentages, whose meaning depends on the key. The ranges reach far past any
    /// signal-integrity use while keeping every product the solver forms finite (common practice, no source); the table
    /// is in docs/scenario-format.md.
    /// </summary>
    public (double Min, double Max)? SensibleRange => (Kind, PerLength) switch
    {
        (BaseKind.Voltage, false) => (1e-12, 1e6),
        (BaseKind.Current, false) => (1e-15, 1e6),
        (BaseKind.Time, false) => (1e-18, 1e3),
        (BaseKind.Frequency, false) => (1e-3, 1e15),
        (BaseKind.Resistance, false) => (1e-6, 1e12),
        (BaseKind.Conductance, false) => (1e-12, 1e6),
        (BaseKind.Capacitance, false) => (1e-18, 1.0),
        (BaseKind.Inductance, false) => (1e-15, 1e3),
        (BaseKind.Length, false) => (1e-9, 1e6),
        (BaseKind.Power, false) => (1e-15, 1e9),
        (BaseKind.Velocity, false) => (1e3, 1e9),
        (BaseKind.Time, true) => (1e-10, 1e-3),
        (BaseKind.Resistance, true) => (1e-9, 1e12),
        (BaseKind.Conductance, true) => (1e-15, 1e9),
        (BaseKind.Capacitance, true) => (1e-15, 1e-6),
        (BaseKind.Inductance, true) => (1e-12, 1e-2),
        _ => null,
    };

    /// <summary>The SI unit symbol of this dimension, e.g. "ohm/m", "s"; empty for a plain number.</summary>
    public string SiUnit => (Kind switch
    {
        BaseKind.Voltage => "V",
        BaseKind.Current => "A",
        BaseKind.Time => "s",
        BaseKind.Frequency => "Hz",
        BaseKind.Resistance => "ohm",
        BaseKind.Conductance => "S",
        BaseKind.Capacitance => "F",
        BaseKind.Inductance => "H",
        BaseKind.Length => "m",
        BaseKind.Power => "W",
        BaseKind.Velocity => "m/s",
        BaseKind.Percent => "%",
        _ => "",
    }) + (PerLength ? "/m" : "");

    /// <summary>Words for the dimension, as used in error messages ("a resistance per length").</summary>
    public string Describe() => (Kind switch
    {
        BaseKind.Number => "a plain number",
        BaseKind.Voltage => "a voltage",
        BaseKind.Current => "a current",
        BaseKind.Time => PerLength ? "a delay per length" : "a time",
        BaseKind.Frequency => "a frequency",
        BaseKind.Resistance => "a resistance",
        BaseKind.Conductance => "a conductance",
        BaseKind.Capacitance => "a capacitance",
        BaseKind.Inductance => "an inductance",
        BaseKind.Length => "a length",
        BaseKind.Power => "a power",
        BaseKind.Velocity => "a velocity",
        BaseKind.Percent => "a percentage",
        _ => Kind.ToString(),
    }) + (PerLength && Kind != BaseKind.Time ? " per length" : "");

    /// <summary>Example units accepted for this dimension, for error messages.</summary>
    public string Examples()
    {
        string num = Kind switch
        {
            BaseKind.Number => "",
            BaseKind.Voltage => "V, mV, kV",
            BaseKind.Current => "A, mA, uA",
            BaseKind.Time => "s, ms, us, ns, ps, fs",
            BaseKind.Frequency => "Hz, kHz, MHz, GHz",
            BaseKind.Resistance => "ohm, Ω, mohm, kohm, Mohm",
            BaseKind.Conductance => "S, mS, uS",
            BaseKind.Capacitance => "F, uF, nF, pF, fF",
            BaseKind.Inductance => "H, mH, uH, nH, pH",
            BaseKind.Length => "m, cm, mm, um, in, mil, ft",
            BaseKind.Power => "W, mW",
            BaseKind.Velocity => "c (fraction of the speed of light), m/s",
            BaseKind.Percent => "%",
            _ => "",
        };
        if (Kind == BaseKind.Number) return "no unit";
        if (!PerLength) return num;
        string first = Kind switch
        {
            BaseKind.Time => "ns/m, ps/in, ns/ft",
            BaseKind.Resistance => "ohm/m, kohm/m, ohm/in",
            BaseKind.Conductance => "S/m, mS/m, uS/in",
            BaseKind.Capacitance => "pF/m, pF/in",
            BaseKind.Inductance => "nH/m, nH/in",
            _ => "…/m",
        };
        return first + " (over /m, /cm, /mm, /in, /ft, /mil)";
    }
}
