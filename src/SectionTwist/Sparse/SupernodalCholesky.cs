namespace SectionTwist.Sparse;

/// <summary>
/// Left-looking supernodal sparse Cholesky factorization (Ng and Peyton, "Block sparse Cholesky algorithms on advanced
/// uniprocessor computers", SIAM J. Sci. Comput. 14(5), 1993; Rothberg and Gupta 1991): each supernode is a dense
/// column-major block; the descendants that update it are kept in linked lists keyed by the next supernode they touch;
/// the update is one dense product (<see cref="SyrkKernel.LowerProductParallel"/>) scattered through relative row indices,
/// then the block is factored in place (<see cref="DenseKernels.FactorPanel"/>). All workspaces are sized from the
/// symbolic analysis before the loop.
/// </summary>
internal sealed class SupernodalCholesky : ISpdSolver
{
    private readonly SymbolicCholesky _s;
    private readonly Supernodes _sn;
    private readonly double[] _lx;
    private readonly double[] _work;

    private SupernodalCholesky(SymbolicCholesky s, double[] lx)
    {
        _s = s; _sn = s.Supernodes; _lx = lx; _work = new double[s.N];
    }

    /// <summary>Numeric factorization of <paramref name="a"/> (same pattern as analysed).</summary>
    /// <exception cref="SectionTwistException">The matrix is not positive definite.</exception>
    public static SupernodalCholesky Factorize(SymbolicCholesky s, CscMatrix a, CancellationToken ct = default)
    {
        var sn = s.Supernodes;
        int n = s.N, ns = sn.Count;
        var fx = s.PermutedValues(a);
        int[] fp = s.Fp, fi = s.Fi, rows = sn.Rows, start = sn.Start, c2s = sn.ColumnToSuper;
        long[] rowPtr = sn.RowPtr, valPtr = sn.ValuePtr;
        var lx = new double[valPtr[ns]];
        var map = new int[n];
        var head = new int[ns];
        var next = new int[ns];
        var pos = new int[ns];
        Array.Fill(head, -1);
        var c = new double[sn.MaxUpdate];
        for (int k = 0; k < ns; k++)
        {
            if ((k & 255) == 0) ct.ThrowIfCancellationRequested();
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
                    lx[colOff + map[i]] = fx[p];
                }
            }
            for (int d = head[k]; d != -1;)
            {
                int dnext = next[d];
                int drp = (int)rowPtr[d], dnr = (int)(rowPtr[d + 1] - rowPtr[d]), dnc = start[d + 1] - start[d];
                int p1 = pos[d], p2 = p1;
                while (p2 < dnr && rows[drp + p2] < l) p2++;
                int m = dnr - p1, ncu = p2 - p1;
                SyrkKernel.LowerProductParallel(lx, valPtr[d] + p1, dnr, m, dnc, c, 0, m, true, ncu);
                for (int jj = 0; jj < ncu; jj++)
                {
                    long colOff = off + (long)(rows[drp + p1 + jj] - f) * nr;
                    int cOff = jj * m;
                    for (int ii = jj; ii < m; ii++) lx[colOff + map[rows[drp + p1 + ii]]] += c[cOff + ii];
                }
                pos[d] = p2;
                if (p2 < dnr)
                {
                    int s2 = c2s[rows[drp + p2]];
                    next[d] = head[s2]; head[s2] = d;
                }
                d = dnext;
            }
            int bad = DenseKernels.FactorPanel(lx, off, nr, nc);
            if (bad >= 0)
                throw new SectionTwistException("not-positive-definite",
                    $"stiffness matrix is not positive definite at pivot {f + bad} of {n}: check the mesh for degenerate or inverted elements");
            pos[k] = nc;
            if (nc < nr)
            {
                int s2 = c2s[rows[rp0 + nc]];
                next[k] = head[s2]; head[s2] = k;
            }
        }
        return new SupernodalCholesky(s, lx);
    }

    /// <summary>Solves A x = b: permute, block forward and backward substitution, permute back.</summary>
    public void Solve(ReadOnlySpan<double> b, Span<double> x)
    {
        int n = _s.N, ns = _sn.Count;
        var perm = _s.Perm;
        var y = _work;
        int[] rows = _sn.Rows, start = _sn.Start;
        long[] rowPtr = _sn.RowPtr, valPtr = _sn.ValuePtr;
        var lx = _lx;
        for (int k = 0; k < n; k++) y[k] = b[perm[k]];
        for (int k = 0; k < ns; k++)
        {
            int f = start[k], nc = start[k + 1] - f, rp0 = (int)rowPtr[k], nr = (int)(rowPtr[k + 1] - rowPtr[k]);
            long off = valPtr[k];
            for (int j = 0; j < nc; j++)
            {
                long co = off + (long)j * nr;
                double yj = y[f + j] / lx[co + j];
                y[f + j] = yj;
                for (int i = j + 1; i < nr; i++) y[rows[rp0 + i]] -= lx[co + i] * yj;
            }
        }
        for (int k = ns - 1; k >= 0; k--)
        {
            int f = start[k], nc = start[k + 1] - f, rp0 = (int)rowPtr[k], nr = (int)(rowPtr[k + 1] - rowPtr[k]);
            long off = valPtr[k];
            for (int j = nc - 1; j >= 0; j--)
            {
                long co = off + (long)j * nr;
                double t = y[f + j];
                for (int i = j + 1; i < nr; i++) t -= lx[co + i] * y[rows[rp0 + i]];
                y[f + j] = t / lx[co + j];
            }
        }
        for (int k = 0; k < n; k++) x[perm[k]] = y[k];
    }
}
