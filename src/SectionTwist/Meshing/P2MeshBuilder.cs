using SectionTwist.Geometry;

namespace SectionTwist.Meshing;

/// <summary>
/// Turns the refined triangulation into the 6-node <see cref="Mesh"/>: domain triangles in Hilbert order of their
/// centroids, nodes numbered in the order the elements first touch them (good locality for the sparse solver),
/// interior mid-side nodes at edge midpoints, boundary mid-side nodes on the true curve at the parameter midpoint.
/// </summary>
internal static class P2MeshBuilder
{
    public static Mesh Build(DelaunayRefiner r, out List<int> invertedChords)
    {
        var T = r.T;
        var b = Box2.Empty;
        int ne = 0;
        for (int t = 0; t < T.TriangleCount; t++) if (T.Reg[t] >= 0) ne++;
        var order = new int[ne];
        var keys = new uint[ne];
        for (int t = 0, k = 0; t < T.TriangleCount; t++)
            if (T.Reg[t] >= 0) { order[k++] = t; b = b.Include(T.Node(T.V[3 * t])); }
        double size = Math.Max(b.Width, b.Height);
        for (int k = 0; k < ne; k++)
        {
            int t = order[k];
            double cx = (T.X[T.V[3 * t]] + T.X[T.V[3 * t + 1]] + T.X[T.V[3 * t + 2]]) / 3;
            double cy = (T.Y[T.V[3 * t]] + T.Y[T.V[3 * t + 1]] + T.Y[T.V[3 * t + 2]]) / 3;
            keys[k] = HilbertCurve.Key(cx, cy, b.MinX, b.MinY, size);
        }
        Array.Sort(keys, order);

        var nodeOf = new int[T.VertexCount];
        Array.Fill(nodeOf, -1);
        var midOf = new int[3 * T.TriangleCount];
        Array.Fill(midOf, -1);
        var xs = new List<double>(4 * ne); var ys = new List<double>(4 * ne);
        var elements = new int[6 * ne];
        var region = new int[ne];
        var boundary = new List<(MeshBoundaryEdge Edge, int Curve, int Chord)>();
        var interfaces = new List<(MeshBoundaryEdge Edge, int Curve, int Chord)>();
        ReadOnlySpan<int> midEdge = [2, 0, 1]; // mid-sides of edges 01, 12, 20 lie opposite vertices 2, 0, 1
        for (int k = 0; k < ne; k++)
        {
            int t = order[k];
            region[k] = T.Reg[t];
            for (int i = 0; i < 3; i++)
            {
                int v = T.V[3 * t + i];
                if (nodeOf[v] < 0) { nodeOf[v] = xs.Count; xs.Add(T.X[v]); ys.Add(T.Y[v]); }
                elements[6 * k + i] = nodeOf[v];
            }
            for (int i = 0; i < 3; i++)
            {
                int code = 3 * t + midEdge[i];
                if (midOf[code] < 0)
                {
                    int s = T.Seg[code];
                    int id = xs.Count;
                    if (s >= 0)
                    {
                        double tm = 0.5 * (r.ChT0[s] + r.ChT1[s]);
                        Point2 p = r.Curve[r.ChCurve[s]].PointAt(tm);
                        xs.Add(p.X); ys.Add(p.Y);
                        (r.Loops[r.LoopOfChord(s)].IsInterface ? interfaces : boundary).Add((new MeshBoundaryEdge(nodeOf[r.ChA[s]], id, nodeOf[r.ChB[s]], r.LoopOfChord(s),
                            r.Curve[r.ChCurve[s]], r.ChT0[s], r.ChT1[s]), r.ChCurve[s], s));
                    }
                    else
                    {
                        int a = T.V[3 * t + Triangulation.Next(midEdge[i])], c = T.V[3 * t + Triangulation.Prev(midEdge[i])];
                        xs.Add(0.5 * (T.X[a] + T.X[c])); ys.Add(0.5 * (T.Y[a] + T.Y[c]));
                    }
                    midOf[code] = id;
                    if (T.N[code] >= 0) midOf[T.N[code]] = id;
                }
                elements[6 * k + 3 + i] = midOf[code];
            }
        }
        boundary.Sort((p, q) => p.Curve != q.Curve ? p.Curve.CompareTo(q.Curve) : p.Edge.T0.CompareTo(q.Edge.T0));

        double[] x = xs.ToArray(), y = ys.ToArray();
        invertedChords = [];
        var curvedMid = new bool[x.Length];
        var chordOfMid = new Dictionary<int, int>();
        foreach (var (e, cv, s) in boundary.Concat(interfaces))
            if (r.Curve[cv] is not LineSegment) { curvedMid[e.Mid] = true; chordOfMid[e.Mid] = s; }
        for (int k = 0; k < ne; k++)
        {
            bool curved = curvedMid[elements[6 * k + 3]] || curvedMid[elements[6 * k + 4]] || curvedMid[elements[6 * k + 5]];
            if (!curved || MeshQuality.JacobianCertainlyPositive(x, y, elements.AsSpan(6 * k, 6))) continue;
            for (int i = 3; i < 6; i++)
                if (chordOfMid.TryGetValue(elements[6 * k + i], out int s)) invertedChords.Add(s);
        }
        var loops = r.Loops.Where(l => !l.IsInterface).ToArray(); // interface loops come last: boundary loop numbers unchanged
        var (zone, samples) = Zones(T, order, x, y, elements);
        return new Mesh(x, y, elements, region, boundary.Select(p => p.Edge).ToArray(), loops)
        {
            ElementZone = zone, ZoneSample = samples, InterfaceEdges = interfaces.Select(p => p.Edge).ToArray(),
        };
    }

    /// <summary>Floods the domain triangles without crossing a constrained edge: one zone per piece between interfaces.</summary>
    private static (int[] Zone, Point2[] Samples) Zones(Triangulation T, int[] order, double[] x, double[] y, int[] elements)
    {
        int ne = order.Length;
        var elementOf = new int[T.TriangleCount];
        Array.Fill(elementOf, -1);
        for (int k = 0; k < ne; k++) elementOf[order[k]] = k;
        var zone = new int[ne];
        Array.Fill(zone, -1);
        var samples = new List<Point2>();
        var best = new List<double>();
        var stack = new Stack<int>();
        for (int k0 = 0; k0 < ne; k0++)
        {
            if (zone[k0] >= 0) continue;
            int z = samples.Count;
            samples.Add(default); best.Add(-1);
            zone[k0] = z; stack.Push(k0);
            while (stack.Count > 0)
            {
                int k = stack.Pop();
                int a = elements[6 * k], b = elements[6 * k + 1], c = elements[6 * k + 2];
                double area = (x[b] - x[a]) * (y[c] - y[a]) - (y[b] - y[a]) * (x[c] - x[a]);
                if (area > best[z]) { best[z] = area; samples[z] = new Point2((x[a] + x[b] + x[c]) / 3, (y[a] + y[b] + y[c]) / 3); }
                int t = order[k];
                for (int i = 0; i < 3; i++)
                {
                    int code = 3 * t + i;
                    if (T.Seg[code] >= 0 || T.N[code] < 0) continue;
                    int kn = elementOf[T.N[code] / 3];
                    if (kn < 0 || zone[kn] >= 0) continue;
                    zone[kn] = z; stack.Push(kn);
                }
            }
        }
        return (zone, samples.ToArray());
    }
}
