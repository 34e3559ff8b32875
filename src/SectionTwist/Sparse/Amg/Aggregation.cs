namespace SectionTwist.Sparse.Amg;

/// <summary>
/// Strength of connection and aggregation of smoothed-aggregation multigrid (Vanek, Mandel and Brezina,
/// "Algebraic multigrid by smoothed aggregation for second and fourth order elliptic problems", Computing 56, 1996,
/// sec. 3-4): j is a strong neighbour of i when |a_ij| &gt;= theta sqrt(a_ii a_jj); aggregates are built in three
/// passes (whole untouched neighbourhoods, then attaching leftovers to a neighbouring aggregate, then the rest).
/// </summary>
internal static class Aggregation
{
    /// <summary>Aggregate number of every row; returns the number of aggregates.</summary>
    public static int Build(CsrMatrix a, double theta, out int[] aggregate, CancellationToken ct = default)
    {
        int n = a.Rows;
        int[] rp = a.RowPtr, ci = a.ColIdx;
        double[] v = a.Values;
        var diag = Diagonal(a);
        // strong-neighbour pattern as a boolean per entry
        var strong = new bool[a.NonZeros];
        Parallel2.For(n, a.NonZeros, (r0, r1) =>
        {
            double t2 = theta * theta;
            for (int i = r0; i < r1; i++)
                for (int p = rp[i]; p < rp[i + 1]; p++)
                {
                    int j = ci[p];
                    strong[p] = j != i && v[p] * v[p] >= t2 * Math.Abs(diag[i] * diag[j]);
                }
        });
        var agg = new int[n];
        Array.Fill(agg, -1);
        int count = 0;
        // pass 1: root nodes whose strong neighbourhood is untouched
        for (int i = 0; i < n; i++)
        {
            if ((i & 65535) == 0) ct.ThrowIfCancellationRequested();
            if (agg[i] != -1) continue;
            bool free = true, any = false;
            for (int p = rp[i]; p < rp[i + 1]; p++)
                if (strong[p]) { any = true; if (agg[ci[p]] != -1) { free = false; break; } }
            if (!free) continue;
            if (!any) { agg[i] = -2; continue; } // isolated: handled at the end
            agg[i] = count;
            for (int p = rp[i]; p < rp[i + 1]; p++) if (strong[p]) agg[ci[p]] = count;
            count++;
        }
        // pass 2: attach leftovers to the aggregate of the strongest pass-1 neighbour
        var pass1 = (int[])agg.Clone();
        for (int i = 0; i < n; i++)
        {
            if ((i & 65535) == 0) ct.ThrowIfCancellationRequested();
            if (agg[i] != -1) continue;
            double best = -1; int ba = -1;
            for (int p = rp[i]; p < rp[i + 1]; p++)
            {
                if (!strong[p]) continue;
                int g = pass1[ci[p]];
                if (g >= 0 && Math.Abs(v[p]) > best) { best = Math.Abs(v[p]); ba = g; }
            }
            if (ba >= 0) agg[i] = ba;
        }
        // pass 3: remaining nodes with their unaggregated strong neighbours
        for (int i = 0; i < n; i++)
        {
            if ((i & 65535) == 0) ct.ThrowIfCancellationRequested();
            if (agg[i] != -1) continue;
            agg[i] = count;
            for (int p = rp[i]; p < rp[i + 1]; p++)
                if (strong[p] && agg[ci[p]] == -1) agg[ci[p]] = count;
            count++;
        }
        for (int i = 0; i < n; i++) if (agg[i] == -2) agg[i] = count++;
        aggregate = agg;
        return count;
    }

    /// <summary>The diagonal of a square matrix.</summary>
    public static double[] Diagonal(CsrMatrix a)
    {
        var d = new double[a.Rows];
        for (int i = 0; i < a.Rows; i++)
            for (int p = a.RowPtr[i]; p < a.RowPtr[i + 1]; p++)
                if (a.ColIdx[p] == i) { d[i] = a.Values[p]; break; }
        return d;
    }
}
