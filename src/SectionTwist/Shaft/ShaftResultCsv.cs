using System.Globalization;
using System.Text;

namespace SectionTwist.Shaft;

/// <summary>CSV tables of a shaft result in SI units (the unit is part of each column name), written with <see cref="AtomicFile"/>.</summary>
internal static class ShaftResultCsv
{
    public static string Stations(ShaftResult r)
    {
        var sb = new StringBuilder("name,position_m,rotation_rad,rotation_deg,applied_torque_Nm,fixed\n");
        foreach (var s in r.Stations)
            sb.Append(CultureInfo.InvariantCulture, $"{Text(s.Name)},{N(s.Position)},{N(s.Rotation)},{N(s.Rotation * 180 / Math.PI)},{N(s.AppliedTorque)},{(s.IsFixed ? "yes" : "no")}\n");
        return sb.ToString();
    }

    public static string Segments(ShaftResult r)
    {
        var sb = new StringBuilder("name,from,to,length_m,section,material,torque_at_from_Nm,torque_at_to_Nm,twist_rad,max_shear_Pa,shear_limit_Pa,safety_factor,max_twist_rate_rad_per_m,exceeds_shear_limit,exceeds_twist_limit\n");
        foreach (var s in r.Segments)
            sb.Append(CultureInfo.InvariantCulture,
                $"{Text(s.Label)},{Text(s.From)},{Text(s.To)},{N(s.Length)},{Text(s.Section)},{Text(s.Material.Name)},{N(s.TorqueAtFrom)},{N(s.TorqueAtTo)},{N(s.Twist)},{N(s.MaxShear)},{N(s.ShearLimit)},{N(s.SafetyFactor)},{N(s.MaxTwistRate)},{(s.ExceedsShearLimit ? "yes" : "no")},{(s.ExceedsTwistRateLimit ? "yes" : "no")}\n");
        return sb.ToString();
    }

    /// <summary>Writes stations.csv and segments.csv into <paramref name="directory"/>.</summary>
    public static void WriteAll(ShaftResult r, string directory)
    {
        AtomicFile.WriteText(Path.Combine(directory, "stations.csv"), Stations(r));
        AtomicFile.WriteText(Path.Combine(directory, "segments.csv"), Segments(r));
        if (r.Bending is { } b) AtomicFile.WriteText(Path.Combine(directory, "bending.csv"), Bending.BendingCsv.Samples(b));
    }

    internal static string N(double? v) => v is { } x ? double.IsFinite(x) ? x.ToString("R", CultureInfo.InvariantCulture) : double.IsPositiveInfinity(x) ? "inf" : "" : "";

    internal static string Text(string s) => s.AsSpan().IndexOfAny(",\"\n") >= 0 ? "\"" + s.Replace("\"", "\"\"", StringComparison.Ordinal) + "\"" : s;
}
