using System.CommandLine;
using WaveSim.Core.Tolerances;

namespace WaveSim.Cli.Parsing;

/// <summary>The <c>--shard K/N|auto</c> option of the commands that can be cut into shards; auto reads the Slurm job array's variables.</summary>
public static class ShardOption
{
    /// <summary>The option; null when not given.</summary>
    public static Option<Shard?> Create() =>
        OptionValue.Create<Shard?>("--shard",
            "Compute only shard K of N (K from 1) into a partial folder for 'wavesim merge'; auto takes K and N from a Slurm job array (SLURM_ARRAY_TASK_ID, SLURM_ARRAY_TASK_MIN, SLURM_ARRAY_TASK_COUNT)",
            t => t.Trim().Equals("auto", StringComparison.OrdinalIgnoreCase) ? Shard.FromSlurm(Environment.GetEnvironmentVariable) : Shard.Parse(t),
            null, "K/N|auto");
}
