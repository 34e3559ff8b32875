using SectionTwist.Rendering.Warping;
using SectionTwist.Shaft;
using SectionTwist.WarpingTorsion;

namespace SectionTwist.Rendering.Report;

/// <summary>The report chapter of a shaft solved with restrained warping (Vlasov torsion): station and segment tables and diagrams.</summary>
internal static class WarpingChapter
{
    public static ReportChapter? Build(ShaftDocument doc, ShaftResult result)
    {
        if (result.Warping is not { } m) return null;
        var u = doc.Units;
        double scale = m.Segments.Count == 0 ? 0 : m.Segments.Max(s => s.MaxBimoment);
        var stations = new ReportTable("Stations under restrained warping",
            ["station", $"position [{u.Length.Symbol}]", $"rotation [{u.Angle.Symbol}]", $"rate of twist [{u.TwistRate.Symbol}]", $"support torque [{u.Torque.Symbol}]", $"bimoment at restraint [{u.Bimoment.Symbol}]"],
            m.Stations.Select(s => (IReadOnlyList<string>)[s.Name, u.Length.Format(s.Position), u.Angle.Format(s.Rotation, 5),
                u.TwistRate.Format(s.RateOfTwist, 4), u.Torque.Format(s.ReactionTorque, 4), u.Bimoment.Format(Units.NumberText.Clean(s.ReactionBimoment, scale), 4)]).ToArray());
        var segments = new ReportTable("Segments under restrained warping (largest values along each segment)",
            ["segment", $"warping length a [{u.Length.Symbol}]", $"largest rotation [{u.Angle.Symbol}]", $"largest bimoment [{u.Bimoment.Symbol}]",
                $"warping normal stress [{u.Stress.Symbol}]", $"bending + warping normal [{u.Stress.Symbol}]"],
            m.Segments.Select(s => (IReadOnlyList<string>)[s.Label, s.WarpingLength > 0 ? u.Length.Format(s.WarpingLength, 4) : "- (does not warp)", u.Angle.Format(s.MaxRotation, 5),
                u.Bimoment.Format(s.MaxBimoment, 4), u.Stress.Format(s.MaxWarpingNormalStress, 4),
                s.MaxCombinedNormalStress is { } c ? u.Stress.Format(c, 4) : "no bending block"]).ToArray());
        var shear = new ReportTable("Shear under restrained warping (largest values along each segment)",
            ["segment", $"Saint-Venant shear [{u.Stress.Symbol}]", $"warping shear [{u.Stress.Symbol}]", $"combined shear [{u.Stress.Symbol}]"],
            m.Segments.Select(s => (IReadOnlyList<string>)[s.Label, Shear(u, s, s.MaxSaintVenantShear), Shear(u, s, s.MaxWarpingShear), Shear(u, s, s.MaxCombinedShear)]).ToArray());
        var tables = new List<ReportTable> { stations, segments, shear };
        if (m.Springs.Count > 0)
            tables.Insert(1, new ReportTable("Couplings under restrained warping (they carry torque, no bimoment)",
                ["spring", "between", $"torque [{u.Torque.Symbol}]", $"wind-up [{u.Angle.Symbol}]"],
                m.Springs.Select(s => (IReadOnlyList<string>)[s.Label, $"{s.StationA} and {s.StationB}", u.Torque.Format(s.Torque, 4), u.Angle.Format(s.Windup, 5)]).ToArray()));
        return new ReportChapter("Restrained warping (non-uniform torsion)")
        {
            Paragraphs =
            [
                "Segments of open section whose warping is restrained at a station are solved as one member in non-uniform (Vlasov) torsion, " +
                "E Iw φ'''' − G J φ'' = m, with exact elements (theory manual, section 7). These rotations replace the free-warping ones of the " +
                "result tables. The warping normal stress E |ω|max |φ''| acts where |ω| is largest (flange tips of I and channel sections); " +
                "the bending + warping column adds its magnitude to the bending check's normal stress at the same position (a bound). " +
                "A coupling (torsional spring) carries torque but no bimoment, so the parts it joins warp independently; a round taper does not warp " +
                "and carries its torque as Saint-Venant torque.",
                "The warping shear is E |φ'''| q_w with the section's warping shear factor q_w (for thin walls the largest S_w / t); the combined " +
                "shear adds the Saint-Venant and warping peaks at each position, a bound since they need not lie at the same point of the section.",
                "Not included: lateral-torsional buckling, local buckling and connection design. Follow the local steel design code and licensed engineering practice.",
            ],
            Tables = tables,
            Figures = WarpingDiagram.Figures(doc, m),
        };
    }

    private static string Shear(Units.UnitSystem u, WarpingSegmentResult s, double value) => s.ShearUnbounded && value > 0 ? "unbounded" : u.Stress.Format(value, 4);
}
