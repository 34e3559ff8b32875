using System.Text.Json.Nodes;
using SectionTwist.Fatigue;
using static SectionTwist.JsonTree;

namespace SectionTwist.Bending;

/// <summary>The JSON form of a <see cref="BendingResult"/> (inside the shaft JSON as <c>bending</c>), SI base units, camelCase.</summary>
internal static class BendingJson
{
    private static double? Num(double? v) => v is { } x && double.IsFinite(x) ? x : null;

    private static JsonObject Point(CombinedStressPoint p) => new JsonObject
    {
        ["x"] = p.X, ["y"] = p.Y, ["normal"] = p.Normal, ["bendingStress"] = p.BendingStress, ["axialStress"] = p.AxialStress, ["shear"] = p.Shear,
        ["vonMises"] = p.VonMises, ["tresca"] = p.Tresca, ["dominant"] = p.Dominant,
    };

    private static JsonObject Factor(FatigueFactor f) => new JsonObject { ["symbol"] = f.Symbol, ["meaning"] = f.Meaning, ["value"] = f.Value, ["source"] = f.Source };

    public static JsonObject ToDto(BendingResult r) => new JsonObject
    {
        ["axes"] = "x along the shaft from the first station to the last; Y right and Z up looking back toward the first station; section x = Y, section y = Z; directions from +Y toward +Z",
        ["caution"] = "fatigue factors are estimates; keyseat ends, press fits and fretting need the applicable code and testing; defer to licensed engineering practice",
        ["anyLimitExceeded"] = r.AnyLimitExceeded,
        ["maxDeflection"] = r.MaxDeflection,
        ["governingSegment"] = r.Governing?.Label,
        ["warnings"] = Arr(r.Warnings),
        ["loads"] = Arr(r.Loads, l => new JsonObject { ["station"] = l.Station, ["kind"] = l.Kind, ["forceY"] = l.ForceY, ["forceZ"] = l.ForceZ, ["axialForce"] = l.AxialForce, ["momentY"] = l.MomentY, ["momentZ"] = l.MomentZ, ["description"] = l.Description }),
        ["bearings"] = Arr(r.Bearings, b => new JsonObject
        {
            ["name"] = b.Label, ["station"] = b.Station, ["position"] = b.Position, ["forceY"] = b.ForceY, ["forceZ"] = b.ForceZ, ["force"] = b.Force,
            ["axialForce"] = b.AxialForce, ["momentY"] = b.MomentY, ["momentZ"] = b.MomentZ, ["slope"] = b.Slope, ["slopeLimit"] = b.SlopeLimit, ["exceedsSlopeLimit"] = b.ExceedsSlopeLimit,
        }),
        ["segments"] = Arr(r.Segments, s => new JsonObject
        {
            ["name"] = s.Label, ["section"] = s.Section, ["material"] = s.Material, ["maxMoment"] = s.MaxMoment, ["position"] = s.Position, ["worstPoint"] = Point(s.Stress),
            ["yieldStrength"] = s.YieldStrength, ["strengthBasis"] = s.StrengthBasis, ["safetyFactor"] = Num(s.SafetyFactor), ["exceedsYield"] = s.ExceedsYield,
            ["fatigueSafetyFactor"] = Num(s.FatigueSafetyFactor),
        }),
        ["fatigue"] = Arr(r.Fatigue, f => new JsonObject
        {
            ["name"] = f.Label, ["station"] = f.Station, ["segment"] = f.Segment, ["position"] = f.Position, ["moment"] = f.Moment, ["torque"] = f.Torque,
            ["criterion"] = f.Criterion == FatigueCriterion.Goodman ? "goodman" : "asme-elliptic",
            ["notchFactors"] = Arr(f.NotchFactors, Factor),
            ["enduranceLimit"] = f.Endurance.Value, ["unmodifiedEnduranceLimit"] = f.Endurance.Unmodified, ["unmodifiedSource"] = f.Endurance.UnmodifiedSource,
            ["marinFactors"] = Arr(f.Endurance.Factors, Factor),
            ["sectionTorsionConcentration"] = f.SectionTorsionConcentration,
            ["alternatingStress"] = f.AlternatingStress, ["meanStress"] = f.MeanStress,
            ["safetyFactor"] = Num(f.SafetyFactor), ["yieldSafetyFactor"] = Num(f.YieldSafetyFactor), ["pointX"] = f.Point.X, ["pointY"] = f.Point.Y,
        }),
        ["connections"] = Arr(r.Connections, c => new JsonObject
        {
            ["name"] = c.Label, ["kind"] = c.Kind, ["segment"] = c.Segment, ["torque"] = c.Torque, ["shear"] = c.Shear, ["pressure"] = c.Pressure, ["shaftPressure"] = c.ShaftPressure,
            ["allowablePressure"] = c.AllowablePressure, ["allowableShear"] = c.AllowableShear, ["safetyFactor"] = Num(c.SafetyFactor), ["exceeds"] = c.Exceeds, ["method"] = c.Method,
        }),
        ["samples"] = Arr(r.Samples, s => new JsonObject
        {
            ["position"] = s.Position, ["segment"] = s.Segment, ["shearY"] = s.ShearY, ["shearZ"] = s.ShearZ, ["momentY"] = s.MomentY, ["momentZ"] = s.MomentZ, ["moment"] = s.Moment,
            ["deflectionY"] = s.DeflectionY, ["deflectionZ"] = s.DeflectionZ, ["slopeY"] = s.SlopeY, ["slopeZ"] = s.SlopeZ, ["axialForce"] = s.AxialForce, ["torque"] = s.Torque,
            ["vonMises"] = s.Stress.VonMises, ["tresca"] = s.Stress.Tresca, ["staticSafetyFactor"] = Num(s.StaticSafetyFactor), ["fatigueSafetyFactor"] = Num(s.FatigueSafetyFactor),
        }),
    };
}
