namespace WaveSim.Core.Terminations;

/// <summary>The termination strategies compared by <see cref="TerminationStudy"/>.</summary>
public enum TerminationKind
{
    /// <summary>The net as drawn in the scenario, with the user's own termination (if any): always the first row.</summary>
    AsDrawn,
    /// <summary>The net with the load resistor of the scenario removed (its C, L and receiver kept); does not apply when there is none.</summary>
    None,
    /// <summary>A resistor in series at the driver, Z0 − R_driver.</summary>
    Series,
    /// <summary>A resistor Z0 from the load to 0 V.</summary>
    Parallel,
    /// <summary>Two resistors at the load, to the supply (source high) and to ground, Z0 in parallel.</summary>
    Thevenin,
    /// <summary>R = Z0 in series with C from the load to ground.</summary>
    Rc,
}
