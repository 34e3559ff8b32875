namespace SectionTwist.Sparse;

/// <summary>
/// Approximate minimum degree ordering for a symmetric pattern (Amestoy, Davis and Duff, "An approximate minimum
/// degree ordering algorithm", SIAM J. Matrix Anal. Appl. 17(4), 1996), following the quotient-graph formulation of
/// Davis, Direct Methods for Sparse Linear Systems, SIAM 2006, ch. 7.1: element absorption, mass elimination,
/// aggressive absorption, hash-based supervariable detection, approximate external degrees, and dense rows
/// (degree above 10 sqrt(n)) ordered last.
/// </summary>
internal static class Amd
{
    private static int Flip(int i) => -i - 2;

    /// <summary>
    /// Returns the fill-reducing permutation p (new index k holds old index p[k]) for the pattern of a square
    /// symmetric matrix (full storage; the diagonal is ignored).
    /// </summary>
    public static int[] Order(CscMatrix a, CancellationToken ct = default) => Order(a.N, a.ColPtr, a.RowIdx, ct);

    /// <summary>AMD on a symmetric pattern given by column pointers and row indices (both triangles present).</summary>
    public static int[] Order(int n, int[] ap, int[] ai, CancellationToken ct = default)
    {
        if (n == 0) return [];
        // C = pattern without the diagonal, with elbow room for the quotient graph.
        int cnz = 0;
        for (int j = 0; j < n; j++)
            for (int p = ap[j]; p < ap[j + 1]; p++) if (ai[p] != j) cnz++;
        long tl = cnz + cnz / 5L + 2L * n + 16;
        int nzmax = (int)Math.Min(tl, int.MaxValue - 64);
        var ci = new int[nzmax];
        var cp = new int[n + 1];
        {
            int q = 0;
            for (int j = 0; j < n; j++)
            {
                cp[j] = q;
                for (int p = ap[j]; p < ap[j + 1]; p++) if (ai[p] != j) ci[q++] = ai[p];
            }
            cp[n] = q;
        }

        int dense = (int)Math.Max(16, 10 * Math.Sqrt(n));
        dense = Math.Min(n - 2, dense);
        var len = new int[n + 1];
        var nv = new int[n + 1];
        var next = new int[n + 1];
        var head = new int[n + 1];
        var elen = new int[n + 1];
        var degree = new int[n + 1];
        var w = new int[n + 1];
        var hhead = new int[n + 1];
        var last = new int[n + 1];
        for (int k = 0; k < n; k++) len[k] = cp[k + 1] - cp[k];
        len[n] = 0;
        for (int i = 0; i <= n; i++)
        {
            head[i] = -1; last[i] = -1; next[i] = -1; hhead[i] = -1;
            nv[i] = 1; w[i] = 1; elen[i] = 0; degree[i] = len[i];
        }
        int mark = WClear(0, 0, w, n);
        elen[n] = -2; cp[n] = -1; w[n] = 0;
        int nel = 0;
        for (int i = 0; i < n; i++)
        {
            int d = degree[i];
            if (d == 0)
            {
                elen[i] = -2; nel++; cp[i] = -1; w[i] = 0;
            }
            else if (d > dense)
            {
                nv[i] = 0; elen[i] = -1; nel++; cp[i] = Flip(n); nv[n]++;
            }
            else
            {
                if (head[d] != -1) last[head[d]] = i;
                next[i] = head[d]; head[d] = i;
            }
        }

        int mindeg = 0, lemax = 0;
        int iter = 0;
        while (nel < n)
        {
            if ((++iter & 1023) == 0) ct.ThrowIfCancellationRequested();
            // select a node of minimum approximate degree
            int k = -1;
            for (; mindeg < n && (k = head[mindeg]) == -1; mindeg++) { }
            if (next[k] != -1) last[next[k]] = -1;
            head[mindeg] = next[k];
            int elenk = elen[k], nvk = nv[k];
            nel += nvk;

            // garbage collection of the quotient graph
            if (elenk > 0 && cnz + mindeg >= nzmax)
            {
                for (int j = 0; j < n; j++)
                {
                    int p0 = cp[j];
                    if (p0 >= 0) { cp[j] = ci[p0]; ci[p0] = Flip(j); }
                }
                int q = 0;
                for (int p0 = 0; p0 < cnz;)
                {
                    int j = Flip(ci[p0++]);
                    if (j >= 0)
                    {
                        ci[q] = cp[j]; cp[j] = q++;
                        for (int k3 = 0; k3 < len[j] - 1; k3++) ci[q++] = ci[p0++];
                    }
                }
                cnz = q;
            }

            // construct the new element
            int dk = 0;
            nv[k] = -nvk;
            int pp = cp[k];
            int pk1 = elenk == 0 ? pp : cnz;
            int pk2 = pk1;
            for (int k1 = 1; k1 <= elenk + 1; k1++)
            {
                int e, pj, ln;
                if (k1 > elenk) { e = k; pj = pp; ln = len[k] - elenk; }
                else { e = ci[pp++]; pj = cp[e]; ln = len[e]; }
                for (int k2 = 1; k2 <= ln; k2++)
                {
                    int i = ci[pj++];
                    int nvi = nv[i];
                    if (nvi <= 0) continue;
                    dk += nvi;
                    nv[i] = -nvi;
                    ci[pk2++] = i;
                    if (next[i] != -1) last[next[i]] = last[i];
                    if (last[i] != -1) next[last[i]] = next[i];
                    else head[degree[i]] = next[i];
                }
                if (e != k) { cp[e] = Flip(k); w[e] = 0; }
            }
            if (elenk != 0) cnz = pk2;
            degree[k] = dk;
            cp[k] = pk1;
            len[k] = pk2 - pk1;
            elen[k] = -2;

            // set differences |Le \ Lk| for elements adjacent to the new element
            mark = WClear(mark, lemax, w, n);
            for (int pk = pk1; pk < pk2; pk++)
            {
                int i = ci[pk];
                int eln = elen[i];
                if (eln <= 0) continue;
                int nvi = -nv[i];
                int wnvi = mark - nvi;
                for (int p = cp[i]; p <= cp[i] + eln - 1; p++)
                {
                    int e = ci[p];
                    if (w[e] >= mark) w[e] -= nvi;
                    else if (w[e] != 0) w[e] = degree[e] + wnvi;
                }
            }

            // approximate degree update, element absorption
            for (int pk = pk1; pk < pk2; pk++)
            {
                int i = ci[pk];
                int p1 = cp[i], p2 = p1 + elen[i] - 1, pn = p1;
                long h = 0;
                int d = 0;
                for (int p = p1; p <= p2; p++)
                {
                    int e = ci[p];
                    if (w[e] != 0)
                    {
                        int dext = w[e] - mark;
                        if (dext > 0) { d += dext; ci[pn++] = e; h += e; }
                        else { cp[e] = Flip(k); w[e] = 0; } // aggressive absorption
                    }
                }
                elen[i] = pn - p1 + 1;
                int p3 = pn, p4 = p1 + len[i];
                for (int p = p2 + 1; p < p4; p++)
                {
                    int j = ci[p];
                    int nvj = nv[j];
                    if (nvj <= 0) continue;
                    d += nvj; ci[pn++] = j; h += j;
                }
                if (d == 0)
                {
                    // mass elimination
                    cp[i] = Flip(k);
                    int nvi = -nv[i];
                    dk -= nvi; nvk += nvi; nel += nvi;
                    nv[i] = 0; elen[i] = -1;
                }
                else
                {
                    degree[i] = Math.Min(degree[i], d);
                    ci[pn] = ci[p3];
                    ci[p3] = ci[p1];
                    ci[p1] = k;
                    len[i] = pn - p1 + 1;
                    int hh = (int)(h % n);
                    next[i] = hhead[hh]; hhead[hh] = i; last[i] = hh;
                }
            }
            degree[k] = dk;
            lemax = Math.Max(lemax, dk);
            mark = WClear(mark + lemax, lemax, w, n);

            // supervariable detection
            for (int pk = pk1; pk < pk2; pk++)
            {
                int i = ci[pk];
                if (nv[i] >= 0) continue;
                int hh = last[i];
                i = hhead[hh];
                hhead[hh] = -1;
                for (; i != -1 && next[i] != -1; i = next[i], mark++)
                {
                    int ln = len[i], eln = elen[i];
                    for (int p = cp[i] + 1; p <= cp[i] + ln - 1; p++) w[ci[p]] = mark;
                    int jlast = i;
                    for (int j = next[i]; j != -1;)
                    {
                        bool ok = len[j] == ln && elen[j] == eln;
                        for (int p = cp[j] + 1; ok && p <= cp[j] + ln - 1; p++) if (w[ci[p]] != mark) ok = false;
                        if (ok)
                        {
                            cp[j] = Flip(i);
                            nv[i] += nv[j];
                            nv[j] = 0;
                            elen[j] = -1;
                            j = next[j];
                            next[jlast] = j;
                        }
                        else { jlast = j; j = next[j]; }
                    }
                }
            }

            // finalize the new element
            int pw = pk1;
            for (int pk = pk1; pk < pk2; pk++)
            {
                int i = ci[pk];
                int nvi = -nv[i];
                if (nvi <= 0) continue;
                nv[i] = nvi;
                int d = degree[i] + dk - nvi;
                d = Math.Min(d, n - nel - nvi);
                if (head[d] != -1) last[head[d]] = i;
                next[i] = head[d]; last[i] = -1; head[d] = i;
                mindeg = Math.Min(mindeg, d);
                degree[i] = d;
                ci[pw++] = i;
            }
            nv[k] = nvk;
            if ((len[k] = pw - pk1) == 0) { cp[k] = -1; w[k] = 0; }
            if (elenk != 0) cnz = pw;
        }

        // postorder the assembly tree
        for (int i = 0; i < n; i++) cp[i] = Flip(cp[i]);
        for (int j = 0; j <= n; j++) head[j] = -1;
        for (int j = n; j >= 0; j--)
        {
            if (nv[j] > 0) continue;
            next[j] = head[cp[j]]; head[cp[j]] = j;
        }
        for (int e = n; e >= 0; e--)
        {
            if (nv[e] <= 0) continue;
            if (cp[e] != -1) { next[e] = head[cp[e]]; head[cp[e]] = e; }
        }
        var perm = new int[n + 1];
        for (int k = 0, i = 0; i <= n; i++)
            if (cp[i] == -1) k = TreeDfs(i, k, head, next, perm, w);
        Array.Resize(ref perm, n);
        return perm;
    }

    private static int WClear(int mark, int lemax, int[] w, int n)
    {
        if (mark < 2 || mark + lemax < 0)
        {
            for (int k = 0; k < n; k++) if (w[k] != 0) w[k] = 1;
            mark = 2;
        }
        return mark;
    }

    /// <summary>Depth-first postorder of the tree rooted at j (Davis 2006, sec. 4.3); returns the next free slot.</summary>
    internal static int TreeDfs(int j, int k, int[] head, int[] next, int[] post, int[] stack)
    {
        int top = 0;
        stack[0] = j;
        while (top >= 0)
        {
            int p = stack[top];
            int i = head[p];
            if (i == -1) { top--; post[k++] = p; }
            else { head[p] = next[i]; stack[++top] = i; }
        }
        return k;
    }
}
