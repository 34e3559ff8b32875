using SectionTwist.Geometry;

namespace SectionTwist.Torsion;

/// <summary>
/// Finds corners of the outline and the strength of the stress singularity at re-entrant ones. Near a corner with
/// interior angle omega (measured inside the material) the stress function behaves like r^(pi/omega), so the shear is
/// singular when omega &gt; pi (Williams, J. Appl. Mech. 19, 1952; for torsion see Timoshenko and Goodier, sec. 113,
/// re-entrant corners). The finite-element error in J then falls like h^(2 pi/omega) instead of h^4 (Strang and Fix,
/// An Analysis of the Finite Element Method, ch. 8).
/// </summary>
internal static class CornerAnalysis
{
    /// <summary>A vertex where two segments meet at an angle.</summary>
    /// <param name="Where">The vertex.</param>
    /// <param name="InteriorAngle">Angle inside the material, radians (pi = smooth).</param>
    internal readonly record struct Corner(Point2 Where, double InteriorAngle);

    /// <summary>All loop vertices whose interior angle differs from a straight continuation by more than 1e-6 rad.</summary>
    public static List<Corner> Corners(Profile profile)
    {
        var list = new List<Corner>();
        foreach (var loop in profile.Loops)
        {
            // Loops are oriented with the material on the left (outer CCW, holes CW).
            var segs = loop.Segments;
            for (int i = 0; i < segs.Count; i++)
            {
                var a = segs[i];
                var b = segs[(i + 1) % segs.Count];
                Point2 tin = a.DerivativeAt(1), tout = b.DerivativeAt(0);
                double turn = Math.Atan2(Point2.Cross(tin, tout), Point2.Dot(tin, tout));
                if (Math.Abs(turn) < 1e-6) continue;
                list.Add(new Corner(b.Start, Math.PI - turn));
            }
        }
        return list;
    }

    /// <summary>
    /// Convergence order of J under uniform refinement: min(4, 2 pi / omega_max) over re-entrant corners
    /// (4 for 6-node elements on a smooth or convex outline).
    /// </summary>
    /// Kinks of less than 5 degrees (fitted or flattened curves) are ignored: their singularity r^(pi/omega) differs
    /// from a smooth boundary by a factor of r^0.03 at most, far below what the estimate can see.
    public static double TorsionConstantOrder(IEnumerable<Corner> corners)
    {
        double p = 4;
        foreach (var c in corners) if (c.InteriorAngle > Math.PI + 5 * Math.PI / 180) p = Math.Min(p, 2 * Math.PI / c.InteriorAngle);
        return p;
    }
}
