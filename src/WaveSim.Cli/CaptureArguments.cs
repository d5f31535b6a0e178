using System.CommandLine;
using System.Globalization;
using WaveSim.Core;
using WaveSim.Core.Measurements;

namespace WaveSim.Cli;

/// <summary>The capture options shared by compare, fit and tdr: --capture, --skip, --time-col, --volt-col, --time-unit, --volt-scale.</summary>
public sealed class CaptureArguments
{
    /// <summary>Seconds per unit accepted by --time-unit.</summary>
    public static readonly IReadOnlyDictionary<string, double> TimeUnits = new Dictionary<string, double>
    {
        ["s"] = 1, ["ms"] = 1e-3, ["us"] = 1e-6, ["ns"] = 1e-9, ["ps"] = 1e-12,
    };

    /// <summary>--capture FILE.</summary>
    public Option<string?> File { get; }
    /// <summary>--skip N.</summary>
    public Option<int?> Skip { get; } = new("--skip") { Description = "Lines to skip before the header or first data row (default: found automatically)", HelpName = "N" };
    /// <summary>--time-col NAME|N.</summary>
    public Option<string?> TimeColumn { get; } = new("--time-col") { Description = "Time column: header name or 1-based number (default: first numeric column)", HelpName = "NAME|N" };
    /// <summary>--volt-col NAME|N.</summary>
    public Option<string?> VoltColumn { get; } = new("--volt-col") { Description = "Voltage column: header name or 1-based number (default: next numeric column)", HelpName = "NAME|N" };
    /// <summary>--time-unit s|ms|us|ns|ps.</summary>
    public Option<string> TimeUnit { get; }
    /// <summary>--volt-scale X.</summary>
    public Option<string> VoltScale { get; } = new("--volt-scale") { Description = "Volts per file unit, e.g. 0.001 for mV or -1 for an inverted probe", HelpName = "X", DefaultValueFactory = _ => "1" };

    /// <summary>Creates the options; <paramref name="required"/> makes --capture mandatory.</summary>
    /// <param name="required">True for commands that cannot work without a capture.</param>
    public CaptureArguments(bool required)
    {
        File = new Option<string?>("--capture") { Description = "Measured waveform: delimited text, time and voltage columns", HelpName = "FILE", Required = required };
        TimeUnit = new Option<string>("--time-unit") { Description = "Unit of the time column", DefaultValueFactory = _ => "s" };
        TimeUnit.AcceptOnlyFromAmong([.. TimeUnits.Keys]);
    }

    /// <summary>Adds every option to <paramref name="command"/>.</summary>
    /// <param name="command">The command.</param>
    public void AddTo(Command command)
    {
        command.Options.Add(File);
        command.Options.Add(Skip);
        command.Options.Add(TimeColumn);
        command.Options.Add(VoltColumn);
        command.Options.Add(TimeUnit);
        command.Options.Add(VoltScale);
    }

    /// <summary>Reads the capture named by --capture, or null when the option was not given.</summary>
    /// <param name="pr">The parse result.</param>
    /// <returns>The capture in s and V.</returns>
    /// <exception cref="InputException">A bad option value or a malformed file.</exception>
    public Capture? Read(ParseResult pr)
    {
        string? path = pr.GetValue(File);
        if (path is null) return null;
        string scaleText = pr.GetValue(VoltScale)!;
        if (!double.TryParse(scaleText, NumberStyles.Float, CultureInfo.InvariantCulture, out double scale) || scale == 0 || !double.IsFinite(scale))
            throw new InputException($"--volt-scale: expected a non-zero number of volts per file unit, e.g. 0.001, got '{scaleText}'");
        var options = new CaptureOptions
        {
            Skip = pr.GetValue(Skip),
            TimeColumn = pr.GetValue(TimeColumn),
            VoltColumn = pr.GetValue(VoltColumn),
            TimeScale = TimeUnits[pr.GetValue(TimeUnit)!],
            VoltScale = scale,
        };
        return CaptureReader.Read(path, options);
    }

    /// <summary>The required --probe option: the scenario probe a capture was taken at.</summary>
    public static Option<string> ProbeOption() =>
        new("--probe") { Description = "The scenario probe the capture was taken at", Required = true, HelpName = "NAME" };

    /// <summary>Prints the capture's warnings (dropped rows) on <paramref name="error"/>.</summary>
    /// <param name="capture">The capture.</param>
    /// <param name="error">Standard error.</param>
    public static void Warn(Capture capture, TextWriter error)
    {
        foreach (string w in capture.Warnings) error.WriteLine("warning: " + w);
    }

    /// <summary>Prints the capture's warnings and, when its time span is wildly out of scale with the scenario's duration, that too.</summary>
    /// <param name="capture">The capture.</param>
    /// <param name="simulationDuration">The scenario's simulated duration, s.</param>
    /// <param name="error">Standard error.</param>
    public static void Warn(Capture capture, double simulationDuration, TextWriter error)
    {
        Warn(capture, error);
        foreach (string w in CaptureTimeSpan.Warnings(capture, simulationDuration)) error.WriteLine("warning: " + w);
    }
}
