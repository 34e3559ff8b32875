using System.Globalization;

namespace SectionTwist.Shaft;

/// <summary>
/// The magnitudes a shaft-file value may have, in SI, so that every product and quotient of the solve stays a finite
/// double (the widest combination, T L / (G J) at the limits, is about 1e50). The ranges are generous beyond any
/// real shaft: a 100 km length, 1e12 N*m, 1 nm; a value outside them is a typing error or a hostile file.
/// </summary>
internal static class ShaftValueRange
{
    /// <summary>(largest magnitude, smallest non-zero magnitude) of each kind.</summary>
    private static (double Max, double MinNonZero) Range(QuantityKind kind) => kind switch
    {
        QuantityKind.Length => (1e5, 1e-9),
        QuantityKind.Torque => (1e12, 0),
        QuantityKind.Stress => (1e13, 0),
        QuantityKind.Modulus => (1e13, 1e3),
        QuantityKind.Volume => (1e3, 1e-27),
        QuantityKind.Power => (1e12, 0),
        QuantityKind.Speed => (1e6, 1e-6),
        QuantityKind.TorquePerLength => (1e12, 0),
        QuantityKind.RotationalStiffness => (1e15, 1e-6),
        QuantityKind.AreaMoment => (1e2, 1e-36),
        QuantityKind.ShearPerTorque => (1e27, 1e-6),
        QuantityKind.TwistRate => (1e6, 1e-12),
        QuantityKind.Force => (1e10, 0),
        QuantityKind.Angle => (1e3, 0),
        QuantityKind.WarpingStiffness => (1e18, 0),
        _ => (1e6, 0),
    };

    /// <summary>Null when <paramref name="si"/> is a usable value of <paramref name="kind"/>, else the problem and its remedy.</summary>
    public static string? Check(QuantityKind kind, double si)
    {
        var (max, min) = Range(kind);
        if (!double.IsFinite(si)) return "is not a finite number";
        double a = Math.Abs(si);
        if (a > max) return $"is {G(a)} in SI units, beyond the largest magnitude SectionTwist accepts ({G(max)}); check the value and its unit";
        if (a > 0 && a < min) return $"is {G(a)} in SI units, below the smallest non-zero magnitude SectionTwist accepts ({G(min)}); check the value and its unit";
        return null;
    }

    private static string G(double v) => v.ToString("G3", CultureInfo.InvariantCulture);
}
