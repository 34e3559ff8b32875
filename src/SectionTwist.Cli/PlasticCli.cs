using System.Text.Json;
using SectionTwist.Plastic;
using SectionTwist.Shaft;
using SectionTwist.Units;

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
        throw new UsageException($"--plastic: '{text}' is neither a material{Suggest.DidYouMean(text, ShaftMaterials.All.Keys)} ({string.Join(", ", ShaftMaterials.All.Keys)}) nor a positive shear yield stress with a unit, e.g. 140MPa");
    }

    /// <summary>The plastic tables in <paramref name="units"/> (the section's own system when null).</summary>
    public static void WriteText(TextWriter w, PlasticResult r, string basis, UnitSystem? units = null)
    {
        var u = units ?? UnitSystem.For(r.Elastic.LengthUnit);
        string F(double v) => NumberText.Format(v, 5);
        string E(double v) => double.IsFinite(v) ? NumberText.Exponent(v, 2) : "n/a";
        string T = u.Torque.Symbol;
        w.WriteLine($"elastic-perfectly-plastic torsion, tau_y = {u.Stress.Text(r.YieldShear, 5)} ({basis})");
        w.WriteLine($"  first-yield torque T_y    {u.Torque.Format(r.FirstYieldTorque, 5),14} {T}");
        w.WriteLine($"  fully plastic torque T_p  {u.Torque.Format(r.FullyPlasticTorque, 5),14} {T}   est. rel. error {E(r.FullyPlasticTorqueError)}");
        w.WriteLine($"  shape factor T_p/T_y      {F(r.ShapeFactor),14}");
        w.WriteLine($"  twist/twist_y  {$"torque [{T}]",13}    T/T_y   yielded area   est. rel. error");
        foreach (var p in r.Curve)
            w.WriteLine($"  {F(p.TwistRatio),13} {u.Torque.Format(p.Torque, 5),13} {NumberText.Fixed(p.TorqueRatio, 4),8} {NumberText.Fixed(p.PlasticFraction * 100, 1),12} % {E(p.EstimatedRelativeError),14}");
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
