using SectionTwist.Geometry;

namespace SectionTwist.Import.Dxf;

/// <summary>A plane affine map p -> M p + t with M = [[A, B], [C, D]].</summary>
internal readonly record struct Affine2(double A, double B, double C, double D, double Tx, double Ty)
{
    public static Affine2 Identity => new(1, 0, 0, 1, 0, 0);

    public static Affine2 Translation(Point2 t) => new(1, 0, 0, 1, t.X, t.Y);

    public static Affine2 Rotation(double radians)
    {
        double c = Math.Cos(radians), s = Math.Sin(radians);
        // exact quarter turns keep axis-aligned geometry exact
        if (Math.Abs(c) < 1e-15) c = 0;
        if (Math.Abs(s) < 1e-15) s = 0;
        return new(c, -s, s, c, 0, 0);
    }

    public static Affine2 Scaling(double sx, double sy) => new(sx, 0, 0, sy, 0, 0);

    public Point2 Apply(Point2 p) => new(A * p.X + B * p.Y + Tx, C * p.X + D * p.Y + Ty);

    public Point2 ApplyVector(Point2 v) => new(A * v.X + B * v.Y, C * v.X + D * v.Y);

    public double Det => A * D - B * C;

    /// <summary>This map applied after <paramref name="first"/>.</summary>
    public Affine2 After(Affine2 first) => new(
        A * first.A + B * first.C, A * first.B + B * first.D,
        C * first.A + D * first.C, C * first.B + D * first.D,
        A * first.Tx + B * first.Ty + Tx, C * first.Tx + D * first.Ty + Ty);

    public bool IsFinite => double.IsFinite(A) && double.IsFinite(B) && double.IsFinite(C) && double.IsFinite(D) && double.IsFinite(Tx) && double.IsFinite(Ty);

    /// <summary>
    /// The map as a <see cref="Similarity2"/> when it is one (orthogonal columns of equal length, within 1e-12).
    /// With a mirror, Similarity2 is s R(theta) diag(-1, 1), so M = [[-s cos, -s sin], [-s sin, s cos]].
    /// </summary>
    public bool TrySimilarity(out Similarity2 sim)
    {
        sim = default;
        double c1 = Math.Sqrt(A * A + C * C), c2 = Math.Sqrt(B * B + D * D);
        double scale = Math.Max(c1, c2);
        if (!(scale > 0)) return false;
        double tol = 1e-12 * scale;
        var t = new Point2(Tx, Ty);
        if (Det > 0)
        {
            if (Math.Abs(A - D) > tol || Math.Abs(B + C) > tol) return false;
            sim = new Similarity2(c1, Math.Atan2(C, A), false, t);
            return true;
        }
        if (Math.Abs(A + D) > tol || Math.Abs(B - C) > tol) return false;
        sim = new Similarity2(c2, Math.Atan2(-C, D), true, t);
        return true;
    }
}
