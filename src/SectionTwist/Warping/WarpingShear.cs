using SectionTwist.Geometry;
using SectionTwist.Meshing;
using SectionTwist.Sparse;
using SectionTwist.Torsion;

namespace SectionTwist.Warping;

/// <summary>
/// The warping shear stress of non-uniform torsion for any section. Under a varying rate of twist the warping normal
/// stress sigma = E omega phi'' varies along the member, and axial equilibrium (Timoshenko and Goodier, Theory of
/// Elasticity, 3rd ed., sec. 84, the equations of equilibrium) asks for shear stresses with
/// d tau_xz/dx + d tau_yz/dy = -E omega phi''' in the section and tau . n = 0 on its free boundary. The field taken here is
/// the curl-free one, tau_w = -E phi''' grad chi with Laplacian(chi) = omega, d chi/dn = 0 (solvable: omega has zero
/// mean): its circulation round every closed path is zero, the compatibility condition of the secondary shear flow in
/// closed cells. In a thin wall chi is constant across the thickness and t d chi/ds = integral(omega t ds) from a free
/// edge, so |grad chi| = S_w / t and tau_w = -E S_w phi''' / t, the thin-walled result with the sectorial statical
/// moment S_w (Vlasov, Thin-Walled Elastic Beams, 2nd ed., ch. 1; Timoshenko and Gere, Theory of Elastic Stability,
/// sec. 5.2). The Neumann problem has the warping function's matrix, so it reuses its factorization: one more
/// forward and back substitution.
/// </summary>
internal static class WarpingShear
{
    /// <summary>Gradients evaluated at the six nodes of the reference element (weights unused).</summary>
    private static readonly P2Triangle.Rule AtNodes = new([0, 1, 0, 0.5, 0.5, 0], [0, 0, 1, 0, 0.5, 0.5], [0, 0, 0, 0, 0, 0]);

    /// <summary>
    /// Solves for chi with the node loads <paramref name="load"/> = integral(omega N_i) (the node of
    /// <paramref name="map"/> = -1 fixed at 0) and returns the largest |grad chi|, m^3, from element gradients averaged at
    /// the nodes, and where it is.
    /// </summary>
    public static (double Max, Point2 Where) Solve(Mesh mesh, int[] map, ISpdSolver solver, double[] load, CancellationToken ct)
    {
        int nNodes = mesh.NodeCount, n = nNodes - 1;
        var f = new double[n];
        for (int i = 0; i < nNodes; i++) if (map[i] >= 0) f[map[i]] += load[i];
        var u = new double[n];
        solver.Solve(f, u);
        var chi = new double[nNodes];
        for (int i = 0; i < nNodes; i++) chi[i] = map[i] < 0 ? 0 : u[map[i]];

        var gx = new double[nNodes];
        var gy = new double[nNodes];
        var count = new int[nNodes];
        Span<double> xe = stackalloc double[6];
        Span<double> ye = stackalloc double[6];
        Span<double> ce = stackalloc double[6];
        int[] elements = mesh.Elements;
        double[] rDr = AtNodes.Dr, rDs = AtNodes.Ds;
        for (int e = 0; e < mesh.ElementCount; e++)
        {
            if ((e & 4095) == 0) ct.ThrowIfCancellationRequested();
            TorsionSolver.Gather(mesh, e, xe, ye);
            var nodes = elements.AsSpan(6 * e, 6);
            for (int a = 0; a < 6; a++) ce[a] = chi[nodes[a]];
            // grad chi = J^-T (d chi/dr, d chi/ds); the Jacobian of a straight-sided element is the same at every node
            bool straight = P2Triangle.IsStraight(xe, ye);
            double xr = 0, xs = 0, yr = 0, ys = 0, inv = 0;
            for (int q = 0; q < 6; q++)
            {
                var dr = rDr.AsSpan(6 * q, 6);
                var ds = rDs.AsSpan(6 * q, 6);
                if (q == 0 || !straight)
                {
                    xr = 0; xs = 0; yr = 0; ys = 0;
                    for (int a = 0; a < 6; a++) { xr += dr[a] * xe[a]; xs += ds[a] * xe[a]; yr += dr[a] * ye[a]; ys += ds[a] * ye[a]; }
                    inv = 1 / (xr * ys - xs * yr);
                }
                double cr = 0, cs = 0;
                for (int a = 0; a < 6; a++) { cr += dr[a] * ce[a]; cs += ds[a] * ce[a]; }
                int nd = nodes[q];
                gx[nd] += (ys * cr - yr * cs) * inv; gy[nd] += (xr * cs - xs * cr) * inv; count[nd]++;
            }
        }
        double best = 0;
        int at = 0;
        for (int i = 0; i < nNodes; i++)
        {
            if (count[i] == 0) continue;
            double g = Math.Sqrt(gx[i] * gx[i] + gy[i] * gy[i]) / count[i];
            if (g > best) { best = g; at = i; }
        }
        return (best, mesh.Node(at));
    }
}
