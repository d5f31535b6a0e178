namespace WaveSim.Core.Measurements;

/// <summary>What a short reflection excursion is taken to be.</summary>
public enum LumpedKind
{
    /// <summary>A dip (ρ below its surroundings): a shunt capacitance to ground.</summary>
    ShuntCapacitance,

    /// <summary>A bump (ρ above its surroundings): a series inductance.</summary>
    SeriesInductance,
}
