namespace SectionTwist.Bending;

/// <summary>
/// Combines the normal stress of axial force and biaxial bending with the torsional shear point by point around the real
/// boundary of a section. On a traction-free boundary of a Saint-Venant shaft the stress state is the axial normal stress
/// sigma and the shear tau tangent to the boundary, so von Mises sigma_v = sqrt(sigma^2 + 3 tau^2) and Tresca
/// (stress intensity, twice the largest shear) sigma_T = sqrt(sigma^2 + 4 tau^2) (Budynas and Nisbett, Shigley's Mechanical
/// Engineering Design, 10th ed., sec. 5-5 and 5-4). The peak of a combined stress is on the boundary for the same reason the
/// peak shear is: both stress parts take their largest values there on the sections this tool handles.
/// </summary>
public static class CombinedStress
{
    /// <summary>
    /// The worst boundary point of <paramref name="section"/> (largest von Mises stress).
    /// </summary>
    /// <param name="section">The section.</param>
    /// <param name="axialForce">N, N (tension positive).</param>
    /// <param name="mx">Bending moment about the section's x axis, N*m.</param>
    /// <param name="my">Bending moment about the section's y axis, N*m.</param>
    /// <param name="torque">Torque, N*m.</param>
    /// <param name="rotating">
    /// True for a shaft that turns under a load fixed in space: every boundary point passes every angle to the moment
    /// vector, so the bending stress at a point is taken at its worst alignment, |M| |c(p)|, with the sign of the axial
    /// stress. False: the section stands as drawn against the moment components.
    /// </param>
    public static CombinedStressPoint Worst(BendingSection section, double axialForce, double mx, double my, double torque, bool rotating)
    {
        ArgumentNullException.ThrowIfNull(section);
        CombinedStressPoint? best = null;
        foreach (var p in section.PointSpan)
        {
            var q = At(section, p, axialForce, mx, my, torque, rotating);
            // a point must win clearly (1e-9 relative): on a round shaft every point ties, and round-off alone should not
            // move the reported point between builds (the stress differs by less than the 1e-9)
            if (best is null || q.VonMises > best.VonMises * (1 + 1e-9)) best = q;
        }
        return best!;
    }

    /// <summary>The combined stress at every boundary sample of <paramref name="section"/>, in the order of <see cref="BendingSection.Points"/> (arguments as for <see cref="Worst"/>).</summary>
    public static IReadOnlyList<CombinedStressPoint> AtBoundary(BendingSection section, double axialForce, double mx, double my, double torque, bool rotating)
    {
        ArgumentNullException.ThrowIfNull(section);
        var list = new CombinedStressPoint[section.PointSpan.Length];
        for (int i = 0; i < list.Length; i++) list[i] = At(section, section.PointSpan[i], axialForce, mx, my, torque, rotating);
        return Array.AsReadOnly(list);
    }

    private static CombinedStressPoint At(BendingSection section, BoundarySample p, double axialForce, double mx, double my, double torque, bool rotating)
    {
        double sigmaN = axialForce / section.Area;
        double m = Math.Sqrt(mx * mx + my * my);
        var (cx, cy) = section.Coefficients(p.X, p.Y);
        double sb = rotating ? (sigmaN >= 0 ? 1 : -1) * m * Math.Sqrt(cx * cx + cy * cy) : cx * mx + cy * my;
        double sigma = sigmaN + sb, tau = Math.Abs(torque) * p.ShearPerTorque;
        return new CombinedStressPoint(p.X, p.Y, sigma, sb, sigmaN, tau, Math.Sqrt(sigma * sigma + 3 * tau * tau), Math.Sqrt(sigma * sigma + 4 * tau * tau));
    }

    /// <summary>Largest bending-stress amplitude per unit moment over the boundary of a rotating shaft, max |c(p)|, 1/m^3 (32 / (pi d^3) for a round).</summary>
    public static double BendingPerMoment(BendingSection section)
    {
        ArgumentNullException.ThrowIfNull(section);
        double best = 0;
        foreach (var p in section.PointSpan)
        {
            var (cx, cy) = section.Coefficients(p.X, p.Y);
            best = Math.Max(best, Math.Sqrt(cx * cx + cy * cy));
        }
        return best;
    }
}

/// <summary>The combined stress at one boundary point, Pa, position relative to the section's centroid, m.</summary>
/// <param name="X">x of the point relative to the centroid, m (section frame).</param>
/// <param name="Y">y of the point relative to the centroid, m.</param>
/// <param name="Normal">Axial normal stress sigma = axial + bending, Pa.</param>
/// <param name="BendingStress">Bending part of <see cref="Normal"/>, Pa.</param>
/// <param name="AxialStress">Axial part N / A, Pa.</param>
/// <param name="Shear">Torsional shear magnitude, Pa.</param>
/// <param name="VonMises">sqrt(sigma^2 + 3 tau^2), Pa.</param>
/// <param name="Tresca">sqrt(sigma^2 + 4 tau^2), Pa.</param>
public sealed record CombinedStressPoint(double X, double Y, double Normal, double BendingStress, double AxialStress, double Shear, double VonMises, double Tresca)
{
    /// <summary>The load part that contributes most to the von Mises stress here: <c>bending</c>, <c>torsion</c>, <c>axial</c> or <c>none</c>.</summary>
    public string Dominant
    {
        get
        {
            double b = Math.Abs(BendingStress), a = Math.Abs(AxialStress), t = Math.Sqrt(3) * Shear;
            if (b == 0 && a == 0 && t == 0) return "none";
            return b >= a && b >= t ? "bending" : t >= a ? "torsion" : "axial";
        }
    }
}
