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
    /// <remarks>
    /// The matrix is the Laplacian of the stress-function solve on the same mesh: with <paramref name="shared"/> (kept by
    /// that solve) it is neither assembled nor ordered again; the node fixed is the one the shared order eliminates last,
    /// and only the numeric factorization is new.
    /// </remarks>
    /// <param name="mesh">The mesh.</param>
    /// <param name="centroid">The section's centroid, m.</param>
    /// <param name="ct">Cancellation.</param>
    /// <param name="shared">The stress-function solve's matrix and order on this mesh, or null.</param>
    /// <param name="parent">
    /// The solve on the mesh <paramref name="mesh"/> uniformly refines, with its solver kept: above
    /// <paramref name="twoGridThreshold"/> nodes the system is solved by conjugate gradients with the two-grid
    /// preconditioner on that coarse factorization (<see cref="TwoGridSolver"/>, as the stress-function solve does), the
    /// fine matrix neither ordered nor factorized unless the iteration stalls.
    /// </param>
    /// <param name="keepSolver">Keep the solver on the result (<see cref="WarpingSolution.Solver"/>) for such a solve.</param>
    /// <param name="twoGridThreshold">Nodes above which a <paramref name="parent"/> is used.</param>
    public static WarpingSolution? Solve(Mesh mesh, Point2 centroid, CancellationToken ct = default, MeshLaplacian? shared = null,
        WarpingSolution? parent = null, bool keepSolver = false, int twoGridThreshold = int.MaxValue)
    {
        int nNodes = mesh.NodeCount, nEl = mesh.ElementCount;
        for (int e = 1; e < nEl; e++) if (mesh.ElementRegion[e] != mesh.ElementRegion[0]) return null;
        double cx = centroid.X, cy = centroid.Y;
        var laplacian = shared ?? MeshLaplacian.Assemble(mesh, new double[6 * nEl], ct);
        // DOF: the last node of the shared order fixed (psi = 0 there), the rest numbered in node order. A two-grid solve
        // fixes the coarse solve's node instead (the refinement keeps coarse node numbers), so the coarse space is nested.
        bool twoGrid = parent?.Solver is not null && parent.Mesh is not null && nNodes > twoGridThreshold;
        int fixedNode = twoGrid ? parent!.FixedNode : laplacian.LastNode(ct);
        int n = nNodes - 1;
        var map = new int[nNodes];
        for (int i = 0; i < nNodes; i++) map[i] = i < fixedNode ? i : i - 1;
        map[fixedNode] = -1;
        var f = new double[n];
        Span<double> fe = stackalloc double[6];
        Span<double> xe = stackalloc double[6];
        Span<double> ye = stackalloc double[6];
        var m = new Moments();
        for (int e = 0; e < nEl; e++)
        {
            if ((e & 4095) == 0) ct.ThrowIfCancellationRequested();
            Gather(mesh, e, cx, cy, xe, ye);
            var rule = P2Triangle.IsStraight(xe, ye) ? P2Triangle.Degree2 : P2Triangle.Degree5;
            fe.Clear();
            for (int q = 0; q < rule.Count; q++)
            {
                // w (y dN/dx - x dN/dy) with w = W det J and the inverse Jacobian written out: det J cancels, so
                // fe += W ((y y_s + x x_s) dN/dr - (y y_r + x x_r) dN/ds), no division
                var nq = rule.N.AsSpan(q * 6, 6);
                var dr = rule.Dr.AsSpan(q * 6, 6);
                var ds = rule.Ds.AsSpan(q * 6, 6);
                double jxr = 0, jxs = 0, jyr = 0, jys = 0, x = 0, y = 0;
                for (int a = 0; a < 6; a++)
                {
                    jxr += dr[a] * xe[a]; jxs += ds[a] * xe[a]; jyr += dr[a] * ye[a]; jys += ds[a] * ye[a];
                    x += nq[a] * xe[a]; y += nq[a] * ye[a];
                }
                double cr = rule.W[q] * (y * jys + x * jxs), cs = rule.W[q] * (y * jyr + x * jxr);
                for (int a = 0; a < 6; a++) fe[a] += cr * dr[a] - cs * ds[a];
            }
            for (int a = 0; a < 6; a++)
            {
                int da = map[mesh.Elements[6 * e + a]];
                if (da >= 0) f[da] += fe[a];
            }
        }
        var u = new double[n];
        ISpdSolver? solver = null;
        if (n > 0 && twoGrid)
        {
            var k = CscRestriction.Restrict(laplacian.Matrix, map, n, ct);
            var p = NestedProlongation.Build(parent!.Mesh!, parent.Map, parent.Map.Length - 1, mesh, map, n, ct);
            var tg = new TwoGridSolver(k, p, parent.Solver!, TwoGridTolerance, ct);
            var x0 = new double[n];
            tg.Prolong(parent.Unknowns, x0);
            tg.Initial = x0;
            solver = new TwoGridWithFallback(tg, () => laplacian.System(map, n, SpdSolver.DefaultTolerance, ct).Solver);
        }
        else if (n > 0) solver = laplacian.System(map, n, SpdSolver.DefaultTolerance, ct).Solver;
        solver?.Solve(f, u);
        var psi = new double[nNodes];
        for (int i = 0; i < nNodes; i++) psi[i] = map[i] < 0 ? 0 : u[map[i]];
        double energy = 0; // integral |grad psi|^2 = f . u (Galerkin orthogonality)
        for (int i = 0; i < n; i++) energy += f[i] * u[i];

        // Moments of the mesh domain and of psi about (cx, cy), one pass: Trefftz conditions.
        var loads = new NodeLoads(nNodes);
        Integrate(mesh, cx, cy, psi, ref m, loads);
        // second moments about the mesh domain's own centroid (it differs from the exact one by the curved-edge error)
        double xc = m.X / m.A, yc = m.Y / m.A;
        double ixx = m.Ixx - m.A * yc * yc, iyy = m.Iyy - m.A * xc * xc, ixy = m.Ixy - m.A * xc * yc;
        double psiX = m.PsiX - xc * m.Psi, psiY = m.PsiY - yc * m.Psi;
        double det = ixx * iyy - ixy * ixy;
        double xs = (psiX * ixy - iyy * psiY) / det;
        double ys = (ixx * psiX - ixy * psiY) / det;
        // omega = psi - ys x + xs y + c with zero mean (x, y about (cx, cy))
        double c = -(m.Psi - ys * m.X + xs * m.Y) / m.A;
        var omega = new double[nNodes];
        double best = -1; int at = 0;
        for (int i = 0; i < nNodes; i++)
        {
            double x = mesh.X[i] - cx, y = mesh.Y[i] - cy;
            omega[i] = psi[i] - ys * x + xs * y + c;
            if (Math.Abs(omega[i]) > best) { best = Math.Abs(omega[i]); at = i; }
        }
        // Iw = integral (psi + c + a x + b y)^2 dA from the same moments (no second pass): the rounding this adds is of
        // order 1e-16 integral psi^2, far below the discretization error even for thin angles where Iw is small.
        double a1 = -ys, b1 = xs;
        double iw = m.Psi2 + c * c * m.A + a1 * a1 * m.Iyy + b1 * b1 * m.Ixx
            + 2 * (c * m.Psi + a1 * m.PsiX + b1 * m.PsiY + c * a1 * m.X + c * b1 * m.Y + a1 * b1 * m.Ixy);
        // warping shear: load integral(omega N_i) = the same combination of the node integrals
        var g = new double[nNodes];
        for (int i = 0; i < nNodes; i++) g[i] = loads.Psi[i] + c * loads.One[i] + a1 * loads.X[i] + b1 * loads.Y[i];
        var (shear, shearAt) = solver is null ? (0.0, mesh.Node(0)) : WarpingShear.Solve(mesh, map, solver, g, ct);
        return new WarpingSolution
        {
            MaxShearFactor = shear,
            MaxShearFactorLocation = shearAt,
            Omega = omega,
            ShearCentre = new Point2(cx + xs, cy + ys),
            WarpingConstant = Math.Max(0, iw),
            MaxOmega = best,
            MaxOmegaLocation = mesh.Node(at),
            // J = Ip - integral |grad psi|^2 with Ip about the origin psi was solved about (cx, cy)
            TorsionConstantUpper = m.Ixx + m.Iyy - energy,
            FixedNode = fixedNode,
            Map = map,
            Unknowns = u,
            Mesh = mesh,
            Solver = keepSolver ? solver : null,
        };
    }

    /// <summary>
    /// Relative residual asked of the two-grid iteration: the finest of the stress-function solves' tolerances, since J
    /// from the warping energy cancels Ip against it.
    /// </summary>
    internal const double TwoGridTolerance = 1e-12;

    private static void Gather(Mesh mesh, int e, double cx, double cy, Span<double> xe, Span<double> ye)
    {
        TorsionSolver.Gather(mesh, e, xe, ye);
        for (int a = 0; a < 6; a++) { xe[a] -= cx; ye[a] -= cy; }
    }

    /// <summary>
    /// Area moments of the mesh domain and moments of the nodal field <paramref name="g"/> (P2 interpolation), about
    /// (cx, cy), and the node integrals, in one pass. On a straight-sided element x, y and g are P2 fields exactly, so
    /// every integral is a product with the element mass matrix det J <see cref="ReferenceMass"/> (the degree-5 rule is
    /// exact for it: the same sums up to rounding); a curved element is integrated point by point.
    /// </summary>
    private static void Integrate(Mesh mesh, double cx, double cy, double[] g, ref Moments m, NodeLoads loads)
    {
        Span<double> xe = stackalloc double[6];
        Span<double> ye = stackalloc double[6];
        Span<double> ge = stackalloc double[6];
        var rule = P2Triangle.Degree5;
        var mass = ReferenceMass;
        int[] elements = mesh.Elements;
        double[] one = loads.One, nx = loads.X, ny = loads.Y, npsi = loads.Psi;
        for (int e = 0; e < mesh.ElementCount; e++)
        {
            Gather(mesh, e, cx, cy, xe, ye);
            var nodes = elements.AsSpan(6 * e, 6);
            for (int a = 0; a < 6; a++) ge[a] = g[nodes[a]];
            if (P2Triangle.IsStraight(xe, ye))
            {
                double det = (xe[1] - xe[0]) * (ye[2] - ye[0]) - (xe[2] - xe[0]) * (ye[1] - ye[0]);
                double ea = 0, ex = 0, ey = 0, exx = 0, eyy = 0, exy = 0, ev = 0, evx = 0, evy = 0, evv = 0;
                for (int a = 0; a < 6; a++)
                {
                    var row = mass.AsSpan(6 * a, 6);
                    double s1 = 0, sx = 0, sy = 0, sg = 0;
                    for (int b = 0; b < 6; b++) { s1 += row[b]; sx += row[b] * xe[b]; sy += row[b] * ye[b]; sg += row[b] * ge[b]; }
                    s1 *= det; sx *= det; sy *= det; sg *= det;
                    int nd = nodes[a];
                    one[nd] += s1; nx[nd] += sx; ny[nd] += sy; npsi[nd] += sg;
                    ea += s1; ex += sx; ey += sy;
                    eyy += ye[a] * sy; exx += xe[a] * sx; exy += xe[a] * sy;
                    ev += sg; evx += xe[a] * sg; evy += ye[a] * sg; evv += ge[a] * sg;
                }
                m.A += ea; m.X += ex; m.Y += ey;
                m.Ixx += eyy; m.Iyy += exx; m.Ixy += exy;
                m.Psi += ev; m.PsiX += evx; m.PsiY += evy; m.Psi2 += evv;
                continue;
            }
            for (int q = 0; q < rule.Count; q++)
            {
                double w = rule.W[q] * P2Triangle.Determinant(rule, q, xe, ye);
                var nq = rule.N.AsSpan(q * 6, 6);
                double x = 0, y = 0, v = 0;
                for (int a = 0; a < 6; a++) { x += nq[a] * xe[a]; y += nq[a] * ye[a]; v += nq[a] * ge[a]; }
                m.A += w; m.X += w * x; m.Y += w * y;
                m.Ixx += w * y * y; m.Iyy += w * x * x; m.Ixy += w * x * y;
                m.Psi += w * v; m.PsiX += w * v * x; m.PsiY += w * v * y; m.Psi2 += w * v * v;
                for (int a = 0; a < 6; a++)
                {
                    int nd = nodes[a];
                    double wn = w * nq[a];
                    one[nd] += wn; nx[nd] += wn * x; ny[nd] += wn * y; npsi[nd] += wn * v;
                }
            }
        }
    }

    /// <summary>
    /// Mass matrix of the reference element, integral(N_a N_b) over the reference triangle by the degree-5 rule (exact:
    /// the integrand is of degree 4), row-major; an affine element's is det J times it.
    /// </summary>
    private static readonly double[] ReferenceMass = BuildReferenceMass();

    private static double[] BuildReferenceMass()
    {
        var rule = P2Triangle.Degree5;
        var mass = new double[36];
        for (int q = 0; q < rule.Count; q++)
            for (int a = 0; a < 6; a++)
                for (int b = 0; b < 6; b++) mass[6 * a + b] += rule.W[q] * rule.N[6 * q + a] * rule.N[6 * q + b];
        return mass;
    }

    /// <summary>Node integrals of N_i, x N_i, y N_i and psi N_i (x, y about the centroid).</summary>
    private sealed class NodeLoads(int n)
    {
        public double[] One { get; } = new double[n];
        public double[] X { get; } = new double[n];
        public double[] Y { get; } = new double[n];
        public double[] Psi { get; } = new double[n];
    }

    private struct Moments
    {
        public double A, X, Y, Ixx, Iyy, Ixy, Psi, PsiX, PsiY, Psi2;
    }
}
