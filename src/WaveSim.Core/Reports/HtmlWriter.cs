using System.Text;

namespace WaveSim.Core.Reports;

/// <summary>
/// A small builder of XHTML-compatible markup: every element closed, void elements self-closed, only the five XML
/// entities used, so the page parses both as HTML and as XML.
/// </summary>
internal sealed class HtmlWriter
{
    readonly StringBuilder _sb = new();

    /// <summary>Escapes text for element content and attribute values.</summary>
    public static string Escape(string text) => text
        .Replace("&", "&amp;").Replace("<", "&lt;").Replace(">", "&gt;").Replace("\"", "&quot;").Replace("'", "&apos;");

    public HtmlWriter Raw(string markup) { _sb.Append(markup); return this; }

    public HtmlWriter Line(string markup) { _sb.Append(markup).Append('\n'); return this; }

    /// <summary>An element with escaped text content and optional attributes (name, value pairs; values escaped).</summary>
    public HtmlWriter El(string tag, string text, params (string Name, string Value)[] attributes)
    {
        _sb.Append('<').Append(tag);
        foreach (var (n, v) in attributes) _sb.Append(' ').Append(n).Append("=\"").Append(Escape(v)).Append('"');
        _sb.Append('>').Append(Escape(text)).Append("</").Append(tag).Append(">\n");
        return this;
    }

    /// <summary>A table row of header cells.</summary>
    public HtmlWriter HeaderRow(IEnumerable<string> cells)
    {
        _sb.Append("<tr>");
        foreach (var c in cells) _sb.Append("<th>").Append(Escape(c)).Append("</th>");
        _sb.Append("</tr>\n");
        return this;
    }

    /// <summary>A table row; each cell's class is left out when null.</summary>
    public HtmlWriter Row(IEnumerable<(string Text, string? Class)> cells)
    {
        _sb.Append("<tr>");
        foreach (var (t, c) in cells)
            _sb.Append(c is null ? "<td>" : $"<td class=\"{Escape(c)}\">").Append(Escape(t)).Append("</td>");
        _sb.Append("</tr>\n");
        return this;
    }

    /// <summary>A table row whose cells may carry a title, shown on hover (the rule that judged the cell).</summary>
    public HtmlWriter Row(IEnumerable<(string Text, string? Class, string? Title)> cells)
    {
        _sb.Append("<tr>");
        foreach (var (t, c, title) in cells)
        {
            _sb.Append("<td");
            if (c is not null) _sb.Append(" class=\"").Append(Escape(c)).Append('"');
            if (title is not null) _sb.Append(" title=\"").Append(Escape(title)).Append('"');
            _sb.Append('>').Append(Escape(t)).Append("</td>");
        }
        _sb.Append("</tr>\n");
        return this;
    }

    /// <summary>Characters written so far.</summary>
    public int Length => _sb.Length;

    /// <summary>An embedded PNG picture.</summary>
    public HtmlWriter Image(string id, byte[] png, int width, int height, string alt) =>
        Line($"<img id=\"{Escape(id)}\" src=\"{ReportImages.DataUri(png)}\" width=\"{width}\" height=\"{height}\" alt=\"{Escape(alt)}\" />");

    public override string ToString() => _sb.ToString();
}
