namespace SectionTwist.Shaft;

/// <summary>
/// The exact two-node torsion element of one segment, oriented along the axis (end a nearer the first station).
/// With internal torque T(s) = Ta - t s (s from end a, t the uniform distributed torque), the twist is
/// phi_b - phi_a = Ta F0 - t F1 with F0 = integral ds / (G J), F1 = integral s ds / (G J), so
/// Ta = k (phi_b - phi_a) + t F1 / F0 with k = 1 / F0: the element is exact for prismatic and tapered segments alike.
/// </summary>
/// <remarks>
/// Linearly tapered solid round, d(s) = dA + (dB - dA) s / L, J = pi d^4 / 32 (derived here, checked against the closed
/// form phi = 32 T L (dA^2 + dA dB + dB^2) / (3 pi G dA^3 dB^3), Young and Budynas, Roark's Formulas, 7th ed., Table 10.1
/// note on tapered shafts; Gere, Mechanics of Materials, nonuniform torsion):
/// F0 = 32 L (dA^2 + dA dB + dB^2) / (3 pi G dA^3 dB^3), F1 = 16 L^2 (2 dA + dB) / (3 pi G dA^2 dB^3).
/// Both forms are free of the 1 / (dB - dA) cancellation and reduce to L / (G J) and L^2 / (2 G J) for dA = dB.
/// </remarks>
internal sealed class SegmentElement
{
    public SegmentElement(int a, int b, double length, double g, SectionStiffness? section, double dA, double dB, double distributed)
    {
        A = a; B = b; Length = length; G = g; Section = section; DiameterA = dA; DiameterB = dB; Distributed = distributed;
        double l = length;
        if (section is not null)
        {
            double gj = g * section.TorsionConstant;
            F0 = l / gj;
            F1 = l * l / (2 * gj);
        }
        else
        {
            F0 = 32 * l * (dA * dA + dA * dB + dB * dB) / (3 * Math.PI * g * dA * dA * dA * dB * dB * dB);
            F1 = 16 * l * l * (2 * dA + dB) / (3 * Math.PI * g * dA * dA * dB * dB * dB);
        }
    }

    public int A { get; }
    public int B { get; }
    public double Length { get; }
    public double G { get; }
    public SectionStiffness? Section { get; }
    public double DiameterA { get; }
    public double DiameterB { get; }
    /// <summary>Uniform distributed torque t, N*m/m.</summary>
    public double Distributed { get; }
    public double F0 { get; }
    public double F1 { get; }
    public double Stiffness => 1 / F0;

    /// <summary>Equivalent nodal torque at end a: t F1 / F0 (t L / 2 for a prismatic segment).</summary>
    public double LoadA => Distributed * F1 / F0;
    /// <summary>Equivalent nodal torque at end b: t L - t F1 / F0.</summary>
    public double LoadB => Distributed * Length - LoadA;

    /// <summary>Internal torque at end a for the given end rotations.</summary>
    public double TorqueA(double phiA, double phiB) => Stiffness * (phiB - phiA) + LoadA;

    /// <summary>Largest |T(s)| times the peak shear per unit torque of the section at s.</summary>
    public double MaxShear(double torqueA)
    {
        if (Section is not null) return Math.Max(Math.Abs(torqueA), Math.Abs(torqueA - Distributed * Length)) * Section.ShearPerTorque;
        return 16 / Math.PI * MaxOverPower(torqueA, 3);
    }

    /// <summary>Largest |T(s)| / (G J(s)), rad/m.</summary>
    public double MaxTwistRate(double torqueA)
    {
        if (Section is not null) return Math.Max(Math.Abs(torqueA), Math.Abs(torqueA - Distributed * Length)) / (G * Section.TorsionConstant);
        return 32 / (Math.PI * G) * MaxOverPower(torqueA, 4);
    }

    /// <summary>
    /// max over s in [0, L] of |Ta - t s| / d(s)^n for the linear taper: the ends and the one stationary point
    /// s* = (t dA + n Ta d') / ((n - 1) t d'), d' = (dB - dA) / L.
    /// </summary>
    private double MaxOverPower(double ta, int n)
    {
        double t = Distributed, l = Length, dA = DiameterA, slope = (DiameterB - DiameterA) / l;
        double F(double s) => Math.Abs(ta - t * s) / Math.Pow(dA + slope * s, n);
        double best = Math.Max(F(0), F(l));
        if (t != 0 && slope != 0)
        {
            double s = (t * dA + n * ta * slope) / ((n - 1) * t * slope);
            if (s > 0 && s < l) best = Math.Max(best, F(s));
        }
        return best;
    }

    /// <summary>A short section description for tables.</summary>
    public string Describe() => Section is not null
        ? Section.Description ?? $"J={Section.TorsionConstant:G4} m⁴"
        : $"taper d={DiameterA * 1e3:G5}..{DiameterB * 1e3:G5} mm";
}
