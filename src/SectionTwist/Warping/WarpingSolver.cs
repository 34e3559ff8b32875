using SectionTwist.Geometry;
using SectionTwist.Meshing;
using SectionTwist.Sparse;
using SectionTwist.Torsion;

namespace SectionTwist.Warping;

/// <summary>
/// Finite-element solve of the Saint-Venant warping function psi on the 6-node mesh of the stress-function solve
/// (Timoshenko and Goodier, Theory of Elasticity, 3rd ed., sec. 104: axial displacement w = theta psi,
/// Laplacian(psi) = 0, d psi/dn = y n_x - x n_y on every boundary). The boundary term is turned into an area integral
/// by the divergence theorem (div(y, -x) = 0), so the weak form is
/// integral(grad psi . grad v) = integral(y dv/dx - x dv/dy) for all v, with no boundary integrals. The Neumann matrix is
/// singular (psi is fixed up to a constant); one node is fixed and the constant is restored by the normalization.
/// Then: J = Ip - integral |grad psi|^2 (Timoshenko and Goodier sec. 104; the discrete value is an upper bound, minimum
/// potential energy), the shear centre by Trefftz's definition (the warping function about the shear centre is
/// orthogonal to 1, x and y; Trefftz, ZAMM 15, 1935; Vlasov, Thin-Walled Elastic Beams, 2nd ed., ch. 1), and the
/// warping constant Iw = integral omega^2 dA of that normalized function.
/// </summary>
internal static class WarpingSolver
{
    /// <summary>
    /// Solves on a mesh of one connected region; coordinates are taken about <paramref name="centroid"/>. Returns null
    /// when the mesh has more than one region (disjoint parts warp independently; no single shear centre).
    /// </summary>
    public static WarpingSolution? Solve(Mesh mesh, Point2 centroid, CancellationToken ct = default)
    {
        int nNodes = mesh.NodeCount, nEl = mesh.ElementCount;
        for (int e = 1; e < nEl; e++) if (mesh.ElementRegion[e] != mesh.ElementRegion[0]) return null;
        double cx = centroid.X, cy = centroid.Y;
        // DOF: node 0 fixed (psi = 0 there), the rest shifted down by one.
        int n = nNodes - 1;
        var f = new double[n];
        var trip = new TripletMatrix(n, nEl * 36);
        Span<double> ke = stackalloc double[36];
        Span<double> fe = stackalloc double[6];
        Span<double> xe = stackalloc double[6];
        Span<double> ye = stackalloc double[6];
        Span<double> dx = stackalloc double[6];
        Span<double> dy = stackalloc double[6];
        var m = new Moments();
        for (int e = 0; e < nEl; e++)
        {
            if ((e & 4095) == 0) ct.ThrowIfCancellationRequested();
            Gather(mesh, e, cx, cy, xe, ye);
            TorsionSolver.ElementMatrices(xe, ye, ke, fe);
            var rule = P2Triangle.IsStraight(xe, ye) ? P2Triangle.Degree2 : P2Triangle.Degree5;
            fe.Clear();
            for (int q = 0; q < rule.Count; q++)
            {
                double w = rule.W[q] * P2Triangle.Gradients(rule, q, xe, ye, dx, dy);
                var nq = rule.N.AsSpan(q * 6, 6);
                double x = 0, y = 0;
                for (int a = 0; a < 6; a++) { x += nq[a] * xe[a]; y += nq[a] * ye[a]; }
                for (int a = 0; a < 6; a++) fe[a] += w * (y * dx[a] - x * dy[a]);
            }
            for (int a = 0; a < 6; a++)
            {
                int da = mesh.Elements[6 * e + a] - 1;
                if (da < 0) continue;
                f[da] += fe[a];
                for (int b = 0; b < 6; b++)
                {
                    int db = mesh.Elements[6 * e + b] - 1;
                    if (db >= 0) trip.Add(da, db, ke[6 * a + b]);
                }
            }
        }
        var u = new double[n];
        if (n > 0) SpdSolver.Create(trip.ToCsc(), ct).Solve(f, u);
        var psi = new double[nNodes];
        for (int i = 1; i < nNodes; i++) psi[i] = u[i - 1];
        double energy = 0; // integral |grad psi|^2 = f . u (Galerkin orthogonality)
        for (int i = 0; i < n; i++) energy += f[i] * u[i];

        // Moments of the mesh domain and of psi (about the centroid): Trefftz conditions.
        Integrate(mesh, cx, cy, psi, ref m);
        double det = m.Ixx * m.Iyy - m.Ixy * m.Ixy;
        double xs = (m.PsiX * m.Ixy - m.Iyy * m.PsiY) / det;
        double ys = (m.Ixx * m.PsiX - m.Ixy * m.PsiY) / det;
        // omega = psi - ys (x - x0) + xs (y - y0) + c with zero mean (x0, y0: the mesh domain's own centroid offset)
        double c = -(m.Psi - ys * m.X + xs * m.Y) / m.A;
        var omega = new double[nNodes];
        double best = -1; int at = 0;
        for (int i = 0; i < nNodes; i++)
        {
            double x = mesh.X[i] - cx, y = mesh.Y[i] - cy;
            omega[i] = psi[i] - ys * x + xs * y + c;
            if (Math.Abs(omega[i]) > best) { best = Math.Abs(omega[i]); at = i; }
        }
        var mo = new Moments();
        Integrate(mesh, cx, cy, omega, ref mo);
        return new WarpingSolution
        {
            Omega = omega,
            ShearCentre = new Point2(cx + xs, cy + ys),
            WarpingConstant = mo.Psi2,
            MaxOmega = best,
            MaxOmegaLocation = mesh.Node(at),
            TorsionConstantUpper = m.Ixx + m.Iyy - energy,
        };
    }

    private static void Gather(Mesh mesh, int e, double cx, double cy, Span<double> xe, Span<double> ye)
    {
        TorsionSolver.Gather(mesh, e, xe, ye);
        for (int a = 0; a < 6; a++) { xe[a] -= cx; ye[a] -= cy; }
    }

    /// <summary>Area moments of the mesh domain and moments of the nodal field <paramref name="g"/> (P2 interpolation).</summary>
    private static void Integrate(Mesh mesh, double cx, double cy, double[] g, ref Moments m)
    {
        Span<double> xe = stackalloc double[6];
        Span<double> ye = stackalloc double[6];
        Span<double> dx = stackalloc double[6];
        Span<double> dy = stackalloc double[6];
        var rule = P2Triangle.Degree5;
        for (int e = 0; e < mesh.ElementCount; e++)
        {
            Gather(mesh, e, cx, cy, xe, ye);
            for (int q = 0; q < rule.Count; q++)
            {
                double w = rule.W[q] * P2Triangle.Gradients(rule, q, xe, ye, dx, dy);
                var nq = rule.N.AsSpan(q * 6, 6);
                double x = 0, y = 0, v = 0;
                for (int a = 0; a < 6; a++) { x += nq[a] * xe[a]; y += nq[a] * ye[a]; v += nq[a] * g[mesh.Elements[6 * e + a]]; }
                m.A += w; m.X += w * x; m.Y += w * y;
                m.Ixx += w * y * y; m.Iyy += w * x * x; m.Ixy += w * x * y;
                m.Psi += w * v; m.PsiX += w * v * x; m.PsiY += w * v * y; m.Psi2 += w * v * v;
            }
        }
        // second moments about the mesh domain's own centroid (it differs from the exact one by the curved-edge error)
        double xc = m.X / m.A, yc = m.Y / m.A;
        m.Ixx -= m.A * yc * yc; m.Iyy -= m.A * xc * xc; m.Ixy -= m.A * xc * yc;
        m.PsiX -= xc * m.Psi; m.PsiY -= yc * m.Psi;
    }

    private struct Moments
    {
        public double A, X, Y, Ixx, Iyy, Ixy, Psi, PsiX, PsiY, Psi2;
    }
}
