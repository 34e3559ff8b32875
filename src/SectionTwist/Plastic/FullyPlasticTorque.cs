using SectionTwist.Geometry;
using SectionTwist.Meshing;
using SectionTwist.Torsion;

namespace SectionTwist.Plastic;

/// <summary>
/// The fully plastic torque by the sand-heap analogy (Nadai, Theory of Flow and Fracture of Solids, vol. 1, 2nd ed.,
/// 1950, ch. 35; Hill, The Mathematical Theory of Plasticity, 1950, ch. IV sec. 6): when the whole section has yielded,
/// |grad phi| = tau_y everywhere and T_p = 2 (integral of phi over the section + sum of c_k A_k over the holes).
/// In a region without holes phi = tau_y d with d the distance to the boundary. With holes, phi is the largest
/// function with slope at most tau_y that is 0 on the outer loop and constant (c_k) on hole k:
/// phi = tau_y min(d_0, min_k(c_k + d_k)), and the c_k maximise T_p (a concave problem, solved hole by hole by Brent's
/// line search within the limits that the slope bound puts on the constants). Distances are straight-line: inside a
/// non-convex outer outline with holes this can only under-estimate T_p.
/// The integral uses the 7-point rule of every element of the mesh; d has ridges (the medial axis),
/// so the error falls as h^2 and the estimate compares the mesh with its uniform refinement.
/// </summary>
internal static class FullyPlasticTorque
{
    /// <summary>T_p / tau_y, m^3, and the hole constants / tau_y, m.</summary>
    public static (double TorquePerYield, double[] HoleConstants) Compute(Mesh mesh, double[] holeArea, CancellationToken ct = default)
    {
        var dist = new SectionDistances(mesh);
        int nh = dist.HoleCount;
        var rule = P2Triangle.Degree5;
        int nq = rule.Count * mesh.ElementCount;
        var w = new double[nq];
        var d0 = new double[nq];
        var dh = new double[nh][];
        for (int k = 0; k < nh; k++) dh[k] = new double[nq];
        Span<double> xe = stackalloc double[6], ye = stackalloc double[6], dx = stackalloc double[6], dy = stackalloc double[6];
        for (int e = 0, q = 0; e < mesh.ElementCount; e++)
        {
            if ((e & 63) == 0) ct.ThrowIfCancellationRequested(); // distances cost the loops' segment count per point
            TorsionSolver.Gather(mesh, e, xe, ye);
            int region = mesh.ElementRegion[e];
            for (int i = 0; i < rule.Count; i++, q++)
            {
                double det = P2Triangle.Gradients(rule, i, xe, ye, dx, dy);
                var n = rule.N.AsSpan(i * 6, 6);
                double px = 0, py = 0;
                for (int a = 0; a < 6; a++) { px += n[a] * xe[a]; py += n[a] * ye[a]; }
                var p = new Point2(px, py);
                w[q] = rule.W[i] * det;
                d0[q] = dist.ToOuter(p, region);
                for (int k = 0; k < nh; k++) dh[k][q] = dist.ToHole(p, region, k);
            }
        }
        var c = new double[nh];
        double Torque(double[] cc)
        {
            ct.ThrowIfCancellationRequested(); // one pass over every quadrature point and hole
            double s = 0;
            for (int q = 0; q < nq; q++)
            {
                double v = d0[q];
                for (int k = 0; k < nh; k++) v = Math.Min(v, cc[k] + dh[k][q]);
                s += w[q] * v;
            }
            for (int k = 0; k < nh; k++) s += cc[k] * holeArea[dist.HoleLoops[k]];
            return 2 * s;
        }
        if (nh > 0)
        {
            var (outerGap, holeGap) = dist.Gaps(ct);
            for (int sweep = 0; sweep < 30; sweep++)
            {
                ct.ThrowIfCancellationRequested();
                double moved = 0, scale = 0;
                for (int k = 0; k < nh; k++)
                {
                    var (lo, hi) = SectionDistances.HoleRange(k, c, outerGap, holeGap);
                    double old = c[k];
                    c[k] = LineMinimum.Minimize(v => { double keep = c[k]; c[k] = v; double t = -Torque(c); c[k] = keep; return t; },
                        lo, hi, 1e-10 * Math.Max(hi, 1e-300));
                    moved = Math.Max(moved, Math.Abs(c[k] - old));
                    scale = Math.Max(scale, Math.Abs(c[k]));
                }
                if (nh == 1 || moved <= 1e-9 * Math.Max(scale, 1e-300)) break;
            }
        }
        return (Torque(c), c);
    }
}
