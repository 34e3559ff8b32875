using SectionTwist.Shaft;

namespace SectionTwist.Rendering.Report;

/// <summary>The report chapter of a shaft solved with restrained warping (Vlasov torsion): station and segment tables.</summary>
internal static class WarpingChapter
{
    public static ReportChapter? Build(ShaftDocument doc, ShaftResult result)
    {
        if (result.Warping is not { } m) return null;
        var u = doc.Units;
        var stations = new ReportTable("Stations under restrained warping",
            ["station", $"position [{u.Length.Symbol}]", $"rotation [{u.Angle.Symbol}]", $"rate of twist [{u.TwistRate.Symbol}]", $"support torque [{u.Torque.Symbol}]", $"bimoment at restraint [{u.Bimoment.Symbol}]"],
            m.Stations.Select(s => (IReadOnlyList<string>)[s.Name, u.Length.Format(s.Position), u.Angle.Format(s.Rotation, "F4"),
                u.TwistRate.Format(s.RateOfTwist, "G4"), u.Torque.Format(s.ReactionTorque, "G4"), u.Bimoment.Format(s.ReactionBimoment, "G4")]).ToArray());
        var segments = new ReportTable("Segments under restrained warping (largest values along each segment)",
            ["segment", $"warping length a [{u.Length.Symbol}]", $"largest rotation [{u.Angle.Symbol}]", $"largest bimoment [{u.Bimoment.Symbol}]",
                $"warping normal stress [{u.Stress.Symbol}]", $"Saint-Venant shear [{u.Stress.Symbol}]"],
            m.Segments.Select(s => (IReadOnlyList<string>)[s.Label, u.Length.Format(s.WarpingLength, "G4"), u.Angle.Format(s.MaxRotation, "F4"),
                u.Bimoment.Format(s.MaxBimoment, "G4"), u.Stress.Format(s.MaxWarpingNormalStress, "G4"), u.Stress.Format(s.MaxSaintVenantShear, "G4")]).ToArray());
        return new ReportChapter("Restrained warping (non-uniform torsion)")
        {
            Paragraphs =
            [
                "Segments of open section whose warping is restrained at a station are solved as one member in non-uniform (Vlasov) torsion, " +
                "E Iw φ'''' − G J φ'' = m, with exact elements (theory manual, section 7). These rotations replace the free-warping ones of the " +
                "result tables; the warping normal stress E |ω|max |φ''| acts at the flange tips and adds to bending stresses.",
                "Not included: warping shear stresses, lateral-torsional buckling, local buckling and connection design. Follow the local steel design code.",
            ],
            Tables = [stations, segments],
        };
    }
}
