using SectionTwist.Geometry;
using SectionTwist.Meshing;

namespace SectionTwist.Torsion;

/// <summary>
/// Nodal shear field for plots: element gradients of phi averaged at each node, replaced on the boundary by the
/// smoothed consistent flux along the outward normal; then tau per unit torque = (d phi/dy, -d phi/dx) / J.
/// </summary>
internal static class FieldRecovery
{
    // Reference coordinates of the six nodes.
    private static readonly double[] NodeR = [0, 1, 0, 0.5, 0.5, 0];
    private static readonly double[] NodeS = [0, 0, 1, 0, 0.5, 0.5];

    public static SectionField Build(TorsionSolution sol)
    {
        var mesh = sol.Mesh;
        int n = mesh.NodeCount;
        var gx = new double[n]; var gy = new double[n]; var cnt = new int[n];
        Span<double> xe = stackalloc double[6];
        Span<double> ye = stackalloc double[6];
        Span<double> dr = stackalloc double[6];
        Span<double> ds = stackalloc double[6];
        for (int e = 0; e < mesh.ElementCount; e++)
        {
            TorsionSolver.Gather(mesh, e, xe, ye);
            for (int k = 0; k < 6; k++)
            {
                P2Triangle.ShapeDerivatives(NodeR[k], NodeS[k], dr, ds);
                double xr = 0, xs = 0, yr = 0, ys = 0, pr = 0, ps = 0;
                for (int a = 0; a < 6; a++)
                {
                    double ph = sol.Phi[mesh.Elements[6 * e + a]];
                    xr += dr[a] * xe[a]; xs += ds[a] * xe[a]; yr += dr[a] * ye[a]; ys += ds[a] * ye[a];
                    pr += dr[a] * ph; ps += ds[a] * ph;
                }
                double det = xr * ys - xs * yr;
                int node = mesh.Elements[6 * e + k];
                gx[node] += (ys * pr - yr * ps) / det;
                gy[node] += (-xs * pr + xr * ps) / det;
                cnt[node]++;
            }
        }
        for (int i = 0; i < n; i++) if (cnt[i] > 0) { gx[i] /= cnt[i]; gy[i] /= cnt[i]; }
        foreach (var be in mesh.BoundaryEdges)
        {
            Span<int> nodes = [be.A, be.Mid, be.B];
            Span<double> ts = [be.T0, 0.5 * (be.T0 + be.T1), be.T1];
            for (int k = 0; k < 3; k++)
            {
                double q = sol.BoundaryFlux[nodes[k]];
                if (double.IsNaN(q)) continue;
                var t = be.Curve.DerivativeAt(ts[k]);
                double len = t.Length;
                if (len == 0) continue;
                // material on the left of the loop direction: outward normal = (ty, -tx)
                gx[nodes[k]] = q * t.Y / len;
                gy[nodes[k]] = -q * t.X / len;
            }
        }
        double invJ = 1 / sol.J;
        var sx = new double[n]; var sy = new double[n];
        for (int i = 0; i < n; i++) { sx[i] = gy[i] * invJ; sy[i] = -gx[i] * invJ; }
        var tris = new int[mesh.ElementCount * 12];
        var corners = new int[mesh.ElementCount * 3];
        for (int e = 0; e < mesh.ElementCount; e++)
        {
            var el = mesh.Elements.AsSpan(6 * e, 6);
            int[] sub = [el[0], el[3], el[5], el[3], el[1], el[4], el[5], el[4], el[2], el[3], el[4], el[5]];
            sub.CopyTo(tris, 12 * e);
            corners[3 * e] = el[0]; corners[3 * e + 1] = el[1]; corners[3 * e + 2] = el[2];
        }
        var boundaries = mesh.Loops.Select(l =>
            (IReadOnlyList<Point2>)l.Geometry.Flatten(1e-4 * Math.Max(l.Geometry.Bounds.Diagonal, 1e-300))).ToList();
        var chains = BoundaryFluxRecovery.BoundaryChains(mesh).Select(c => c.SelectMany(e => new[] { e.A, e.Mid }).ToArray()).ToArray();
        return new SectionField((double[])mesh.X.Clone(), (double[])mesh.Y.Clone(), tris, (double[])sol.Phi.Clone(), sx, sy, boundaries, corners)
        {
            BoundaryNodeChains = chains,
        };
    }
}
