using System.CommandLine;
using WaveSim.Cli;

namespace WaveSim.Tests.Cli;

/// <summary>Runs the command line in-process with captured output, and makes temporary folders.</summary>
internal static class CliRunner
{
    public static (int Code, string Out, string Err) Run(params string[] args)
    {
        var o = new StringWriter(); var e = new StringWriter();
        int code = Program.BuildRoot().Parse(args).Invoke(new InvocationConfiguration { Output = o, Error = e });
        return (code, o.ToString(), e.ToString());
    }

    public static string TempDir()
    {
        string d = Path.Combine(Path.GetTempPath(), "wavesim-tests", Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(d);
        return d;
    }

    public static string Write(string dir, string name, string text)
    {
        string p = Path.Combine(dir, name);
        File.WriteAllText(p, text);
        return p;
    }
}
