namespace SectionTwist.Sparse;

/// <summary>
/// Supernode partition of a postordered Cholesky factor: fundamental supernodes (consecutive columns j, j+1 with
/// parent(j) = j+1, j+1 having one child and equal structure below), then relaxed amalgamation of a child into its
/// parent when the added explicit zeros stay small (Ashcraft and Grimes, "The influence of relaxed supernode
/// partitions on the multifrontal method", ACM TOMS 15(4), 1989), with the row structure of every supernode.
/// </summary>
internal sealed class Supernodes
{
    private Supernodes() { }

    /// <summary>Number of supernodes.</summary>
    public int Count { get; private init; }

    /// <summary>First column of each supernode; Start[Count] = n.</summary>
    public int[] Start { get; private init; } = [];

    /// <summary>Offsets of each supernode's row list in <see cref="Rows"/>.</summary>
    public long[] RowPtr { get; private init; } = [];

    /// <summary>Row indices of each supernode (its own columns first, ascending).</summary>
    public int[] Rows { get; private init; } = [];

    /// <summary>Offsets of each supernode's dense column-major block (rows x columns) in the value array.</summary>
    public long[] ValuePtr { get; private init; } = [];

    /// <summary>Supernode containing each column.</summary>
    public int[] ColumnToSuper { get; private init; } = [];

    /// <summary>Parent supernode, -1 for a root.</summary>
    public int[] Parent { get; private init; } = [];

    /// <summary>Largest rows x columns of an update block (workspace size).</summary>
    public long MaxUpdate { get; private init; }

    /// <summary>Largest number of rows of a supernode.</summary>
    public int MaxRows { get; private init; }

    /// <summary>Builds the partition from a postordered analysis.</summary>
    public static Supernodes Build(SymbolicCholesky s)
    {
        int n = s.N;
        int[] parent = s.Parent;
        var count = new int[n];
        for (int j = 0; j < n; j++) count[j] = (int)(s.Lp[j + 1] - s.Lp[j]);
        var nchild = new int[n];
        for (int j = 0; j < n; j++) if (parent[j] >= 0) nchild[parent[j]]++;
        // fundamental supernodes
        var fstart = new List<int>();
        for (int j = 0; j < n; j++)
        {
            bool join = j > 0 && parent[j - 1] == j && count[j - 1] == count[j] + 1 && nchild[j] == 1;
            if (!join) fstart.Add(j);
        }
        int ns = fstart.Count;
        fstart.Add(n);
        var colToF = new int[n];
        for (int k = 0; k < ns; k++) for (int j = fstart[k]; j < fstart[k + 1]; j++) colToF[j] = k;
        var fparent = new int[ns];
        for (int k = 0; k < ns; k++)
        {
            int last = fstart[k + 1] - 1;
            fparent[k] = parent[last] < 0 ? -1 : colToF[parent[last]];
        }
        // relaxed amalgamation, children merged into the group that starts right after them
        var ncols = new long[ns];
        var nrows = new long[ns];
        var zeros = new double[ns];
        for (int k = 0; k < ns; k++) { ncols[k] = fstart[k + 1] - fstart[k]; nrows[k] = count[fstart[k]]; }
        var groupEnd = new int[ns]; // last fundamental supernode of the group starting at k
        var merged = new bool[ns];  // k merged into the group of k+1
        for (int k = ns - 1; k >= 0; k--)
        {
            groupEnd[k] = k;
            if (k == ns - 1) continue;
            int g = k + 1, ge = groupEnd[g];
            int p = fparent[k];
            if (p < g || p > ge) continue;
            long tc = ncols[k] + ncols[g];
            long tr = nrows[g] + ncols[k];
            double lnzK = ncols[k] * (ncols[k] + 1) / 2.0 + ncols[k] * (double)(nrows[k] - ncols[k]);
            double lnzG = ncols[g] * (ncols[g] + 1) / 2.0 + ncols[g] * (double)(nrows[g] - ncols[g]);
            double lnzM = tc * (tc + 1) / 2.0 + tc * (double)(tr - tc);
            double z = zeros[k] + zeros[g] + (lnzM - lnzK - lnzG);
            double frac = z / lnzM;
            bool ok = tc <= 4 || (tc <= 16 && frac < 0.8) || (tc <= 48 && frac < 0.1) || frac < 0.05;
            if (!ok || tc > 192) continue;
            merged[k] = true;
            groupEnd[k] = ge;
            ncols[k] = tc; nrows[k] = tr; zeros[k] = z;
        }
        var start = new List<int>();
        for (int k = 0; k < ns;)
        {
            start.Add(fstart[k]);
            k = groupEnd[k] + 1;
        }
        int nsup = start.Count;
        start.Add(n);
        var colToSuper = new int[n];
        for (int k = 0; k < nsup; k++) for (int j = start[k]; j < start[k + 1]; j++) colToSuper[j] = k;
        var sparent = new int[nsup];
        for (int k = 0; k < nsup; k++)
        {
            int last = start[k + 1] - 1;
            sparent[k] = parent[last] < 0 ? -1 : colToSuper[parent[last]];
        }
        // row structure: own columns, rows of A below, and children's rows below
        var childHead = new int[nsup];
        var childNext = new int[nsup];
        Array.Fill(childHead, -1);
        for (int k = nsup - 1; k >= 0; k--)
            if (sparent[k] >= 0) { childNext[k] = childHead[sparent[k]]; childHead[sparent[k]] = k; }
        var rowPtr = new long[nsup + 1];
        var rows = new List<int>(n * 4);
        var mark = new int[n];
        Array.Fill(mark, -1);
        var tmp = new List<int>();
        int[] fp = s.Fp, fi = s.Fi;
        for (int k = 0; k < nsup; k++)
        {
            int f = start[k], l = start[k + 1];
            tmp.Clear();
            for (int j = f; j < l; j++)
                for (int p = fp[j + 1] - 1; p >= fp[j] && fi[p] >= l; p--)
                    if (mark[fi[p]] != k) { mark[fi[p]] = k; tmp.Add(fi[p]); }
            for (int c = childHead[k]; c >= 0; c = childNext[c])
                for (long p = rowPtr[c]; p < rowPtr[c + 1]; p++)
                {
                    int r = rows[(int)p];
                    if (r >= l && mark[r] != k) { mark[r] = k; tmp.Add(r); }
                }
            tmp.Sort();
            rowPtr[k] = rows.Count;
            for (int j = f; j < l; j++) rows.Add(j);
            rows.AddRange(tmp);
            rowPtr[k + 1] = rows.Count;
        }
        var valuePtr = new long[nsup + 1];
        long maxUpd = 0;
        int maxRows = 0;
        for (int k = 0; k < nsup; k++)
        {
            long nr = rowPtr[k + 1] - rowPtr[k], nc = start[k + 1] - start[k];
            valuePtr[k + 1] = valuePtr[k] + nr * nc;
            maxUpd = Math.Max(maxUpd, (nr - nc) * (nr - nc));
            maxRows = Math.Max(maxRows, (int)nr);
        }
        return new Supernodes
        {
            Count = nsup, Start = [.. start], RowPtr = rowPtr, Rows = [.. rows], ValuePtr = valuePtr,
            ColumnToSuper = colToSuper, Parent = sparent, MaxUpdate = Math.Max(maxUpd, 1), MaxRows = maxRows,
        };
    }
}
