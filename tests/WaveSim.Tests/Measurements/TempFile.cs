namespace WaveSim.Tests.Measurements;

/// <summary>A file in a fresh temporary folder, deleted with the folder on dispose.</summary>
internal sealed class TempFile : IDisposable
{
    readonly string _dir;

    public TempFile(string name, string content)
    {
        _dir = System.IO.Path.Combine(System.IO.Path.GetTempPath(), "wavesim-tests-" + Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(_dir);
        Path = System.IO.Path.Combine(_dir, name);
        File.WriteAllText(Path, content);
    }

    public string Path { get; }

    public void Dispose() => Directory.Delete(_dir, recursive: true);
}
