using System.Globalization;
using System.Text;
using System.Text.Json;

namespace WaveSim.Core.Reports;

/// <summary>
/// The page of a study of variants (<see cref="VariantSet"/>): a chart per figure over the variants with the best point and
/// the limits marked; clicking a point shows that variant's waveforms. Self-contained like the report page.
/// </summary>
public static class VariantPage
{
    /// <summary>Builds the page.</summary>
    public static string Html(VariantSet set)
    {
        ArgumentNullException.ThrowIfNull(set);
        var w = new HtmlWriter();
        PageShell.Head(w, $"{set.Title} - WaveSim");
        w.El("h1", set.Title);
        if (set.Note is { } note) w.El("p", note, ("class", "note"));
        if (set.Outcome is { } outcome) w.El("p", outcome, ("id", "outcome"));
        if (set.Best is { } b) w.El("p", $"Best: {set.Variants[b].Label}" + (set.BestNote is { } why ? $" ({why})" : "") + ", marked on every chart.", ("id", "best"));
        w.El("p", "Click a point on any chart to show that variant's waveforms below.", ("class", "note"));
        w.Raw("<div id=\"figure-charts\"></div>\n");
        w.El("h2", "Waveforms of the chosen variant");
        w.Raw("<p id=\"variant-title\" class=\"note\"></p>\n<div class=\"chart\" id=\"variant-chart\"></div>\n");
        PageShell.Scripts(w, Json(set), PageAssets.VariantScript);
        w.Line("</body>").Line("</html>");
        return w.ToString();
    }

    static string Json(VariantSet set)
    {
        var o = new JsonSerializerOptions { WriteIndented = false };
        var sb = new StringBuilder();
        sb.Append("{\"kind\":\"variants\",\"title\":").Append(JsonSerializer.Serialize(set.Title, o))
          .Append(",\"xLabel\":").Append(JsonSerializer.Serialize(set.XLabel, o))
          .Append(",\"xUnit\":").Append(JsonSerializer.Serialize(set.XUnit, o))
          .Append(",\"categorical\":").Append(set.Categorical ? "true" : "false")
          .Append(",\"best\":").Append(set.Best is { } b ? b.ToString(CultureInfo.InvariantCulture) : "null")
          .Append(",\"probes\":").Append(JsonSerializer.Serialize(set.Probes, o))
          .Append(",\"labels\":").Append(JsonSerializer.Serialize(set.Variants.Select(v => v.Label), o))
          .Append(",\"xs\":[").AppendJoin(',', set.Variants.Select(v => G(v.X, "G9"))).Append(']');
        sb.Append(",\"figures\":[");
        for (int f = 0; f < set.Figures.Count; f++)
        {
            var fig = set.Figures[f];
            if (f > 0) sb.Append(',');
            sb.Append("{\"name\":").Append(JsonSerializer.Serialize(fig.Name, o)).Append(",\"unit\":").Append(JsonSerializer.Serialize(fig.Unit, o))
              .Append(",\"values\":[").AppendJoin(',', fig.Values.Select(v => "[" + string.Join(',', v.Select(x => x is { } y ? G(y) : "null")) + "]")).Append(']')
              .Append(",\"pointsOnly\":").Append(fig.PointsOnly ? "true" : "false")
              .Append(",\"note\":").Append(JsonSerializer.Serialize(fig.Note, o));
            if (fig.Axis is { } axis)
                sb.Append(",\"axis\":{\"label\":").Append(JsonSerializer.Serialize(axis.Label, o)).Append(",\"unit\":").Append(JsonSerializer.Serialize(axis.Unit, o))
                  .Append(",\"values\":[").AppendJoin(',', axis.Values.Select(x => G(x, "G9"))).Append("]}");
            sb.Append(",\"limits\":[").AppendJoin(',', fig.Limits.Select(l => $"{{\"label\":{JsonSerializer.Serialize(l.Label, o)},\"value\":{G(l.Value)}}}")).Append("]}");
        }
        sb.Append("],\"waves\":[");
        for (int i = 0; i < set.Variants.Count; i++)
        {
            var v = set.Variants[i];
            if (i > 0) sb.Append(',');
            if (v.Time is null || v.Volts is null) { sb.Append("null"); continue; }
            sb.Append("{\"t\":[").AppendJoin(',', v.Time.Select(x => G(x, "G9"))).Append("],\"v\":[")
              .AppendJoin(',', v.Volts.Select(x => "[" + string.Join(',', x.Select(y => G(y))) + "]")).Append("]}");
        }
        sb.Append("]}");
        return sb.ToString();
    }

    static string G(double x, string format = "G6") => double.IsFinite(x) ? x.ToString(format, CultureInfo.InvariantCulture) : "null";
}
