using SectionTwist.Rendering.Drawing;
using SectionTwist.Rendering.Report;
using SectionTwist.Rendering.Section;
using SectionTwist.Torsion;
using SectionTwist.Verification;

namespace SectionTwist.Rendering.Adapters;

/// <summary>Turns solver results into report pieces (tables, key figures, verification rows).</summary>
public static class ReportAdapters
{
    /// <summary>One report row per verification outcome (values SI: m^4 for J, 1/m^3 for shear per unit torque).</summary>
    public static IReadOnlyList<VerificationRow> Verification(IEnumerable<VerificationOutcome> outcomes)
    {
        ArgumentNullException.ThrowIfNull(outcomes);
        return outcomes.Select(o => new VerificationRow(o.Case.Name, o.Computed, o.Case.Reference,
            o.Case.Quantity == VerifiedQuantity.TorsionConstant ? "m⁴" : "1/m³",
            (o.Computed - o.Case.Reference) / o.Case.Reference, o.Tolerance, o.Case.Source, o.Passed)).ToList();
    }

    /// <summary>
    /// A chapter for one solved section: its property table (in the profile's display unit) and, when
    /// <paramref name="picture"/> is given, the contour picture.
    /// </summary>
    public static ReportChapter SectionChapter(string heading, SectionResult result, ReportFigure? picture = null)
    {
        ArgumentNullException.ThrowIfNull(result);
        var u = result.LengthUnit;
        string s = u.Symbol;
        double L(double m, int power) => m / Math.Pow(u.Metres, power);
        var p = result.Properties;
        var rows = new List<IReadOnlyList<string>>
        {
            Row("area A", L(p.Area, 2), $"{s}²"),
            Row("polar moment Ip (about the centroid)", L(p.PolarMoment, 4), $"{s}⁴"),
            Row("torsion constant J", L(result.TorsionConstant, 4), $"{s}⁴"),
            Row("J / Ip", result.TorsionConstant / p.PolarMoment, "-"),
            Row("peak shear per unit torque", result.MaxShearPerTorque * 1e-3, "MPa per kN·m"),
            Row("torsional section modulus T/τmax", L(result.TorsionalModulus, 3), $"{s}³"),
            Text("peak location (x, y)", $"{NiceScale.Sig(L(result.MaxShearLocation.X, 1), 5)}, {NiceScale.Sig(L(result.MaxShearLocation.Y, 1), 5)}", s),
            Row("estimated rel. error of J", result.EstimatedRelativeError.TorsionConstant, "-"),
            Row("estimated rel. error of the peak", result.EstimatedRelativeError.MaxShear, "-"),
            Text("mesh", $"{result.Mesh.Elements} elements, {result.Mesh.Nodes} nodes, min. angle {NiceScale.Sig(result.Mesh.MinAngleDeg, 3)}°", ""),
        };
        return new ReportChapter(heading)
        {
            Tables = [new ReportTable("Section properties", ["quantity", "value", "unit"], rows)],
            Figures = picture is null ? [] : [picture],
            Paragraphs = result.Warnings.Select(w => $"Warning ({w.Code}): {w.Message}").ToList(),
        };

        static IReadOnlyList<string> Row(string name, double v, string unit) => [name, NiceScale.Sig(v, 5), unit];
        static IReadOnlyList<string> Text(string name, string v, string unit) => [name, v, unit];
    }

    /// <summary>The contour picture of a section as a report figure (PNG), also usable beside the report.</summary>
    public static ReportFigure SectionFigure(SectionResult result, string caption, SectionPlotOptions? options = null, string? fileName = null) =>
        new(caption, ImageFormat.Png, SectionPicture.Render(SectionPlotData.From(result), ImageFormat.Png, options), fileName);
}
