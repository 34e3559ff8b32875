using System.Runtime.ExceptionServices;

namespace SectionTwist.Sparse;

/// <summary>
/// Numeric work of <see cref="SupernodalCholesky"/>: the left-looking supernodal loop (Ng and Peyton 1993), run on two
/// threads over two disjoint sets of subtrees of the supernodal elimination tree (<see cref="SubtreeSplit"/>) and then
/// on the calling thread over the supernodes above them (subtree-to-processor mapping, George, Liu and Ng,
/// "Communication results for parallel sparse Cholesky factorization on a hypercube", Parallel Computing 10, 1989).
/// A supernode needs only its own descendants, so the two sets share nothing but the updates they send to the
/// supernodes above them; those links are queued per thread and entered in a fixed order after both finish, so the
/// result is the same from run to run.
/// </summary>
internal sealed class SupernodalFactorizer
{
    private readonly Supernodes _sn;
    private readonly int[] _fp, _fi, _valueMap;
    private readonly double[] _av, _lx;
    private readonly int[] _head, _next, _pos;

    private SupernodalFactorizer(SymbolicCholesky s, CscMatrix a)
    {
        // the entries of P A P' are read from A through the analysis's value map (no permuted copy)
        if (a.N != s.SourceN || a.NonZeros != s.NonZerosA)
            throw new ArgumentException("matrix pattern differs from the analysed pattern", nameof(a));
        _sn = s.Supernodes; _fp = s.Fp; _fi = s.Fi; _valueMap = s.ValueMap; _av = a.Values;
        int ns = _sn.Count;
        _lx = new double[_sn.ValuePtr[ns]];
        _head = new int[ns]; _next = new int[ns]; _pos = new int[ns];
        Array.Fill(_head, -1);
    }

    /// <summary>Supernode work (sum of squared column counts) above which the subtrees are factored on two threads.</summary>
    public const double ParallelWork = 2e7;

    /// <summary>Factors <paramref name="a"/> and returns the supernodal values (layout of <see cref="Supernodes.ValuePtr"/>).</summary>
    /// <exception cref="SectionTwistException">The matrix is not positive definite.</exception>
    public static double[] Run(SymbolicCholesky s, CscMatrix a, CancellationToken ct)
    {
        var f = new SupernodalFactorizer(s, a);
        var sn = f._sn;
        int ns = sn.Count;
        var split = KernelThreads.MayUseMore && s.Flops >= ParallelWork ? SubtreeSplit.Choose(sn) : null;
        var done = new bool[ns];
        if (split is not null)
        {
            var queues = new List<int>[2];
            ExceptionDispatchInfo? error = null;
            Parallel.For(0, 2, t =>
            {
                try
                {
                    queues[t] = [];
                    var ws = Workspace.For(sn, s.N, split[t], split.First);
                    foreach (int root in split[t])
                        for (int k = split.First[root]; k <= root; k++)
                        {
                            if ((k & 255) == 0) ct.ThrowIfCancellationRequested();
                            f.Process(k, ws, root, queues[t], parallelKernels: false);
                            done[k] = true;
                        }
                }
                catch (Exception e) when (e is SectionTwistException or OperationCanceledException)
                {
                    Interlocked.CompareExchange(ref error, ExceptionDispatchInfo.Capture(e), null);
                }
            });
            error?.Throw();
            foreach (var q in queues) foreach (int d in q) f.Link(d);
        }
        var main = new Workspace(sn, s.N);
        for (int k = 0; k < ns; k++)
        {
            if (done[k]) continue;
            if ((k & 255) == 0) ct.ThrowIfCancellationRequested();
            f.Process(k, main, ns, null, parallelKernels: true);
        }
        return f._lx;
    }

    /// <summary>Per-thread scratch: row map, update block, relative indices.</summary>
    private readonly record struct Workspace(int[] Map, double[] C, int[] Rel)
    {
        public Workspace(Supernodes sn, int n) : this(new int[n], new double[sn.MaxUpdate], new int[Math.Max(1, sn.MaxRows)]) { }

        /// <summary>Scratch sized for the subtrees rooted at <paramref name="roots"/> (an update block fits in the
        /// square of the rows below the descendant's own columns).</summary>
        public static Workspace For(Supernodes sn, int n, List<int> roots, int[] first)
        {
            long maxUpdate = 1;
            int maxRows = 1;
            foreach (int r in roots)
                for (int k = first[r]; k <= r; k++)
                {
                    long nr = sn.RowPtr[k + 1] - sn.RowPtr[k], nc = sn.Start[k + 1] - sn.Start[k];
                    maxUpdate = Math.Max(maxUpdate, (nr - nc) * (nr - nc));
                    maxRows = Math.Max(maxRows, (int)nr);
                }
            return new Workspace(new int[n], new double[maxUpdate], new int[maxRows]);
        }
    }

    /// <summary>Pushes <paramref name="d"/> on the list of the next supernode it updates.</summary>
    private void Link(int d)
    {
        int s2 = _sn.ColumnToSuper[_sn.Rows[(int)_sn.RowPtr[d] + _pos[d]]];
        _next[d] = _head[s2]; _head[s2] = d;
    }

    /// <summary>
    /// Assembles supernode k, applies the updates of its descendants, factors it and links it to its first ancestor;
    /// links to supernodes above <paramref name="limit"/> go to <paramref name="deferred"/> (null: link at once).
    /// </summary>
    private void Process(int k, Workspace ws, int limit, List<int>? deferred, bool parallelKernels)
    {
        var sn = _sn;
        int[] rows = sn.Rows, start = sn.Start, fp = _fp, fi = _fi, map = ws.Map, rel = ws.Rel, pos = _pos;
        long[] rowPtr = sn.RowPtr, valPtr = sn.ValuePtr;
        double[] lx = _lx, av = _av, c = ws.C;
        int[] vmap = _valueMap;
        int f = start[k], l = start[k + 1], nc = l - f;
        int rp0 = (int)rowPtr[k], nr = (int)(rowPtr[k + 1] - rowPtr[k]);
        long off = valPtr[k];
        for (int i = 0; i < nr; i++) map[rows[rp0 + i]] = i;
        for (int j = f; j < l; j++)
        {
            long colOff = off + (long)(j - f) * nr;
            for (int p = fp[j + 1] - 1; p >= fp[j]; p--)
            {
                int i = fi[p];
                if (i < j) break;
                lx[colOff + map[i]] = av[vmap[p]];
            }
        }
        for (int d = _head[k]; d != -1;)
        {
            int dnext = _next[d];
            int drp = (int)rowPtr[d], dnr = (int)(rowPtr[d + 1] - rowPtr[d]), dnc = start[d + 1] - start[d];
            int p1 = pos[d], p2 = p1;
            while (p2 < dnr && rows[drp + p2] < l) p2++;
            int m = dnr - p1, ncu = p2 - p1;
            if (parallelKernels) SyrkKernel.LowerProductParallel(lx, valPtr[d] + p1, dnr, m, dnc, c, 0, m, true, ncu);
            else SyrkKernel.LowerProduct(lx, valPtr[d] + p1, dnr, m, dnc, c, 0, m, true, 0, ncu);
            for (int ii = 0; ii < m; ii++) rel[ii] = map[rows[drp + p1 + ii]];
            bool contiguous = rel[m - 1] - rel[0] == m - 1;
            for (int jj = 0; jj < ncu; jj++)
            {
                long colOff = off + (long)rel[jj] * nr; // the first ncu rows are the target's own columns
                int cOff = jj * m;
                if (contiguous) DenseKernels.AddTo(lx.AsSpan((int)(colOff + rel[jj]), m - jj), c.AsSpan(cOff + jj, m - jj));
                else for (int ii = jj; ii < m; ii++) lx[colOff + rel[ii]] += c[cOff + ii];
            }
            pos[d] = p2;
            if (p2 < dnr) LinkOrDefer(d, limit, deferred);
            d = dnext;
        }
        int bad = DenseKernels.FactorPanel(lx, off, nr, nc, parallelKernels);
        if (bad >= 0)
            throw new SectionTwistException("not-positive-definite",
                $"stiffness matrix is not positive definite at pivot {f + bad} of {sn.Start[sn.Count]}: check the mesh for degenerate or inverted elements");
        pos[k] = nc;
        if (nc < nr) LinkOrDefer(k, limit, deferred);
    }

    private void LinkOrDefer(int d, int limit, List<int>? deferred)
    {
        if (deferred is not null && _sn.ColumnToSuper[_sn.Rows[(int)_sn.RowPtr[d] + _pos[d]]] > limit) deferred.Add(d);
        else Link(d);
    }
}
