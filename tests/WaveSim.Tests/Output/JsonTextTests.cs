using System.Text.Json.Nodes;
using WaveSim.Core.Output;

namespace WaveSim.Tests.Output;

/// <summary>JSON files and --json output are readable by eye: text is written as it is, escaped only where JSON requires it.</summary>
public class JsonTextTests
{
    // RFC 8259 (T. Bray, "The JavaScript Object Notation (JSON) Data Interchange Format", 2017), §7: inside a string only the
    // quotation mark, the reverse solidus and the control characters U+0000 to U+001F must be escaped; any other character may
    // be written as itself. ReferenceData/readable-outputs.md §1.
    const string Readable = "R 50 Ω to 1.65 V; overshoot 15.8 % > 10 %, ±5 %, 2.2 µs, R1 ∥ R2 < 1 kΩ & 'quoted'";

    [Fact]
    public void Non_ASCII_and_HTML_sensitive_characters_are_written_as_themselves()
    {
        string text = RunSummary.Text(new JsonObject { ["note"] = Readable });
        Assert.Contains(Readable, text);
        Assert.DoesNotContain("\\u", text);
        Assert.Equal(Readable, JsonNode.Parse(text)!["note"]!.GetValue<string>());
    }

    [Fact]
    public void What_JSON_requires_is_still_escaped()
    {
        // RFC 8259 §7: '"' and '\' must be escaped, and so must a line feed (a control character).
        const string must = "a \"quote\", a back\\slash and a\nnew line";
        string text = JsonText.Write(new JsonObject { ["s"] = must });
        Assert.Contains("a \\\"quote\\\", a back\\\\slash and a\\nnew line", text);
        Assert.Equal(must, JsonNode.Parse(text)!["s"]!.GetValue<string>());
    }

    [Fact]
    public void Terminations_json_prints_ohm_and_greater_than_signs_readably()
    {
        // The reviewer's case: the notes and verdicts of `terminations --json` ("50 Ω to 1.65 V", "overshoot … > 10 %").
        using var cli = new CliRunner();
        string file = cli.Write("vtt.yaml", Terminations.VerdictTests.VttBus);
        var (code, stdout, err) = CliRunner.Run("terminations", file, "--json", "--out", cli.PathOf("out"));
        Assert.True(code == 0, err);
        Assert.Contains("replaces the load resistor 50 Ω to 1.65 V as drawn", stdout);
        Assert.Contains(" > 10 %", stdout);
        Assert.DoesNotContain("\\u", stdout);
        Assert.NotNull(JsonNode.Parse(stdout));
    }
}
