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
    /// <remarks>
    /// Memory-lean variant of Davis's cs_compress + cs_dupl (sec. 2.2): the entries are bucketed by column as indices
    /// into the triplet arrays (4 bytes per entry, not 12), duplicates are found with a row marker and summed in
    /// arrival order, and the result is written once at its final size. Peak beside the triplets: 4 bytes per entry
    /// plus the result, where bucketing values and shrinking afterwards needed 12 bytes per entry plus the result twice.
    /// </remarks>
    public CscMatrix ToCsc()
    {
        int n = N, count = Count;
        int[] ti = _i, tj = _j;
        double[] tv = _v;
        var start = new int[n + 1];
        for (int k = 0; k < count; k++) start[tj[k] + 1]++;
        for (int c = 0; c < n; c++) start[c + 1] += start[c];
        // entries of each column in arrival order, as indices into the triplet arrays (counting sort)
        var idx = new int[count];
        var colPtr = new int[n + 1];
        Array.Copy(start, colPtr, n);
        for (int k = 0; k < count; k++) idx[colPtr[tj[k]]++] = k;
        // distinct rows per column
        var pos = colPtr; // reused as the row marker / position array (its values are rewritten below)
        Array.Fill(pos, -1);
        colPtr = new int[n + 1];
        int nz = 0;
        for (int c = 0; c < n; c++)
        {
            for (int p = start[c]; p < start[c + 1]; p++)
            {
                int r = ti[idx[p]];
                if (pos[r] != c) { pos[r] = c; nz++; }
            }
            colPtr[c + 1] = nz;
        }
        var ri = new int[nz];
        var rv = new double[nz];
        Array.Fill(pos, -1);
        for (int c = 0; c < n; c++)
        {
            int s = colPtr[c], w = s;
            for (int p = start[c]; p < start[c + 1]; p++)
            {
                int k = idx[p], r = ti[k], at = pos[r];
                if (at < s) { pos[r] = w; ri[w] = r; rv[w] = tv[k]; w++; }
                else rv[at] += tv[k];
            }
            Array.Sort(ri, rv, s, w - s);
        }
        return new CscMatrix(n, colPtr, ri, rv);
    }
}
