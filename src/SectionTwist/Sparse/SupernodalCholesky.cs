namespace SectionTwist.Sparse;

/// <summary>
/// Left-looking supernodal sparse Cholesky factorization (Ng and Peyton, "Block sparse Cholesky algorithms on advanced
/// uniprocessor computers", SIAM J. Sci. Comput. 14(5), 1993; Rothberg and Gupta 1991): each supernode is a dense
/// column-major block; the descendants that update it are kept in linked lists keyed by the next supernode they touch;
/// the update is one dense product (<see cref="SyrkKernel"/>) scattered through relative row indices, then the block is
/// factored in place (<see cref="DenseKernels.FactorPanel"/>); the loop is <see cref="SupernodalFactorizer"/>. All
/// workspaces are sized from the symbolic analysis before the loop.
/// </summary>
internal sealed class SupernodalCholesky : ISpdSolver
{
    private readonly SymbolicCholesky _s;
    private readonly Supernodes _sn;
    private readonly double[] _lx;
    private readonly double[] _work;
    private readonly double[] _gathered;

    private SupernodalCholesky(SymbolicCholesky s, double[] lx)
    {
        _s = s; _sn = s.Supernodes; _lx = lx; _work = new double[s.N];
        _gathered = new double[Math.Max(1, _sn.MaxRows)];
    }

    /// <summary>Numeric factorization of <paramref name="a"/> (same pattern as analysed).</summary>
    /// <exception cref="SectionTwistException">The matrix is not positive definite.</exception>
    public static SupernodalCholesky Factorize(SymbolicCholesky s, CscMatrix a, CancellationToken ct = default)
        => new(s, SupernodalFactorizer.Run(s, a, ct));

    /// <summary>
    /// Solves A x = b: permute, block forward and backward substitution, permute back. Per supernode the columns are
    /// contiguous: the diagonal block and the rows below are handled as dense column axpys (forward) and dot products
    /// (backward) against a gathered copy of the entries of y that the rows below touch, scattered back once.
    /// </summary>
    public void Solve(ReadOnlySpan<double> b, Span<double> x)
    {
        int n = _s.N, ns = _sn.Count;
        var perm = _s.Perm;
        var y = _work;
        int[] rows = _sn.Rows, start = _sn.Start;
        long[] rowPtr = _sn.RowPtr, valPtr = _sn.ValuePtr;
        var lx = _lx;
        var tmp = _gathered;
        for (int k = 0; k < n; k++) y[k] = b[perm[k]];
        for (int k = 0; k < ns; k++)
        {
            int f = start[k], nc = start[k + 1] - f, rp0 = (int)rowPtr[k], nr = (int)(rowPtr[k + 1] - rowPtr[k]);
            long off = valPtr[k];
            var below = tmp.AsSpan(0, nr - nc);
            below.Clear();
            for (int j = 0; j < nc; j++)
            {
                int co = (int)(off + (long)j * nr);
                double yj = y[f + j] / lx[co + j];
                y[f + j] = yj;
                DenseKernels.Axpy(y.AsSpan(f + j + 1, nc - j - 1), lx.AsSpan(co + j + 1, nc - j - 1), -yj);
                DenseKernels.Axpy(below, lx.AsSpan(co + nc, nr - nc), yj);
            }
            for (int i = 0; i < nr - nc; i++) y[rows[rp0 + nc + i]] -= below[i];
        }
        for (int k = ns - 1; k >= 0; k--)
        {
            int f = start[k], nc = start[k + 1] - f, rp0 = (int)rowPtr[k], nr = (int)(rowPtr[k + 1] - rowPtr[k]);
            long off = valPtr[k];
            var below = tmp.AsSpan(0, nr - nc);
            for (int i = 0; i < nr - nc; i++) below[i] = y[rows[rp0 + nc + i]];
            for (int j = nc - 1; j >= 0; j--)
            {
                int co = (int)(off + (long)j * nr);
                double t = y[f + j] - DenseKernels.Dot(lx.AsSpan(co + nc, nr - nc), below)
                    - DenseKernels.Dot(lx.AsSpan(co + j + 1, nc - j - 1), y.AsSpan(f + j + 1, nc - j - 1));
                y[f + j] = t / lx[co + j];
            }
        }
        for (int k = 0; k < n; k++) x[perm[k]] = y[k];
    }
}
