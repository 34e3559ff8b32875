using SectionTwist.Geometry;
using SectionTwist.Meshing;

namespace SectionTwist.Torsion;

/// <summary>
/// Boundary shear from the variationally consistent flux: the nodal residuals r_i = sum_e (K_e u_e - f_e)_i at boundary
/// nodes equal integral(N_i d phi/dn ds), so solving the boundary mass system M q = r loop by loop recovers d phi/dn
/// with higher accuracy than differentiating the field (Carey, Chow and Seager, "Approximate boundary-flux calculations",
/// Comput. Methods Appl. Mech. Eng. 50 (1985); Melosh and Marcal style consistent reactions). On a boundary phi is
/// constant, so |grad phi| = |d phi/dn| there, and the peak shear of a Saint-Venant section lies on the boundary
/// (|grad phi|^2 is subharmonic since Laplacian(phi) is constant).
/// </summary>
internal static class BoundaryFluxRecovery
{
    private static readonly double[] G5X = [0.046910077030668, 0.230765344947158, 0.5, 0.769234655052842, 0.953089922969332];
    private static readonly double[] G5W = [0.118463442528095, 0.239314335249683, 0.284444444444444, 0.239314335249683, 0.118463442528095];

    /// <summary>Outward normal derivative of phi at every boundary node (NaN at interior nodes).</summary>
    public static double[] Recover(Mesh mesh, double[] phi)
    {
        int nNodes = mesh.NodeCount;
        var r = new double[nNodes];
        Span<double> ke = stackalloc double[36];
        Span<double> fe = stackalloc double[6];
        Span<double> xe = stackalloc double[6];
        Span<double> ye = stackalloc double[6];
        for (int e = 0; e < mesh.ElementCount; e++)
        {
            bool touches = false;
            for (int a = 0; a < 6 && !touches; a++) touches = mesh.NodeLoop[mesh.Elements[6 * e + a]] >= 0;
            if (!touches) continue;
            TorsionSolver.Gather(mesh, e, xe, ye);
            TorsionSolver.ElementMatrices(xe, ye, ke, fe);
            for (int a = 0; a < 6; a++)
            {
                int na = mesh.Elements[6 * e + a];
                if (mesh.NodeLoop[na] < 0) continue;
                double s = -fe[a];
                for (int b = 0; b < 6; b++) s += ke[6 * a + b] * phi[mesh.Elements[6 * e + b]];
                r[na] += s;
            }
        }
        var q = new double[nNodes];
        Array.Fill(q, double.NaN);
        // Boundary mass system per loop, solved by Jacobi-preconditioned conjugate gradients (well conditioned).
        var byLoop = mesh.BoundaryEdges.GroupBy(be => be.Loop);
        Span<double> me = stackalloc double[9];
        foreach (var group in byLoop)
        {
            var edges = group.ToArray();
            var local = new Dictionary<int, int>();
            foreach (var be in edges) foreach (int nd in (ReadOnlySpan<int>)[be.A, be.Mid, be.B]) if (!local.ContainsKey(nd)) local[nd] = local.Count;
            int m = local.Count;
            var trip = new Sparse.TripletMatrix(m, edges.Length * 9);
            foreach (var be in edges)
            {
                EdgeMass(mesh, be, me);
                int[] ids = [local[be.A], local[be.Mid], local[be.B]];
                for (int a = 0; a < 3; a++) for (int b = 0; b < 3; b++) trip.Add(ids[a], ids[b], me[3 * a + b]);
            }
            var rhs = new double[m];
            foreach (var (nd, li) in local) rhs[li] = r[nd];
            var sol = new double[m];
            Sparse.SpdSolver.Create(trip.ToCsc()).Solve(rhs, sol);
            foreach (var (nd, li) in local) q[nd] = sol[li];
        }
        return q;
    }

    /// <summary>
    /// Smooths the consistent flux and finds its peak. The nodal values of the consistent P2 flux carry an oscillating
    /// part (corner nodes high, mid-side nodes low) whose edge mean is nearly zero, while the edge means themselves are
    /// superconvergent. So each edge is represented by its mean m_e; the value at the edge midpoint is
    /// m_e - L^2 q''/24 with q'' from a parabola through the neighbouring means on the same curve, and the peak is the
    /// largest such value or the vertex of that parabola when it falls on the edge. Nodal values (for plots) are rebuilt
    /// from the means. Returns the smoothed nodal flux, the peak |d phi/dn| and its location.
    /// </summary>
    public static (double[] Smoothed, double Peak, Point2 Where) Smooth(Mesh mesh, double[] flux)
    {
        var smoothed = new double[mesh.NodeCount];
        Array.Fill(smoothed, double.NaN);
        double best = 0; Point2 where = default;
        foreach (var chain in BoundaryChains(mesh))
        {
            int m = chain.Length;
            var mean = new double[m]; var len = new double[m]; var s0 = new double[m];
            double pos = 0;
            for (int k = 0; k < m; k++)
            {
                (mean[k], len[k]) = EdgeMean(mesh, chain[k], flux);
                s0[k] = pos + 0.5 * len[k];
                pos += len[k];
            }
            double total = pos;
            var mid = new double[m];
            for (int k = 0; k < m; k++)
            {
                var e = chain[k];
                mid[k] = mean[k];
                int kp = (k - 1 + m) % m, kn = (k + 1) % m;
                bool smooth = m >= 3 && ReferenceEquals(chain[kp].Curve, e.Curve) && ReferenceEquals(chain[kn].Curve, e.Curve);
                double vPeak = Math.Abs(mean[k]), sPeak = 0;
                if (smooth)
                {
                    // positions of neighbour midpoints relative to this one (arc length, wrapping on closed loops)
                    double hp = -(0.5 * len[kp] + 0.5 * len[k]), hn = 0.5 * len[k] + 0.5 * len[kn];
                    double a0 = mean[kp], a1 = mean[k], a2 = mean[kn];
                    // parabola p(s) = a1 + b s + c s^2 through (hp,a0), (0,a1), (hn,a2)
                    double c = (a0 * hn - a2 * hp - a1 * (hn - hp)) / (hp * hn * (hp - hn));
                    double b = (a2 - a1 - c * hn * hn) / hn;
                    // the mean of a quadratic over the edge exceeds its midpoint value by c L^2 / 12
                    double corr = c * len[k] * len[k] / 12;
                    mid[k] = a1 - corr;
                    vPeak = Math.Abs(mid[k]);
                    if (c != 0)
                    {
                        double sv = -b / (2 * c);
                        if (Math.Abs(sv) <= 0.5 * len[k])
                        {
                            double v = Math.Abs(a1 - corr + b * sv + c * sv * sv);
                            if (v > vPeak) { vPeak = v; sPeak = sv; }
                        }
                    }
                }
                if (vPeak > best)
                {
                    best = vPeak;
                    double t = 0.5 + sPeak / len[k];
                    where = PointOnEdge(mesh, e, t);
                }
                smoothed[e.Mid] = mid[k];
            }
            for (int k = 0; k < m; k++)
            {
                int kp = (k - 1 + m) % m;
                // shared corner node A of edge k: linear blend of the two neighbouring midpoint values
                smoothed[chain[k].A] = (len[k] * mid[kp] + len[kp] * mid[k]) / (len[k] + len[kp]);
            }
            _ = total;
        }
        return (smoothed, best, where);
    }

    private static Point2 PointOnEdge(Mesh mesh, MeshBoundaryEdge be, double t)
    {
        double na = (1 - t) * (1 - 2 * t), nm = 4 * t * (1 - t), nb = t * (2 * t - 1);
        return new Point2(na * mesh.X[be.A] + nm * mesh.X[be.Mid] + nb * mesh.X[be.B], na * mesh.Y[be.A] + nm * mesh.Y[be.Mid] + nb * mesh.Y[be.B]);
    }

    /// <summary>Mean of the quadratic flux interpolant over an edge and the edge length (isoparametric arc length).</summary>
    private static (double Mean, double Length) EdgeMean(Mesh mesh, MeshBoundaryEdge be, double[] flux)
    {
        double xa = mesh.X[be.A], ya = mesh.Y[be.A], xm = mesh.X[be.Mid], ym = mesh.Y[be.Mid], xb = mesh.X[be.B], yb = mesh.Y[be.B];
        double len = 0, integral = 0;
        for (int g = 0; g < G5X.Length; g++)
        {
            double t = G5X[g];
            double na = (1 - t) * (1 - 2 * t), nm = 4 * t * (1 - t), nb = t * (2 * t - 1);
            double da = 4 * t - 3, dm = 4 - 8 * t, db = 4 * t - 1;
            double dxt = da * xa + dm * xm + db * xb, dyt = da * ya + dm * ym + db * yb;
            double w = G5W[g] * Math.Sqrt(dxt * dxt + dyt * dyt);
            len += w;
            integral += w * (na * flux[be.A] + nm * flux[be.Mid] + nb * flux[be.B]);
        }
        return (integral / len, len);
    }

    /// <summary>The boundary edges of each loop in order along the loop (edge k ends where edge k+1 starts).</summary>
    internal static IEnumerable<MeshBoundaryEdge[]> BoundaryChains(Mesh mesh)
    {
        foreach (var group in mesh.BoundaryEdges.GroupBy(be => be.Loop))
        {
            var edges = group.ToArray();
            var byStart = new Dictionary<int, int>(edges.Length);
            for (int k = 0; k < edges.Length; k++) byStart[edges[k].A] = k;
            var used = new bool[edges.Length];
            for (int s = 0; s < edges.Length; s++)
            {
                if (used[s]) continue;
                var chain = new List<MeshBoundaryEdge>();
                int k = s;
                while (k >= 0 && !used[k])
                {
                    used[k] = true; chain.Add(edges[k]);
                    k = byStart.TryGetValue(edges[k].B, out int nk) ? nk : -1;
                }
                yield return chain.ToArray();
            }
        }
    }

    /// <summary>Consistent mass matrix of a quadratic boundary edge, integral(N_a N_b ds) on the isoparametric curve.</summary>
    private static void EdgeMass(Mesh mesh, MeshBoundaryEdge be, Span<double> me)
    {
        me.Clear();
        double xa = mesh.X[be.A], ya = mesh.Y[be.A], xm = mesh.X[be.Mid], ym = mesh.Y[be.Mid], xb = mesh.X[be.B], yb = mesh.Y[be.B];
        Span<double> nn = stackalloc double[3];
        for (int g = 0; g < G5X.Length; g++)
        {
            double t = G5X[g];
            nn[0] = (1 - t) * (1 - 2 * t); nn[1] = 4 * t * (1 - t); nn[2] = t * (2 * t - 1);
            double da = 4 * t - 3, dm = 4 - 8 * t, db = 4 * t - 1;
            double dxt = da * xa + dm * xm + db * xb, dyt = da * ya + dm * ym + db * yb;
            double w = G5W[g] * Math.Sqrt(dxt * dxt + dyt * dyt);
            for (int a = 0; a < 3; a++) for (int b = 0; b < 3; b++) me[3 * a + b] += w * nn[a] * nn[b];
        }
    }
}
