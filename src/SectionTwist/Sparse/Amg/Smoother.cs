namespace SectionTwist.Sparse.Amg;

/// <summary>
/// Gauss-Seidel sweeps for the multigrid smoother. On large levels the rows are split into one contiguous block per
/// core: Gauss-Seidel inside a block, values from other blocks taken from the previous iterate (the "hybrid"
/// block-Jacobi / Gauss-Seidel smoother, e.g. Baker, Falgout, Kolev and Yang, "Multigrid smoothers for ultraparallel
/// computing", SIAM J. Sci. Comput. 33(5), 2011, sec. 5). A forward sweep followed by a backward sweep is symmetric.
/// </summary>
internal static class Smoother
{
    public static void GaussSeidel(CsrMatrix a, double[] invDiag, double[] b, double[] x, double[] copy, bool forward, bool initialZero)
    {
        int n = a.Rows;
        int blocks = Parallel2.Blocks(n, a.NonZeros);
        if (blocks == 1) { Sweep(a, invDiag, b, x, x, 0, n, forward); return; }
        if (initialZero) Array.Clear(copy);
        else Array.Copy(x, copy, n);
        double[] old = copy;
        Parallel.For(0, blocks, Parallel2.Options, blk =>
        {
            var (s, e) = Parallel2.Range(n, blocks, blk);
            Sweep(a, invDiag, b, x, old, s, e, forward);
        });
    }

    /// <summary>One sweep over rows [s, e); entries outside the block are read from <paramref name="old"/>.</summary>
    private static void Sweep(CsrMatrix a, double[] invDiag, double[] b, double[] x, double[] old, int s, int e, bool forward)
    {
        int[] rp = a.RowPtr, ci = a.ColIdx;
        double[] v = a.Values;
        if (forward)
        {
            for (int i = s; i < e; i++) x[i] = Row(i);
        }
        else
        {
            for (int i = e - 1; i >= s; i--) x[i] = Row(i);
        }

        double Row(int i)
        {
            double t = b[i];
            for (int p = rp[i]; p < rp[i + 1]; p++)
            {
                int j = ci[p];
                if (j == i) continue;
                t -= v[p] * (j >= s && j < e ? x[j] : old[j]);
            }
            return t * invDiag[i];
        }
    }
}
