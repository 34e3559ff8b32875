namespace SectionTwist.Meshing;

/// <summary>Quality and consistency measures of a 6-node triangle mesh.</summary>
internal static class MeshQuality
{
    /// <summary>Smallest angle (degrees) over the straight corner triangles.</summary>
    public static double MinAngleDegrees(Mesh m)
    {
        double min = 180;
        for (int e = 0; e < m.ElementCount; e++) min = Math.Min(min, MinAngleDegrees(m, e));
        return min;
    }

    /// <summary>Smallest angle (degrees) of element e's corner triangle.</summary>
    public static double MinAngleDegrees(Mesh m, int e)
    {
        double min = 180;
        for (int i = 0; i < 3; i++)
        {
            int a = m.Elements[6 * e + i], b = m.Elements[6 * e + (i + 1) % 3], c = m.Elements[6 * e + (i + 2) % 3];
            double ux = m.X[b] - m.X[a], uy = m.Y[b] - m.Y[a], vx = m.X[c] - m.X[a], vy = m.Y[c] - m.Y[a];
            double ang = Math.Atan2(Math.Abs(ux * vy - uy * vx), ux * vx + uy * vy) * 180 / Math.PI;
            min = Math.Min(min, ang);
        }
        return min;
    }

    /// <summary>Longest corner-to-corner edge of the mesh.</summary>
    public static double MaxEdgeLength(Mesh m)
    {
        double max = 0;
        for (int e = 0; e < m.ElementCount; e++)
            for (int i = 0; i < 3; i++)
            {
                int a = m.Elements[6 * e + i], b = m.Elements[6 * e + (i + 1) % 3];
                max = Math.Max(max, Math.Sqrt((m.X[a] - m.X[b]) * (m.X[a] - m.X[b]) + (m.Y[a] - m.Y[b]) * (m.Y[a] - m.Y[b])));
            }
        return max;
    }

    /// <summary>
    /// Area of the isoparametric (curved) mesh: the integral of det J over each element by the 3-point Gauss rule on
    /// the reference triangle, exact because det J of a quadratic map is a quadratic polynomial (Strang and Fix, table 4.1).
    /// </summary>
    public static double Area(Mesh m)
    {
        ReadOnlySpan<double> gx = [1.0 / 6, 2.0 / 3, 1.0 / 6];
        ReadOnlySpan<double> gy = [1.0 / 6, 1.0 / 6, 2.0 / 3];
        double sum = 0;
        for (int e = 0; e < m.ElementCount; e++)
        {
            var el = m.Elements.AsSpan(6 * e, 6);
            for (int q = 0; q < 3; q++) sum += DetJ(m.X, m.Y, el, gx[q], gy[q]) / 6;
        }
        return sum;
    }

    /// <summary>Area of each region (index = region id) by the same quadrature.</summary>
    public static double[] RegionAreas(Mesh m, int regions)
    {
        var a = new double[regions];
        for (int e = 0; e < m.ElementCount; e++)
        {
            var el = m.Elements.AsSpan(6 * e, 6);
            a[m.ElementRegion[e]] += (DetJ(m.X, m.Y, el, 1.0 / 6, 1.0 / 6) + DetJ(m.X, m.Y, el, 2.0 / 3, 1.0 / 6) + DetJ(m.X, m.Y, el, 1.0 / 6, 2.0 / 3)) / 6;
        }
        return a;
    }

    /// <summary>Determinant of the Jacobian of the quadratic map of element nodes <paramref name="el"/> at reference point (xi, eta).</summary>
    public static double DetJ(double[] x, double[] y, ReadOnlySpan<int> el, double xi, double eta)
    {
        double l = 1 - xi - eta;
        Span<double> dxi = [-(4 * l - 1), 4 * xi - 1, 0, 4 * (l - xi), 4 * eta, -4 * eta];
        Span<double> deta = [-(4 * l - 1), 0, 4 * eta - 1, -4 * xi, 4 * xi, 4 * (l - eta)];
        double xx = 0, xy = 0, yx = 0, yy = 0;
        for (int i = 0; i < 6; i++)
        {
            xx += dxi[i] * x[el[i]]; xy += deta[i] * x[el[i]];
            yx += dxi[i] * y[el[i]]; yy += deta[i] * y[el[i]];
        }
        return xx * yy - xy * yx;
    }

    /// <summary>
    /// A sufficient test that det J &gt; 0 over the whole element: det J is a quadratic polynomial, so it is positive
    /// when its six Bernstein-Bezier coefficients are (the convex-hull property of the Bernstein basis; e.g.
    /// Johnen, Remacle, Geuzaine, "Geometrical validity of curvilinear finite elements", J. Comput. Phys. 233, 2013).
    /// Coefficients from nodal values: b_i = f(vertex i), b_ij = 2 f(mid ij) - (f_i + f_j) / 2.
    /// </summary>
    public static bool JacobianCertainlyPositive(double[] x, double[] y, ReadOnlySpan<int> el)
    {
        double f0 = DetJ(x, y, el, 0, 0), f1 = DetJ(x, y, el, 1, 0), f2 = DetJ(x, y, el, 0, 1);
        double f01 = DetJ(x, y, el, 0.5, 0), f12 = DetJ(x, y, el, 0.5, 0.5), f20 = DetJ(x, y, el, 0, 0.5);
        return f0 > 0 && f1 > 0 && f2 > 0 && 2 * f01 - 0.5 * (f0 + f1) > 0 && 2 * f12 - 0.5 * (f1 + f2) > 0 && 2 * f20 - 0.5 * (f2 + f0) > 0;
    }

    /// <summary>Number of elements failing <see cref="JacobianCertainlyPositive"/>.</summary>
    public static int FoldedElements(Mesh m)
    {
        int n = 0;
        for (int e = 0; e < m.ElementCount; e++) if (!JacobianCertainlyPositive(m.X, m.Y, m.Elements.AsSpan(6 * e, 6))) n++;
        return n;
    }

    /// <summary>
    /// Checks conformity: every corner edge is shared by exactly two elements with the same mid-side node, or lies
    /// on the boundary once and matches exactly one boundary edge; corner triangles are counter-clockwise.
    /// Returns null when all holds, else a description of the first problem.
    /// </summary>
    public static string? CheckConformity(Mesh m)
    {
        var edges = new Dictionary<long, (int Count, int Mid)>();
        long Key(int a, int b) => a < b ? ((long)a << 32) | (uint)b : ((long)b << 32) | (uint)a;
        for (int e = 0; e < m.ElementCount; e++)
        {
            int a = m.Elements[6 * e], b = m.Elements[6 * e + 1], c = m.Elements[6 * e + 2];
            double area2 = (m.X[b] - m.X[a]) * (m.Y[c] - m.Y[a]) - (m.Y[b] - m.Y[a]) * (m.X[c] - m.X[a]);
            if (!(area2 > 0)) return $"element {e} is not counter-clockwise";
            for (int i = 0; i < 3; i++)
            {
                int p = m.Elements[6 * e + i], q = m.Elements[6 * e + (i + 1) % 3], mid = m.Elements[6 * e + 3 + i];
                long k = Key(p, q);
                if (edges.TryGetValue(k, out var v))
                {
                    if (v.Mid != mid) return $"edge {p}-{q} has two different mid-side nodes";
                    if (v.Count >= 2) return $"edge {p}-{q} is shared by more than two elements";
                    edges[k] = (2, mid);
                }
                else edges[k] = (1, mid);
            }
        }
        var boundary = new HashSet<long>();
        foreach (var be in m.BoundaryEdges)
        {
            long k = Key(be.A, be.B);
            if (!edges.TryGetValue(k, out var v)) return $"boundary edge {be.A}-{be.B} is not an element edge";
            if (v.Count != 1) return $"boundary edge {be.A}-{be.B} is shared by two elements";
            if (v.Mid != be.Mid) return $"boundary edge {be.A}-{be.B} has another mid-side node than its element";
            if (!boundary.Add(k)) return $"boundary edge {be.A}-{be.B} is listed twice";
        }
        foreach (var (k, v) in edges)
            if (v.Count == 1 && !boundary.Contains(k)) return $"edge {k >> 32}-{k & 0xffffffff} has one element but is not a boundary edge";
        return null;
    }
}
