using SectionTwist.Shaft;

namespace SectionTwist.WarpingTorsion;

/// <summary>
/// Hooks restrained warping into the shaft solve: segments of open section (<see cref="SectionStiffness.WarpingSensitive"/>)
/// draw a warning when the shaft states no warping conditions; when it restrains warping somewhere, the whole shaft is
/// solved again as a Vlasov member (<see cref="WarpingMemberSolver"/>) and the result is attached.
/// </summary>
internal static class ShaftWarping
{
    public static ShaftResult Attach(ShaftResult r)
    {
        var model = r.Model;
        var open = model.Segments.Where(s => s.Section is { WarpingSensitive: true }).Select(s => s.Label).ToArray();
        var warnings = new List<string>();
        if (model.Warping is null)
        {
            if (open.Length > 0)
                warnings.Add($"segment{(open.Length > 1 ? "s" : "")} {string.Join(", ", open)}: open thin-walled section solved with free warping everywhere (twist T L / (G J), no warping stresses); " +
                             "end plates, fixed connections or continuity restrain warping and change twist and stresses: state the conditions under 'warping:', or 'warping: free' to confirm");
            return warnings.Count == 0 ? r : r with { WarpingWarnings = warnings.AsReadOnly() };
        }
        if (!model.Warping.Values.Any(w => w.Kind != WarpingEndKind.Free)) return r;
        if (model.Segments.Any(s => s.Section is { WarpingConstant: > 0 }) is false)
            return r with { WarpingWarnings = new[] { "warping restraints are given but no segment has a warping constant (no open section); they change nothing" } };
        if (model.Springs.Count > 0)
        {
            var sp = model.Springs[0];
            throw new SectionTwistException("warping", $"spring {sp.Label} (stations {sp.StationA} and {sp.StationB}){(model.Springs.Count > 1 ? $" and {model.Springs.Count - 1} more" : "")}: " +
                "restrained warping cannot be combined with torsional springs (couplings); model the member on each side of the coupling as its own shaft file, or state 'warping: free'");
        }
        var segs = model.Segments.Select(s =>
        {
            var sec = s.Section ?? throw new SectionTwistException("warping", $"segment {s.Label} (stations {s.From} to {s.To}): a tapered segment cannot be combined with restrained warping; split it into prismatic segments of stepped sections, or state 'warping: free'");
            double g = s.Material.ShearModulus, len = Length(model, s);
            var mat = sec.WarpingConstant is > 0 ? s.Material : s.Material with { YoungsModulus = s.Material.YoungsModulus ?? 2.6 * g };
            // A section without warping gets a warping length of 1e-4 of the segment: Saint-Venant torsion to round-off.
            double iw = sec.WarpingConstant is > 0 ? sec.WarpingConstant.Value : Math.Pow(1e-4 * len, 2) * g * sec.TorsionConstant / mat.YoungsModulus!.Value;
            var section = new WarpingSection(sec.TorsionConstant, iw, sec.MaxSectorialCoordinate ?? 0, sec.ShearPerTorque, sec.Description)
            {
                // a section without warping (round, closed) has no warping shear to speak of: its factor stays 0 silently
                WarpingShearFactor = sec.WarpingShearFactor ?? (sec.WarpingConstant is > 0 ? 0 : double.Epsilon),
                ShearUnbounded = sec.PeakShearUnbounded,
            };
            return new WarpingSegment(s.From, s.To, section, mat) { Name = s.Name };
        }).ToArray();
        var member = new WarpingMember
        {
            Stations = model.Stations,
            Segments = segs,
            Loads = model.Loads,
            FixedStations = model.FixedStations,
            Warping = model.Warping,
        };
        var result = WarpingMemberSolver.Solve(member);
        if (r.Bending is { } bending) result = WarpingBending.Combine(result, bending);
        // an angle, tee or stocky open section: its small Iw comes from warping across the wall thickness, which the
        // thin-walled (Vlasov) theory leaves out, and its restrained-warping stresses decay within a warping length of
        // the order of the section's own size, where beam theory does not describe them (Saint-Venant's principle)
        var negligible = model.Segments.Where(s => s.Section is { WarpingConstant: > 0, WarpingSensitive: false }).Select(s => s.Label).ToArray();
        if (negligible.Length > 0)
            result = result with
            {
                Warnings = result.Warnings.Prepend(
                    $"segment{(negligible.Length > 1 ? "s" : "")} {string.Join(", ", negligible)}: the section is warping-negligible (warping ratio below 1: an angle, tee or stocky section, see 'section --warping'); " +
                    "its restrained-warping stresses are local end effects within about a warping length of the restraint, beyond beam (Vlasov) theory: treat them as indicative, and take its twist as Saint-Venant torsion").ToList().AsReadOnly(),
            };
        return r with { Warping = result, WarpingWarnings = result.Warnings };
    }

    private static double Length(ShaftModel m, ShaftSegment s)
    {
        double a = m.Stations.First(x => x.Name == s.From).Position, b = m.Stations.First(x => x.Name == s.To).Position;
        return Math.Abs(b - a);
    }
}
