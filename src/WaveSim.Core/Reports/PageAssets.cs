using System.Reflection;

namespace WaveSim.Core.Reports;

/// <summary>
/// The scripts and style sheets inlined into every interactive page: the vendored charting library (uPlot 1.6.32, MIT;
/// Reports/Vendor/uplot/VENDORED.md) and the page's own script and style, all embedded in this assembly.
/// </summary>
public static class PageAssets
{
    /// <summary>uPlot's minified script.</summary>
    public static string ChartScript => Read("WaveSim.Page.uPlot.js");

    /// <summary>uPlot's style sheet.</summary>
    public static string ChartStyle => Read("WaveSim.Page.uPlot.css");

    /// <summary>uPlot's licence text, carried in the page beside the script.</summary>
    public static string ChartLicence => Read("WaveSim.Page.uPlot.LICENSE");

    /// <summary>The page's own script: charts, cursors, scrubber, space-time readout.</summary>
    public static string PageScript => Read("WaveSim.Page.report.js");

    /// <summary>The script of a study's page: a chart per figure over the variants, a click shows a variant's waveforms.</summary>
    public static string VariantScript => Read("WaveSim.Page.variants.js");

    /// <summary>The page's own style sheet.</summary>
    public static string PageStyle => Read("WaveSim.Page.report.css");

    static string Read(string name)
    {
        using var s = Assembly.GetExecutingAssembly().GetManifestResourceStream(name)
            ?? throw new InvalidOperationException($"embedded resource {name} is missing from the build");
        using var r = new StreamReader(s);
        return r.ReadToEnd();
    }
}
