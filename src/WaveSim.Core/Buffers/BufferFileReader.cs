namespace WaveSim.Core.Buffers;

/// <summary>
/// Reads a buffer model file (the open IBIS format, ANSI/EIA-656-B, version 5.0 keywords) into a <see cref="BufferFile"/>.
/// Every mistake is a one-line <see cref="InputException"/> naming the file, the line and the keyword and saying what was
/// expected; keywords and sub-parameters this reader does not model are skipped with a warning naming their line.
/// </summary>
/// <remarks>
/// Read: [IBIS Ver], [Comment Char], [File Name], [Component], [Manufacturer], [Package], [Pin], [Model] (Model_type, Polarity,
/// Enable, C_comp, Vinl, Vinh, Vmeas, Vref, Cref, Rref), [Voltage Range], the four reference keywords, [Pulldown], [Pullup],
/// [GND Clamp], [POWER Clamp], [Ramp], [Rising Waveform], [Falling Waveform] and [End]; the free-text header keywords
/// ([File Rev], [Date], [Source], [Notes], [Disclaimer], [Copyright]) are accepted and not kept. docs/buffers.md lists the rules.
/// </remarks>
public static class BufferFileReader
{
    /// <summary>The largest file read (50 MB); a buffer model file is a few hundred kilobytes at most.</summary>
    public const long MaxBytes = 50L * 1024 * 1024;

    /// <summary>Reads the file at <paramref name="path"/>.</summary>
    /// <exception cref="InputException">The file is missing, too large, not text, or malformed.</exception>
    public static BufferFile Read(string path)
    {
        ArgumentNullException.ThrowIfNull(path);
        if (Directory.Exists(path)) throw new InputException($"{path}: is a folder, not a buffer model file");
        if (!File.Exists(path)) throw new InputException($"{path}: no such buffer model file");
        long length = new FileInfo(path).Length;
        if (length > MaxBytes)
            throw new InputException($"{path}: is {length / (1024.0 * 1024.0):F0} MB; buffer model files above {MaxBytes / (1024 * 1024)} MB are refused");
        return Parse(File.ReadAllText(path), path);
    }

    /// <summary>Reads the text of a buffer model file; <paramref name="source"/> names it in messages.</summary>
    /// <exception cref="InputException">The text is malformed.</exception>
    public static BufferFile Parse(string text, string source)
    {
        ArgumentNullException.ThrowIfNull(text);
        ArgumentNullException.ThrowIfNull(source);
        return new BufferFileParser(text, source).Run();
    }
}
