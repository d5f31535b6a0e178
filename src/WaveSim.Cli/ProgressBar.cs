namespace WaveSim.Cli;

/// <summary>A one-line progress bar on stderr, shown only when stderr is a terminal (never in CI logs or redirected output).</summary>
public sealed class ProgressBar : IProgress<double>, IDisposable
{
    readonly TextWriter _err;
    readonly string _label;
    readonly bool _enabled;
    int _last = -1;
    string _note = "";
    int _width;

    /// <summary>Creates a bar labelled <paramref name="label"/>; it stays silent unless stderr is an interactive terminal.</summary>
    public ProgressBar(TextWriter err, string label)
    {
        _err = err; _label = label;
        _enabled = ReferenceEquals(err, Console.Error) && !Console.IsErrorRedirected && Environment.GetEnvironmentVariable("CI") is null;
    }

    /// <inheritdoc/>
    public void Report(double value) => Report(value, "");

    /// <summary>Shows the fraction done with a note after it (e.g. the rate and time left); redrawn when the percentage or the note changes.</summary>
    public void Report(double value, string note)
    {
        if (!_enabled) return;
        int pct = (int)Math.Clamp(value * 100, 0, 100);
        if (pct == _last && note == _note) return;
        _last = pct;
        _note = note;
        _width = Math.Max(_width, note.Length);
        int filled = pct * 30 / 100;
        lock (_err) _err.Write($"\r{_label} [{new string('#', filled)}{new string('.', 30 - filled)}] {pct,3}% {note.PadRight(_width)}");
    }

    /// <summary>Clears the bar's line.</summary>
    public void Dispose()
    {
        if (_enabled && _last >= 0) _err.Write("\r" + new string(' ', _label.Length + 41 + _width) + "\r");
    }
}
