namespace SectionTwist.Bending;

/// <summary>
/// A two-node plane beam element (deflection and slope at each end) built from its flexibility: the end displacements of a
/// cantilever clamped at the first end are the virtual-work integrals of the bending (and shear) flexibility,
/// f11 = integral((L - s)^2 / EI + 1 / (k G A)), f12 = integral((L - s) / EI), f22 = integral(1 / EI), and the stiffness follows
/// from equilibrium (Przemieniecki, Theory of Matrix Structural Analysis, 1968, ch. 5, flexibility-derived stiffness of a
/// non-uniform beam). For a prismatic element this is the exact Euler-Bernoulli (or Timoshenko, with shear) stiffness; for a
/// varying EI(s) the integrals are taken by 8-point Gauss-Legendre quadrature, which for the smooth 1 / d^4 of a taper over a
/// short sub-element is exact to rounding. Sign convention: deflection v and load q positive along the plane's axis,
/// slope theta = dv/dx, bending moment M = EI v'' (sagging positive), shear V = dM/dx.
/// </summary>
internal static class BeamElement
{
    private static readonly double[] GX =
        [-0.960289856497536, -0.796666477413627, -0.525532409916329, -0.183434642495650, 0.183434642495650, 0.525532409916329, 0.796666477413627, 0.960289856497536];
    private static readonly double[] GW =
        [0.101228536290376, 0.222381034453374, 0.313706645877887, 0.362683783378362, 0.362683783378362, 0.313706645877887, 0.222381034453374, 0.101228536290376];

    /// <summary>
    /// Fills the 4x4 stiffness (dofs v1, theta1, v2, theta2, row-major) and the fixed-end forces (the forces the clamps apply to
    /// the element under a uniform load <paramref name="q"/> per length).
    /// </summary>
    /// <param name="length">Element length, m.</param>
    /// <param name="ei">EI at local position s in [0, L], N*m^2.</param>
    /// <param name="kga">k G A at s, N, or null to leave out shear deformation.</param>
    /// <param name="q">Uniform transverse load, N/m.</param>
    /// <param name="k">Receives the stiffness.</param>
    /// <param name="fixedEnd">Receives (P1, C1, P2, C2), the clamp forces on the element.</param>
    public static void Build(double length, Func<double, double> ei, Func<double, double>? kga, double q, Span<double> k, Span<double> fixedEnd)
    {
        double l = length;
        double f11 = 0, f12 = 0, f22 = 0, d0 = 0, t0 = 0;
        for (int g = 0; g < GX.Length; g++)
        {
            double s = 0.5 * l * (GX[g] + 1), w = 0.5 * l * GW[g];
            double inv = 1 / ei(s), r = l - s;
            f11 += w * r * r * inv; f12 += w * r * inv; f22 += w * inv;
            // cantilever under the uniform load: M0(s) = q r^2 / 2 on the same side as a tip force P (M = P r)
            d0 += w * q * r * r / 2 * r * inv; t0 += w * q * r * r / 2 * inv;
            if (kga is not null)
            {
                double invS = 1 / kga(s);
                f11 += w * invS; d0 += w * q * r * invS;
            }
        }
        // free-end stiffness K22 = F^-1
        double det = f11 * f22 - f12 * f12;
        double a = f22 / det, b = -f12 / det, c = f11 / det;
        // end-1 forces from end-2 forces by equilibrium: P1 = -P2, C1 = -C2 - P2 L  => H = [[-1, 0], [-L, -1]]
        // K = [[H K22 H^T, H K22], [K22 H^T, K22]]
        double h11 = -1, h21 = -l, h22 = -1;
        // H K22
        double hk11 = h11 * a, hk12 = h11 * b, hk21 = h21 * a + h22 * b, hk22 = h21 * b + h22 * c;
        // H K22 H^T
        double m11 = hk11 * h11, m12 = hk11 * h21 + hk12 * h22, m22 = hk21 * h21 + hk22 * h22;
        double[] kk =
        [
            m11, m12, hk11, hk12,
            m12, m22, hk21, hk22,
            hk11, hk21, a, b,
            hk12, hk22, b, c,
        ];
        kk.CopyTo(k);
        // clamp at end 2 cancels the cantilever tip displacement: (P2, C2) = -K22 (d0, t0); end 1 by equilibrium with the load q L
        double p2 = -(a * d0 + b * t0), c2 = -(b * d0 + c * t0);
        fixedEnd[0] = -p2 - q * l;
        fixedEnd[1] = -c2 - p2 * l - q * l * l / 2;
        fixedEnd[2] = p2;
        fixedEnd[3] = c2;
    }
}
