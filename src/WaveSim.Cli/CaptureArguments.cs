using System.CommandLine;
using System.Globalization;
using WaveSim.Cli.Parsing;
using WaveSim.Core;
using WaveSim.Core.Measurements;

namespace WaveSim.Cli;

/// <summary>The capture options shared by compare, fit and tdr: --capture, --skip, --time-col, --volt-col, --time-unit, --volt-scale.</summary>
public sealed class CaptureArguments
{
    /// <summary>Seconds per unit accepted by --time-unit.</summary>
    public static readonly IReadOnlyList<(string Name, double Seconds)> TimeUnits = [("s", 1), ("ms", 1e-3), ("us", 1e-6), ("ns", 1e-9), ("ps", 1e-12)];

    /// <summary>--capture FILE.</summary>
    public Option<string?> File { get; }
    /// <summary>--skip N.</summary>
    public Option<int?> Skip { get; } = IntegerOption.Optional("--skip", "Lines to skip before the header or first data row (default: found automatically)", 0, int.MaxValue, "N");
    /// <summary>--time-col NAME|N.</summary>
    public Option<string?> TimeColumn { get; } = new("--time-col") { Description = "Time column: header name or 1-based number (default: first numeric column)", HelpName = "NAME|N" };
    /// <summary>--volt-col NAME|N.</summary>
    public Option<string?> VoltColumn { get; } = new("--volt-col") { Description = "Voltage column: header name or 1-based number (default: next numeric column)", HelpName = "NAME|N" };
    /// <summary>--time-unit s|ms|us|ns|ps.</summary>
    public Option<double> TimeUnit { get; } = ChoiceOption.Create("--time-unit", "Unit of the time column", TimeUnits, "s");
    /// <summary>--volt-scale X.</summary>
    public Option<double> VoltScale { get; } = OptionValue.Create("--volt-scale", "Volts per file unit, e.g. 0.001 for mV or -1 for an inverted probe", ReadScale, "1", "X");

    /// <summary>Creates the options; <paramref name="required"/> makes --capture mandatory.</summary>
    /// <param name="required">True for commands that cannot work without a capture.</param>
    public CaptureArguments(bool required)
    {
        File = new Option<string?>("--capture") { Description = "Measured waveform: delimited text, time and voltage columns", HelpName = "FILE", Required = required };
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
        var options = new CaptureOptions
        {
            Skip = pr.GetValue(Skip),
            TimeColumn = pr.GetValue(TimeColumn),
            VoltColumn = pr.GetValue(VoltColumn),
            TimeScale = pr.GetValue(TimeUnit),
            VoltScale = pr.GetValue(VoltScale),
        };
        return CaptureReader.Read(path, options);
    }

    static double ReadScale(string text) =>
        double.TryParse(text, NumberStyles.Float, CultureInfo.InvariantCulture, out double scale) && scale != 0 && double.IsFinite(scale) ? scale
        : throw new OptionValueException($"expected a non-zero number of volts per file unit, e.g. 0.001, got '{text}'");

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
