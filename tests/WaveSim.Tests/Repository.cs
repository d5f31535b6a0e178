namespace WaveSim.Tests;

/// <summary>The checkout the tests run from, found by walking up from the test binaries to WaveSim.sln.</summary>
internal static class Repository
{
    /// <summary>The folder holding WaveSim.sln.</summary>
    public static readonly string Root = Find();

    /// <summary>A path inside the checkout.</summary>
    public static string PathOf(params string[] parts) => Path.Combine([Root, .. parts]);

    static string Find()
    {
        var d = new DirectoryInfo(AppContext.BaseDirectory);
        while (d is not null && !File.Exists(Path.Combine(d.FullName, "WaveSim.sln"))) d = d.Parent;
        return d?.FullName ?? throw new InvalidOperationException("WaveSim.sln not found above the test folder");
    }
}
