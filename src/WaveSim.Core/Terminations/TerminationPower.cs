using WaveSim.Core.Model;
using WaveSim.Core.Solver;

namespace WaveSim.Core.Terminations;

/// <summary>
/// Power in a termination's resistors. <see cref="Average"/> is the mean over the record of the simulated v·i of each part
/// (for a resistor v = i·R, so R·⟨i²⟩ from the solver's own step values), which counts what the DC levels miss: the C·V²·f
/// an RC termination burns on every edge, and the time a clock spends at each level. <see cref="At"/> is the static (DC)
/// power in a termination with the driver held at one level: the network's DC operating point (capacitors open,
/// inductors shorted, line resistance included) and Ohm's law, P = I²·R in each resistor of the termination. A load
/// resistor given in the scenario counts as part of the termination. A Thevenin pair is simulated as its equivalent but its
/// power is that of both resistors: (Vcc − V)²/R1 + V²/R2 at the load voltage V. Below 1 pW is reported as 0.
/// </summary>
public static class TerminationPower
{
    /// <summary>Powers below this are reported as 0 W (they come from the DC solution's tiny leak to ground), W.</summary>
    public const double NegligibleW = 1e-12;

    /// <summary>Power in the termination's resistors, W, with the driver's open-circuit voltage at <paramref name="level"/>.</summary>
    /// <exception cref="InputException">The design does not apply (no variant) or the network has no DC solution.</exception>
    public static double At(TerminationDesign design, double level)
    {
        var v = design.Variant ?? throw new InputException($"the {design.Name} termination does not apply: {design.Note}");
        var net = NetworkBuilder.Build(v, GridPlan.For(v));
        var (volts, amps) = DcOperatingPoint.Solution(net, level);
        double p = 0;
        for (int b = 0; b < net.Branches.Count; b++)
        {
            var br = net.Branches[b];
            if (!IsTermination(design, v, br.Label)) continue;
            if (br.C is not null) continue; // a capacitor in the branch: no DC current
            if (design.Kind == TerminationKind.Thevenin && br.Label == "load R")
            {
                double node = volts[br.A];
                double r1 = design.Parts[0].Used, r2 = design.Parts[1].Used;
                p += (design.SupplyV - node) * (design.SupplyV - node) / r1 + node * node / r2;
                continue;
            }
            p += amps[b] * amps[b] * br.R;
        }
        // Below a picowatt is the DC solution's 1e-15 S leak at every junction, not a real current: report it as none.
        return p < NegligibleW ? 0 : p;
    }

    /// <summary>
    /// Mean power over the record in the termination's resistors, W, from a run made with branch averages tracked. A Thevenin
    /// pair, simulated as its equivalent, counts both resistors at the simulated load voltage v:
    /// ⟨(Vcc − v)²⟩/R1 + ⟨v²⟩/R2 = (Vcc² − 2·Vcc·⟨v⟩ + ⟨v²⟩)/R1 + ⟨v²⟩/R2.
    /// </summary>
    /// <exception cref="InvalidOperationException">The run did not track branch averages.</exception>
    public static double Average(TerminationDesign design, SimulationResult run)
    {
        var averages = run.BranchAverages ?? throw new InvalidOperationException("the run did not track the branch averages");
        double p = 0;
        foreach (var a in averages)
        {
            if (!IsTermination(design, run.Scenario, a.Label)) continue;
            if (design.Kind == TerminationKind.Thevenin && a.Label == "load R")
            {
                double r1 = design.Parts[0].Used, r2 = design.Parts[1].Used, vcc = design.SupplyV;
                p += (vcc * vcc - 2 * vcc * a.MeanVoltageA + a.MeanSquareVoltageA) / r1 + a.MeanSquareVoltageA / r2;
                continue;
            }
            p += a.R * a.MeanSquareCurrent;
        }
        return p < NegligibleW ? 0 : p;
    }

    /// <summary>The main load's resistor (the user's own termination, or the strategy's), and the part a strategy added.</summary>
    static bool IsTermination(TerminationDesign d, Scenario v, string label) => label switch
    {
        "load R" => true,
        "line[0] series" => d.Kind == TerminationKind.Series,
        _ => d.Kind == TerminationKind.Rc && label == $"line[{v.Line.Count - 1}] shunt",
    };
}
