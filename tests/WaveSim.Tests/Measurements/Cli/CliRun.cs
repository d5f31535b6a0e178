using System.CommandLine;
using WaveSim.Cli;

namespace WaveSim.Tests.Measurements.Cli;

/// <summary>Runs the command line in-process with captured output, and a scratch folder per test.</summary>
internal sealed class CliRun : IDisposable
{
    public CliRun()
    {
        Dir = Path.Combine(Path.GetTempPath(), "wavesim-cli-" + Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(Dir);
    }

    /// <summary>The scratch folder, deleted on dispose.</summary>
    public string Dir { get; }

    /// <summary>A path inside the scratch folder.</summary>
    public string PathOf(string name) => Path.Combine(Dir, name);

    /// <summary>Writes a file into the scratch folder and returns its path.</summary>
    public string Write(string name, string text)
    {
        string p = PathOf(name);
        File.WriteAllText(p, text);
        return p;
    }

    public static (int Code, string Out, string Err) Invoke(params string[] args)
    {
        var sw = new StringWriter();
        var ew = new StringWriter();
        int code = Program.BuildRoot().Parse(args).Invoke(new InvocationConfiguration { Output = sw, Error = ew });
        return (code, sw.ToString(), ew.ToString());
    }

    public void Dispose()
    {
        try { Directory.Delete(Dir, recursive: true); } catch (IOException) { }
    }
}
