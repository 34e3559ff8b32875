using System.Text;
using System.Text.Json;
using SectionTwist.Geometry;
using SectionTwist.Torsion;

namespace SectionTwist.Cli;

/// <summary>The <c>--json</c> object for one section, in SI base units (m, m^2, m^4, 1/m^3); non-finite numbers are null.</summary>
internal static class SectionJson
{
    public static string Write(SectionResult r, string source, Action<Utf8JsonWriter>? extra = null)
    {
        using var ms = new MemoryStream();
        using (var w = new Utf8JsonWriter(ms, new JsonWriterOptions { Indented = true }))
        {
            w.WriteStartObject();
            Write(w, r, source);
            extra?.Invoke(w);
            w.WriteEndObject();
        }
        return Encoding.UTF8.GetString(ms.ToArray());
    }

    /// <summary>Writes the section's properties into the current JSON object.</summary>
    public static void Write(Utf8JsonWriter w, SectionResult r, string source)
    {
        var p = r.Properties;
        w.WriteString("source", source);
        w.WriteString("lengthUnit", r.LengthUnit.Symbol);
        Num(w, "area", p.Area);
        Pt(w, "centroid", p.Centroid);
        Num(w, "ixx", p.Ixx);
        Num(w, "iyy", p.Iyy);
        Num(w, "ixy", p.Ixy);
        Num(w, "i1", p.I1);
        Num(w, "i2", p.I2);
        // undefined when I1 = I2 (every centroidal axis is principal): null rather than an angle made of round-off
        Num(w, "principalAngleDeg", p.HasPrincipalAxes ? p.PrincipalAngle * 180 / Math.PI : double.NaN);
        Num(w, "polarMoment", p.PolarMoment);
        Num(w, "torsionConstant", r.TorsionConstant);
        Num(w, "maxShearPerTorque", r.MaxShearPerTorque);
        Pt(w, "maxShearLocation", r.MaxShearLocation);
        w.WriteBoolean("peakShearUnbounded", double.IsPositiveInfinity(r.EstimatedRelativeError.MaxShear));
        w.WriteStartObject("estimatedRelativeError");
        Num(w, "torsionConstant", r.EstimatedRelativeError.TorsionConstant);
        Num(w, "maxShear", r.EstimatedRelativeError.MaxShear);
        w.WriteEndObject();
        w.WriteStartArray("regionTorsionConstants");
        foreach (var j in r.RegionTorsionConstants) w.WriteNumberValue(j);
        w.WriteEndArray();
        if (r.Warping is { } wr)
        {
            Pt(w, "shearCentre", wr.ShearCentre);
            Num(w, "warpingConstant", wr.WarpingConstant);
            Num(w, "maxSectorialCoordinate", wr.MaxSectorialCoordinate);
            w.WriteStartObject("warping");
            Pt(w, "maxSectorialCoordinateLocation", wr.MaxSectorialCoordinateLocation);
            Num(w, "torsionConstantUpperBound", wr.TorsionConstantUpperBound);
            Num(w, "warpingRatio", wr.WarpingRatio);
            w.WriteString("classification", wr.Classification == Warping.WarpingClass.WarpingSensitive ? "warping-sensitive" : "warping-negligible");
            Num(w, "steelWarpingLength", wr.SteelWarpingLength);
            Num(w, "warpingShearFactor", wr.WarpingShearFactor);
            Pt(w, "warpingShearFactorLocation", wr.WarpingShearFactorLocation);
            w.WriteBoolean("warpingShearUnbounded", double.IsPositiveInfinity(wr.EstimatedError.WarpingShearFactor));
            w.WriteStartObject("estimatedError");
            Num(w, "shearCentre", wr.EstimatedError.ShearCentre);
            Num(w, "warpingConstant", wr.EstimatedError.WarpingConstant);
            Num(w, "maxSectorialCoordinate", wr.EstimatedError.MaxSectorialCoordinate);
            Num(w, "warpingShearFactor", wr.EstimatedError.WarpingShearFactor);
            w.WriteEndObject();
            w.WriteEndObject();
        }
        w.WriteStartObject("mesh");
        w.WriteNumber("nodes", r.Mesh.Nodes);
        w.WriteNumber("elements", r.Mesh.Elements);
        Num(w, "minAngleDeg", r.Mesh.MinAngleDeg);
        w.WriteEndObject();
        Warnings(w, r.Warnings);
    }

    /// <summary>Writes a <c>warnings</c> array of code and message objects.</summary>
    internal static void Warnings(Utf8JsonWriter w, IEnumerable<AnalysisWarning> warnings)
    {
        w.WriteStartArray("warnings");
        foreach (var warn in warnings)
        {
            w.WriteStartObject();
            w.WriteString("code", warn.Code);
            w.WriteString("message", warn.Message);
            w.WriteEndObject();
        }
        w.WriteEndArray();
    }

    internal static void Num(Utf8JsonWriter w, string name, double v)
    {
        if (double.IsFinite(v)) w.WriteNumber(name, v); else w.WriteNull(name);
    }

    private static void Pt(Utf8JsonWriter w, string name, Point2 p)
    {
        w.WriteStartObject(name);
        Num(w, "x", p.X);
        Num(w, "y", p.Y);
        w.WriteEndObject();
    }
}
