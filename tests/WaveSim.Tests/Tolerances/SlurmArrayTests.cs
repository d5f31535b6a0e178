using System.Diagnostics;

namespace WaveSim.Tests.Tolerances;

/// <summary>
/// deploy/slurm on a real Slurm: a 4-shard montecarlo array and its dependent merge job, checked against an unsharded run.
/// Skipped where sbatch or a slurm.conf is absent, unless WAVESIM_REQUIRE_SLURM=1 (CI starts a one-node cluster, deploy/slurm/ci/cluster.sh).
/// </summary>
public class SlurmArrayTests
{
    static bool OnPath(string name) => (Environment.GetEnvironmentVariable("PATH") ?? "").Split(':')
        .Any(d => d.Length > 0 && File.Exists(Path.Combine(d, name)));

    static (int Code, string Out) Shell(string dir, string file, params string[] args)
    {
        var psi = new ProcessStartInfo(file) { WorkingDirectory = dir, RedirectStandardOutput = true, RedirectStandardError = true };
        foreach (string a in args) psi.ArgumentList.Add(a);
        psi.Environment["WAVESIM"] = Path.Combine(AppContext.BaseDirectory, "wavesim");
        using var p = Process.Start(psi)!;
        string o = p.StandardOutput.ReadToEnd() + p.StandardError.ReadToEnd();
        p.WaitForExit();
        return (p.ExitCode, o);
    }

    [SkippableFact]
    public void Array_and_merge_job_equal_an_unsharded_run()
    {
        bool required = Environment.GetEnvironmentVariable("WAVESIM_REQUIRE_SLURM") == "1";
        bool configured = Environment.GetEnvironmentVariable("SLURM_CONF") is { Length: > 0 } || File.Exists("/etc/slurm/slurm.conf");
        if (!OnPath("sbatch") || !configured)
        {
            Assert.False(required, "WAVESIM_REQUIRE_SLURM=1 but sbatch is not on PATH or no slurm.conf is found (SLURM_CONF)");
            Skip.If(true, "no Slurm here (sbatch and a slurm.conf); CI runs this against a one-node cluster");
        }
        using var t = new CliRunner();
        string file = t.Write("divider.yaml", ToleranceSetTests.Divider);
        string[] args = ["montecarlo", file, "--vary", "load.r=tol(20%)", "--vary", "source.resistance=normal(50, 5 ohm)", "--samples", "12", "--seed", "3", "--limit", "rx.high>0.45V"];
        Assert.Equal(0, CliRunner.Run([.. args, "--out", t.PathOf("whole")]).Code);
        var (code, ids) = Shell(t.Dir, Repository.PathOf("deploy", "slurm", "submit.sh"), ["4", t.PathOf("runs"), .. args]);
        Assert.True(code == 0, ids);
        string jobs = string.Join(",", ids.Trim().Split(' '));
        var clock = Stopwatch.StartNew();   // a bound on waiting, not a timed check
        while (clock.Elapsed < TimeSpan.FromSeconds(100) && Shell(t.Dir, "squeue", "-h", "-j", jobs).Out.Trim().Length > 0) Thread.Sleep(500);
        string merged = Path.Combine(t.PathOf("runs"), "merged");
        Assert.True(File.Exists(Path.Combine(merged, "summary.json")), $"the merge job wrote nothing; jobs {jobs}");
        foreach (string f in new[] { "montecarlo.csv", "summary.json", "histogram_rx_high.png", "scatter_rx_high.png" })
            Assert.Equal(File.ReadAllBytes(Path.Combine(t.PathOf("whole"), f)), File.ReadAllBytes(Path.Combine(merged, f)));
    }
}
