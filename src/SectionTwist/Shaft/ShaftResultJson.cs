using System.Text.Json.Nodes;
using static SectionTwist.JsonTree;

namespace SectionTwist.Shaft;

/// <summary>
/// The JSON form of a shaft result, in SI base units (m, N*m, Pa, rad; twist rates rad/m), camelCase keys.
/// Non-finite numbers (an infinite factor of safety of an unloaded segment) are written as null, and so is the peak shear of
/// a segment whose peak is unbounded (a sharp re-entrant corner). The analysis warnings are in <c>warnings</c>.
/// </summary>
internal static class ShaftResultJson
{
    public static string Write(ShaftResult r, string? file = null, GearedShaftResult? geared = null) => JsonTree.Write(ToDto(r, file, geared));

    private static double? Num(double? v) => v is { } x && double.IsFinite(x) ? x : null;

    private static JsonObject ToDto(ShaftResult r, string? file, GearedShaftResult? geared) => new JsonObject
    {
        ["units"] = new JsonObject { ["length"] = "m", ["torque"] = "N*m", ["stress"] = "Pa", ["angle"] = "rad", ["twistRate"] = "rad/m" },
        ["title"] = r.Model.Title,
        ["file"] = file,
        ["signConvention"] = "right-hand rule about the axis from the first station to the last; internal torque positive when it acts counter-clockwise on the cut face looking back toward the first station",
        ["referenceStation"] = r.ReferenceStation,
        ["twistRateLimit"] = r.TwistRateLimit,
        ["anyLimitExceeded"] = r.AnyLimitExceeded,
        ["anyPeakShearUnbounded"] = r.AnyPeakShearUnbounded,
        ["governingSegment"] = r.GoverningSegment?.Label,
        ["governingTwistSegment"] = r.GoverningTwistSegment?.Label,
        ["endToEndTwist"] = r.EndToEndTwist,
        ["stations"] = Arr(r.Stations, s => new JsonObject { ["name"] = s.Name, ["position"] = s.Position, ["rotation"] = s.Rotation, ["appliedTorque"] = s.AppliedTorque, ["isFixed"] = s.IsFixed }),
        ["segments"] = Arr(r.Segments, Segment),
        ["reactions"] = Arr(r.Reactions, x => new JsonObject { ["station"] = x.Station, ["torque"] = x.Torque }),
        ["springs"] = Arr(r.Springs, x => new JsonObject { ["name"] = x.Label, ["stationA"] = x.StationA, ["stationB"] = x.StationB, ["torque"] = x.Torque, ["windup"] = x.Windup }),
        ["warnings"] = Arr(r.Warnings, x => new JsonObject { ["code"] = x.Code, ["message"] = x.Message }),
        ["warpingWarnings"] = Arr(r.WarpingWarnings),
        ["warping"] = r.Warping is not { } w ? null : new JsonObject
        {
            ["stations"] = Arr(w.Stations, s => new JsonObject { ["name"] = s.Name, ["position"] = s.Position, ["rotation"] = s.Rotation, ["rateOfTwist"] = s.RateOfTwist, ["reactionTorque"] = s.ReactionTorque, ["reactionBimoment"] = s.ReactionBimoment }),
            ["segments"] = Arr(w.Segments, s => new JsonObject
            {
                ["name"] = s.Label,
                ["warpingLength"] = s.WarpingLength,
                ["maxRotation"] = s.MaxRotation,
                ["maxBimoment"] = s.MaxBimoment,
                ["maxWarpingNormalStress"] = s.MaxWarpingNormalStress,
                ["maxSaintVenantShear"] = s.ShearUnbounded ? (double?)null : s.MaxSaintVenantShear,
                ["maxWarpingShear"] = s.ShearUnbounded && s.MaxWarpingShear > 0 ? (double?)null : s.MaxWarpingShear,
                ["maxCombinedShear"] = s.ShearUnbounded ? (double?)null : s.MaxCombinedShear,
                ["shearUnbounded"] = s.ShearUnbounded,
                ["maxCombinedNormalStress"] = s.MaxCombinedNormalStress,
            }),
            ["springs"] = Arr(w.Springs, x => new JsonObject { ["name"] = x.Label, ["stationA"] = x.StationA, ["stationB"] = x.StationB, ["torque"] = x.Torque, ["windup"] = x.Windup }),
        },
        ["bending"] = r.Bending is null ? null : Bending.BendingJson.ToDto(r.Bending),
        ["branches"] = Arr(geared?.Branches, b => new JsonObject
        {
            ["shaft"] = b.Shaft,
            ["stage"] = b.Stage,
            ["parent"] = b.Parent,
            ["station"] = b.Station,
            ["speedRatio"] = b.SpeedRatio,
            ["stageTorque"] = b.StageTorque,
            ["torqueFromOwnLoads"] = b.TorqueFromOwnLoads,
            ["referenceStation"] = b.Result.ReferenceStation,
            ["stations"] = Arr(b.Result.Stations, s => new JsonObject { ["name"] = s.Name, ["position"] = s.Position, ["rotation"] = s.Rotation, ["appliedTorque"] = s.AppliedTorque, ["isFixed"] = s.IsFixed }),
            ["segments"] = Arr(b.Result.Segments, Segment),
            ["reactions"] = Arr(b.Result.Reactions, x => new JsonObject { ["station"] = x.Station, ["torque"] = x.Torque }),
            ["warnings"] = Arr(b.Result.Warnings, x => new JsonObject { ["code"] = x.Code, ["message"] = x.Message }),
        }),
        ["stageWarnings"] = Arr(geared?.Warnings, x => new JsonObject { ["code"] = x.Code, ["message"] = x.Message }),
        ["overload"] = r.Overload is not { } o ? null : new JsonObject
        {
            ["factor"] = o.Factor,
            ["anyOverCapacity"] = o.AnyOverCapacity,
            ["segments"] = Arr(o.Segments, s => new JsonObject
            {
                ["segment"] = s.Segment,
                ["section"] = s.Section,
                ["yieldShear"] = s.YieldShear,
                ["firstYieldTorque"] = s.FirstYieldTorque,
                ["firstYieldUnbounded"] = s.FirstYieldUnbounded,
                ["fullyPlasticTorque"] = s.FullyPlasticTorque,
                ["fullyPlasticTorqueError"] = Num(s.FullyPlasticTorqueError),
                ["shapeFactor"] = s.ShapeFactor,
                ["checks"] = Arr(s.Checks, c => new JsonObject { ["case"] = c.Case, ["torque"] = c.Torque, ["margin"] = c.Margin, ["yields"] = c.Yields, ["check"] = c.Check }),
            }),
            ["warnings"] = Arr(o.Warnings, x => new JsonObject { ["code"] = x.Code, ["message"] = x.Message }),
        },
    };

    private static JsonObject Segment(SegmentResult s) => new JsonObject
    {
        ["name"] = s.Label,
        ["from"] = s.From,
        ["to"] = s.To,
        ["length"] = s.Length,
        ["section"] = s.Section,
        ["material"] = s.Material.Name,
        ["materialSource"] = s.Material.Source,
        ["materialStrengthBasis"] = s.Material.StrengthBasis switch { MaterialBasis.SpecifiedMinimum => "specified-minimum", MaterialBasis.Typical => "typical", _ => "user" },
        ["stiffness"] = s.Stiffness,
        ["internalTorque"] = s.InternalTorque,
        ["torqueAtFrom"] = s.TorqueAtFrom,
        ["torqueAtTo"] = s.TorqueAtTo,
        ["twist"] = s.Twist,
        // a sharp re-entrant corner: the mesh value is no bound on the stress, so no number is given
        ["maxShear"] = s.PeakShearUnbounded ? (double?)null : s.MaxShear,
        ["peakShearUnbounded"] = s.PeakShearUnbounded,
        ["shearFromRestrainedWarping"] = s.ShearFromRestrainedWarping,
        ["shearLimit"] = s.ShearLimit,
        ["shearLimitBasis"] = s.Material.LimitBasis,
        ["safetyFactor"] = Num(s.SafetyFactor),
        ["maxTwistRate"] = s.MaxTwistRate,
        ["exceedsShearLimit"] = s.ExceedsShearLimit,
        ["exceedsTwistRateLimit"] = s.ExceedsTwistRateLimit,
        ["check"] = s.Check,
        ["materialChecks"] = Arr(s.MaterialChecks, c => new JsonObject { ["material"] = c.Material.Name, ["maxShear"] = c.MaxShear, ["shearLimit"] = c.Material.LimitShear, ["shearLimitBasis"] = c.Material.LimitBasis, ["safetyFactor"] = Num(c.SafetyFactor), ["exceedsShearLimit"] = c.Exceeds }),
    };
}
