using SectionTwist.Geometry;

namespace SectionTwist.Torsion;

/// <summary>
/// Finds the corners of the outline and the convergence order each one allows. Near a corner with interior angle
/// omega (measured inside the material) the stress function behaves like r^(pi/omega) (Williams, J. Appl. Mech. 19,
/// 1952; Grisvard, Elliptic Problems in Nonsmooth Domains, 1985, sec. 4.4 and 5.1), so it lies in the Sobolev space
/// H^(1 + pi/omega - e) and no better. The shear is singular when omega &gt; pi (re-entrant corner; Timoshenko and Goodier,
/// sec. 113), but a convex corner wider than 90 deg already limits the regularity: the finite-element error of J (the
/// squared energy-norm error) falls like h^min(4, 2 pi/omega) with 6-node elements instead of h^4 (Strang and Fix,
/// An Analysis of the Finite Element Method, ch. 8).
/// </summary>
internal static class CornerAnalysis
{
    /// <summary>A vertex where two segments meet at an angle, or tangentially with a jump in curvature.</summary>
    /// <param name="Where">The vertex.</param>
    /// <param name="InteriorAngle">Angle inside the material, radians (pi = tangent joint).</param>
    /// <param name="CurvatureJump">True for a tangent joint whose two sides differ in curvature (a line meeting a fillet).</param>
    internal readonly record struct Corner(Point2 Where, double InteriorAngle, bool CurvatureJump = false)
    {
        /// <summary>
        /// The order of the J error this corner allows: <see cref="CornerAnalysis.Order(double)"/>, or
        /// <see cref="CurvatureJumpOrder"/> at a tangent joint.
        /// </summary>
        public double Order => CurvatureJump ? CurvatureJumpOrder : CornerAnalysis.Order(InteriorAngle);
    }

    /// <summary>
    /// Order of the J error at a tangent joint with a jump in curvature (a straight edge running into a fillet): the
    /// outline is only C^(1,1) there and the stress function picks up a weak r^2 log r term, as at a right angle; the
    /// three-mesh sequence of a hollow section with corner radii shows orders 3.74 to 3.80 (docs/verification.md).
    /// The right-angle value 3.6 is used.
    /// </summary>
    public const double CurvatureJumpOrder = 3.6;

    /// <summary>Order of the J error on smooth outlines (6-node elements: energy error h^2, squared).</summary>
    public const double SmoothOrder = 4;

    /// <summary>
    /// All loop vertices whose interior angle differs from a straight continuation by more than 1e-6 rad, and the tangent
    /// joints whose two sides differ in curvature by more than 1e-6 of the larger curvature.
    /// </summary>
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
                if (Math.Abs(turn) >= 1e-6) list.Add(new Corner(b.Start, Math.PI - turn));
                else
                {
                    double ka = Curvature(a, 1), kb = Curvature(b, 0);
                    if (Math.Abs(ka - kb) > 1e-6 * Math.Max(Math.Abs(ka), Math.Abs(kb))) list.Add(new Corner(b.Start, Math.PI, true));
                }
            }
        }
        return list;
    }

    /// <summary>Signed curvature of a segment at parameter t (exact for lines and arcs, central differences otherwise).</summary>
    internal static double Curvature(Segment s, double t)
    {
        switch (s)
        {
            case LineSegment: return 0;
            case ArcSegment arc: return Math.Sign(arc.Sweep) / arc.Radius;
        }
        const double dt = 1e-5;
        double t0 = Math.Clamp(t - dt, 0, 1), t1 = Math.Clamp(t + dt, 0, 1);
        Point2 d = s.DerivativeAt(t), d0 = s.DerivativeAt(t0), d1 = s.DerivativeAt(t1);
        Point2 dd = (1 / (t1 - t0)) * (d1 - d0);
        double speed = d.Length;
        return Point2.Cross(d, dd) / (speed * speed * speed);
    }

    /// <summary>
    /// Convergence order of the J error that a corner of interior angle <paramref name="omega"/> allows under uniform
    /// refinement: 2 lambda with the singular exponent lambda = pi / omega, at most 4, lowered near lambda = 2 (a right
    /// angle): there the particular solution of the constant load resonates with the corner's own r^2 solution and an
    /// r^2 log r term appears (Grisvard, sec. 5.1, the exceptional angles), so the error falls like h^4 |log h|, and for
    /// angles near 90 deg the two terms r^2 and r^lambda nearly cancel and behave the same way on any practical mesh.
    /// The order used is min(4, 2 lambda) - 0.4 max(0, 1 - |lambda - 2| / 0.8): 3.6 at 90 deg, 2.85 at 120 deg,
    /// unchanged outside 65 to 150 deg. Three-mesh sequences give observed orders of 3.66 to 3.74 at 90 deg and 2.94 to
    /// 2.97 at 120 deg (docs/verification.md). Even a kink of a few degrees counts: its singular part is weak but
    /// converges at order about 2, and a fine mesh sees it.
    /// </summary>
    public static double Order(double omega)
    {
        double lambda = Math.PI / omega;
        return Math.Min(SmoothOrder, 2 * lambda) - 0.4 * Math.Max(0, 1 - Math.Abs(lambda - 2) / 0.8);
    }

    /// <summary>The lowest order over all corners (<see cref="SmoothOrder"/> without corners).</summary>
    public static double LowestOrder(IEnumerable<Corner> corners)
    {
        double p = SmoothOrder;
        foreach (var c in corners) p = Math.Min(p, c.Order);
        return p;
    }
}
