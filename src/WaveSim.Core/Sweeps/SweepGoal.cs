namespace WaveSim.Core.Sweeps;

/// <summary>What the best point minimises or maximises: <c>min:rx.settling</c> or <c>max:rx.noise_margin_high</c>.</summary>
/// <param name="Target">The probe figure.</param>
/// <param name="Maximise">True for max, false for min.</param>
public sealed record SweepGoal(ProbeFigure Target, bool Maximise)
{
    /// <summary>Reads <c>min:PROBE.FIGURE</c> or <c>max:PROBE.FIGURE</c>.</summary>
    /// <exception cref="InputException">Malformed text, unknown probe or figure (naming the <c>text</c> parameter).</exception>
    public static SweepGoal Parse(string text, IReadOnlyList<string> probes)
    {
        int colon = text.IndexOf(':');
        string how = colon > 0 ? text[..colon].Trim() : "";
        if (how is not ("min" or "max"))
            throw new InputException($"'{text}': expected min:PROBE.FIGURE or max:PROBE.FIGURE, e.g. min:rx.settling") { Parameter = "text" };
        return new SweepGoal(FigureSelector.ProbeAndFigure(text[(colon + 1)..], probes), how == "max");
    }

    /// <summary>The goal as written, e.g. "min:rx.settling_s".</summary>
    public override string ToString() => (Maximise ? "max:" : "min:") + Target.Column;
}
