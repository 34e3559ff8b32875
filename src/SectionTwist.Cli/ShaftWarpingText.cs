using SectionTwist.Shaft;
using SectionTwist.Units;

namespace SectionTwist.Cli;

/// <summary>The warping part of the shaft tables: warnings and, when warping is restrained, the Vlasov results.</summary>
internal static class ShaftWarpingText
{
    public static void Write(TextWriter w, ShaftDocument doc, ShaftResult r)
    {
        if (r.WarpingWarnings.Count == 0 && r.Warping is null) return;
        var u = doc.Units;
        string F(double v, string f = "G4") => NumberText.Styled(v, f);
        if (r.Warping is { } m)
        {
            w.WriteLine("restrained warping (non-uniform torsion, Vlasov): these rotations replace the free-warping ones above");
            w.WriteLine($"  station        rotation [{u.Angle.Symbol}]   rate of twist [{u.TwistRate.Symbol}]   reaction torque [{u.Torque.Symbol}]   bimoment reaction [{u.Bimoment.Symbol}]");
            foreach (var s in m.Stations)
                w.WriteLine($"  {s.Name,-14} {u.Angle.Format(s.Rotation, "F4"),14}   {u.TwistRate.Format(s.RateOfTwist, "G4"),21}   {u.Torque.Format(s.ReactionTorque, "G4"),20}   {u.Bimoment.Format(s.ReactionBimoment, "G4"),25}");
            w.WriteLine($"  segment        a [{u.Length.Symbol}]   max bimoment [{u.Bimoment.Symbol}]   max warping normal stress [{u.Stress.Symbol}]   max Saint-Venant shear [{u.Stress.Symbol}]   warping stress / yield");
            for (int i = 0; i < m.Segments.Count; i++)
            {
                var s = m.Segments[i];
                double? sy = doc.Model.Segments.FirstOrDefault(x => x.Label == s.Label)?.Material.YieldStrength;
                string ratio = sy is { } y && y > 0 ? F(s.MaxWarpingNormalStress / y, "F2") + (s.MaxWarpingNormalStress > y ? "  !! OVER YIELD" : "") : "- (no yield given)";
                w.WriteLine($"  {s.Label,-14} {u.Length.Format(s.WarpingLength, "G4"),7}   {u.Bimoment.Format(s.MaxBimoment, "G4"),20}   {u.Stress.Format(s.MaxWarpingNormalStress, "G4"),30}   {u.Stress.Format(s.MaxSaintVenantShear, "G4"),27}   {ratio}");
            }
            w.WriteLine("  the warping normal stress adds to bending stresses at the flange tips (not combined here: check the sum against the steel design code);");
            w.WriteLine("  the shear check above uses the whole torque as Saint-Venant torque");
        }
        foreach (var text in r.WarpingWarnings) w.WriteLine($"warning: {text}");
        w.WriteLine();
    }
}
