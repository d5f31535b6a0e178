using System.Globalization;
using System.Text;

namespace WaveSim.Core.Io;

/// <summary>
/// The one way WaveSim reads a user's text file: a regular file only (a named pipe or a device is refused before it is
/// opened), at most a stated number of bytes (at most the limit + 1 are ever read), and text only (a NUL character, which no
/// text export holds, is refused at once, so /dev/zero or a binary file fails on its first block).
/// </summary>
/// <remarks>Every refusal is a <see cref="FileReadException"/> whose one-line message starts with the label the caller chose.</remarks>
public static class BoundedText
{
    const int BlockChars = 64 * 1024;

    /// <summary>The whole text of a file no larger than <paramref name="limitBytes"/>.</summary>
    /// <param name="path">The file.</param>
    /// <param name="limitBytes">Most bytes accepted.</param>
    /// <param name="what">What the file is for, in messages ("scenario", "capture").</param>
    /// <param name="label">How messages name the file; default <paramref name="path"/>.</param>
    /// <returns>The text (encoding from its byte-order mark, else UTF-8).</returns>
    /// <exception cref="FileReadException">Missing, not a regular file, unreadable, too large or not text.</exception>
    public static string Read(string path, long limitBytes, string what, string? label = null)
    {
        label ??= path;
        using var reader = Open(path, limitBytes, what, label);
        var text = new StringBuilder();
        var block = new char[BlockChars];
        int lines = 1;
        int n;
        while ((n = Guard(() => reader.Read(block, 0, block.Length), what, label)) > 0)
        {
            var span = block.AsSpan(0, n);
            int nul = span.IndexOf('\0');
            if (nul >= 0)
                throw NotText(label, what, lines + span[..nul].Count('\n'));
            lines += span.Count('\n');
            text.Append(span);
        }
        return text.ToString();
    }

    /// <summary>
    /// The lines of a file no larger than <paramref name="limitBytes"/>, read as they are needed, so memory does not follow the
    /// file's size. A line ends at LF, CR LF or CR; blank lines are returned too (line numbers stay those of the file).
    /// </summary>
    /// <param name="path">The file.</param>
    /// <param name="limitBytes">Most bytes accepted.</param>
    /// <param name="what">What the file is for, in messages.</param>
    /// <param name="maxLineChars">Longest line accepted.</param>
    /// <param name="label">How messages name the file; default <paramref name="path"/>.</param>
    /// <returns>The lines without their line breaks.</returns>
    /// <exception cref="FileReadException">As <see cref="Read"/>, or a line longer than <paramref name="maxLineChars"/>.</exception>
    public static IEnumerable<string> Lines(string path, long limitBytes, string what, int maxLineChars, string? label = null)
    {
        label ??= path;
        var reader = Open(path, limitBytes, what, label);   // opened now, so a missing file fails at the call, not at the first row
        return Iterate(reader, what, maxLineChars, label);
    }

    static IEnumerable<string> Iterate(StreamReader reader, string what, int maxLineChars, string label)
    {
        using (reader)
        {
            var line = new StringBuilder();
            var block = new char[BlockChars];
            int number = 1;
            bool afterCr = false;
            int n;
            while ((n = Guard(() => reader.Read(block, 0, block.Length), what, label)) > 0)
            {
                for (int i = 0; i < n; i++)
                {
                    char ch = block[i];
                    if (ch == '\n' && afterCr)
                    {
                        afterCr = false;
                        continue;
                    }
                    afterCr = ch == '\r';
                    if (ch is '\n' or '\r')
                    {
                        yield return line.ToString();
                        line.Clear();
                        number++;
                        continue;
                    }
                    if (ch == '\0')
                        throw NotText(label, what, number);
                    if (line.Length >= maxLineChars)
                        throw new FileReadException(label, $"line {number} is longer than {Count(maxLineChars)} characters; a {what} is lines of text");
                    line.Append(ch);
                }
            }
            if (line.Length > 0)
                yield return line.ToString();
        }
    }

    static StreamReader Open(string path, long limitBytes, string what, string label)
    {
        ArgumentNullException.ThrowIfNull(path);
        ArgumentOutOfRangeException.ThrowIfNegative(limitBytes);
        if (Directory.Exists(path))
            throw new FileReadException(label, $"a folder, not a {what} file");
        if (!File.Exists(path))
            throw new FileReadException(label, "file not found");
        if (FileKind.NotRegular(path) is { } kind)
            throw new FileReadException(label, $"not a regular file but {kind}; a {what} is read from a regular file");
        FileStream stream;
        try
        {
            stream = new FileStream(path, FileMode.Open, FileAccess.Read, FileShare.Read, 1 << 16, FileOptions.SequentialScan);
        }
        catch (Exception ex) when (ex is IOException or UnauthorizedAccessException)
        {
            throw new FileReadException(label, $"cannot read the {what} ({EchoText.Clean(ex.Message)})");
        }
        long length = 0;
        try { length = stream.Length; } catch (IOException) { }   // a file whose length is not known (/proc) is still capped below
        if (length > limitBytes)
        {
            stream.Dispose();
            throw TooLarge(label, what, limitBytes);
        }
        return new StreamReader(new CappedStream(stream, limitBytes, () => TooLarge(label, what, limitBytes)), Encoding.UTF8, true);
    }

    static int Guard(Func<int> read, string what, string label)
    {
        try { return read(); }
        catch (Exception ex) when (ex is IOException or UnauthorizedAccessException)
        {
            throw new FileReadException(label, $"cannot read the {what} ({EchoText.Clean(ex.Message)})");
        }
    }

    static FileReadException TooLarge(string label, string what, long limit) =>
        new(label, $"larger than {Size(limit)}, the most a {what} may be (docs/limits.md)");

    static FileReadException NotText(string label, string what, int line) =>
        new(label, $"line {line} holds a NUL character: not a text file; a {what} is plain text");

    /// <summary>A size as messages show it: "16 MiB", "1 GiB".</summary>
    internal static string Size(long bytes) =>
        bytes >= 1L << 30 && bytes % (1L << 30) == 0 ? $"{bytes >> 30} GiB"
        : bytes >= 1L << 20 && bytes % (1L << 20) == 0 ? $"{bytes >> 20} MiB"
        : bytes >= 1L << 10 && bytes % (1L << 10) == 0 ? $"{bytes >> 10} KiB"
        : $"{bytes.ToString(CultureInfo.InvariantCulture)} bytes";

    static string Count(int n) => n.ToString("N0", CultureInfo.InvariantCulture);

    /// <summary>Passes at most limit bytes through; asking for one more throws, so no more than limit + 1 are read.</summary>
    sealed class CappedStream(Stream inner, long limit, Func<Exception> tooLarge) : Stream
    {
        long _read;

        public override int Read(byte[] buffer, int offset, int count) => Read(buffer.AsSpan(offset, count));

        public override int Read(Span<byte> buffer)
        {
            long room = limit + 1 - _read;
            int n = inner.Read(buffer[..(int)Math.Min(buffer.Length, room)]);
            _read += n;
            if (_read > limit) throw tooLarge();
            return n;
        }

        public override bool CanRead => true;
        public override bool CanSeek => false;
        public override bool CanWrite => false;
        public override long Length => throw new NotSupportedException();
        public override long Position { get => _read; set => throw new NotSupportedException(); }
        public override void Flush() { }
        public override long Seek(long offset, SeekOrigin origin) => throw new NotSupportedException();
        public override void SetLength(long value) => throw new NotSupportedException();
        public override void Write(byte[] buffer, int offset, int count) => throw new NotSupportedException();

        protected override void Dispose(bool disposing)
        {
            if (disposing) inner.Dispose();
            base.Dispose(disposing);
        }
    }
}
