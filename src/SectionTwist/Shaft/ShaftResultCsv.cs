using System.Globalization;
using System.Text;
using SectionTwist.Units;

namespace SectionTwist.Shaft;

/// <summary>
/// CSV tables of a shaft result in a <see cref="UnitSystem"/> (the unit is part of each column name, in ASCII, e.g.
/// <c>torque_at_from_N*m</c> becomes <c>torque_at_from_Nm</c>), written with <see cref="AtomicFile"/>: stations.csv,
/// segments.csv (with the <c>check</c> column), warnings.csv (with the overload and stage warnings), bending.csv when the
/// model has bending, warping-stations.csv and warping-segments.csv when it restrains warping, and overload.csv when it has
/// overload checks. Numbers keep
/// full precision.
/// </summary>
internal static class ShaftResultCsv
{
    public static string Stations(ShaftResult r, UnitSystem u)
    {
        var sb = new StringBuilder($"name,{Col("position", u.Length)},rotation_rad,rotation_deg,{Col("applied_torque", u.Torque)},fixed\n");
        foreach (var s in r.Stations)
            sb.Append(CultureInfo.InvariantCulture, $"{Text(s.Name)},{N(u.Length.FromSi(s.Position))},{N(s.Rotation)},{N(s.Rotation * 180 / Math.PI)},{N(u.Torque.FromSi(s.AppliedTorque))},{(s.IsFixed ? "yes" : "no")}\n");
        return sb.ToString();
    }

    public static string Segments(ShaftResult r, UnitSystem u)
    {
        var sb = new StringBuilder(
            $"name,from,to,{Col("length", u.Length)},section,material,{Col("torque_at_from", u.Torque)},{Col("torque_at_to", u.Torque)},twist_rad," +
            $"{Col("max_shear", u.Stress)},{Col("shear_limit", u.Stress)},safety_factor,{Col("max_twist_rate", u.TwistRate)},exceeds_shear_limit,exceeds_twist_limit,peak_shear_unbounded,check\n");
        foreach (var s in r.Segments)
            sb.Append(CultureInfo.InvariantCulture,
                $"{Text(s.Label)},{Text(s.From)},{Text(s.To)},{N(u.Length.FromSi(s.Length))},{Text(s.Section)},{Text(s.Material.Name)},{N(u.Torque.FromSi(s.TorqueAtFrom))},{N(u.Torque.FromSi(s.TorqueAtTo))},{N(s.Twist)}," +
                $"{(s.PeakShearUnbounded ? "" : N(u.Stress.FromSi(s.MaxShear)))},{N(s.ShearLimit is { } l ? u.Stress.FromSi(l) : null)},{N(s.SafetyFactor)},{N(u.TwistRate.FromSi(s.MaxTwistRate))}," +
                $"{(s.ExceedsShearLimit ? "yes" : "no")},{(s.ExceedsTwistRateLimit ? "yes" : "no")},{(s.PeakShearUnbounded ? "yes" : "no")},{Text(s.Check)}\n");
        return sb.ToString();
    }

    /// <summary>One row per warning: its code and message (header only when there is none).</summary>
    public static string Warnings(ShaftResult r, GearedShaftResult? geared = null)
    {
        var sb = new StringBuilder("code,message\n");
        foreach (var w in r.Warnings) sb.Append(CultureInfo.InvariantCulture, $"{Text(w.Code)},{Text(w.Message)}\n");
        foreach (var w in r.WarpingWarnings) sb.Append(CultureInfo.InvariantCulture, $"warping,{Text(w)}\n");
        foreach (var w in r.Overload?.Warnings ?? []) sb.Append(CultureInfo.InvariantCulture, $"{Text(w.Code)},{Text(w.Message)}\n");
        foreach (var w in geared?.Warnings ?? []) sb.Append(CultureInfo.InvariantCulture, $"{Text(w.Code)},{Text(w.Message)}\n");
        foreach (var b in geared?.Branches ?? [])
            foreach (var w in b.Result.Warnings) sb.Append(CultureInfo.InvariantCulture, $"{Text(w.Code)},{Text($"shaft '{b.Shaft}': {w.Message}")}\n");
        return sb.ToString();
    }

    /// <summary>One row per segment and overload case: T_y, T_p, shape factor, the case's torque, margin and check (empty cells where unknown).</summary>
    public static string Overload(Plastic.OverloadResult o, UnitSystem u)
    {
        var sb = new StringBuilder($"segment,section,{Col("yield_shear", u.Stress)},{Col("first_yield_torque", u.Torque)},first_yield_unbounded,{Col("fully_plastic_torque", u.Torque)}," +
                                   $"fully_plastic_torque_error,shape_factor,factor,case,{Col("overload_torque", u.Torque)},margin,yields,check\n");
        foreach (var s in o.Segments)
            foreach (var c in s.Checks)
                sb.Append(CultureInfo.InvariantCulture,
                    $"{Text(s.Segment)},{Text(s.Section)},{N(s.YieldShear is { } t ? u.Stress.FromSi(t) : null)},{N(s.FirstYieldTorque is { } y ? u.Torque.FromSi(y) : null)},{(s.FirstYieldUnbounded ? "yes" : "no")}," +
                    $"{N(s.FullyPlasticTorque is { } p ? u.Torque.FromSi(p) : null)},{N(s.FullyPlasticTorqueError)},{N(s.ShapeFactor)},{N(o.Factor)},{Text(c.Case)},{N(u.Torque.FromSi(c.Torque))},{N(c.Margin)},{(c.Yields ? "yes" : "no")},{Text(c.Check)}\n");
        return sb.ToString();
    }

    /// <summary>
    /// The stations of the restrained-warping solve: rotation, rate of twist, support torque and the bimoment a restraint or
    /// warping spring takes. These rotations replace the free-warping ones of stations.csv.
    /// </summary>
    public static string WarpingStations(WarpingTorsion.WarpingMemberResult w, UnitSystem u)
    {
        var sb = new StringBuilder($"name,{Col("position", u.Length)},rotation_rad,rotation_deg,{Col("rate_of_twist", u.TwistRate)},{Col("reaction_torque", u.Torque)},{Col("reaction_bimoment", u.Bimoment)}\n");
        foreach (var s in w.Stations)
            sb.Append(CultureInfo.InvariantCulture,
                $"{Text(s.Name)},{N(u.Length.FromSi(s.Position))},{N(s.Rotation)},{N(s.Rotation * 180 / Math.PI)},{N(u.TwistRate.FromSi(s.RateOfTwist))},{N(u.Torque.FromSi(s.ReactionTorque))},{N(u.Bimoment.FromSi(s.ReactionBimoment))}\n");
        return sb.ToString();
    }

    /// <summary>
    /// The segments of the restrained-warping solve, largest values along each: warping length (empty for a segment that
    /// does not warp), rotation, bimoment, warping normal stress, the shears (empty when unbounded) and the bending + warping
    /// normal stress (empty without a bending block).
    /// </summary>
    public static string WarpingSegments(WarpingTorsion.WarpingMemberResult w, UnitSystem u)
    {
        var sb = new StringBuilder($"name,{Col("warping_length", u.Length)},max_rotation_rad,{Col("max_bimoment", u.Bimoment)},{Col("max_warping_normal_stress", u.Stress)}," +
                                   $"{Col("max_saint_venant_shear", u.Stress)},{Col("max_warping_shear", u.Stress)},{Col("max_combined_shear", u.Stress)},shear_unbounded,{Col("max_bending_plus_warping_normal", u.Stress)}\n");
        string Shear(WarpingTorsion.WarpingSegmentResult s, double v) => s.ShearUnbounded ? "" : N(u.Stress.FromSi(v));
        foreach (var s in w.Segments)
            sb.Append(CultureInfo.InvariantCulture,
                $"{Text(s.Label)},{(s.WarpingLength > 0 ? N(u.Length.FromSi(s.WarpingLength)) : "")},{N(s.MaxRotation)},{N(u.Bimoment.FromSi(s.MaxBimoment))},{N(u.Stress.FromSi(s.MaxWarpingNormalStress))}," +
                $"{Shear(s, s.MaxSaintVenantShear)},{Shear(s, s.MaxWarpingShear)},{Shear(s, s.MaxCombinedShear)},{(s.ShearUnbounded ? "yes" : "no")},{N(s.MaxCombinedNormalStress is { } c ? u.Stress.FromSi(c) : null)}\n");
        return sb.ToString();
    }

    /// <summary>
    /// Writes stations.csv, segments.csv and warnings.csv (and bending.csv when the model has bending, warping-stations.csv
    /// and warping-segments.csv when it restrains warping, overload.csv with overload checks) into
    /// <paramref name="directory"/>; returns the files written.
    /// </summary>
    public static IReadOnlyList<string> WriteAll(ShaftResult r, string directory, UnitSystem units, GearedShaftResult? geared = null)
    {
        var files = new List<string>();
        void Put(string name, string text)
        {
            string path = Path.Combine(directory, name);
            AtomicFile.WriteText(path, text);
            files.Add(path);
        }
        Put("stations.csv", Stations(r, units));
        Put("segments.csv", Segments(r, units));
        Put("warnings.csv", Warnings(r, geared));
        if (r.Bending is { } b) Put("bending.csv", Bending.BendingCsv.Samples(b, units));
        if (r.Warping is { } w)
        {
            Put("warping-stations.csv", WarpingStations(w, units));
            Put("warping-segments.csv", WarpingSegments(w, units));
        }
        if (r.Overload is { } o) Put("overload.csv", Overload(o, units));
        return files;
    }

    /// <summary>A column name with its unit in ASCII: <c>max_shear_MPa</c>, <c>max_twist_rate_deg_per_m</c>, <c>torque_at_to_Nm</c>, <c>applied_torque_lbf_in</c>.</summary>
    internal static string Col(string name, DisplayUnit unit)
    {
        var b = new StringBuilder(name).Append('_');
        string a = unit.Ascii;
        for (int i = 0; i < a.Length; i++)
        {
            char c = a[i];
            if (char.IsAsciiLetterOrDigit(c)) b.Append(c);
            else if (c == '/') b.Append("_per_");
            else if (c == '*') b.Append(i > 0 && a[i - 1] == 'N' ? "" : "_"); // N*m -> Nm (the usual spelling), lbf*in -> lbf_in
            else if (c == ' ') b.Append('_');
        }
        return b.ToString();
    }

    internal static string N(double? v) => v is { } x ? double.IsFinite(x) ? x.ToString("R", CultureInfo.InvariantCulture) : double.IsPositiveInfinity(x) ? "inf" : "" : "";

    internal static string Text(string s) => s.AsSpan().IndexOfAny(",\"\n") >= 0 ? "\"" + s.Replace("\"", "\"\"", StringComparison.Ordinal) + "\"" : s;
}
