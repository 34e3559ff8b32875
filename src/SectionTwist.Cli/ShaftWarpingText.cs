using SectionTwist.Shaft;
using SectionTwist.Units;
using SectionTwist.WarpingTorsion;

namespace SectionTwist.Cli;

/// <summary>The warping part of the shaft tables: warnings and, when warping is restrained, the Vlasov results.</summary>
internal static class ShaftWarpingText
{
    public static void Write(TextWriter w, ShaftDocument doc, ShaftResult r)
    {
        if (r.WarpingWarnings.Count == 0 && r.Warping is null) return;
        var u = doc.Units;
        if (r.Warping is { } m)
        {
            w.WriteLine("restrained warping (non-uniform torsion, Vlasov): these rotations replace the free-warping ones above");
            w.WriteLine($"  station        rotation [{u.Angle.Symbol}]   rate of twist [{u.TwistRate.Symbol}]   reaction torque [{u.Torque.Symbol}]   bimoment reaction [{u.Bimoment.Symbol}]");
            foreach (var s in m.Stations)
                w.WriteLine($"  {s.Name,-14} {u.Angle.Format(s.Rotation, 5),14}   {u.TwistRate.Format(NumberText.Clean(s.RateOfTwist, RateScale(m)), 4),21}   {u.Torque.Format(s.ReactionTorque, 4),20}   {u.Bimoment.Format(NumberText.Clean(s.ReactionBimoment, Scale(m)), 4),25}");
            foreach (var sp in m.Springs)
                w.WriteLine($"  spring {sp.Label} ({sp.StationA} to {sp.StationB}): torque {u.Torque.Format(sp.Torque, 4)} {u.Torque.Symbol}, wind-up {u.Angle.Format(sp.Windup, 5)} {u.Angle.Symbol} (replaces the free-warping value above)");
            w.WriteLine($"  segment        a [{u.Length.Symbol}]   max bimoment [{u.Bimoment.Symbol}]   max warping normal stress [{u.Stress.Symbol}]   warping stress / yield");
            foreach (var s in m.Segments)
            {
                double? sy = doc.Model.Segments.FirstOrDefault(x => x.Label == s.Label)?.Material.YieldStrength;
                string ratio = sy is { } y && y > 0 ? NumberText.Fixed(s.MaxWarpingNormalStress / y, 2) + (s.MaxWarpingNormalStress > y ? "  !! OVER YIELD" : "") : "- (no yield given)";
                w.WriteLine($"  {s.Label,-14} {(s.WarpingLength > 0 ? u.Length.Format(s.WarpingLength, 4) : "-"),7}   {u.Bimoment.Format(s.MaxBimoment, 4),20}   {u.Stress.Format(s.MaxWarpingNormalStress, 4),30}   {ratio}");
            }
            w.WriteLine($"  segment        Saint-Venant shear [{u.Stress.Symbol}]   warping shear [{u.Stress.Symbol}]   combined shear [{u.Stress.Symbol}]   bending + warping normal [{u.Stress.Symbol}]");
            foreach (var s in m.Segments)
            {
                string combinedNormal = s.MaxCombinedNormalStress is { } c ? u.Stress.Format(c, 4) : "- (no bending block)";
                w.WriteLine($"  {s.Label,-14} {Shear(u, s, s.MaxSaintVenantShear),25}   {Shear(u, s, s.MaxWarpingShear),20}   {Shear(u, s, s.MaxCombinedShear),21}   {combinedNormal,28}");
            }
            w.WriteLine("  combined shear: Saint-Venant plus warping peak (a bound); bending + warping normal: the two magnitudes added at the same");
            w.WriteLine("  position (a bound, exact where both peak at the flange tips); the shear check above takes the larger of its free-warping peak");
            w.WriteLine("  (the whole torque as Saint-Venant torque) and this combined shear");
            foreach (var s in r.Segments.Where(x => x.ShearFromRestrainedWarping))
                w.WriteLine($"  segment {s.Label}: its shear check above uses this combined shear, {u.Stress.Format(s.MaxShear, 4)} {u.Stress.Symbol}, which exceeds the free-warping peak");
        }
        foreach (var text in r.WarpingWarnings) w.WriteLine($"warning: {text}");
        w.WriteLine();
    }

    private static string Shear(UnitSystem u, WarpingSegmentResult s, double value) => s.ShearUnbounded && value > 0 ? "unbounded" : u.Stress.Format(value, 4);

    /// <summary>The scale of the rates of twist: the largest rotation over the member's length (zero in exact arithmetic below 1e-12 of it).</summary>
    private static double RateScale(WarpingMemberResult m) =>
        m.Stations.Count < 2 ? 0 : m.Stations.Max(x => Math.Abs(x.Rotation)) / Math.Max(m.Stations[^1].Position - m.Stations[0].Position, double.Epsilon);

    private static double Scale(WarpingMemberResult m) => m.Segments.Count == 0 ? 0 : m.Segments.Max(s => s.MaxBimoment);
}
