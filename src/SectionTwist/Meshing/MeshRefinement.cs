namespace SectionTwist.Meshing;

/// <summary>Uniform refinement of 6-node meshes (used for Richardson error estimates).</summary>
internal static class MeshRefinement
{
    /// <summary>
    /// Splits every element into four: the parent's six nodes become the corners of the children
    /// (v0, m01, m20), (m01, v1, m12), (m20, m12, v2), (m12, m20, m01). New mid-side nodes are the isoparametric
    /// images of the reference midpoints of the child edges (for straight parents these are plain midpoints);
    /// on boundary edges they lie on the curve at the quarter parameters.
    /// </summary>
    public static Mesh Uniform(Mesh m)
    {
        int ne = m.ElementCount, nn = m.NodeCount;
        var x = new List<double>(m.X); var y = new List<double>(m.Y);
        // each parent mid node owns the two half edges toward its end corners: (corner, new node)
        var halfCorner = new int[2 * nn]; var halfNode = new int[2 * nn];
        Array.Fill(halfCorner, -1);
        var onBoundary = new int[nn];
        Array.Fill(onBoundary, -1);
        for (int i = 0; i < m.BoundaryEdges.Length; i++) onBoundary[m.BoundaryEdges[i].Mid] = i;

        var el = new int[24 * ne];
        var region = new int[4 * ne];
        for (int e = 0; e < ne; e++)
        {
            int[] p = m.Elements[(6 * e)..(6 * e + 6)];
            // half-edge nodes: reference midpoints of the six half edges
            int HalfNode(int edge, int corner, double xi, double eta)
            {
                int mid = p[3 + edge], c = p[corner];
                for (int s = 0; s < 2; s++)
                    if (halfCorner[2 * mid + s] == c) return halfNode[2 * mid + s];
                int slot = halfCorner[2 * mid] < 0 ? 0 : 1;
                int id = x.Count;
                if (onBoundary[mid] >= 0)
                {
                    var be = m.BoundaryEdges[onBoundary[mid]];
                    double tm = 0.5 * (be.T0 + be.T1);
                    double t = c == be.A ? 0.5 * (be.T0 + tm) : 0.5 * (tm + be.T1);
                    var pt = be.Curve.PointAt(t);
                    x.Add(pt.X); y.Add(pt.Y);
                }
                else
                {
                    var (px, py) = Map(m, p, xi, eta);
                    x.Add(px); y.Add(py);
                }
                halfCorner[2 * mid + slot] = c; halfNode[2 * mid + slot] = id;
                return id;
            }
            int inner(double xi, double eta) { var (px, py) = Map(m, p, xi, eta); x.Add(px); y.Add(py); return x.Count - 1; }

            int h0a = HalfNode(0, 0, 0.25, 0), h0b = HalfNode(0, 1, 0.75, 0);
            int h1a = HalfNode(1, 1, 0.75, 0.25), h1b = HalfNode(1, 2, 0.25, 0.75);
            int h2a = HalfNode(2, 2, 0, 0.75), h2b = HalfNode(2, 0, 0, 0.25);
            // interior child edges: m01-m12, m12-m20, m20-m01
            int i0112 = inner(0.5, 0.25), i1220 = inner(0.25, 0.5), i2001 = inner(0.25, 0.25);
            int v0 = p[0], v1 = p[1], v2 = p[2], m01 = p[3], m12 = p[4], m20 = p[5];
            Span<int> kids =
            [
                v0, m01, m20, h0a, i2001, h2b,
                m01, v1, m12, h0b, h1a, i0112,
                m20, m12, v2, i1220, h1b, h2a,
                m12, m20, m01, i1220, i2001, i0112,
            ];
            kids.CopyTo(el.AsSpan(24 * e, 24));
            for (int k = 0; k < 4; k++) region[4 * e + k] = m.ElementRegion[e];
        }

        var edges = new List<MeshBoundaryEdge>(2 * m.BoundaryEdges.Length);
        foreach (var be in m.BoundaryEdges)
        {
            int qa = halfCorner[2 * be.Mid] == be.A ? halfNode[2 * be.Mid] : halfNode[2 * be.Mid + 1];
            int qb = halfCorner[2 * be.Mid] == be.B ? halfNode[2 * be.Mid] : halfNode[2 * be.Mid + 1];
            double tm = 0.5 * (be.T0 + be.T1);
            edges.Add(new MeshBoundaryEdge(be.A, qa, be.Mid, be.Loop, be.Curve, be.T0, tm));
            edges.Add(new MeshBoundaryEdge(be.Mid, qb, be.B, be.Loop, be.Curve, tm, be.T1));
        }
        return new Mesh(x.ToArray(), y.ToArray(), el, region, edges.ToArray(), m.Loops);
    }

    private static (double X, double Y) Map(Mesh m, ReadOnlySpan<int> p, double xi, double eta)
    {
        double l = 1 - xi - eta;
        Span<double> n = [l * (2 * l - 1), xi * (2 * xi - 1), eta * (2 * eta - 1), 4 * l * xi, 4 * xi * eta, 4 * eta * l];
        double px = 0, py = 0;
        for (int i = 0; i < 6; i++) { px += n[i] * m.X[p[i]]; py += n[i] * m.Y[p[i]]; }
        return (px, py);
    }
}
