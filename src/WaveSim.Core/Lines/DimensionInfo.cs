using WaveSim.Core.Units;

namespace WaveSim.Core.Lines;

/// <summary>One named input of a cross-section (a dimension, a material value or the evaluation frequency).</summary>
/// <param name="Name">Key as written in a scenario geometry and, with "--", as a command-line option.</param>
/// <param name="Dimension">What the value is read as; resistivity is a plain number in ohm m.</param>
/// <param name="Required">True when the key must be given (or be the one solved for).</param>
/// <param name="Description">One line for help texts, including the unit and the default when optional.</param>
public sealed record DimensionInfo(string Name, Dimension Dimension, bool Required, string Description);
