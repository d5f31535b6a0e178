using WaveSim.Core.Model;

namespace WaveSim.Core.Terminations;

/// <summary>One strategy applied to the user's net.</summary>
/// <param name="Kind">The strategy.</param>
/// <param name="Parts">Its parts (none for <see cref="TerminationKind.None"/>).</param>
/// <param name="Variant">The modified copy of the scenario to simulate; null when the strategy does not apply.</param>
/// <param name="Note">Why the strategy does not apply, or a remark on it; null otherwise.</param>
public sealed record TerminationDesign(TerminationKind Kind, IReadOnlyList<TerminationPart> Parts, Scenario? Variant, string? Note)
{
    /// <summary>The strategy's name as written in outputs: none, series, parallel, thevenin, rc.</summary>
    public string Name => Kind.ToString().ToLowerInvariant();

    /// <summary>For Thevenin: the supply the upper resistor returns to, V.</summary>
    public double SupplyV { get; init; }

    /// <summary>For Thevenin: the chosen Thevenin level, V.</summary>
    public double TheveninV { get; init; }
}
