namespace SectionTwist.Sparse;

/// <summary>
/// Square sparse matrix in compressed sparse column storage (both triangles of a symmetric matrix are stored),
/// row indices sorted within each column.
/// </summary>
internal sealed class CscMatrix
{
    public CscMatrix(int n, int[] colPtr, int[] rowIdx, double[] values)
    {
        N = n; ColPtr = colPtr; RowIdx = rowIdx; Values = values;
    }

    public int N { get; }
    public int[] ColPtr { get; }
    public int[] RowIdx { get; }
    public double[] Values { get; }
    public int NonZeros => ColPtr[N];

    /// <summary>y = A x.</summary>
    public void Multiply(ReadOnlySpan<double> x, Span<double> y)
    {
        y.Clear();
        for (int c = 0; c < N; c++)
        {
            double xc = x[c];
            if (xc == 0) continue;
            for (int p = ColPtr[c]; p < ColPtr[c + 1]; p++) y[RowIdx[p]] += Values[p] * xc;
        }
    }

    /// <summary>||b - A x||_2 / ||b||_2.</summary>
    public double RelativeResidual(ReadOnlySpan<double> x, ReadOnlySpan<double> b)
    {
        var ax = new double[N];
        Multiply(x, ax);
        double r = 0, nb = 0;
        for (int i = 0; i < N; i++) { double d = b[i] - ax[i]; r += d * d; nb += b[i] * b[i]; }
        return nb == 0 ? Math.Sqrt(r) : Math.Sqrt(r / nb);
    }
}
