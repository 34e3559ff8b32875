using System.Globalization;
using System.Text.RegularExpressions;
using UnitsNet;

namespace SectionTwist.Shaft;

/// <summary>
/// Reads numbers with units (<c>120 mm</c>, <c>1800 lbf*in</c>, <c>11.5e6 psi</c>, <c>7.5 kW</c>, <c>1450 rpm</c>) into SI
/// values with UnitsNet. <c>*</c> may stand for the middle dot and <c>^2 ^3 ^4</c> for superscripts. <c>hp</c> is the
/// mechanical horsepower (<see cref="ShaftPower.MechanicalHorsepower"/>). A plain number takes the default unit of its kind.
/// </summary>
internal static partial class QuantityText
{
    [GeneratedRegex(@"^\s*([-+]?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?)\s*(.*?)\s*$", RegexOptions.CultureInvariant)]
    private static partial Regex NumberAndUnit();

    /// <summary>Splits <paramref name="text"/> into its number and unit text (empty when there is none); false when it does not start with a number.</summary>
    public static bool TrySplit(string text, out double value, out string unit)
    {
        var m = NumberAndUnit().Match(text);
        unit = "";
        value = 0;
        if (!m.Success || !double.TryParse(m.Groups[1].Value, NumberStyles.Float, CultureInfo.InvariantCulture, out value)) return false;
        unit = m.Groups[2].Value;
        return true;
    }

    /// <summary>The SI size of one <paramref name="unit"/> of <paramref name="kind"/>, or null when the unit is not one of that kind.</summary>
    public static double? UnitFactor(string unit, QuantityKind kind)
    {
        string u = Normalize(unit);
        if (u.Length == 0) return kind == QuantityKind.Number ? 1 : null;
        switch (kind)
        {
            case QuantityKind.Number:
                return null;
            case QuantityKind.Power when u is "hp" or "HP" or "hp(I)":
                return ShaftPower.MechanicalHorsepower;
            case QuantityKind.Angle:
                return AngleRadians(u);
            case QuantityKind.ShearPerTorque:
                {
                    // 1/mm^3, /in^3, 1/m³: per cube of a length
                    string rest = u.StartsWith("1/", StringComparison.Ordinal) ? u[2..] : u.StartsWith('/') ? u[1..] : "";
                    if (!rest.EndsWith('³')) return null;
                    return Si(rest[..^1], QuantityKind.Length) is { } l ? 1 / (l * l * l) : null;
                }
            case QuantityKind.WarpingStiffness:
                return WarpingStiffness(u);
            case QuantityKind.TwistRate:
                {
                    int slash = u.LastIndexOf('/');
                    if (slash <= 0) return null;
                    double? angle = AngleRadians(u[..slash]), len = Si(u[(slash + 1)..], QuantityKind.Length);
                    return angle is not null && len is not null ? angle / len : null;
                }
        }
        if (Si(u, kind) is { } direct) return direct;
        int s = u.LastIndexOf('/');
        if (s > 0 && kind is QuantityKind.TorquePerLength or QuantityKind.RotationalStiffness)
        {
            double? top = Si(u[..s], QuantityKind.Torque);
            double? bottom = kind == QuantityKind.TorquePerLength ? Si(u[(s + 1)..], QuantityKind.Length) : AngleRadians(u[(s + 1)..]);
            return top is not null && bottom is not null ? top / bottom : null;
        }
        return null;
    }

    /// <summary>Example units of each kind, for messages.</summary>
    public static string Examples(QuantityKind kind) => kind switch
    {
        QuantityKind.Length => "mm, cm, m, in, ft",
        QuantityKind.Torque => "N*m, kN*m, N*mm, lbf*in, lbf*ft (also written Nm, N-m, kNm, lb-in, in-lb, lbf-ft, ft-lb)",
        QuantityKind.Stress or QuantityKind.Modulus => "Pa, MPa, GPa, psi, ksi",
        QuantityKind.Volume => "mm^3, cm^3, in^3",
        QuantityKind.Power => "W, kW, hp",
        QuantityKind.Speed => "rpm, rad/s",
        QuantityKind.TorquePerLength => "N*m/m, Nm/m, lbf*in/in",
        QuantityKind.RotationalStiffness => "N*m/rad, kN*m/rad, Nm/rad, lbf*in/deg",
        QuantityKind.AreaMoment => "mm^4, cm^4, m^4, in^4",
        QuantityKind.ShearPerTorque => "1/mm^3, 1/m^3, 1/in^3",
        QuantityKind.TwistRate => "deg/m, deg/ft, rad/m",
        QuantityKind.Density => "kg/m^3, g/cm^3, lb/in^3",
        QuantityKind.Force => "N, kN, lbf",
        QuantityKind.Angle => "deg, rad",
        QuantityKind.WarpingStiffness => "N*m^3, kN*m^3, N*mm^3, lbf*in^3 (bimoment per rate of twist; also written N*m^2/(rad/m))",
        _ => "no unit",
    };

    private static string Normalize(string unit) => unit.Trim()
        .Replace('*', '·').Replace("^2", "²", StringComparison.Ordinal).Replace("^3", "³", StringComparison.Ordinal)
        .Replace("^4", "⁴", StringComparison.Ordinal).Replace(" ", "", StringComparison.Ordinal);

    /// <summary>
    /// A warping spring's unit, bimoment per rate of twist: force times length cubed (<c>N·m³</c>, optionally <c>/rad</c>),
    /// or a bimoment over a twist rate (<c>N·m²/(rad/m)</c>).
    /// </summary>
    private static double? WarpingStiffness(string u)
    {
        var m = WarpingUnit().Match(u);
        if (!m.Success) return null;
        double? force = Si(m.Groups["f"].Value, QuantityKind.Force), len = Si(m.Groups["l"].Value, QuantityKind.Length);
        if (force is null || len is null) return null;
        if (m.Groups["per"].Success)
        {
            double? angle = AngleRadians(m.Groups["a"].Value), per = Si(m.Groups["per"].Value, QuantityKind.Length);
            return angle is null || per is null ? null : force * len * len / (angle / per);
        }
        return force * len * len * len;
    }

    [GeneratedRegex(@"^(?<f>[^·/()]+)·(?<l>[^·/()²³]+)(?:³(?:/rad)?|²/\((?<a>[^/()]+)/(?<per>[^/()]+)\))$", RegexOptions.CultureInvariant)]
    private static partial Regex WarpingUnit();

    private static double? AngleRadians(string unit)
    {
        if (unit is "rad") return 1;
        if (unit is "deg" or "°") return Math.PI / 180;
        return Quantity.TryParse(CultureInfo.InvariantCulture, typeof(Angle), "1 " + unit, out IQuantity? q) ? ((Angle)q).Radians : null;
    }

    private static double? Si(string unit, QuantityKind kind)
    {
        // the common torque spellings (Nm, N-m, lb-in, in-lb, ft-lb, ...) mean the units UnitsNet knows as N·m, lbf·in, ...
        if (kind == QuantityKind.Torque && Units.UnitAliases.Torque(unit) is { } torque) unit = torque;
        Type? t = kind switch
        {
            QuantityKind.Length => typeof(Length),
            QuantityKind.Torque => typeof(Torque),
            QuantityKind.Stress or QuantityKind.Modulus => typeof(Pressure),
            QuantityKind.Volume => typeof(Volume),
            QuantityKind.Power => typeof(Power),
            QuantityKind.Speed => typeof(RotationalSpeed),
            QuantityKind.TorquePerLength => typeof(TorquePerLength),
            QuantityKind.RotationalStiffness => typeof(RotationalStiffness),
            QuantityKind.AreaMoment => typeof(AreaMomentOfInertia),
            QuantityKind.Density => typeof(Density),
            QuantityKind.Force => typeof(Force),
            _ => null,
        };
        if (t is null || !Quantity.TryParse(CultureInfo.InvariantCulture, t, "1 " + unit, out IQuantity? q)) return null;
        return q switch
        {
            Length l => l.Meters,
            Torque x => x.NewtonMeters,
            Pressure p => p.Pascals,
            Power w => (double)w.Watts,
            RotationalSpeed r => r.RadiansPerSecond,
            TorquePerLength tl => tl.NewtonMetersPerMeter,
            RotationalStiffness rs => rs.NewtonMetersPerRadian,
            AreaMomentOfInertia a => a.MetersToTheFourth,
            Volume vol => vol.CubicMeters,
            Density d => d.KilogramsPerCubicMeter,
            Force fo => fo.Newtons,
            _ => null,
        };
    }
}
