using System.CommandLine;
using System.Reflection;
using System.Text.Json.Nodes;
using WaveSim.Core.Output;

namespace WaveSim.Cli.Commands;

/// <summary>`wavesim about`: the version and the model's limits in one screen.</summary>
public static class AboutCommand
{
    /// <summary>The limits of the model, one line each, as printed by <c>about</c> and the README.</summary>
    public static readonly string[] Limits =
    [
        "one conductor pair (a signal and its return), quasi-TEM propagation: no crosstalk, no radiation",
        "linear, time-invariant parts: no driver or receiver non-linearity",
        "simulation is an estimate: verify on hardware; never connect instruments to energized or high-voltage lines",
    ];

    /// <summary>The tool's version, from the one place it is set (Directory.Build.props).</summary>
    public static string Version =>
        (typeof(Program).Assembly.GetCustomAttribute<AssemblyInformationalVersionAttribute>()?.InformationalVersion ?? "?").Split('+')[0];

    /// <summary>Creates the command.</summary>
    public static Command Create()
    {
        var json = CommonOptions.Json();
        var cmd = new Command("about", "Print the version and the limits of the model") { json };
        cmd.SetAction(pr =>
        {
            var o = pr.InvocationConfiguration.Output;
            if (pr.GetValue(json))
            {
                o.WriteLine(new JsonObject { ["version"] = Version, ["limits"] = new JsonArray(Limits.Select(l => (JsonNode)l).ToArray()) }.ToJsonString(JsonText.Compact));
                return ExitCodes.Ok;
            }
            o.WriteLine($"wavesim {Version}");
            foreach (var l in Limits) o.WriteLine("- " + l);
            return ExitCodes.Ok;
        });
        return cmd;
    }
}
