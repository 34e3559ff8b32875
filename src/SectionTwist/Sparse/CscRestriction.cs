namespace SectionTwist.Sparse;

/// <summary>
/// Restriction of an assembled matrix to a subset of its unknowns, with unknowns merged where several map to one:
/// B = P' A P for the 0/1 map P (node i to unknown map[i], or dropped when map[i] &lt; 0). This is how a finite-element
/// matrix assembled once over all nodes gives the systems of different boundary conditions (Dirichlet nodes dropped,
/// nodes of a constant-valued boundary merged into one unknown, one node fixed for a Neumann problem) without a second
/// assembly (the direct-stiffness method; Zienkiewicz and Taylor, The Finite Element Method, vol. 1, 5th ed., ch. 1).
/// </summary>
internal static class CscRestriction
{
    /// <summary>
    /// P' A P with <paramref name="n"/> unknowns: entry (map[r], map[c]) collects A(r, c) for every kept pair; rows sorted
    /// within each column, duplicates summed.
    /// </summary>
    public static CscMatrix Restrict(CscMatrix a, int[] map, int n, CancellationToken ct = default)
    {
        int na = a.N;
        if (map.Length != na) throw new ArgumentException("map length differs from the matrix order", nameof(map));
        if (KeepsOrder(map, n)) return Drop(a, map, n, ct);
        // columns of B gather the columns of A that map to them: count A's nodes per unknown first
        var start = new int[n + 1];
        for (int c = 0; c < na; c++) if (map[c] >= 0) start[map[c] + 1]++;
        for (int j = 0; j < n; j++) start[j + 1] += start[j];
        var members = new int[start[n]];
        var fill = (int[])start.Clone();
        for (int c = 0; c < na; c++) if (map[c] >= 0) members[fill[map[c]]++] = c;

        var colPtr = new int[n + 1];
        var rows = new int[a.NonZeros];
        var vals = new double[a.NonZeros];
        int w = 0;
        var slot = new int[n];
        Array.Fill(slot, -1);
        var touched = new List<int>();
        for (int j = 0; j < n; j++)
        {
            if ((j & 4095) == 0) ct.ThrowIfCancellationRequested();
            colPtr[j] = w;
            bool merged = start[j + 1] - start[j] > 1;
            for (int m = start[j]; m < start[j + 1]; m++)
            {
                int c = members[m];
                for (int p = a.ColPtr[c]; p < a.ColPtr[c + 1]; p++)
                {
                    int r = map[a.RowIdx[p]];
                    if (r < 0) continue;
                    if (slot[r] >= 0) { vals[slot[r]] += a.Values[p]; continue; }
                    slot[r] = w;
                    rows[w] = r;
                    vals[w++] = a.Values[p];
                    touched.Add(r);
                }
            }
            // rows arrive sorted from one column of A when the map keeps the order of the rows it keeps; sort otherwise
            int s = colPtr[j], e = w;
            if (merged || !Sorted(rows, s, e)) Array.Sort(rows, vals, s, e - s);
            foreach (int r in touched) slot[r] = -1;
            touched.Clear();
        }
        colPtr[n] = w;
        Array.Resize(ref rows, w);
        Array.Resize(ref vals, w);
        return new CscMatrix(n, colPtr, rows, vals);
    }

    /// <summary>
    /// True when every unknown of <paramref name="map"/> is one node (nothing merged): the restriction is then a
    /// principal submatrix, which <see cref="SymbolicCholesky.AnalyzeRestricted"/> analyses without forming it.
    /// </summary>
    public static bool OneToOne(int[] map, int n)
    {
        var seen = new bool[n];
        int count = 0;
        foreach (int u in map)
        {
            if (u < 0) continue;
            if (u >= n || seen[u]) return false;
            seen[u] = true;
            count++;
        }
        return count == n;
    }

    /// <summary>
    /// True when <paramref name="map"/> numbers the nodes it keeps 0, 1, ..., n - 1 in node order (no merged nodes): the
    /// restriction then only drops rows and columns.
    /// </summary>
    private static bool KeepsOrder(int[] map, int n)
    {
        int next = 0;
        foreach (int u in map)
        {
            if (u < 0) continue;
            if (u != next) return false;
            next++;
        }
        return next == n;
    }

    /// <summary>
    /// P' A P for a map that keeps the order of the nodes it keeps: each kept column of A is copied without its dropped
    /// rows and with its rows renumbered, which keeps them sorted; no entries are summed.
    /// </summary>
    private static CscMatrix Drop(CscMatrix a, int[] map, int n, CancellationToken ct)
    {
        int na = a.N;
        int[] cp = a.ColPtr, ri = a.RowIdx;
        double[] av = a.Values;
        var colPtr = new int[n + 1];
        int nz = 0;
        for (int c = 0; c < na; c++)
        {
            if (map[c] < 0) continue;
            for (int p = cp[c]; p < cp[c + 1]; p++) if (map[ri[p]] >= 0) nz++;
        }
        var rows = new int[nz];
        var vals = new double[nz];
        int w = 0;
        for (int c = 0; c < na; c++)
        {
            int j = map[c];
            if (j < 0) continue;
            if ((j & 4095) == 0) ct.ThrowIfCancellationRequested();
            colPtr[j] = w;
            for (int p = cp[c]; p < cp[c + 1]; p++)
            {
                int r = map[ri[p]];
                if (r < 0) continue;
                rows[w] = r;
                vals[w++] = av[p];
            }
        }
        colPtr[n] = w;
        return new CscMatrix(n, colPtr, rows, vals);
    }

    /// <summary>
    /// The order <paramref name="perm"/> of all nodes restricted to the unknowns of <paramref name="map"/>: dropped nodes
    /// leave it, and an unknown shared by several nodes takes the place of the last of them (it is eliminated once all
    /// of them could be).
    /// </summary>
    public static int[] RestrictOrder(int[] perm, int[] map, int n)
    {
        var order = new int[n];
        var seen = new bool[n];
        int k = n;
        for (int q = perm.Length - 1; q >= 0; q--)
        {
            int u = map[perm[q]];
            if (u < 0 || seen[u]) continue;
            seen[u] = true;
            order[--k] = u;
        }
        if (k != 0) throw new ArgumentException("the map leaves unknowns without a node", nameof(map));
        return order;
    }

    private static bool Sorted(int[] rows, int s, int e)
    {
        for (int p = s + 1; p < e; p++) if (rows[p - 1] > rows[p]) return false;
        return true;
    }
}
