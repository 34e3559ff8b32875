using SectionTwist.Geometry;
using SectionTwist.Torsion;

namespace SectionTwist.Rendering.Section;

/// <summary>Iso-lines of the solved fields as plain line pieces, for export to CAD (e.g. DXF polylines).</summary>
public static class ContourLines
{
    /// <summary>
    /// Pieces of the stress-function contours at <paramref name="levels"/> equally spaced values between 0 and the
    /// largest value (linear interpolation on the field's sub-triangles), metres.
    /// </summary>
    public static IReadOnlyList<(Point2 A, Point2 B)> StressFunction(SectionField field, int levels = 10)
    {
        ArgumentNullException.ThrowIfNull(field);
        double max = field.Phi.Max();
        var list = new List<(Point2, Point2)>();
        Span<double> x = stackalloc double[3];
        Span<double> y = stackalloc double[3];
        Span<double> v = stackalloc double[3];
        for (int k = 1; k <= levels; k++)
        {
            double level = max * k / (levels + 1);
            for (int t = 0; t + 2 < field.Triangles.Count; t += 3)
            {
                for (int i = 0; i < 3; i++) { int n = field.Triangles[t + i]; x[i] = field.X[n]; y[i] = field.Y[n]; v[i] = field.Phi[n]; }
                if (ContourGeometry.IsoSegment(x, y, v, level, out double x0, out double y0, out double x1, out double y1))
                    list.Add((new Point2(x0, y0), new Point2(x1, y1)));
            }
        }
        return list;
    }

    /// <summary>The edges of the quadratic elements' corner triangles (each edge once), metres.</summary>
    public static IReadOnlyList<(Point2 A, Point2 B)> MeshEdges(SectionField field)
    {
        ArgumentNullException.ThrowIfNull(field);
        var seen = new HashSet<(int, int)>();
        var list = new List<(Point2, Point2)>();
        for (int e = 0; e + 2 < field.ElementCorners.Count; e += 3)
            for (int i = 0; i < 3; i++)
            {
                int a = field.ElementCorners[e + i], b = field.ElementCorners[e + (i + 1) % 3];
                if (!seen.Add(a < b ? (a, b) : (b, a))) continue;
                list.Add((new Point2(field.X[a], field.Y[a]), new Point2(field.X[b], field.Y[b])));
            }
        return list;
    }
}
