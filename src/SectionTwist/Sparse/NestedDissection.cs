namespace SectionTwist.Sparse;

/// <summary>
/// Nested dissection ordering (George, "Nested dissection of a regular finite element mesh", SIAM J. Numer. Anal.
/// 10(2), 1973): split the graph in two, number both halves recursively and the vertex separator last. The split is
/// geometric when node coordinates are given (median along the longer extent; the separator is the set of vertices of
/// one side adjacent across the cut), otherwise the middle level of a breadth-first level structure rooted at a
/// pseudo-peripheral node (Gibbs, Poole and Stockmeyer 1976; George and Liu 1981, ch. 4). Leaves of at most
/// <see cref="LeafSize"/> nodes are ordered by <see cref="Amd"/> on their induced subgraph.
/// </summary>
internal static class NestedDissection
{
    /// <summary>Subgraphs at or below this size are ordered by AMD.</summary>
    public const int LeafSize = 2000;

    /// <summary>Returns p (new k holds old p[k]) for the symmetric pattern of <paramref name="a"/>.</summary>
    public static int[] Order(CscMatrix a, double[]? coordinates, CancellationToken ct = default)
    {
        int n = a.N;
        if (coordinates is not null && coordinates.Length < 2 * n)
            throw new ArgumentException("need two coordinates per unknown", nameof(coordinates));
        var st = new State(a, coordinates, ct);
        var all = new int[n];
        for (int i = 0; i < n; i++) all[i] = i;
        st.Dissect(all);
        return [.. st.Output];
    }

    private sealed class State(CscMatrix a, double[]? xy, CancellationToken ct)
    {
        public readonly List<int> Output = new(a.N);
        private readonly int[] _set = new int[a.N];
        private readonly int[] _level = new int[a.N];
        private readonly int[] _local = new int[a.N];
        private int _label;

        public void Dissect(int[] nodes)
        {
            ct.ThrowIfCancellationRequested();
            if (nodes.Length <= LeafSize) { Leaf(nodes); return; }
            int lab = ++_label;
            foreach (int v in nodes) _set[v] = lab;
            var side = xy is not null ? GeometricSides(nodes) : LevelSides(nodes, lab);
            // side[i]: 0 left, 1 right; right vertices with a left neighbour form the separator
            int[] ci = a.RowIdx, cp = a.ColPtr;
            var left = new List<int>(); var right = new List<int>(); var sep = new List<int>();
            for (int t = 0; t < nodes.Length; t++) _local[nodes[t]] = t;
            for (int t = 0; t < nodes.Length; t++)
            {
                int v = nodes[t];
                if (side[t] == 0) { left.Add(v); continue; }
                bool touches = false;
                for (int p = cp[v]; p < cp[v + 1] && !touches; p++)
                {
                    int u = ci[p];
                    if (_set[u] == lab && side[_local[u]] == 0) touches = true;
                }
                (touches ? sep : right).Add(v);
            }
            if (left.Count == 0 || right.Count == 0) { Leaf(nodes); return; }
            Dissect([.. left]);
            Dissect([.. right]);
            Output.AddRange(sep);
        }

        private byte[] GeometricSides(int[] nodes)
        {
            double x0 = double.MaxValue, x1 = double.MinValue, y0 = double.MaxValue, y1 = double.MinValue;
            foreach (int v in nodes)
            {
                x0 = Math.Min(x0, xy![2 * v]); x1 = Math.Max(x1, xy[2 * v]);
                y0 = Math.Min(y0, xy[2 * v + 1]); y1 = Math.Max(y1, xy[2 * v + 1]);
            }
            int axis = x1 - x0 >= y1 - y0 ? 0 : 1;
            var keys = new double[nodes.Length];
            for (int t = 0; t < nodes.Length; t++) keys[t] = xy![2 * nodes[t] + axis];
            var sorted = (double[])keys.Clone();
            Array.Sort(sorted);
            double median = sorted[sorted.Length / 2];
            var side = new byte[nodes.Length];
            for (int t = 0; t < nodes.Length; t++) side[t] = keys[t] < median ? (byte)0 : (byte)1;
            return side;
        }

        private byte[] LevelSides(int[] nodes, int lab)
        {
            int root = nodes[0], depth = 0;
            // pseudo-peripheral node: repeat BFS from the last level until the depth stops growing
            for (int it = 0; it < 5; it++)
            {
                var (d, far) = Bfs(root, lab);
                if (d <= depth) break;
                depth = d; root = far;
            }
            Bfs(root, lab);
            int mid = depth / 2;
            var side = new byte[nodes.Length];
            for (int t = 0; t < nodes.Length; t++) side[t] = _level[nodes[t]] < mid || _level[nodes[t]] < 0 ? (byte)0 : (byte)1;
            return side;
        }

        private (int Depth, int Far) Bfs(int root, int lab)
        {
            int[] ci = a.RowIdx, cp = a.ColPtr;
            var queue = new Queue<int>();
            var seen = new HashSet<int> { root };
            _level[root] = 0;
            queue.Enqueue(root);
            int far = root;
            while (queue.Count > 0)
            {
                int v = queue.Dequeue();
                far = v;
                for (int p = cp[v]; p < cp[v + 1]; p++)
                {
                    int u = ci[p];
                    if (_set[u] != lab || !seen.Add(u)) continue;
                    _level[u] = _level[v] + 1;
                    queue.Enqueue(u);
                }
            }
            return (_level[far], far);
        }

        private void Leaf(int[] nodes)
        {
            int m = nodes.Length;
            int lab = ++_label;
            for (int t = 0; t < m; t++) { _set[nodes[t]] = lab; _local[nodes[t]] = t; }
            var sp = new int[m + 1];
            var si = new List<int>(m * 8);
            int[] ci = a.RowIdx, cp = a.ColPtr;
            for (int t = 0; t < m; t++)
            {
                int v = nodes[t];
                for (int p = cp[v]; p < cp[v + 1]; p++) if (_set[ci[p]] == lab) si.Add(_local[ci[p]]);
                sp[t + 1] = si.Count;
            }
            var order = Amd.Order(m, sp, [.. si], ct);
            foreach (int t in order) Output.Add(nodes[t]);
        }
    }
}
