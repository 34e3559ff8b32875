using SectionTwist.Geometry;
using SectionTwist.Meshing;
using SectionTwist.Sparse;
using SectionTwist.Torsion;

namespace SectionTwist.Composite;

/// <summary>
/// The Prandtl stress function of a composite section on one mesh. With phi = G_ref theta psi the complementary energy
/// integral((1 / 2G) |grad phi|^2 - 2 theta phi) gives div((G_ref / G) grad psi) = -2 with psi = 0 on outer boundaries,
/// psi continuous across interfaces (traction continuity) and one constant per hole, whose equation is the circulation
/// condition integral((G_ref / G) d psi/dn ds) = -2 A_k (Timoshenko and Goodier, Theory of Elasticity, 3rd ed., sec. 101
/// and 115, with the piecewise modulus as in Muskhelishvili, Some Basic Problems of the Mathematical Theory of Elasticity,
/// sec. 148 on compound bars, from memory of the section number). Each element stiffness of <see cref="TorsionSolver"/>
/// is scaled by G_ref / G_e; the load is unchanged. Then J_ref = 2 integral(psi) + 2 sum(c_k A_k) = u . f,
/// (G J)_eff = G_ref J_ref, and shear per unit torque tau / T = (d psi/dy, -d psi/dx) / J_ref in every material.
/// </summary>
internal static class CompositeSolver
{
    private static readonly double[] NodeR = [0, 1, 0, 0.5, 0.5, 0];
    private static readonly double[] NodeS = [0, 0, 1, 0, 0.5, 0.5];

    /// <summary>Solves on <paramref name="mesh"/> whose zone z has weight G_ref / G = <paramref name="zoneWeight"/>[z] and material index <paramref name="zoneMaterial"/>[z].</summary>
    public static CompositeSolution Solve(Mesh mesh, double[] holeArea, double[] zoneWeight, int[] zoneMaterial, int materials, Point2 origin, CancellationToken ct)
    {
        int nNodes = mesh.NodeCount, nEl = mesh.ElementCount;
        var loops = mesh.Loops;
        var dof = new int[nNodes];
        var holeDof = new int[loops.Length];
        int nd = 0;
        for (int l = 0; l < loops.Length; l++) holeDof[l] = loops[l].IsHole ? nd++ : -1;
        for (int i = 0; i < nNodes; i++) { int l = mesh.NodeLoop[i]; dof[i] = l < 0 ? nd++ : holeDof[l]; }
        var f = new double[nd];
        for (int l = 0; l < loops.Length; l++) if (holeDof[l] >= 0) f[holeDof[l]] += 2 * holeArea[l];
        var k = TorsionSolver.AssembleReduced(mesh, dof, nd, f, ct, e => zoneWeight[mesh.ElementZone[e]]);
        var u = new double[nd];
        if (nd > 0) SpdSolver.Create(k, SpdSolver.DefaultTolerance, ct).Solve(f, u);
        double residual = nd > 0 ? k.RelativeResidual(u, f) : 0;
        double j = 0;
        for (int i = 0; i < nd; i++) j += u[i] * f[i];
        var psi = new double[nNodes];
        for (int i = 0; i < nNodes; i++) psi[i] = dof[i] < 0 ? 0 : u[dof[i]];
        Span<double> xe = stackalloc double[6];
        Span<double> ye = stackalloc double[6];

        // per material: torque integral(x tau_zy - y tau_zx) = -integral(x psi_x + y psi_y) about the origin, area, and
        // nodal gradients averaged over that material's elements only (the tangential shear jumps at an interface)
        var torque = new double[materials];
        var area = new double[materials];
        var gx = new double[materials * nNodes];
        var gy = new double[gx.Length];
        var cnt = new int[gx.Length];
        Span<double> dx = stackalloc double[6];
        Span<double> dy = stackalloc double[6];
        Span<double> dr = stackalloc double[6];
        Span<double> ds = stackalloc double[6];
        for (int e = 0; e < nEl; e++)
        {
            if ((e & 4095) == 0) ct.ThrowIfCancellationRequested();
            int m = zoneMaterial[mesh.ElementZone[e]];
            TorsionSolver.Gather(mesh, e, xe, ye);
            var rule = P2Triangle.Degree5;
            for (int q = 0; q < rule.Count; q++)
            {
                double det = P2Triangle.Gradients(rule, q, xe, ye, dx, dy);
                var nq = rule.N.AsSpan(q * 6, 6);
                double px = 0, py = 0, x = 0, y = 0;
                for (int a = 0; a < 6; a++)
                {
                    double p = psi[mesh.Elements[6 * e + a]];
                    px += dx[a] * p; py += dy[a] * p; x += nq[a] * xe[a]; y += nq[a] * ye[a];
                }
                double wq = rule.W[q] * det;
                torque[m] -= wq * ((x - origin.X) * px + (y - origin.Y) * py);
                area[m] += wq;
            }
            for (int c = 0; c < 6; c++)
            {
                P2Triangle.ShapeDerivatives(NodeR[c], NodeS[c], dr, ds);
                double xr = 0, xs = 0, yr = 0, ys = 0, pr = 0, ps = 0;
                for (int a = 0; a < 6; a++)
                {
                    double p = psi[mesh.Elements[6 * e + a]];
                    xr += dr[a] * xe[a]; xs += ds[a] * xe[a]; yr += dr[a] * ye[a]; ys += ds[a] * ye[a];
                    pr += dr[a] * p; ps += ds[a] * p;
                }
                double d = xr * ys - xs * yr;
                int slot = m * nNodes + mesh.Elements[6 * e + c];
                gx[slot] += (ys * pr - yr * ps) / d;
                gy[slot] += (-xs * pr + xr * ps) / d;
                cnt[slot]++;
            }
        }
        var peak = new double[materials];
        var where = new Point2[materials];
        for (int m = 0; m < materials; m++)
            for (int i = 0; i < nNodes; i++)
            {
                int slot = m * nNodes + i;
                if (cnt[slot] == 0) continue;
                double g = Math.Sqrt(gx[slot] * gx[slot] + gy[slot] * gy[slot]) / cnt[slot];
                if (g > peak[m]) { peak[m] = g; where[m] = mesh.Node(i); }
            }
        return new CompositeSolution(mesh, psi, j, torque, area, peak, where, residual) { ZoneMaterial = zoneMaterial };
    }
}

/// <summary>One composite solve: psi for G_ref theta = 1 (m^2), J_ref (m^4), and per material the torque integral of psi (m^4), area, peak |grad psi| (m) and where.</summary>
internal sealed record CompositeSolution(Mesh Mesh, double[] Psi, double J, double[] Torque, double[] Area, double[] PeakGradient, Point2[] PeakLocation, double Residual)
{
    /// <summary>Material index of each zone of the mesh (<see cref="Mesh.ElementZone"/>).</summary>
    public int[] ZoneMaterial { get; init; } = [];
}
