namespace WaveSim.Core.Rendering;

/// <summary>How values are placed along an axis.</summary>
public enum AxisKind
{
    /// <summary>Position proportional to the value.</summary>
    Linear,

    /// <summary>Position proportional to the base-10 logarithm of the value; values must be greater than 0.</summary>
    Logarithmic,
}
