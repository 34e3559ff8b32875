using SectionTwist.Rendering.Drawing;
using SectionTwist.Rendering.Report;
using SectionTwist.Rendering.Section;
using SectionTwist.Torsion;
using SectionTwist.Units;
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
            o.Case.UnitSymbol,
            (o.Computed - o.Case.Reference) / o.Case.Reference, o.Tolerance, o.Case.Source, o.Passed)).ToList();
    }

    /// <summary>
    /// A chapter for one solved section: its property table in <paramref name="units"/> (null: the standard system of the
    /// profile's length unit) and, when <paramref name="picture"/> is given, the contour picture. A sharp re-entrant corner
    /// shows as an unbounded peak shear, never as a plain number.
    /// </summary>
    public static ReportChapter SectionChapter(string heading, SectionResult result, ReportFigure? picture = null, UnitSystem? units = null)
    {
        ArgumentNullException.ThrowIfNull(result);
        var u = units ?? UnitSystem.For(result.LengthUnit);
        var p = result.Properties;
        bool unbounded = double.IsPositiveInfinity(result.EstimatedRelativeError.MaxShear);
        var rows = new List<IReadOnlyList<string>>
        {
            Row("area A", u.Area.Format(p.Area), u.Area.Symbol),
            Row("polar moment Ip (about the centroid)", u.SecondMoment.Format(p.PolarMoment), u.SecondMoment.Symbol),
            Row("torsion constant J", u.SecondMoment.Format(result.TorsionConstant), u.SecondMoment.Symbol),
            Row("J / Ip", NumberText.Format(result.TorsionConstant / p.PolarMoment, 5), "-"),
            Row("peak shear per unit torque", unbounded ? $"unbounded (sharp corner; {u.ShearPerTorque.Format(result.MaxShearPerTorque)} on this mesh)" : u.ShearPerTorque.Format(result.MaxShearPerTorque), u.ShearPerTorque.Symbol),
            Row("torsional section modulus T/τmax", unbounded ? "0 (unbounded peak)" : u.SectionModulus.Format(result.TorsionalModulus), u.SectionModulus.Symbol),
            Row("peak location (x, y)", $"{u.Length.Format(result.MaxShearLocation.X)}, {u.Length.Format(result.MaxShearLocation.Y)}", u.Length.Symbol),
            Row("estimated rel. error of J", NumberText.Exponent(result.EstimatedRelativeError.TorsionConstant), "-"),
            Row("estimated rel. error of the peak", unbounded ? "unbounded" : NumberText.Exponent(result.EstimatedRelativeError.MaxShear), "-"),
            Row("mesh", $"{result.Mesh.Elements} elements, {result.Mesh.Nodes} nodes, min. angle {NumberText.Format(result.Mesh.MinAngleDeg, 3)}°", ""),
        };
        return new ReportChapter(heading)
        {
            Tables = [new ReportTable("Section properties", ["quantity", "value", "unit"], rows)],
            Figures = picture is null ? [] : [picture],
            Paragraphs = result.Warnings.Select(w => $"Warning ({w.Code}): {w.Message}").ToList(),
        };

        static IReadOnlyList<string> Row(string name, string v, string unit) => [name, v, unit];
    }

    /// <summary>The contour picture of a section as a report figure (PNG), also usable beside the report.</summary>
    public static ReportFigure SectionFigure(SectionResult result, string caption, SectionPlotOptions? options = null, string? fileName = null) =>
        new(caption, ImageFormat.Png, SectionPicture.Render(SectionPlotData.From(result), ImageFormat.Png, options), fileName);
}
