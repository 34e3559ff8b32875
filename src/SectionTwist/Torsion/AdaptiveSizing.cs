using SectionTwist.Geometry;
using SectionTwist.Meshing;

namespace SectionTwist.Torsion;

/// <summary>
/// A-posteriori error indicator and the element-size field for the next mesh (Zienkiewicz and Zhu, "A simple error
/// estimator and adaptive procedure for practical engineering analysis", Int. J. Numer. Meth. Eng. 24, 1987).
/// The indicator of element e is eta_e^2 = integral over e of |G* - grad phi_h|^2, with G* the nodal-averaged gradient
/// interpolated by the element's shape functions. For the stress-function problem the error of J equals the squared
/// energy-norm error of phi (complementary energy), so sum eta_e^2 / J estimates the relative error of J. The new size
/// equidistributes the error: h_new = h_e (eta_target / eta_e)^(1/k), with k = 3 (eta_e ~ h^3 for 6-node elements on
/// smooth solutions: gradient error h^2 times the square root of the element area).
/// </summary>
internal static class AdaptiveSizing
{
    private const double Order = 3;

    /// <summary>Element indicators eta_e^2 on the solution's mesh.</summary>
    public static double[] Indicators(TorsionSolution sol, SectionField field)
    {
        var mesh = sol.Mesh;
        var eta2 = new double[mesh.ElementCount];
        // nodal recovered gradient G* = (d phi/dx, d phi/dy) = J * (-shearY, shearX)
        Span<double> xe = stackalloc double[6];
        Span<double> ye = stackalloc double[6];
        Span<double> dx = stackalloc double[6];
        Span<double> dy = stackalloc double[6];
        var rule = P2Triangle.Degree5;
        for (int e = 0; e < mesh.ElementCount; e++)
        {
            TorsionSolver.Gather(mesh, e, xe, ye);
            double s = 0;
            for (int q = 0; q < rule.Count; q++)
            {
                double det = P2Triangle.Gradients(rule, q, xe, ye, dx, dy);
                var nq = rule.N.AsSpan(q * 6, 6);
                double gx = 0, gy = 0, rx = 0, ry = 0;
                for (int a = 0; a < 6; a++)
                {
                    int nd = mesh.Elements[6 * e + a];
                    double ph = sol.Phi[nd];
                    gx += dx[a] * ph; gy += dy[a] * ph;
                    rx += nq[a] * (-field.ShearY[nd] * sol.J);
                    ry += nq[a] * (field.ShearX[nd] * sol.J);
                }
                s += rule.W[q] * det * ((rx - gx) * (rx - gx) + (ry - gy) * (ry - gy));
            }
            eta2[e] = s;
        }
        return eta2;
    }

    /// <summary>
    /// Largest turn of the boundary tangent (radians) over one edge near the peak shear for the peak to count as
    /// resolved: 15 deg. Coarser, the smoothed boundary peak on a fillet is not yet in its asymptotic range (its
    /// coarse-to-fine change can be smaller than its remaining error); from 15 deg per edge on, three-mesh sequences
    /// show orders of 2 to 4 (docs/verification.md).
    /// </summary>
    public const double PeakEdgeTurn = 15 * Math.PI / 180;

    /// <summary>True when every boundary edge within 3 % of the peak shear turns by at most <see cref="PeakEdgeTurn"/>.</summary>
    public static bool PeakResolved(TorsionSolution sol)
    {
        foreach (var be in PeakEdges(sol))
            if (Turn(be) > PeakEdgeTurn * (1 + 1e-9)) return false;
        return true;
    }

    private static IEnumerable<MeshBoundaryEdge> PeakEdges(TorsionSolution sol) =>
        sol.Mesh.BoundaryEdges.Where(be => Math.Abs(sol.BoundaryFlux[be.Mid]) >= 0.97 * sol.MaxGradient);

    /// <summary>Angle between the curve's tangents at the two ends of the edge (0 on straight edges).</summary>
    private static double Turn(MeshBoundaryEdge be)
    {
        Point2 t0 = be.Curve.DerivativeAt(be.T0), t1 = be.Curve.DerivativeAt(be.T1);
        return Math.Abs(Math.Atan2(Point2.Cross(t0, t1), Point2.Dot(t0, t1)));
    }

    /// <summary>
    /// Size sources at the boundary edges whose shear is within 3 % of the peak: the new size is the edge length times
    /// <paramref name="factor"/>, and small enough that a curved edge turns by at most 0.8 <see cref="PeakEdgeTurn"/>
    /// (at most 200 sources, evenly picked).
    /// </summary>
    public static IReadOnlyList<(Point2 Where, double Size)> PeakSources(TorsionSolution sol, double factor)
    {
        var mesh = sol.Mesh;
        var list = new List<(Point2, double)>();
        foreach (var be in PeakEdges(sol))
        {
            double len = Point2.Distance(mesh.Node(be.A), mesh.Node(be.Mid)) + Point2.Distance(mesh.Node(be.Mid), mesh.Node(be.B));
            double turn = Turn(be);
            double size = factor * len;
            if (turn > 0.8 * PeakEdgeTurn) size = Math.Min(size, len * 0.8 * PeakEdgeTurn / turn);
            list.Add((mesh.Node(be.Mid), size));
        }
        if (list.Count <= 200) return list;
        int step = (list.Count + 199) / 200;
        return list.Where((_, i) => i % step == 0).ToList();
    }

    /// <summary>
    /// A size field for a new mesh that aims at a relative J error of <paramref name="target"/>, sampled on a grid of
    /// buckets over the profile (each bucket keeps the smallest size wanted by the elements that overlap it).
    /// <paramref name="elementsPerParent"/> maps indicators measured on a uniformly refined mesh back to its parent elements.
    /// </summary>
    public static Func<Point2, double> SizeField(Mesh mesh, double[] eta2, double j, double target, double hMax,
        IReadOnlyList<(Point2 Where, double Size)>? sources = null, int elementsPerParent = 1)
    {
        int ne = mesh.ElementCount / elementsPerParent;
        var parentEta = new double[ne];
        for (int e = 0; e < mesh.ElementCount; e++) parentEta[Math.Min(e / elementsPerParent, ne - 1)] += eta2[e];
        double allowed = 0.5 * target * j; // half the budget: the estimate is not exact
        double perElement = allowed / ne;
        var box = Box2.Empty;
        for (int i = 0; i < mesh.NodeCount; i++) box = box.Include(mesh.Node(i));
        int nc = Math.Clamp((int)Math.Sqrt(ne), 8, 400);
        double cw = box.Width / nc, ch = box.Height / nc;
        var cell = new double[nc * nc];
        Array.Fill(cell, hMax);
        for (int pe = 0; pe < ne; pe++)
        {
            // parent element geometry: union of its children
            var b = Box2.Empty;
            for (int c = 0; c < elementsPerParent; c++)
            {
                int e = pe * elementsPerParent + c;
                for (int a = 0; a < 3; a++) b = b.Include(mesh.Node(mesh.Elements[6 * e + a]));
            }
            double h = Math.Max(b.Width, b.Height);
            double ratio = parentEta[pe] > 0 ? Math.Sqrt(perElement / parentEta[pe]) : 4;
            double hNew = Math.Clamp(h * Math.Pow(ratio, 1 / Order), 0.15 * h, Math.Min(2 * h, hMax));
            int x0 = Math.Clamp((int)((b.MinX - box.MinX) / cw), 0, nc - 1), x1 = Math.Clamp((int)((b.MaxX - box.MinX) / cw), 0, nc - 1);
            int y0 = Math.Clamp((int)((b.MinY - box.MinY) / ch), 0, nc - 1), y1 = Math.Clamp((int)((b.MaxY - box.MinY) / ch), 0, nc - 1);
            for (int ix = x0; ix <= x1; ix++)
                for (int iy = y0; iy <= y1; iy++)
                    cell[ix * nc + iy] = Math.Min(cell[ix * nc + iy], hNew);
        }
        // point sources with a size growing 0.3 per unit distance around them
        foreach (var (w, hs) in sources ?? [])
        {
            double reach = 8 * hs;
            int x0 = Math.Clamp((int)((w.X - reach - box.MinX) / cw), 0, nc - 1), x1 = Math.Clamp((int)((w.X + reach - box.MinX) / cw), 0, nc - 1);
            int y0 = Math.Clamp((int)((w.Y - reach - box.MinY) / ch), 0, nc - 1), y1 = Math.Clamp((int)((w.Y + reach - box.MinY) / ch), 0, nc - 1);
            for (int ix = x0; ix <= x1; ix++)
                for (int iy = y0; iy <= y1; iy++)
                {
                    var c = new Point2(box.MinX + (ix + 0.5) * cw, box.MinY + (iy + 0.5) * ch);
                    double d = Math.Max(0, Point2.Distance(c, w) - 0.75 * Math.Max(cw, ch));
                    cell[ix * nc + iy] = Math.Min(cell[ix * nc + iy], hs + 0.3 * d);
                }
        }
        return p =>
        {
            int ix = Math.Clamp((int)((p.X - box.MinX) / cw), 0, nc - 1), iy = Math.Clamp((int)((p.Y - box.MinY) / ch), 0, nc - 1);
            return cell[ix * nc + iy];
        };
    }
}
