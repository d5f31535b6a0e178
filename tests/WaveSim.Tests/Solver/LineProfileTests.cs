namespace WaveSim.Tests.Solver;

/// <summary>The line profile built from the compact node list: the grid definition z_k = z_start + k·length/n per segment.</summary>
public class LineProfileTests
{
    [Fact]
    public void Profile_has_every_grid_node_at_k_times_dz_in_each_segment()
    {
        var r = TestScenarios.Run(@"
source: { waveform: step, low: 0 V, high: 1 V, rise: 100 ps, delay: 1 ns, resistance: 50 ohm }
line: [ { segment: { length: 0.2 m, z0: 50 ohm, delay: 1 ns } }, { series: { r: 5 ohm } }, { segment: { length: 0.1 m, z0: 60 ohm, delay: 1 ns } } ]
load: { r: 50 ohm }
probes: [ { name: rx, at: load } ]
simulation: { duration: 3 ns }
");
        var pos = r.Lines.Single(l => l.Path == "").Positions;
        int n0 = r.Plan.Segments[0].Cells, n1 = r.Plan.Segments[1].Cells;
        // Nodes: junction, n0−1 interior, junction, junction after the series part, n1−1 interior, load junction.
        Assert.Equal(n0 + 1 + n1 + 1, pos.Length);
        for (int k = 1; k < n0; k++) Assert.Equal(k * (0.2 / n0), pos[k]);
        Assert.Equal(0.2, pos[n0]);
        Assert.Equal(0.2, pos[n0 + 1]);
        for (int k = 1; k < n1; k++) Assert.Equal(0.2 + k * (0.1 / n1), pos[n0 + 1 + k]);
        Assert.Equal(0.3, pos[^1], 1e-15);
    }
}
