namespace SectionTwist.Sparse;

/// <summary>
/// Coordinate-format assembly buffer for a square sparse matrix; duplicates are summed when converted once to
/// compressed storage by <see cref="ToCsc"/> (Davis, Direct Methods for Sparse Linear Systems, SIAM 2006, sec. 2.1-2.2).
/// </summary>
internal sealed class TripletMatrix
{
    private int[] _i, _j;
    private double[] _v;

    public TripletMatrix(int n, int capacity = 16)
    {
        N = n;
        capacity = Math.Max(capacity, 4);
        _i = new int[capacity]; _j = new int[capacity]; _v = new double[capacity];
    }

    /// <summary>Order of the matrix.</summary>
    public int N { get; }

    /// <summary>Number of stored entries (duplicates included).</summary>
    public int Count { get; private set; }

    /// <summary>Adds <paramref name="v"/> to entry (i, j).</summary>
    public void Add(int i, int j, double v)
    {
        if (Count == _i.Length)
        {
            int cap = 2 * _i.Length;
            Array.Resize(ref _i, cap); Array.Resize(ref _j, cap); Array.Resize(ref _v, cap);
        }
        _i[Count] = i; _j[Count] = j; _v[Count] = v; Count++;
    }

    /// <summary>Compressed sparse column form with duplicates summed and row indices sorted within each column.</summary>
    public CscMatrix ToCsc()
    {
        int n = N;
        var colCount = new int[n + 1];
        for (int k = 0; k < Count; k++) colCount[_j[k] + 1]++;
        for (int c = 0; c < n; c++) colCount[c + 1] += colCount[c];
        var next = (int[])colCount.Clone();
        var ri = new int[Count];
        var rv = new double[Count];
        // bucket by column, rows in arrival order
        for (int k = 0; k < Count; k++) { int p = next[_j[k]]++; ri[p] = _i[k]; rv[p] = _v[k]; }
        // sort rows within each column and sum duplicates
        var colPtr = new int[n + 1];
        int w = 0;
        for (int c = 0; c < n; c++)
        {
            int s = colCount[c], e = colCount[c + 1];
            Array.Sort(ri, rv, s, e - s);
            colPtr[c] = w;
            for (int p = s; p < e; p++)
            {
                if (w > colPtr[c] && ri[w - 1] == ri[p]) rv[w - 1] += rv[p];
                else { ri[w] = ri[p]; rv[w] = rv[p]; w++; }
            }
        }
        colPtr[n] = w;
        Array.Resize(ref ri, w); Array.Resize(ref rv, w);
        return new CscMatrix(n, colPtr, ri, rv);
    }
}
