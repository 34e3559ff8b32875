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
        var done = AttachWarping(r);
        // a rotating shaft (the bending default) is checked with each boundary point at its worst angle to the moment: for
        // an I-beam or channel that is bending about the weak axis, several times the strong-axis stress of a member that
        // does not rotate (common practice, no source: structural members of open section do not rotate)
        var openBent = r.Bending is null || r.Model.Bending is not { Rotating: true } ? []
            : r.Model.Segments.Where(s => s.Section is { WarpingSensitive: true }).Select(s => s.Label).ToArray();
        if (openBent.Length == 0) return done;
        string note = $"segment{(openBent.Length > 1 ? "s" : "")} {string.Join(", ", openBent)}: open section checked in bending as a rotating shaft " +
                      "('rotating: true', the default): every boundary point is taken at its worst angle to the bending moment, for an I-section " +
                      "or channel the weak axis; for a beam or frame member that does not rotate, write 'rotating: false' in the bending block";
        return done with { WarpingWarnings = done.WarpingWarnings.Prepend(note).ToArray() };
    }

    private static ShaftResult AttachWarping(ShaftResult r)
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
        var segs = model.Segments.Select(s =>
        {
            if (s.Taper is { } taper) return WarpingSegment.Tapered(s.From, s.To, taper, s.Material) with { Name = s.Name };
            var sec = s.Section!;
            // a section without a warping constant (round, closed or solid: warping negligible) gets Iw = 0, which the
            // member solver takes as Saint-Venant torsion on the rotations only
            var section = new WarpingSection(sec.TorsionConstant, sec.WarpingConstant is > 0 ? sec.WarpingConstant.Value : 0, sec.MaxSectorialCoordinate ?? 0, sec.ShearPerTorque, sec.Description)
            {
                WarpingShearFactor = sec.WarpingShearFactor ?? 0,
                ShearUnbounded = sec.PeakShearUnbounded,
            };
            return new WarpingSegment(s.From, s.To, section, s.Material) { Name = s.Name };
        }).ToArray();
        var member = new WarpingMember
        {
            Stations = model.Stations,
            Segments = segs,
            Loads = model.Loads,
            // a free shaft (no support, torques in balance) is held at its reference station, as the shaft solver holds it
            FixedStations = model.FixedStations.Count > 0 ? model.FixedStations
                : [model.ReferenceStation ?? model.Stations.OrderBy(x => x.Position).First().Name],
            Warping = model.Warping,
            Springs = model.Springs,
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
        return Recheck(r with { Warping = result, WarpingWarnings = result.Warnings });
    }

    /// <summary>
    /// The shear check covers both solves: where the combined shear of the restrained-warping solve exceeds the free-warping
    /// peak (an indeterminate member can share its torque differently once warping stiffens a part), the segment's peak,
    /// factor of safety and limit flag take the combined value, and the governing segment is chosen again.
    /// </summary>
    private static ShaftResult Recheck(ShaftResult r)
    {
        var byLabel = r.Warping!.Segments.ToDictionary(s => s.Label, StringComparer.Ordinal);
        bool changed = false;
        var segments = r.Segments.Select(s =>
        {
            if (s.PeakShearUnbounded || s.MaterialChecks.Count > 0 || !byLabel.TryGetValue(s.Label, out var w) || w.ShearUnbounded
                || !(w.MaxCombinedShear > s.MaxShear * (1 + 1e-9))) return s;
            changed = true;
            double tau = w.MaxCombinedShear;
            return s with
            {
                MaxShear = tau,
                SafetyFactor = s.ShearLimit is { } lim ? lim / tau : null,
                ExceedsShearLimit = s.ShearLimit is { } l && tau > l,
                ShearFromRestrainedWarping = true,
            };
        }).ToArray();
        if (!changed) return r;
        var governing = segments.FirstOrDefault(s => s.PeakShearUnbounded)
            ?? segments.Where(s => s.ShearLimit is not null && s.MaxShear > 0).OrderByDescending(s => s.MaxShear / s.ShearLimit!.Value).FirstOrDefault();
        return r with { Segments = Array.AsReadOnly(segments), GoverningSegment = governing };
    }
}
