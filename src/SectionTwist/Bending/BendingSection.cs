using SectionTwist.Torsion;

namespace SectionTwist.Bending;

/// <summary>
/// What the combined-stress check needs of one cross-section: area, centroidal second moments in the section frame and
/// sample points on the boundary with the torsional shear per unit torque there. The section frame is the profile's own
/// (x, y); in a shaft, profile x is the shaft's transverse Y axis and profile y its Z axis (docs/shaft-file.md, bending).
/// </summary>
public sealed class BendingSection
{
    private readonly BoundarySample[] _points;

    private BendingSection(double area, double ixx, double iyy, double ixy, BoundarySample[] points, double outerDiameter, string source)
    {
        Area = area; Ixx = ixx; Iyy = iyy; Ixy = ixy; _points = points; OuterDiameter = outerDiameter; ShearSource = source;
    }

    /// <summary>Net area, m^2.</summary>
    public double Area { get; }
    /// <summary>Second moment about the centroidal x axis, integral of y^2 dA, m^4.</summary>
    public double Ixx { get; }
    /// <summary>Second moment about the centroidal y axis, integral of x^2 dA, m^4.</summary>
    public double Iyy { get; }
    /// <summary>Product of inertia about the centroid, integral of x y dA, m^4.</summary>
    public double Ixy { get; }
    /// <summary>Outer diameter (or largest extent), m: the size used for the fatigue size factor.</summary>
    public double OuterDiameter { get; }
    /// <summary>Where the boundary shear comes from: <c>exact</c> (round, tube) or <c>field</c> (the Prandtl solution).</summary>
    public string ShearSource { get; }
    /// <summary>True when the section has a sharp re-entrant corner: its peak shear there is singular (mesh-dependent).</summary>
    public bool HasSingularCorner { get; private init; }

    /// <summary>Boundary sample points relative to the centroid, with their shear per unit torque.</summary>
    public IReadOnlyList<BoundarySample> Points => Array.AsReadOnly(_points);

    internal ReadOnlySpan<BoundarySample> PointSpan => _points;

    /// <summary>A solid round of diameter <paramref name="diameter"/>, m: I = pi d^4 / 64, boundary shear 16 / (pi d^3) per unit torque.</summary>
    public static BendingSection Round(double diameter) => Tube(diameter, 0);

    /// <summary>A round tube: I = pi (D^4 - d^4) / 64, outer-boundary shear 16 D / (pi (D^4 - d^4)) per unit torque (Timoshenko and Goodier, ch. 10).</summary>
    /// <param name="outerDiameter">D, m.</param>
    /// <param name="innerDiameter">d, m (0 for a solid round).</param>
    public static BendingSection Tube(double outerDiameter, double innerDiameter)
    {
        if (!(outerDiameter > 0) || !(innerDiameter >= 0 && innerDiameter < outerDiameter))
            throw new SectionTwistException("bad-section", $"round section: diameters {outerDiameter} m / {innerDiameter} m must satisfy 0 <= d < D");
        double d4 = Math.Pow(outerDiameter, 4) - Math.Pow(innerDiameter, 4);
        double i = Math.PI * d4 / 64, j = 2 * i, r = outerDiameter / 2;
        const int n = 72;
        var pts = new BoundarySample[n];
        for (int k = 0; k < n; k++)
        {
            double a = 2 * Math.PI * k / n;
            pts[k] = new BoundarySample(r * Math.Cos(a), r * Math.Sin(a), r / j);
        }
        return new BendingSection(Math.PI * (outerDiameter * outerDiameter - innerDiameter * innerDiameter) / 4, i, i, 0, pts, outerDiameter, "exact");
    }

    /// <summary>
    /// A section from the section analysis: exact area properties of the profile and, at every boundary node of the mesh, the
    /// smoothed boundary shear per unit torque (plus the located peak), relative to the centroid.
    /// </summary>
    /// <param name="result">The solved section.</param>
    /// <param name="outerDiameter">Outer diameter for the fatigue size factor, m; null: the larger side of the profile's bounds.</param>
    public static BendingSection FromSection(SectionResult result, double? outerDiameter = null)
    {
        ArgumentNullException.ThrowIfNull(result);
        var p = result.Properties;
        var f = result.Field;
        var c = p.Centroid;
        var list = new List<BoundarySample>();
        foreach (var chain in f.BoundaryNodeChains)
            foreach (int i in chain) list.Add(new BoundarySample(f.X[i] - c.X, f.Y[i] - c.Y, f.ShearMagnitude(i)));
        if (list.Count == 0)
            throw new SectionTwistException("bad-section", $"{result.Profile.Name}: the solved section carries no boundary samples; analyse it again");
        // the located peak lies between nodes in general: keep it as its own sample
        list.Add(new BoundarySample(result.MaxShearLocation.X - c.X, result.MaxShearLocation.Y - c.Y, result.MaxShearPerTorque));
        double od = outerDiameter ?? Math.Max(result.Profile.Bounds.Width, result.Profile.Bounds.Height);
        return new BendingSection(p.Area, p.Ixx, p.Iyy, p.Ixy, [.. list], od, "field")
        {
            HasSingularCorner = result.Warnings.Any(w => w.Code == "sharp-reentrant-corner"),
        };
    }

    /// <summary>
    /// The same section turned counter-clockwise by <paramref name="angle"/> (rad) about its centroid: the second moments are
    /// transformed (Mohr) and the sample points rotated.
    /// </summary>
    public BendingSection Rotated(double angle)
    {
        double cs = Math.Cos(angle), sn = Math.Sin(angle);
        // I' = R I R^T for the tensor [[Iyy-like]]: with x' = c x - s y, y' = s x + c y
        double ixx = Ixx * cs * cs + Iyy * sn * sn + 2 * Ixy * sn * cs;
        double iyy = Ixx * sn * sn + Iyy * cs * cs - 2 * Ixy * sn * cs;
        double ixy = (Iyy - Ixx) * sn * cs + Ixy * (cs * cs - sn * sn);
        var pts = _points.Select(q => new BoundarySample(cs * q.X - sn * q.Y, sn * q.X + cs * q.Y, q.ShearPerTorque)).ToArray();
        return new BendingSection(Area, ixx, iyy, ixy, pts, OuterDiameter, ShearSource) { HasSingularCorner = HasSingularCorner };
    }

    /// <summary>
    /// Normal-stress coefficients at (x, y) relative to the centroid: sigma = N / A + cx Mx + cy My, the general formula of
    /// unsymmetric bending (Boresi and Schmidt, Advanced Mechanics of Materials, 6th ed., ch. 7, from memory), Mx and My the
    /// bending-moment components about the section's x and y axes (right-hand rule, on the face whose outward normal is the axis).
    /// </summary>
    internal (double Cx, double Cy) Coefficients(double x, double y)
    {
        double d = Ixx * Iyy - Ixy * Ixy;
        return ((Iyy * y - Ixy * x) / d, (Ixy * y - Ixx * x) / d);
    }
}

/// <summary>A boundary point of a section relative to its centroid, m, with the torsional shear per unit torque there, 1/m^3.</summary>
/// <param name="X">x relative to the centroid, m.</param>
/// <param name="Y">y relative to the centroid, m.</param>
/// <param name="ShearPerTorque">Shear stress magnitude per unit torque, 1/m^3.</param>
public readonly record struct BoundarySample(double X, double Y, double ShearPerTorque);
