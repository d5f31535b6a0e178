using System.CommandLine;
using System.Reflection;

namespace WaveSim.Cli.Commands;

/// <summary>`wavesim about`: the version and the model's limits in one screen.</summary>
public static class VersionInfoCommand
{
    /// <summary>Creates the command.</summary>
    public static Command Create()
    {
        var cmd = new Command("about", "Print the version and the limits of the model");
        cmd.SetAction(pr =>
        {
            string v = typeof(Program).Assembly.GetCustomAttribute<AssemblyInformationalVersionAttribute>()?.InformationalVersion ?? "?";
            pr.InvocationConfiguration.Output.WriteLine($"wavesim {v.Split('+')[0]}");
            pr.InvocationConfiguration.Output.WriteLine("One conductor pair, quasi-TEM, linear parts. Simulation is an estimate: verify on hardware.");
            return 0;
        });
        return cmd;
    }
}
