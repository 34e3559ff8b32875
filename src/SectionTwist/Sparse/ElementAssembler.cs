namespace SectionTwist.Sparse;

/// <summary>
/// Finite-element assembly straight into compressed sparse column storage, without a coordinate (triplet) buffer.
/// The pattern is built first from the element-to-unknown incidence E (one row per element, its unknowns as columns):
/// the pattern of K is that of E' E, formed column by column with a marker array as in Gustavson's row-by-row sparse
/// product ("Two fast algorithms for sparse matrices: multiplication and permuted transposition", ACM TOMS 4(3), 1978).
/// Element matrices are then added in place, each entry found by binary search in its sorted column.
/// Memory: the incidence (4 bytes per element unknown) and the final matrix, where triplets need 16 bytes per element
/// matrix entry (36 per 6-node element) plus their sorting buffers before the final matrix exists.
/// </summary>
internal sealed class ElementAssembler
{
    private readonly int[] _dofs;
    private readonly int _k;
    private readonly int[] _colPtr;
    private readonly int[] _rows;
    private readonly double[] _values;

    /// <summary>Builds the pattern.</summary>
    /// <param name="n">Number of unknowns (order of the matrix).</param>
    /// <param name="elementDofs">Unknown of each element node, <paramref name="dofsPerElement"/> per element in element
    /// order; a negative entry is a dropped node (a Dirichlet node) and adds nothing. Kept, not copied.</param>
    /// <param name="dofsPerElement">Nodes per element.</param>
    public ElementAssembler(int n, int[] elementDofs, int dofsPerElement)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(dofsPerElement, 1);
        if (elementDofs.Length % dofsPerElement != 0)
            throw new ArgumentException("element unknown list is not a whole number of elements", nameof(elementDofs));
        N = n; _dofs = elementDofs; _k = dofsPerElement;
        int nEl = elementDofs.Length / dofsPerElement;
        // unknown -> elements incidence (E' in compressed form)
        var ep = new int[n + 1];
        foreach (int d in elementDofs) if (d >= 0) ep[d + 1]++;
        for (int i = 0; i < n; i++) ep[i + 1] += ep[i];
        var el = new int[ep[n]];
        var next = new int[n];
        Array.Copy(ep, next, n);
        for (int e = 0; e < nEl; e++)
            for (int a = 0; a < dofsPerElement; a++)
            {
                int d = elementDofs[e * dofsPerElement + a];
                if (d >= 0) el[next[d]++] = e;
            }
        // column c of E' E: the unknowns of the elements around c (count, then fill and sort)
        var mark = next;
        Array.Fill(mark, -1);
        var cp = new int[n + 1];
        long nz = 0;
        for (int c = 0; c < n; c++)
        {
            for (int p = ep[c]; p < ep[c + 1]; p++)
            {
                int o = el[p] * dofsPerElement;
                for (int a = 0; a < dofsPerElement; a++)
                {
                    int d = elementDofs[o + a];
                    if (d >= 0 && mark[d] != c) { mark[d] = c; nz++; }
                }
            }
            if (nz > int.MaxValue) throw new InvalidOperationException("matrix has more than 2^31 nonzeros");
            cp[c + 1] = (int)nz;
        }
        var rows = new int[nz];
        Array.Fill(mark, -1);
        for (int c = 0; c < n; c++)
        {
            int w = cp[c];
            for (int p = ep[c]; p < ep[c + 1]; p++)
            {
                int o = el[p] * dofsPerElement;
                for (int a = 0; a < dofsPerElement; a++)
                {
                    int d = elementDofs[o + a];
                    if (d >= 0 && mark[d] != c) { mark[d] = c; rows[w++] = d; }
                }
            }
            Array.Sort(rows, cp[c], w - cp[c]);
        }
        _colPtr = cp; _rows = rows; _values = new double[nz];
    }

    /// <summary>Order of the matrix.</summary>
    public int N { get; }

    /// <summary>
    /// Adds <paramref name="weight"/> times the element matrix <paramref name="ke"/> (row-major, k x k, entry (a, b) goes
    /// to row dof(a), column dof(b)) of element <paramref name="element"/>.
    /// </summary>
    public void Add(int element, ReadOnlySpan<double> ke, double weight = 1)
    {
        int k = _k, o = element * k;
        if (ke.Length < k * k) throw new ArgumentException("element matrix too small", nameof(ke));
        int[] rows = _rows;
        double[] v = _values;
        for (int b = 0; b < k; b++)
        {
            int db = _dofs[o + b];
            if (db < 0) continue;
            int s = _colPtr[db], len = _colPtr[db + 1] - s;
            for (int a = 0; a < k; a++)
            {
                int da = _dofs[o + a];
                if (da < 0) continue;
                int at = Array.BinarySearch(rows, s, len, da);
                v[at] += weight * ke[a * k + b];
            }
        }
    }

    /// <summary>The assembled matrix (shares this assembler's arrays: assemble no more afterwards).</summary>
    public CscMatrix ToCsc() => new(N, _colPtr, _rows, _values);
}
