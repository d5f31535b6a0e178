namespace WaveSim.Core.Sweeps;

/// <summary>How the values of a <see cref="SweepAxis"/> were given.</summary>
public enum SweepSpacing
{
    /// <summary>Listed one by one: <c>a,b,c</c>.</summary>
    List,

    /// <summary>A range evenly spaced in value: <c>start..stop:count</c>.</summary>
    Linear,

    /// <summary>A range evenly spaced in the logarithm: <c>start..stop:count:log</c>.</summary>
    Logarithmic,
}
