namespace SectionTwist.Geometry;

/// <summary>
/// A plane similarity p -> s R(theta) M p + t, where M mirrors x when <see cref="Mirror"/> is set.
/// It maps circles to circles, so arcs stay exact arcs.
/// </summary>
/// <param name="Scale">Uniform scale factor (positive).</param>
/// <param name="Rotation">Rotation in radians, counter-clockwise, applied after the mirror.</param>
/// <param name="Mirror">Mirror x (x -> -x) before rotating.</param>
/// <param name="Translation">Translation applied last.</param>
public readonly record struct Similarity2(double Scale, double Rotation, bool Mirror, Point2 Translation)
{
    /// <summary>The identity transform.</summary>
    public static Similarity2 Identity => new(1, 0, false, default);

    /// <summary>A pure translation.</summary>
    public static Similarity2 Translate(double dx, double dy) => new(1, 0, false, new Point2(dx, dy));

    /// <summary>A rotation about the origin.</summary>
    public static Similarity2 Rotate(double radians) => new(1, radians, false, default);

    /// <summary>A uniform scale about the origin.</summary>
    public static Similarity2 Scaling(double s) => new(s, 0, false, default);

    /// <summary>Applies the transform to a point.</summary>
    public Point2 Apply(Point2 p)
    {
        double x = Mirror ? -p.X : p.X;
        double c = Math.Cos(Rotation), s = Math.Sin(Rotation);
        return new Point2(Scale * (c * x - s * p.Y) + Translation.X, Scale * (s * x + c * p.Y) + Translation.Y);
    }

    /// <summary>Maps a direction angle (radians) through the linear part.</summary>
    public double ApplyAngle(double angle) => (Mirror ? Math.PI - angle : angle) + Rotation;
}
