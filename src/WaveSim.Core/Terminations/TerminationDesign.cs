using WaveSim.Core.Model;

namespace WaveSim.Core.Terminations;

/// <summary>One strategy applied to the user's net.</summary>
/// <param name="Kind">The strategy.</param>
/// <param name="Parts">Its parts (none for <see cref="TerminationKind.None"/>).</param>
/// <param name="Variant">The modified copy of the scenario to simulate; null when the strategy does not apply.</param>
/// <param name="Note">Why the strategy does not apply, or what it changes in the net as drawn (adds, replaces, removes); null when nothing.</param>
public sealed record TerminationDesign(TerminationKind Kind, IReadOnlyList<TerminationPart> Parts, Scenario? Variant, string? Note)
{
    /// <summary>The strategy's name as written in outputs: as drawn, none, series, parallel, thevenin, rc.</summary>
    public string Name => Kind == TerminationKind.AsDrawn ? AsDrawnName : Kind.ToString().ToLowerInvariant();

    /// <summary>The name of the first row, the net exactly as the scenario draws it.</summary>
    public const string AsDrawnName = "as drawn";

    /// <summary>For Thevenin: the supply the upper resistor returns to, V.</summary>
    public double SupplyV { get; init; }

    /// <summary>For Thevenin: the level asked for (<see cref="TerminationOptions.TheveninLevelV"/>, or its default), V.</summary>
    public double TargetTheveninV { get; init; }

    /// <summary>
    /// For Thevenin: the level the chosen preferred-value pair actually gives, Vcc·R2/(R1 + R2), V. It is what is simulated,
    /// and it differs from <see cref="TargetTheveninV"/> by the rounding of R1 and R2.
    /// </summary>
    public double TheveninV { get; init; }
}
