using System.Globalization;
using System.Text.Json;
using SectionTwist.Plastic;
using SectionTwist.Shaft;

namespace SectionTwist.Cli;

/// <summary>The <c>section --plastic</c> option: parsing the yield value, and the text and JSON output.</summary>
internal static class PlasticCli
{
    /// <summary>Shear yield in Pa and a label from a material key (its shear yield) or a stress with a unit.</summary>
    public static (double YieldShear, string Basis) ParseYield(string text)
    {
        if (ShaftMaterials.TryGet(text, out var m))
        {
            if (m.ShearYield is not { } sy)
                throw new UsageException($"--plastic: material '{text}' has no shear yield strength; give the shear yield stress instead, e.g. --plastic 140MPa");
            return (sy, $"shear yield of {m.Name}, material library");
        }
        if (QuantityText.TrySplit(text, out double v, out string unit) && QuantityText.UnitFactor(unit, QuantityKind.Stress) is { } f && v > 0)
            return (v * f, "given shear yield stress");
        throw new UsageException($"--plastic: '{text}' is neither a material ({string.Join(", ", ShaftMaterials.All.Keys)}) nor a positive shear yield stress with a unit, e.g. 140MPa");
    }

    public static void WriteText(TextWriter w, PlasticResult r, string basis)
    {
        string F(double v) => v.ToString("G5", CultureInfo.InvariantCulture);
        string E(double v) => double.IsFinite(v) ? v.ToString("0.0E+0", CultureInfo.InvariantCulture) : "n/a";
        w.WriteLine($"elastic-perfectly-plastic torsion, tau_y = {F(r.YieldShear * 1e-6)} MPa ({basis})");
        w.WriteLine($"  first-yield torque T_y    {F(r.FirstYieldTorque),14} N*m");
        w.WriteLine($"  fully plastic torque T_p  {F(r.FullyPlasticTorque),14} N*m   est. rel. error {E(r.FullyPlasticTorqueError)}");
        w.WriteLine($"  shape factor T_p/T_y      {F(r.ShapeFactor),14}");
        w.WriteLine("  twist/twist_y    torque N*m    T/T_y   yielded area   est. rel. error");
        foreach (var p in r.Curve)
            w.WriteLine($"  {F(p.TwistRatio),13} {F(p.Torque),13} {p.TorqueRatio,8:F4} {p.PlasticFraction * 100,12:F1} % {E(p.EstimatedRelativeError),14}");
        foreach (var warn in r.Warnings) w.WriteLine($"  warning [{warn.Code}]: {warn.Message}");
        w.WriteLine("  ideal plasticity: no strain hardening, no residual stresses; check limit states against the applicable code");
    }

    public static void WriteJson(Utf8JsonWriter w, PlasticResult r, string basis)
    {
        w.WriteStartObject("plastic");
        SectionJson.Num(w, "yieldShear", r.YieldShear);
        w.WriteString("yieldBasis", basis);
        SectionJson.Num(w, "firstYieldTorque", r.FirstYieldTorque);
        SectionJson.Num(w, "fullyPlasticTorque", r.FullyPlasticTorque);
        SectionJson.Num(w, "fullyPlasticTorqueError", r.FullyPlasticTorqueError);
        SectionJson.Num(w, "shapeFactor", r.ShapeFactor);
        w.WriteStartArray("curve");
        foreach (var p in r.Curve)
        {
            w.WriteStartObject();
            SectionJson.Num(w, "twistRatio", p.TwistRatio);
            SectionJson.Num(w, "torque", p.Torque);
            SectionJson.Num(w, "torqueRatio", p.TorqueRatio);
            SectionJson.Num(w, "plasticFraction", p.PlasticFraction);
            SectionJson.Num(w, "estimatedRelativeError", p.EstimatedRelativeError);
            w.WriteEndObject();
        }
        w.WriteEndArray();
        SectionJson.Warnings(w, r.Warnings);
        w.WriteEndObject();
    }
}
