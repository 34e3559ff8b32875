namespace SectionTwist.Sparse;

/// <summary>
/// Up-looking simplicial sparse Cholesky factorization P A P' = L L' (Davis, Direct Methods for Sparse Linear Systems,
/// SIAM 2006, sec. 4.7): row k of L is found by a sparse triangular solve whose pattern is the row subtree
/// (<see cref="EliminationTree.Reach"/>). All workspaces are sized by the symbolic analysis before the loop.
/// </summary>
internal sealed class SimplicialCholesky : ISpdSolver
{
    private readonly SymbolicCholesky _s;
    private readonly int[] _li;
    private readonly double[] _lx;
    private readonly double[] _work;

    private SimplicialCholesky(SymbolicCholesky s, int[] li, double[] lx)
    {
        _s = s; _li = li; _lx = lx; _work = new double[s.N];
    }

    /// <summary>The analysis this factor was built on.</summary>
    public SymbolicCholesky Symbolic => _s;

    /// <summary>Numeric factorization of <paramref name="a"/> (same pattern as analysed).</summary>
    /// <exception cref="SectionTwistException">The matrix is not positive definite.</exception>
    public static SimplicialCholesky Factorize(SymbolicCholesky s, CscMatrix a, CancellationToken ct = default)
    {
        int n = s.N;
        var fx = s.PermutedValues(a);
        int[] fp = s.Fp, fi = s.Fi, parent = s.Parent;
        long nzl = s.NonZerosL;
        if (nzl > int.MaxValue) throw new InvalidOperationException("factor too large for the simplicial layout");
        var li = new int[nzl];
        var lx = new double[nzl];
        var c = new int[n];
        for (int j = 0; j < n; j++) c[j] = (int)s.Lp[j];
        var x = new double[n];
        var stack = new int[n];
        var mark = new bool[n];
        for (int k = 0; k < n; k++)
        {
            if ((k & 4095) == 0) ct.ThrowIfCancellationRequested();
            int top = EliminationTree.Reach(n, fp, fi, k, parent, stack, mark);
            x[k] = 0;
            for (int p = fp[k]; p < fp[k + 1]; p++)
            {
                int i = fi[p];
                if (i > k) break;
                x[i] = fx[p];
            }
            double d = x[k];
            x[k] = 0;
            for (; top < n; top++)
            {
                int i = stack[top];
                int p0 = c[i];
                int pd = (int)s.Lp[i];
                double lki = x[i] / lx[pd];
                x[i] = 0;
                for (int p = pd + 1; p < p0; p++) x[li[p]] -= lx[p] * lki;
                d -= lki * lki;
                li[p0] = k; lx[p0] = lki;
                c[i] = p0 + 1;
            }
            if (!(d > 0))
                throw new SectionTwistException("not-positive-definite",
                    $"stiffness matrix is not positive definite at pivot {k} of {n}: check the mesh for degenerate or inverted elements");
            int pk = c[k]++;
            li[pk] = k; lx[pk] = Math.Sqrt(d);
        }
        return new SimplicialCholesky(s, li, lx);
    }

    /// <summary>Solves A x = b by permuting, L y = P b, L' z = y, x = P' z.</summary>
    public void Solve(ReadOnlySpan<double> b, Span<double> x)
    {
        int n = _s.N;
        var perm = _s.Perm;
        var lp = _s.Lp;
        var y = _work;
        for (int k = 0; k < n; k++) y[k] = b[perm[k]];
        for (int j = 0; j < n; j++)
        {
            int p0 = (int)lp[j], p1 = (int)lp[j + 1];
            double yj = y[j] / _lx[p0];
            y[j] = yj;
            for (int p = p0 + 1; p < p1; p++) y[_li[p]] -= _lx[p] * yj;
        }
        for (int j = n - 1; j >= 0; j--)
        {
            int p0 = (int)lp[j], p1 = (int)lp[j + 1];
            double t = y[j];
            for (int p = p0 + 1; p < p1; p++) t -= _lx[p] * y[_li[p]];
            y[j] = t / _lx[p0];
        }
        for (int k = 0; k < n; k++) x[perm[k]] = y[k];
    }
}
