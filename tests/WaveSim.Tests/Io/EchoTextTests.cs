using WaveSim.Core;
using WaveSim.Core.Io;

namespace WaveSim.Tests.Io;

/// <summary>
/// Text echoed from users' files: no control characters reach the terminal (an ANSI escape in a title did), and quotes of a
/// file's contents stay short. The control characters are those of Unicode's Cc category and the bidirectional formatting
/// characters (The Unicode Standard, chapter 23 and UAX #9; from memory).
/// </summary>
public class EchoTextTests
{
    [Theory]
    [InlineData("a\u001b[31mred\u001b[0m", "a[31mred[0m")]
    [InlineData("bell\u0007 and \u009b31m", "bell and 31m")]
    [InlineData("two\r\nlines\nand\ttab", "two lines and tab")]
    [InlineData("\u202eevil\u2066x\u2069", "evilx")]
    [InlineData("plain µs Ω", "plain µs Ω")]
    public void Control_characters_are_taken_out(string text, string expected) => Assert.Equal(expected, EchoText.Clean(text));

    [Fact]
    public void An_excerpt_is_short_and_clean()
    {
        Assert.Equal("root:$6$saltsalt$hhhhhhhhhhhhhhhhhhhhhhh…", EchoText.Excerpt("root:$6$saltsalt$" + new string('h', 86) + ":19000:0"));
        Assert.Equal("ab", EchoText.Excerpt("a\u001bb"));
    }

    [Fact]
    public void An_input_message_is_one_clean_line_of_bounded_length()
    {
        var ex = new InputException("s.yaml:1:8: title: '" + new string('t', 1_000_000) + "\u001b' is wrong; expected a short title");
        Assert.True(ex.Message.Length <= EchoText.MaxMessageChars + 3, $"{ex.Message.Length} characters");
        Assert.StartsWith("s.yaml:1:8: title: 'ttt", ex.Message, StringComparison.Ordinal);
        Assert.EndsWith("is wrong; expected a short title", ex.Message, StringComparison.Ordinal);
        Assert.DoesNotContain('\u001b', ex.Message);
    }
}
