namespace SectionTwist.Sparse;

/// <summary>Fill-reducing ordering choice for <see cref="SymbolicCholesky.Analyze"/>.</summary>
internal enum FillOrdering
{
    /// <summary>AMD below a size threshold, nested dissection above it.</summary>
    Auto,
    /// <summary>No reordering (for tests and comparisons).</summary>
    Natural,
    /// <summary>Approximate minimum degree (<see cref="Amd"/>).</summary>
    Amd,
    /// <summary>Nested dissection (<see cref="NestedDissection"/>).</summary>
    NestedDissection,
}

/// <summary>
/// Symbolic Cholesky analysis of a symmetric pattern, separate from the numeric factorization so that it can be reused
/// for every matrix with the same pattern (Davis, Direct Methods for Sparse Linear Systems, SIAM 2006, ch. 4):
/// fill-reducing ordering composed with the elimination-tree postorder, the permuted matrix pattern with a map back to
/// the original entries, elimination tree, column counts and the supernode partition.
/// </summary>
internal sealed class SymbolicCholesky
{
    private SymbolicCholesky() { }

    /// <summary>Order of the matrix.</summary>
    public int N { get; private init; }

    /// <summary>Perm[k] = original index of the k-th pivot.</summary>
    public int[] Perm { get; private init; } = [];

    /// <summary>Column pointers of the permuted matrix P A P' (full symmetric storage, rows sorted).</summary>
    public int[] Fp { get; private init; } = [];

    /// <summary>Row indices of the permuted matrix.</summary>
    public int[] Fi { get; private init; } = [];

    /// <summary>For each permuted entry, the index of the same entry in the original matrix's values.</summary>
    public int[] ValueMap { get; private init; } = [];

    /// <summary>Elimination tree of the permuted matrix (postordered: parent[j] &gt; j).</summary>
    public int[] Parent { get; private init; } = [];

    /// <summary>Column pointers of L (simplicial layout), from the column counts.</summary>
    public long[] Lp { get; private init; } = [];

    /// <summary>Nonzeros of L including the diagonal.</summary>
    public long NonZerosL => Lp[N];

    /// <summary>Floating-point operations of the factorization, sum of count^2 over columns.</summary>
    public double Flops { get; private init; }

    /// <summary>Nonzero count of the original matrix this analysis expects.</summary>
    public int NonZerosA { get; private init; }

    /// <summary>
    /// Order of the matrix whose values <see cref="ValueMap"/> indexes: <see cref="N"/>, or the order of the larger matrix
    /// a <see cref="AnalyzeRestricted"/> analysis reads its submatrix from.
    /// </summary>
    public int SourceN { get; private init; }

    /// <summary>Supernode partition for the supernodal factorization (built on first use).</summary>
    public Supernodes Supernodes => _supernodes ??= Supernodes.Build(this);

    private Supernodes? _supernodes;

    /// <summary>Size above which <see cref="FillOrdering.Auto"/> picks nested dissection.</summary>
    public const int NestedDissectionThreshold = 60_000;

    /// <summary>Analyses the pattern of <paramref name="a"/> (full symmetric storage, sorted rows).</summary>
    /// <param name="a">The matrix; only its pattern is used.</param>
    /// <param name="ordering">Fill-reducing ordering.</param>
    /// <param name="coordinates">Optional node coordinates (x0, y0, x1, y1, ...) for geometric nested dissection.</param>
    /// <param name="ct">Cancellation.</param>
    public static SymbolicCholesky Analyze(CscMatrix a, FillOrdering ordering = FillOrdering.Auto,
        double[]? coordinates = null, CancellationToken ct = default)
    {
        int n = a.N;
        if (ordering == FillOrdering.Auto)
            ordering = n > NestedDissectionThreshold ? FillOrdering.NestedDissection : FillOrdering.Amd;
        int[] perm = ordering switch
        {
            FillOrdering.Natural => Identity(n),
            FillOrdering.Amd => Amd.Order(a, ct),
            _ => NestedDissection.Order(a, coordinates, ct),
        };
        return AnalyzeOrdered(a, perm, ct);
    }

    /// <summary>
    /// Analyses the pattern of <paramref name="a"/> with a given fill-reducing order (<paramref name="perm"/>[k] =
    /// original index of the k-th pivot), e.g. the restriction of an order computed once for a larger matrix
    /// (<see cref="CscRestriction.RestrictOrder"/>). The order is composed with the elimination-tree postorder.
    /// </summary>
    public static SymbolicCholesky AnalyzeOrdered(CscMatrix a, int[] perm, CancellationToken ct = default)
    {
        if (perm.Length != a.N) throw new ArgumentException("order length differs from the matrix order", nameof(perm));
        return AnalyzeCore(a, perm, null, null, ct);
    }

    /// <summary>
    /// Analyses the principal submatrix P' A P of <paramref name="a"/> that keeps the nodes with
    /// <paramref name="map"/>[i] &gt;= 0 as unknowns map[i] (each unknown one node: no merged nodes), in the order
    /// <paramref name="perm"/> of its unknowns, without forming the submatrix: <see cref="ValueMap"/> indexes the values
    /// of <paramref name="a"/>, and the numeric factorization is given <paramref name="a"/> itself. The same analysis as
    /// <see cref="AnalyzeOrdered"/> of <see cref="CscRestriction.Restrict"/>(a, map, n) (same tree, counts and order).
    /// </summary>
    public static SymbolicCholesky AnalyzeRestricted(CscMatrix a, int[] map, int n, int[] perm, CancellationToken ct = default)
    {
        if (map.Length != a.N) throw new ArgumentException("map length differs from the matrix order", nameof(map));
        if (perm.Length != n) throw new ArgumentException("order length differs from the number of unknowns", nameof(perm));
        var node = new int[n];
        Array.Fill(node, -1);
        for (int i = 0; i < map.Length; i++)
        {
            int u = map[i];
            if (u < 0) continue;
            if (node[u] >= 0) throw new ArgumentException("the map merges nodes", nameof(map));
            node[u] = i;
        }
        if (Array.IndexOf(node, -1) >= 0) throw new ArgumentException("the map leaves unknowns without a node", nameof(map));
        return AnalyzeCore(a, perm, map, node, ct);
    }

    /// <summary>
    /// The analysis of the unknowns <paramref name="perm"/> (in pivot order) of <paramref name="a"/>: all of its rows and
    /// columns when <paramref name="map"/> is null, else the nodes <paramref name="node"/> of the unknowns of
    /// <paramref name="map"/>.
    /// </summary>
    private static SymbolicCholesky AnalyzeCore(CscMatrix a, int[] perm, int[]? map, int[]? node, CancellationToken ct)
    {
        int n = perm.Length;
        ct.ThrowIfCancellationRequested();
        // tree of the given order read from A, its postorder composed into the order and the tree relabelled (a
        // postorder is an equivalent order: same tree and fill, Davis sec. 4.3), then P A P' formed once
        var pinv = new int[n];
        for (int k = 0; k < n; k++) pinv[perm[k]] = k;
        var parent = EliminationTree.ParentsPermuted(a, Columns(perm, node), Ranks(pinv, map));
        var post = EliminationTree.Postorder(parent);
        if (!IsIdentity(post))
        {
            var p2 = new int[n];
            var postInv = pinv; // reused: the inverse order is not needed again
            for (int k = 0; k < n; k++) { p2[k] = perm[post[k]]; postInv[post[k]] = k; }
            var parent2 = new int[n];
            for (int k = 0; k < n; k++) { int q = parent[post[k]]; parent2[k] = q < 0 ? -1 : postInv[q]; }
            perm = p2; parent = parent2;
            post = Identity(n);
        }
        var (fp, fi, valueMap) = Permute(a, perm, map, node);
        ct.ThrowIfCancellationRequested();
        var counts = EliminationTree.ColumnCounts(n, fp, fi, parent, post);
        var lp = new long[n + 1];
        double flops = 0;
        for (int j = 0; j < n; j++) { lp[j + 1] = lp[j] + counts[j]; flops += (double)counts[j] * counts[j]; }
        return new SymbolicCholesky
        {
            N = n, Perm = perm, Fp = fp, Fi = fi, ValueMap = valueMap, Parent = parent, Lp = lp, Flops = flops,
            NonZerosA = a.NonZeros, SourceN = a.N,
        };
    }

    /// <summary>Values of P A P' in the layout of <see cref="Fp"/>/<see cref="Fi"/>.</summary>
    public double[] PermutedValues(CscMatrix a)
    {
        if (a.N != SourceN || a.NonZeros != NonZerosA)
            throw new ArgumentException("matrix pattern differs from the analysed pattern", nameof(a));
        var fx = new double[ValueMap.Length];
        var av = a.Values;
        for (int q = 0; q < fx.Length; q++) fx[q] = av[ValueMap[q]];
        return fx;
    }

    /// <summary>
    /// Builds the pattern of P A P' with rows sorted, by scattering then transposing (Davis sec. 2.5); with
    /// <paramref name="map"/>, of the submatrix of the unknowns whose nodes are <paramref name="node"/>.
    /// </summary>
    private static (int[] Fp, int[] Fi, int[] Map) Permute(CscMatrix a, int[] perm, int[]? map, int[]? node)
    {
        int n = perm.Length;
        var pinv = new int[n];
        for (int k = 0; k < n; k++) pinv[perm[k]] = k;
        var rank = Ranks(pinv, map);
        var cols = Columns(perm, node);
        int[] cp = a.ColPtr, ri = a.RowIdx;
        // G(:, j) = A(perm, perm[j]) with rows relabelled; then F = G' has sorted rows (G symmetric so F = P A P').
        var count = new int[n + 1];
        for (int j = 0; j < n; j++)
        {
            int c = cols[j];
            for (int p = cp[c]; p < cp[c + 1]; p++)
            {
                int r = rank[ri[p]];
                if (r >= 0) count[r + 1]++;
            }
        }
        for (int i = 0; i < n; i++) count[i + 1] += count[i];
        int nz = count[n];
        var fp = (int[])count.Clone();
        var fi = new int[nz];
        var vmap = new int[nz];
        for (int j = 0; j < n; j++)
        {
            int c = cols[j];
            for (int p = cp[c]; p < cp[c + 1]; p++)
            {
                int r = rank[ri[p]];
                if (r < 0) continue;
                int q = count[r]++;
                fi[q] = j;
                vmap[q] = p;
            }
        }
        return (fp, fi, vmap);
    }

    /// <summary>Column of A of each pivot: the order itself, or the nodes of the unknowns it orders.</summary>
    private static int[] Columns(int[] perm, int[]? node)
    {
        if (node is null) return perm;
        var cols = new int[perm.Length];
        for (int k = 0; k < cols.Length; k++) cols[k] = node[perm[k]];
        return cols;
    }

    /// <summary>Pivot position of each row of A: the inverse order, or through the map (-1 for rows outside).</summary>
    private static int[] Ranks(int[] pinv, int[]? map)
    {
        if (map is null) return pinv;
        var rank = new int[map.Length];
        for (int i = 0; i < rank.Length; i++) rank[i] = map[i] < 0 ? -1 : pinv[map[i]];
        return rank;
    }

    private static int[] Identity(int n)
    {
        var p = new int[n];
        for (int i = 0; i < n; i++) p[i] = i;
        return p;
    }

    private static bool IsIdentity(int[] p)
    {
        for (int i = 0; i < p.Length; i++) if (p[i] != i) return false;
        return true;
    }
}
