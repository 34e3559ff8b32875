using System.Globalization;
using System.Net;
using System.Text;

namespace SectionTwist.Rendering.Report;

/// <summary>
/// Writes a <see cref="ReportModel"/> as one self-contained HTML5 file: inline CSS, pictures as data: URIs, no scripts
/// and no external resources, so it can be mailed or archived as a single file and printed from any browser.
/// </summary>
public static class HtmlReportWriter
{
    /// <summary>The HTML text of the report.</summary>
    public static string Render(ReportModel model)
    {
        ArgumentNullException.ThrowIfNull(model);
        var h = new StringBuilder(64 * 1024);
        h.Append("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\" />\n");
        h.Append("<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\" />\n");
        h.Append("<title>").Append(E(model.Title)).Append("</title>\n<style>\n").Append(ReportStyle.Css).Append("</style>\n</head>\n<body>\n<main>\n");
        h.Append("<header>\n<h1>").Append(E(model.Title)).Append("</h1>\n");
        if (model.Subtitle is { } sub) h.Append("<p class=\"sub\">").Append(E(sub)).Append("</p>\n");
        var made = new List<string>();
        if (model.Generator is { } g) made.Add("made with " + g);
        if (model.Generated is { } when) made.Add(when.ToString("yyyy-MM-dd HH:mm 'UTC'zzz", CultureInfo.InvariantCulture));
        if (made.Count > 0) h.Append("<p class=\"meta\">").Append(E(string.Join(", ", made))).Append("</p>\n");
        h.Append("</header>\n");

        KeyFigures(h, model);
        Status(h, model);
        if (model.Inputs.Count > 0)
        {
            h.Append("<section id=\"inputs\">\n<h2>Inputs</h2>\n");
            foreach (var t in model.Inputs) Table(h, t);
            h.Append("</section>\n");
        }
        foreach (var c in model.Chapters) Chapter(h, c);
        Warnings(h, model);
        Verification(h, model);
        h.Append("<section id=\"method\">\n<h2>Method</h2>\n");
        foreach (var p in model.Method) h.Append("<p>").Append(E(p)).Append("</p>\n");
        h.Append("<h3>Assumptions</h3>\n<ul>\n");
        foreach (var a in model.Assumptions) h.Append("<li>").Append(E(a)).Append("</li>\n");
        h.Append("</ul>\n</section>\n");
        h.Append("<section id=\"caution\" class=\"caution\">\n<p>").Append(E(model.Caution)).Append("</p>\n</section>\n");
        h.Append("</main>\n</body>\n</html>\n");
        return h.ToString();
    }

    /// <summary>Writes the report to <paramref name="path"/> (UTF-8, via a temporary file).</summary>
    public static void Save(ReportModel model, string path) => AtomicFile.WriteText(path, Render(model));

    private static string E(string s) => WebUtility.HtmlEncode(s);

    private static void KeyFigures(StringBuilder h, ReportModel m)
    {
        if (m.KeyFigures.Count == 0) return;
        h.Append("<section id=\"summary\">\n<h2>Summary</h2>\n<dl class=\"figures\">\n");
        foreach (var f in m.KeyFigures)
            h.Append(f.Alert ? "<div class=\"alert\">" : "<div>").Append("<dt>").Append(E(f.Label)).Append("</dt><dd>")
             .Append(E(f.Value)).Append("</dd></div>\n");
        h.Append("</dl>\n</section>\n");
    }

    private static void Status(StringBuilder h, ReportModel m)
    {
        int failed = m.Verification.Count(v => !v.Pass);
        string verify = m.Verification.Count == 0
            ? "no verification cases were run for this report"
            : failed == 0
                ? $"all {m.Verification.Count} verification cases passed on this build"
                : $"{failed} of {m.Verification.Count} verification cases FAILED on this build";
        h.Append("<p class=\"status ").Append(m.Verification.Count > 0 && failed == 0 ? "ok" : "bad").Append("\">Verification: ")
         .Append(E(verify)).Append(". Warnings: ").Append(m.Warnings.Count.ToString(CultureInfo.InvariantCulture)).Append(".</p>\n");
    }

    private static void Chapter(StringBuilder h, ReportChapter c)
    {
        h.Append("<section>\n<h2>").Append(E(c.Heading)).Append("</h2>\n");
        foreach (var p in c.Paragraphs) h.Append("<p>").Append(E(p)).Append("</p>\n");
        foreach (var t in c.Tables) Table(h, t);
        foreach (var f in c.Figures) Figure(h, f);
        h.Append("</section>\n");
    }

    internal static void Table(StringBuilder h, ReportTable t)
    {
        h.Append("<table>\n<caption>").Append(E(t.Caption)).Append("</caption>\n<thead><tr>");
        foreach (var c in t.Headers) h.Append("<th scope=\"col\">").Append(E(c)).Append("</th>");
        h.Append("</tr></thead>\n<tbody>\n");
        for (int r = 0; r < t.Rows.Count; r++)
        {
            h.Append(t.AlertRows.Contains(r) ? "<tr class=\"alert\">" : "<tr>");
            for (int i = 0; i < t.Rows[r].Count; i++)
                h.Append(i == 0 ? "<th scope=\"row\">" : IsNumber(t.Rows[r][i]) ? "<td class=\"num\">" : "<td>")
                 .Append(E(t.Rows[r][i])).Append(i == 0 ? "</th>" : "</td>");
            h.Append("</tr>\n");
        }
        h.Append("</tbody>\n</table>\n");
    }

    private static bool IsNumber(string s) =>
        double.TryParse(s.Replace('\u2212', '-'), NumberStyles.Float, CultureInfo.InvariantCulture, out _);

    private static void Figure(StringBuilder h, ReportFigure f)
    {
        h.Append("<figure>\n<img alt=\"").Append(E(f.Caption)).Append("\" src=\"data:").Append(Drawing.ImageFormats.MimeType(f.Format))
         .Append(";base64,").Append(Convert.ToBase64String(f.Data)).Append("\" />\n<figcaption>").Append(E(f.Caption));
        if (f.FileName is { } n) h.Append(" <span class=\"file\">(").Append(E(n)).Append(")</span>");
        h.Append("</figcaption>\n</figure>\n");
    }

    private static void Warnings(StringBuilder h, ReportModel m)
    {
        h.Append("<section id=\"warnings\">\n<h2>Warnings</h2>\n");
        if (m.Warnings.Count == 0) h.Append("<p>None.</p>\n");
        else
        {
            h.Append("<ul class=\"warnings\">\n");
            foreach (var w in m.Warnings) h.Append("<li>").Append(E(w)).Append("</li>\n");
            h.Append("</ul>\n");
        }
        h.Append("</section>\n");
    }

    private static void Verification(StringBuilder h, ReportModel m)
    {
        h.Append("<section id=\"verification\">\n<h2>Verification</h2>\n");
        if (m.Verification.Count == 0) { h.Append("<p>No verification cases were run for this report.</p>\n</section>\n"); return; }
        static string G(double v) => Units.NumberText.Format(v, 6);
        var t = new ReportTable("Verification cases run on this build: computed value against the reference",
            ["case", "computed", "reference", "unit", "rel. error", "tolerance", "source", "result"],
            m.Verification.Select(v => (IReadOnlyList<string>)
            [
                v.Name, G(v.Computed), G(v.Reference), v.Unit, Units.NumberText.Exponent(v.RelativeError, 2),
                Units.NumberText.Exponent(v.Tolerance, 1), v.Source, v.Pass ? "pass" : "FAIL",
            ]).ToList())
        {
            AlertRows = m.Verification.Select((v, i) => (v, i)).Where(p => !p.v.Pass).Select(p => p.i).ToList(),
        };
        Table(h, t);
        h.Append("</section>\n");
    }
}
