using System.Text;

namespace WaveSim.Core.Io;

/// <summary>
/// Text from a user's files made safe to print: no control characters (an ANSI escape in a title reached the terminal raw),
/// and quotes of file contents kept short (an error quoted a whole line of whatever file a table named).
/// </summary>
public static class EchoText
{
    /// <summary>Longest message kept whole; a longer one keeps its start and end around an ellipsis.</summary>
    public const int MaxMessageChars = 2000;

    /// <summary>
    /// The text without control characters: line breaks and tabs become spaces; other C0 and C1 controls (ESC among them),
    /// DEL and the bidirectional overrides that reorder a terminal line are dropped.
    /// </summary>
    /// <param name="text">Any text.</param>
    /// <returns>The text as it may be printed.</returns>
    public static string Clean(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        int i = 0;
        while (i < text.Length && !IsUnsafe(text[i])) i++;
        if (i == text.Length) return text;
        var sb = new StringBuilder(text.Length);
        sb.Append(text, 0, i);
        for (; i < text.Length; i++)
        {
            char ch = text[i];
            if (ch is '\n' or '\r' or '\t')
            {
                // A CR LF pair is one break, one space.
                if (!(ch == '\n' && i > 0 && text[i - 1] == '\r')) sb.Append(' ');
            }
            else if (!IsUnsafe(ch))
                sb.Append(ch);
        }
        return sb.ToString();
    }

    /// <summary>
    /// A short, clean quote of file contents: <see cref="Clean"/>, then at most <paramref name="maxChars"/> characters with
    /// "…" when cut. Use it wherever a message quotes what a user's file holds.
    /// </summary>
    /// <param name="text">The text found.</param>
    /// <param name="maxChars">Most characters kept (default <see cref="InputLimits.ExcerptChars"/>).</param>
    /// <returns>The excerpt, without quotes around it.</returns>
    public static string Excerpt(string text, int maxChars = InputLimits.ExcerptChars)
    {
        string clean = Clean(text ?? "");
        if (clean.Length <= maxChars) return clean;
        int cut = maxChars;
        if (char.IsHighSurrogate(clean[cut - 1])) cut--;
        return string.Concat(clean.AsSpan(0, cut), "…");
    }

    /// <summary>
    /// A message as an error shows it: <see cref="Clean"/>, and when longer than <see cref="MaxMessageChars"/> its start (the
    /// file, line and key) and its end (what was expected) around an ellipsis.
    /// </summary>
    /// <param name="message">The message.</param>
    /// <returns>One printable line.</returns>
    public static string Message(string message)
    {
        string clean = Clean(message ?? "");
        if (clean.Length <= MaxMessageChars) return clean;
        int head = MaxMessageChars * 3 / 5, tail = MaxMessageChars - head;
        if (char.IsHighSurrogate(clean[head - 1])) head--;
        if (char.IsLowSurrogate(clean[clean.Length - tail])) tail--;
        return string.Concat(clean.AsSpan(0, head), " … ", clean.AsSpan(clean.Length - tail));
    }

    static bool IsUnsafe(char ch) =>
        char.IsControl(ch)                      // C0, DEL, C1 (U+0080..U+009F, where a single-byte CSI lives)
        || ch is >= '\u202a' and <= '\u202e'    // bidirectional embeddings and overrides
        || ch is >= '\u2066' and <= '\u2069';   // bidirectional isolates
}
