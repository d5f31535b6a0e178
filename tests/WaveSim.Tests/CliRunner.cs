using System.CommandLine;
using WaveSim.Cli;

namespace WaveSim.Tests;

/// <summary>Runs the command line in-process inside a fresh temporary folder (deleted on dispose).</summary>
internal sealed class CliRunner : IDisposable
{
    public CliRunner() => Dir = Directory.CreateDirectory(Path.Combine(Path.GetTempPath(), "wavesim-tests-" + Guid.NewGuid().ToString("N"))).FullName;

    /// <summary>The temporary folder.</summary>
    public string Dir { get; }

    /// <summary>A path inside the folder.</summary>
    public string PathOf(string name) => Path.Combine(Dir, name);

    /// <summary>Writes a file into the folder and returns its path.</summary>
    public string Write(string name, string text)
    {
        string p = Path.Combine(Dir, name);
        File.WriteAllText(p, text);
        return p;
    }

    /// <summary>Runs wavesim with the arguments; returns the exit code, stdout and stderr.</summary>
    public static (int Code, string Out, string Err) Run(params string[] args)
    {
        var o = new StringWriter();
        var e = new StringWriter();
        int code = Program.BuildRoot().Parse(args).Invoke(new InvocationConfiguration { Output = o, Error = e });
        return (code, o.ToString(), e.ToString());
    }

    public void Dispose()
    {
        try { Directory.Delete(Dir, recursive: true); } catch (IOException) { }
    }
}
