namespace SectionTwist.Sparse.Amg;

/// <summary>
/// Rectangular sparse matrix in compressed sparse row storage, with the products the multigrid set-up needs:
/// y = A x, the transpose, and the row-by-row sparse product of Gustavson ("Two fast algorithms for sparse matrices:
/// multiplication and permuted transposition", ACM TOMS 4(3), 1978), run on row blocks in parallel.
/// </summary>
internal sealed class CsrMatrix
{
    public CsrMatrix(int rows, int cols, int[] rowPtr, int[] colIdx, double[] values)
    {
        Rows = rows; Cols = cols; RowPtr = rowPtr; ColIdx = colIdx; Values = values;
    }

    public int Rows { get; }
    public int Cols { get; }
    public int[] RowPtr { get; }
    public int[] ColIdx { get; }
    public double[] Values { get; }
    public int NonZeros => RowPtr[Rows];

    /// <summary>A symmetric CSC matrix read as CSR (same arrays, no copy).</summary>
    public static CsrMatrix FromSymmetric(CscMatrix a) => new(a.N, a.N, a.ColPtr, a.RowIdx, a.Values);

    /// <summary>The same arrays read as a square CSC matrix (valid for symmetric matrices with sorted rows).</summary>
    public CscMatrix AsSymmetricCsc() => new(Rows, RowPtr, ColIdx, Values);

    /// <summary>y = A x, rows split over the worker threads.</summary>
    public void Multiply(double[] x, double[] y)
    {
        Parallel2.For(Rows, NonZeros, (r0, r1) =>
        {
            int[] rp = RowPtr, ci = ColIdx; double[] v = Values;
            for (int i = r0; i < r1; i++)
            {
                double s = 0;
                for (int p = rp[i]; p < rp[i + 1]; p++) s += v[p] * x[ci[p]];
                y[i] = s;
            }
        });
    }

    /// <summary>r = b - A x.</summary>
    public void Residual(double[] b, double[] x, double[] r)
    {
        Parallel2.For(Rows, NonZeros, (r0, r1) =>
        {
            int[] rp = RowPtr, ci = ColIdx; double[] v = Values;
            for (int i = r0; i < r1; i++)
            {
                double s = b[i];
                for (int p = rp[i]; p < rp[i + 1]; p++) s -= v[p] * x[ci[p]];
                r[i] = s;
            }
        });
    }

    /// <summary>y += A x.</summary>
    public void MultiplyAdd(double[] x, double[] y)
    {
        Parallel2.For(Rows, NonZeros, (r0, r1) =>
        {
            int[] rp = RowPtr, ci = ColIdx; double[] v = Values;
            for (int i = r0; i < r1; i++)
            {
                double s = 0;
                for (int p = rp[i]; p < rp[i + 1]; p++) s += v[p] * x[ci[p]];
                y[i] += s;
            }
        });
    }

    /// <summary>The transpose (columns become rows; row indices come out sorted).</summary>
    public CsrMatrix Transpose()
    {
        var cnt = new int[Cols + 1];
        int nz = NonZeros;
        for (int p = 0; p < nz; p++) cnt[ColIdx[p] + 1]++;
        for (int j = 0; j < Cols; j++) cnt[j + 1] += cnt[j];
        var rp = (int[])cnt.Clone();
        var ci = new int[nz];
        var v = new double[nz];
        for (int i = 0; i < Rows; i++)
            for (int p = RowPtr[i]; p < RowPtr[i + 1]; p++)
            {
                int q = cnt[ColIdx[p]]++;
                ci[q] = i; v[q] = Values[p];
            }
        return new CsrMatrix(Cols, Rows, rp, ci, v);
    }

    /// <summary>C = this * b (Gustavson), symbolic then numeric pass per row block; columns sorted when asked. Observes <paramref name="ct"/> every 1024 rows.</summary>
    public CsrMatrix Multiply(CsrMatrix b, bool sortRows, CancellationToken ct = default)
    {
        int rows = Rows, cols = b.Cols;
        var cp = new int[rows + 1];
        int blocks = Parallel2.Blocks(rows, NonZeros);
        Parallel.For(0, blocks, Parallel2.Options, blk =>
        {
            var (r0, r1) = Parallel2.Range(rows, blocks, blk);
            var mark = new int[cols];
            Array.Fill(mark, -1);
            for (int i = r0; i < r1; i++)
            {
                if ((i & 1023) == 0 && ct.IsCancellationRequested) return;
                int c = 0;
                for (int p = RowPtr[i]; p < RowPtr[i + 1]; p++)
                {
                    int k = ColIdx[p];
                    for (int q = b.RowPtr[k]; q < b.RowPtr[k + 1]; q++)
                    {
                        int j = b.ColIdx[q];
                        if (mark[j] != i) { mark[j] = i; c++; }
                    }
                }
                cp[i + 1] = c;
            }
        });
        ct.ThrowIfCancellationRequested();
        for (int i = 0; i < rows; i++) cp[i + 1] += cp[i];
        var ci = new int[cp[rows]];
        var cv = new double[cp[rows]];
        Parallel.For(0, blocks, Parallel2.Options, blk =>
        {
            var (r0, r1) = Parallel2.Range(rows, blocks, blk);
            var pos = new int[cols];
            Array.Fill(pos, -1);
            for (int i = r0; i < r1; i++)
            {
                if ((i & 1023) == 0 && ct.IsCancellationRequested) return;
                int start = cp[i], w = start;
                for (int p = RowPtr[i]; p < RowPtr[i + 1]; p++)
                {
                    int k = ColIdx[p];
                    double av = Values[p];
                    for (int q = b.RowPtr[k]; q < b.RowPtr[k + 1]; q++)
                    {
                        int j = b.ColIdx[q];
                        int at = pos[j];
                        if (at < start) { pos[j] = w; ci[w] = j; cv[w] = av * b.Values[q]; w++; }
                        else cv[at] += av * b.Values[q];
                    }
                }
                if (sortRows) Array.Sort(ci, cv, start, w - start);
            }
        });
        ct.ThrowIfCancellationRequested();
        return new CsrMatrix(rows, cols, cp, ci, cv);
    }
}
