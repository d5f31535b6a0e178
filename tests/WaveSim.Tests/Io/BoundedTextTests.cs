using System.Diagnostics;
using WaveSim.Core.Io;

namespace WaveSim.Tests.Io;

/// <summary>
/// The bounded read every user file goes through (issue 14, "Unbounded reads"): a stated limit, refused beyond it without
/// reading the rest, no named pipes or devices, text only. The limits are the project's own choice (docs/limits.md); the
/// checks here are of the contract, common practice, no source.
/// </summary>
public sealed class BoundedTextTests : IDisposable
{
    readonly string _dir = Directory.CreateDirectory(Path.Combine(Path.GetTempPath(), "wavesim-io-" + Guid.NewGuid().ToString("N"))).FullName;

    public void Dispose() => Directory.Delete(_dir, recursive: true);

    string Write(string name, string text)
    {
        string p = Path.Combine(_dir, name);
        File.WriteAllText(p, text);
        return p;
    }

    [Fact]
    public void A_file_within_the_limit_is_read_whole()
    {
        string p = Write("a.txt", "abc\ndef\n");
        Assert.Equal("abc\ndef\n", BoundedText.Read(p, 8, "test"));
        Assert.Equal(["abc", "def"], BoundedText.Lines(p, 8, "test", 10));
    }

    [Fact]
    public void A_file_one_byte_over_the_limit_is_refused_naming_the_limit()
    {
        string p = Write("a.txt", "abc\ndef\n!");
        var ex = Assert.Throws<FileReadException>(() => BoundedText.Read(p, 8, "test", "a.txt"));
        Assert.Equal("a.txt: larger than 8 bytes, the most a test may be (docs/limits.md)", ex.Message);
    }

    // A file whose size the file system does not report (0 under /proc) is still cut at the limit + 1 bytes.
    [SkippableFact]
    public void A_file_of_unknown_length_is_capped_while_it_is_read()
    {
        Skip.IfNot(File.Exists("/proc/self/maps"), "needs /proc (Linux)");
        var ex = Assert.Throws<FileReadException>(() => BoundedText.Read("/proc/self/maps", 100, "test", "maps"));
        Assert.Contains("larger than 100 bytes", ex.Message, StringComparison.Ordinal);
        Assert.Throws<FileReadException>(() => BoundedText.Lines("/proc/self/maps", 100, "test", 1 << 20).Count());
    }

    // A table `file: /dev/zero` grew without end (2.7 GB resident): it is refused before it is opened.
    [SkippableFact]
    public void A_device_is_refused_before_it_is_read()
    {
        Skip.IfNot(OperatingSystem.IsLinux() && File.Exists("/dev/zero"), "needs Linux and /dev/zero");
        var ex = Assert.Throws<FileReadException>(() => BoundedText.Read("/dev/zero", 1 << 30, "test"));
        Assert.Equal("/dev/zero: not a regular file but a character device; a test is read from a regular file", ex.Message);
    }

    // Opening a named pipe for reading waits for a writer that never comes: the kind is checked without opening it.
    [SkippableFact]
    public void A_named_pipe_is_refused_without_waiting_for_a_writer()
    {
        Skip.IfNot(OperatingSystem.IsLinux(), "needs Linux");
        string fifo = Path.Combine(_dir, "pipe");
        using (var mk = Process.Start(new ProcessStartInfo("mkfifo", fifo) { UseShellExecute = false }))
        {
            Skip.If(mk is null, "no mkfifo");
            mk!.WaitForExit();
            Skip.If(mk.ExitCode != 0, "mkfifo failed");
        }
        var read = Task.Run(() => Assert.Throws<FileReadException>(() => BoundedText.Read(fifo, 100, "test")));
        Assert.True(read.Wait(TimeSpan.FromSeconds(30)), "the read blocked on the pipe");
        Assert.Contains("not a regular file but a named pipe (FIFO)", read.Result.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_nul_character_is_refused_naming_its_line()
    {
        string p = Write("b.bin", "ok\nok\nbin\0ary\n");
        Assert.Equal("b.bin: line 3 holds a NUL character: not a text file; a test is plain text",
            Assert.Throws<FileReadException>(() => BoundedText.Read(p, 1000, "test", "b.bin")).Message);
        Assert.Contains("line 3 holds a NUL", Assert.Throws<FileReadException>(() => BoundedText.Lines(p, 1000, "test", 100).Count()).Message,
            StringComparison.Ordinal);
    }

    [Fact]
    public void A_line_longer_than_the_limit_is_refused_as_it_is_read()
    {
        string p = Write("c.txt", "short\n" + new string('x', 101) + "\n");
        var ex = Assert.Throws<FileReadException>(() => BoundedText.Lines(p, 1000, "test", 100, "c.txt").ToList());
        Assert.Equal("c.txt: line 2 is longer than 100 characters; a test is lines of text", ex.Message);
    }

    [Fact]
    public void Lines_end_at_lf_crlf_or_cr_and_keep_the_file_numbering()
    {
        string p = Write("d.txt", "a\r\nb\rc\n\nd");
        Assert.Equal(["a", "b", "c", "", "d"], BoundedText.Lines(p, 100, "test", 10));
    }

    [Fact]
    public void A_missing_file_and_a_folder_are_one_line_errors()
    {
        Assert.Equal("x.csv: file not found",
            Assert.Throws<FileReadException>(() => BoundedText.Read(Path.Combine(_dir, "x.csv"), 10, "test", "x.csv")).Message);
        Assert.Equal("dir: a folder, not a test file", Assert.Throws<FileReadException>(() => BoundedText.Read(_dir, 10, "test", "dir")).Message);
    }
}
