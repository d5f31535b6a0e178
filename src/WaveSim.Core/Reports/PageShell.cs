using WaveSim.Core.Pictures;

namespace WaveSim.Core.Reports;

/// <summary>
/// The interactive parts of a report page: the head with the inlined style sheets, the markup the page's script fills
/// (charts, toggles, cursor readout, scrubber, space-time map) and the inlined scripts with the run's data. Scripts and
/// styles sit in CDATA sections so the page still parses as XML; nothing is loaded from elsewhere.
/// </summary>
internal static class PageShell
{
    /// <summary>The bytes the inlined scripts and styles add to a page, besides its data.</summary>
    public static long ScriptBytes => PageAssets.ChartScript.Length + PageAssets.PageScript.Length + PageAssets.ChartLicence.Length + 200;

    public static void Head(HtmlWriter w, string title)
    {
        w.Line("<!DOCTYPE html>").Line("<html lang=\"en\">").Line("<head>").Line("<meta charset=\"utf-8\" />")
         .Line("<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\" />");
        w.El("title", title);
        w.Raw("<style>/*<![CDATA[*/\n").Raw(PageAssets.ChartStyle).Raw("\n").Raw(PageAssets.PageStyle).Raw("\n/*]]>*/</style>\n").Line("</head>").Line("<body>");
    }

    public static void Waveforms(HtmlWriter w, WaveformPicture picture)
    {
        w.El("h2", "Waveforms");
        if (picture.Limited)
            w.El("p", $"First shown: {picture.Shown.Describe()}, the start-up and the first {picture.EdgesShown} of " +
                $"{picture.SourceEdges} source edges (double-click the chart for the whole record). The figures and verdicts cover the whole record.",
                ("class", "note"), ("id", "waveform-window"));
        w.Raw("<div class=\"toolbar\" id=\"probe-toggles\"></div>\n");
        w.Raw("<div class=\"toolbar\"><label class=\"toggle\"><input type=\"checkbox\" id=\"show-currents\" /> currents</label>" +
              "<button type=\"button\" id=\"reset-zoom\">whole record</button><button type=\"button\" id=\"clear-cursors\">clear cursors</button></div>\n");
        w.Raw("<div id=\"readout\"></div>\n<div class=\"chart\" id=\"chart-v\"></div>\n");
        w.Raw("<div id=\"chart-a-box\" hidden=\"hidden\"><div class=\"chart\" id=\"chart-a\"></div></div>\n");
        w.Raw("<div id=\"cursor-readout\"></div>\n");
        w.Raw("<noscript><p>The charts need JavaScript; the static picture below shows the same waveforms.</p></noscript>\n");
    }

    public static void FramesAndMap(HtmlWriter w)
    {
        w.El("h2", "Frames along the line");
        w.El("p", "The voltage along the main line at each recorded instant; the dotted line on the waveform charts marks the instant.", ("class", "note"));
        w.Raw("<div class=\"toolbar\"><button type=\"button\" id=\"play\">play</button>" +
              "<input type=\"range\" id=\"scrubber\" min=\"0\" max=\"0\" step=\"1\" value=\"0\" aria-label=\"frame\" /><span id=\"frame-label\"></span></div>\n");
        w.Raw("<div class=\"chart\" id=\"frame-chart\"></div>\n");
        w.El("h2", "Space-time map");
        w.El("p", "Voltage along the main line (across) against time (down); point at the map to read z, t and V, click to show that frame.", ("class", "note"));
        w.Raw("<p class=\"note\" id=\"spacetime-scale\"></p>\n<canvas id=\"spacetime-map\"></canvas>\n<p id=\"spacetime-readout\">&#160;</p>\n");
    }

    public static void Scripts(HtmlWriter w, string json) => Scripts(w, json, PageAssets.PageScript);

    public static void Scripts(HtmlWriter w, string json, string script)
    {
        // Neither "</" nor "]]>" appears in the data (strings are JSON-escaped), so the block cannot end early; the page's
        // script strips the CDATA markers an HTML parser leaves in the text.
        w.Raw("<script type=\"application/json\" id=\"wavesim-data\"><![CDATA[\n");
        w.Raw(json).Raw("\n]]></script>\n");
        w.Raw("<script>//<![CDATA[\n/* uPlot 1.6.32, inlined unchanged.\n").Raw(PageAssets.ChartLicence.Replace("*/", "* /", StringComparison.Ordinal))
         .Raw("\n*/\n").Raw(PageAssets.ChartScript).Raw("\n//]]></script>\n");
        w.Raw("<script>//<![CDATA[\n").Raw(script).Raw("\n//]]></script>\n");
    }
}
