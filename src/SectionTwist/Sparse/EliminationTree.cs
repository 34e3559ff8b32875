namespace SectionTwist.Sparse;

/// <summary>
/// Elimination tree, postorder, row-subtree reach and column counts of the Cholesky factor of a symmetric matrix
/// (Davis, Direct Methods for Sparse Linear Systems, SIAM 2006, ch. 4.1-4.5). The matrix is given in full symmetric
/// storage with sorted row indices; only entries with row &lt; column (the upper triangle) are read for the tree,
/// and entries with row &gt; column for the counts.
/// </summary>
internal static class EliminationTree
{
    /// <summary>parent[j] of the elimination tree, -1 for a root (Liu's algorithm with path compression, Davis sec. 4.1).</summary>
    public static int[] Parents(int n, int[] cp, int[] ci)
    {
        var parent = new int[n];
        var ancestor = new int[n];
        for (int k = 0; k < n; k++)
        {
            parent[k] = -1; ancestor[k] = -1;
            for (int p = cp[k]; p < cp[k + 1]; p++)
            {
                int i = ci[p];
                if (i >= k) break; // rows sorted: upper part only
                Climb(parent, ancestor, i, k);
            }
        }
        return parent;
    }

    /// <summary>
    /// Liu's climb from row i toward column k with path compression: every node passed gets k as its virtual ancestor,
    /// and the root reached (one without an ancestor) gets k as its parent (Davis, Direct Methods for Sparse Linear
    /// Systems, 2006, sec. 4.1).
    /// </summary>
    [System.Runtime.CompilerServices.MethodImpl(System.Runtime.CompilerServices.MethodImplOptions.AggressiveInlining)]
    private static void Climb(int[] parent, int[] ancestor, int i, int k)
    {
        while (i != -1 && i < k)
        {
            int inext = ancestor[i];
            ancestor[i] = k;
            if (inext == -1) { parent[i] = k; break; }
            i = inext;
        }
    }

    /// <summary>
    /// parent[k] of the elimination tree of P A P' (perm[k] = original index of the k-th pivot, pinv its inverse)
    /// read straight from A, without forming P A P' (Liu's algorithm as in <see cref="Parents"/>; rows need no order).
    /// For a principal submatrix of A, <paramref name="perm"/> holds the columns of A of its pivots (fewer than A's
    /// order) and <paramref name="pinv"/> -1 for the rows of A outside it.
    /// </summary>
    public static int[] ParentsPermuted(CscMatrix a, int[] perm, int[] pinv)
    {
        int n = perm.Length;
        int[] cp = a.ColPtr, ci = a.RowIdx;
        var parent = new int[n];
        var ancestor = new int[n];
        for (int k = 0; k < n; k++)
        {
            parent[k] = -1; ancestor[k] = -1;
            int c = perm[k];
            for (int p = cp[c]; p < cp[c + 1]; p++)
            {
                Climb(parent, ancestor, pinv[ci[p]], k);
            }
        }
        return parent;
    }

    /// <summary>Depth-first postorder of a forest given by parent pointers (Davis sec. 4.3).</summary>
    public static int[] Postorder(int[] parent)
    {
        int n = parent.Length;
        var head = new int[n];
        var next = new int[n];
        var stack = new int[n];
        var post = new int[n];
        Array.Fill(head, -1);
        for (int j = n - 1; j >= 0; j--)
        {
            if (parent[j] == -1) continue;
            next[j] = head[parent[j]];
            head[parent[j]] = j;
        }
        int k = 0;
        for (int j = 0; j < n; j++)
            if (parent[j] == -1) k = Amd.TreeDfs(j, k, head, next, post, stack);
        return post;
    }

    /// <summary>
    /// Column counts of L (diagonal included) by the skeleton-matrix / least-common-ancestor method of Gilbert, Ng and
    /// Peyton (1994) as given in Davis sec. 4.5; O(nnz(A) alpha(n)) time.
    /// </summary>
    public static int[] ColumnCounts(int n, int[] cp, int[] ci, int[] parent, int[] post)
    {
        var delta = new int[n];
        var first = new int[n];
        var maxfirst = new int[n];
        var prevleaf = new int[n];
        var ancestor = new int[n];
        Array.Fill(first, -1);
        Array.Fill(maxfirst, -1);
        Array.Fill(prevleaf, -1);
        for (int k = 0; k < n; k++)
        {
            int j = post[k];
            delta[j] = first[j] == -1 ? 1 : 0;
            for (; j != -1 && first[j] == -1; j = parent[j]) first[j] = k;
        }
        for (int i = 0; i < n; i++) ancestor[i] = i;
        for (int k = 0; k < n; k++)
        {
            int j = post[k];
            if (parent[j] != -1) delta[parent[j]]--;
            // row j of the upper triangle = entries i > j of column j
            for (int p = cp[j + 1] - 1; p >= cp[j]; p--)
            {
                int i = ci[p];
                if (i <= j) break;
                if (first[j] <= maxfirst[i]) continue;
                maxfirst[i] = first[j];
                int jprev = prevleaf[i];
                prevleaf[i] = j;
                delta[j]++;
                if (jprev == -1) continue;
                int q = jprev;
                while (q != ancestor[q]) q = ancestor[q];
                for (int s = jprev; s != q;)
                {
                    int sp = ancestor[s];
                    ancestor[s] = q;
                    s = sp;
                }
                delta[q]--;
            }
            if (parent[j] != -1) ancestor[j] = parent[j];
        }
        for (int j = 0; j < n; j++)
            if (parent[j] != -1) delta[parent[j]] += delta[j];
        return delta;
    }

    /// <summary>
    /// Nonzero pattern of row k of L (excluding the diagonal) as the reach of the upper part of column k in the
    /// elimination tree (Davis sec. 4.2). Returns <c>top</c>; the pattern is <c>s[top..n)</c> in topological order.
    /// <paramref name="w"/> must be all-false on entry and is restored on exit.
    /// </summary>
    public static int Reach(int n, int[] cp, int[] ci, int k, int[] parent, int[] s, bool[] w)
    {
        int top = n;
        w[k] = true;
        for (int p = cp[k]; p < cp[k + 1]; p++)
        {
            int i = ci[p];
            if (i > k) break;
            int len = 0;
            for (; !w[i]; i = parent[i]) { s[len++] = i; w[i] = true; }
            while (len > 0) s[--top] = s[--len];
        }
        for (int p = top; p < n; p++) w[s[p]] = false;
        w[k] = false;
        return top;
    }
}
