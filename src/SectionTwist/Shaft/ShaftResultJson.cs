using System.Text.Json;
using System.Text.Json.Serialization;

namespace SectionTwist.Shaft;

/// <summary>
/// The JSON form of a shaft result, in SI base units (m, N*m, Pa, rad; twist rates rad/m), camelCase keys.
/// Non-finite numbers (an infinite factor of safety of an unloaded segment) are written as null, and so is the peak shear of
/// a segment whose peak is unbounded (a sharp re-entrant corner). The analysis warnings are in <c>warnings</c>.
/// </summary>
internal static class ShaftResultJson
{
    private static readonly JsonSerializerOptions Options = new()
    {
        PropertyNamingPolicy = JsonNamingPolicy.CamelCase,
        WriteIndented = true,
        DefaultIgnoreCondition = JsonIgnoreCondition.Never,
        Converters = { new FiniteOrNull() },
    };

    /// <summary>Writes a non-finite double as null: JSON has no infinity, and the result guard should never let one through.</summary>
    private sealed class FiniteOrNull : JsonConverter<double>
    {
        public override double Read(ref Utf8JsonReader reader, Type typeToConvert, JsonSerializerOptions options) => reader.GetDouble();

        public override void Write(Utf8JsonWriter writer, double value, JsonSerializerOptions options)
        {
            if (double.IsFinite(value)) writer.WriteNumberValue(value);
            else writer.WriteNullValue();
        }
    }

    public static string Write(ShaftResult r, string? file = null, GearedShaftResult? geared = null) => JsonSerializer.Serialize(ToDto(r, file, geared), Options);

    private static double? Num(double? v) => v is { } x && double.IsFinite(x) ? x : null;

    private static object ToDto(ShaftResult r, string? file, GearedShaftResult? geared) => new
    {
        units = new { length = "m", torque = "N*m", stress = "Pa", angle = "rad", twistRate = "rad/m" },
        title = r.Model.Title,
        file,
        signConvention = "right-hand rule about the axis from the first station to the last; internal torque positive when it acts counter-clockwise on the cut face looking back toward the first station",
        referenceStation = r.ReferenceStation,
        twistRateLimit = r.TwistRateLimit,
        anyLimitExceeded = r.AnyLimitExceeded,
        anyPeakShearUnbounded = r.AnyPeakShearUnbounded,
        governingSegment = r.GoverningSegment?.Label,
        governingTwistSegment = r.GoverningTwistSegment?.Label,
        endToEndTwist = r.EndToEndTwist,
        stations = r.Stations.Select(s => new { name = s.Name, position = s.Position, rotation = s.Rotation, appliedTorque = s.AppliedTorque, isFixed = s.IsFixed }),
        segments = r.Segments.Select(Segment),
        reactions = r.Reactions.Select(x => new { station = x.Station, torque = x.Torque }),
        springs = r.Springs.Select(x => new { name = x.Label, stationA = x.StationA, stationB = x.StationB, torque = x.Torque, windup = x.Windup }),
        warnings = r.Warnings.Select(x => new { code = x.Code, message = x.Message }),
        warpingWarnings = r.WarpingWarnings,
        warping = r.Warping is not { } w ? null : new
        {
            stations = w.Stations.Select(s => new { name = s.Name, position = s.Position, rotation = s.Rotation, rateOfTwist = s.RateOfTwist, reactionTorque = s.ReactionTorque, reactionBimoment = s.ReactionBimoment }),
            segments = w.Segments.Select(s => new
            {
                name = s.Label,
                warpingLength = s.WarpingLength,
                maxRotation = s.MaxRotation,
                maxBimoment = s.MaxBimoment,
                maxWarpingNormalStress = s.MaxWarpingNormalStress,
                maxSaintVenantShear = s.ShearUnbounded ? (double?)null : s.MaxSaintVenantShear,
                maxWarpingShear = s.ShearUnbounded && s.MaxWarpingShear > 0 ? (double?)null : s.MaxWarpingShear,
                maxCombinedShear = s.ShearUnbounded ? (double?)null : s.MaxCombinedShear,
                shearUnbounded = s.ShearUnbounded,
                maxCombinedNormalStress = s.MaxCombinedNormalStress,
            }),
        },
        bending = r.Bending is null ? null : Bending.BendingJson.ToDto(r.Bending),
        branches = geared?.Branches.Select(b => new
        {
            shaft = b.Shaft,
            stage = b.Stage,
            parent = b.Parent,
            station = b.Station,
            speedRatio = b.SpeedRatio,
            stageTorque = b.StageTorque,
            torqueFromOwnLoads = b.TorqueFromOwnLoads,
            referenceStation = b.Result.ReferenceStation,
            stations = b.Result.Stations.Select(s => new { name = s.Name, position = s.Position, rotation = s.Rotation, appliedTorque = s.AppliedTorque, isFixed = s.IsFixed }),
            segments = b.Result.Segments.Select(Segment),
            reactions = b.Result.Reactions.Select(x => new { station = x.Station, torque = x.Torque }),
            warnings = b.Result.Warnings.Select(x => new { code = x.Code, message = x.Message }),
        }),
        stageWarnings = geared?.Warnings.Select(x => new { code = x.Code, message = x.Message }),
        overload = r.Overload is not { } o ? null : new
        {
            factor = o.Factor,
            anyOverCapacity = o.AnyOverCapacity,
            segments = o.Segments.Select(s => new
            {
                segment = s.Segment,
                section = s.Section,
                yieldShear = s.YieldShear,
                firstYieldTorque = s.FirstYieldTorque,
                firstYieldUnbounded = s.FirstYieldUnbounded,
                fullyPlasticTorque = s.FullyPlasticTorque,
                fullyPlasticTorqueError = Num(s.FullyPlasticTorqueError),
                shapeFactor = s.ShapeFactor,
                checks = s.Checks.Select(c => new { @case = c.Case, torque = c.Torque, margin = c.Margin, yields = c.Yields, check = c.Check }),
            }),
            warnings = o.Warnings.Select(x => new { code = x.Code, message = x.Message }),
        },
    };

    private static object Segment(SegmentResult s) => new
    {
        name = s.Label,
        from = s.From,
        to = s.To,
        length = s.Length,
        section = s.Section,
        material = s.Material.Name,
        materialSource = s.Material.Source,
        materialStrengthBasis = s.Material.StrengthBasis switch { MaterialBasis.SpecifiedMinimum => "specified-minimum", MaterialBasis.Typical => "typical", _ => "user" },
        stiffness = s.Stiffness,
        internalTorque = s.InternalTorque,
        torqueAtFrom = s.TorqueAtFrom,
        torqueAtTo = s.TorqueAtTo,
        twist = s.Twist,
        // a sharp re-entrant corner: the mesh value is no bound on the stress, so no number is given
        maxShear = s.PeakShearUnbounded ? (double?)null : s.MaxShear,
        peakShearUnbounded = s.PeakShearUnbounded,
        shearLimit = s.ShearLimit,
        shearLimitBasis = s.Material.LimitBasis,
        safetyFactor = Num(s.SafetyFactor),
        maxTwistRate = s.MaxTwistRate,
        exceedsShearLimit = s.ExceedsShearLimit,
        exceedsTwistRateLimit = s.ExceedsTwistRateLimit,
        check = s.Check,
        materialChecks = s.MaterialChecks.Select(c => new { material = c.Material.Name, maxShear = c.MaxShear, shearLimit = c.Material.LimitShear, shearLimitBasis = c.Material.LimitBasis, safetyFactor = Num(c.SafetyFactor), exceedsShearLimit = c.Exceeds }),
    };
}
