using SectionTwist.Geometry;
using SectionTwist.Meshing;

namespace SectionTwist.Torsion;

/// <summary>
/// The elements near each corner of a mesh: <see cref="Layers"/> layers of elements around the corner vertex. Under
/// uniform refinement the error of the corner's singular part is largest in the elements at the corner and falls off
/// slowly with distance (like r^(2 lambda - 4) per ring of elements); eight layers hold nearly all of the part that
/// converges at the corner's order, the rest converges like the smooth solution.
/// </summary>
internal static class CornerZones
{
    /// <summary>Layers of elements around a corner that make its zone.</summary>
    public const int Layers = 8;

    /// <summary>
    /// The convergence order of J for each element: the lowest order of the corners whose zone it lies in, else
    /// <see cref="CornerAnalysis.SmoothOrder"/>.
    /// </summary>
    public static double[] ElementOrders(Mesh mesh, IReadOnlyList<CornerAnalysis.Corner> corners)
    {
        int ne = mesh.ElementCount;
        var order = new double[ne];
        Array.Fill(order, CornerAnalysis.SmoothOrder);
        var lowOrder = corners.Where(c => c.Order < CornerAnalysis.SmoothOrder).ToList();
        if (lowOrder.Count == 0) return order;
        // elements around each vertex (corner nodes 0..2 only), compressed
        int nn = mesh.NodeCount;
        var start = new int[nn + 1];
        for (int e = 0; e < ne; e++) for (int a = 0; a < 3; a++) start[mesh.Elements[6 * e + a] + 1]++;
        for (int i = 0; i < nn; i++) start[i + 1] += start[i];
        var fill = (int[])start.Clone();
        var adj = new int[start[nn]];
        for (int e = 0; e < ne; e++) for (int a = 0; a < 3; a++) adj[fill[mesh.Elements[6 * e + a]]++] = e;
        var finder = new BoundaryVertexFinder(mesh);
        var seenVertex = new int[nn];
        var seenElement = new int[ne];
        int stamp = 0;
        var front = new List<int>();
        var next = new List<int>();
        var zone = new List<int>();
        foreach (var c in lowOrder)
        {
            int node = finder.Nearest(c.Where);
            if (node < 0) continue;
            stamp++;
            front.Clear(); zone.Clear();
            front.Add(node);
            seenVertex[node] = stamp;
            for (int layer = 0; layer < Layers && front.Count > 0; layer++)
            {
                next.Clear();
                foreach (int v in front)
                    for (int k = start[v]; k < start[v + 1]; k++)
                    {
                        int e = adj[k];
                        if (seenElement[e] == stamp) continue;
                        seenElement[e] = stamp;
                        zone.Add(e);
                        for (int a = 0; a < 3; a++)
                        {
                            int w = mesh.Elements[6 * e + a];
                            if (seenVertex[w] != stamp) { seenVertex[w] = stamp; next.Add(w); }
                        }
                    }
                (front, next) = (next, front);
            }
            foreach (int e in zone) order[e] = Math.Min(order[e], c.Order);
        }
        return order;
    }

    /// <summary>Nearest boundary vertex to a point, from a bucket grid over the boundary edges' end nodes.</summary>
    private sealed class BoundaryVertexFinder
    {
        private readonly Mesh _mesh;
        private readonly Dictionary<(long, long), List<int>> _cells = [];
        private readonly double _cell;

        public BoundaryVertexFinder(Mesh mesh)
        {
            _mesh = mesh;
            double sum = 0;
            foreach (var be in mesh.BoundaryEdges) sum += Point2.Distance(mesh.Node(be.A), mesh.Node(be.B));
            _cell = Math.Max(sum / Math.Max(1, mesh.BoundaryEdges.Length), double.Epsilon);
            foreach (var be in mesh.BoundaryEdges)
            {
                var key = Key(mesh.Node(be.A));
                if (!_cells.TryGetValue(key, out var list)) _cells[key] = list = [];
                list.Add(be.A);
            }
        }

        private (long, long) Key(Point2 p) => ((long)Math.Floor(p.X / _cell), (long)Math.Floor(p.Y / _cell));

        /// <summary>The boundary vertex nearest <paramref name="p"/> within one cell, or -1.</summary>
        public int Nearest(Point2 p)
        {
            var (kx, ky) = Key(p);
            int best = -1;
            double bestD = double.PositiveInfinity;
            for (long i = kx - 1; i <= kx + 1; i++)
                for (long j = ky - 1; j <= ky + 1; j++)
                {
                    if (!_cells.TryGetValue((i, j), out var list)) continue;
                    foreach (int v in list)
                    {
                        double dd = Point2.Distance(p, _mesh.Node(v));
                        if (dd < bestD) { bestD = dd; best = v; }
                    }
                }
            return bestD <= _cell ? best : -1;
        }
    }
}
