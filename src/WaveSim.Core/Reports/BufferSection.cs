using WaveSim.Core.Model;

namespace WaveSim.Core.Reports;

/// <summary>The report's list of the scenario's buffer models: where each sits, its model, file and corner, and its summary.</summary>
internal static class BufferSection
{
    /// <summary>Writes the section; nothing when the scenario has no buffer.</summary>
    public static void Write(HtmlWriter w, Scenario s)
    {
        var buffers = BufferSpec.Of(s).ToList();
        if (buffers.Count == 0) return;
        w.El("h2", "Buffer models");
        w.Raw("<div class=\"table-box\">\n<table id=\"buffers\" class=\"wrap\">\n").HeaderRow(["at", "model", "corner", "file", "summary"]);
        foreach (var (at, b, driver) in buffers)
            w.Row([(at, null), (b.Model.Name, null), (b.CornerName, null), (b.File, null), (string.Join("; ", b.Summary(driver).Skip(1)), null)]);
        w.Raw("</table>\n</div>\n");
    }
}
