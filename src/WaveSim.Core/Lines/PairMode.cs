namespace WaveSim.Core.Lines;

/// <summary>How a coupled pair is driven when it stands in a scenario as one line.</summary>
public enum PairMode
{
    /// <summary>Opposite signals on the two strips: Z0 = Zdiff = 2 Z0o, delay from the odd-mode eps_eff.</summary>
    Differential,
    /// <summary>The same signal on both strips: Z0 = Zcomm = Z0e/2, delay from the even-mode eps_eff.</summary>
    Common,
}
