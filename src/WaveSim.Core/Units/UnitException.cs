namespace WaveSim.Core.Units;

/// <summary>Thrown when a quantity's text cannot be read as the expected dimension.</summary>
public sealed class UnitException(string message) : Exception(message);
