using System.Text.Encodings.Web;
using System.Text.Json;
using System.Text.Json.Nodes;

namespace WaveSim.Core.Output;

/// <summary>
/// The one place JSON text is written: files (summary.json, fit.json …) and every command's JSON on stdout.
/// </summary>
/// <remarks>
/// The default encoder of System.Text.Json escapes every non-ASCII character and the HTML-sensitive ones, so "Ω" came out as
/// <c>\u03A9</c> and "&gt;" as <c>\u003E</c>: valid, but unreadable by eye. These files are read by people and by JSON
/// parsers, never pasted into a web page, so the relaxed encoder is used: it writes text as it is and escapes only what JSON
/// itself requires (quotes, backslashes, control characters). JSON that is embedded in an HTML page must not use these
/// options; it needs the default encoder, which keeps "&lt;/script&gt;" and the like from closing the page's element.
/// </remarks>
public static class JsonText
{
    /// <summary>Indented, readable text: what files and printed JSON get.</summary>
    public static JsonSerializerOptions Indented { get; } = Readable(indented: true);

    /// <summary>The same on one line.</summary>
    public static JsonSerializerOptions Compact { get; } = Readable(indented: false);

    /// <summary>The node as indented, readable JSON text.</summary>
    /// <param name="node">What to write.</param>
    public static string Write(JsonNode node)
    {
        ArgumentNullException.ThrowIfNull(node);
        return node.ToJsonString(Indented);
    }

    // System.Text.Json freezes shared options at their first use, so no caller can change them afterwards.
    static JsonSerializerOptions Readable(bool indented) =>
        new() { WriteIndented = indented, Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping };
}
