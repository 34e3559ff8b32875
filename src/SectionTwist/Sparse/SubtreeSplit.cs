namespace SectionTwist.Sparse;

/// <summary>
/// Two disjoint sets of subtrees of the supernodal elimination tree with about equal factorization work, for the
/// two-thread phase of <see cref="SupernodalFactorizer"/>. Starting from the roots, the heaviest subtree of the list is
/// replaced by its children (its root moves to the sequential top part) until a longest-processing-time assignment of
/// the list to two bins is balanced (Geist and Ng, "Task scheduling for parallel sparse Cholesky factorization",
/// Int. J. Parallel Programming 18(4), 1989: the subtree-to-subcube mapping with work-balanced bins).
/// In a postordered tree a subtree is the contiguous range [<see cref="First"/>[r], r].
/// </summary>
internal sealed class SubtreeSplit
{
    private readonly List<int>[] _bins;

    private SubtreeSplit(List<int>[] bins, int[] first)
    {
        _bins = bins; First = first;
    }

    /// <summary>First (lowest) supernode of the subtree rooted at each supernode.</summary>
    public int[] First { get; }

    /// <summary>Subtree roots of bin <paramref name="t"/> (0 or 1), ascending.</summary>
    public List<int> this[int t] => _bins[t];

    /// <summary>Bins differing by at most this fraction of their sum count as balanced.</summary>
    public const double Imbalance = 0.1;

    /// <summary>
    /// The split, or null when none leaves at least half of the work to the two threads (a chain-like tree).
    /// </summary>
    public static SubtreeSplit? Choose(Supernodes sn)
    {
        int ns = sn.Count;
        int[] parent = sn.Parent, start = sn.Start;
        var work = new double[ns];
        var first = new int[ns];
        var childHead = new int[ns];
        var childNext = new int[ns];
        Array.Fill(childHead, -1);
        double total = 0;
        for (int k = 0; k < ns; k++) first[k] = k;
        for (int k = 0; k < ns; k++)
        {
            double nc = start[k + 1] - start[k], nr = sn.RowPtr[k + 1] - sn.RowPtr[k];
            work[k] += nc * nr * nr;
            total += nc * nr * nr;
            int p = parent[k];
            if (p >= 0)
            {
                work[p] += work[k];
                first[p] = Math.Min(first[p], first[k]);
                childNext[k] = childHead[p]; childHead[p] = k;
            }
        }
        var list = new List<int>();
        for (int k = 0; k < ns; k++) if (parent[k] < 0) list.Add(k);
        for (int iter = 0; iter < 256; iter++)
        {
            list.Sort((x, y) => work[y].CompareTo(work[x]));
            double b0 = 0, b1 = 0, inList = 0;
            foreach (int r in list)
            {
                if (b0 <= b1) b0 += work[r]; else b1 += work[r];
                inList += work[r];
            }
            if (inList < 0.5 * total) return null;
            if (Math.Abs(b0 - b1) <= Imbalance * inList && list.Count >= 2) return Build(list, work, first);
            int big = list[0];
            if (childHead[big] < 0) return null;
            list.RemoveAt(0);
            for (int ch = childHead[big]; ch >= 0; ch = childNext[ch]) list.Add(ch);
        }
        return null;
    }

    private static SubtreeSplit Build(List<int> list, double[] work, int[] first)
    {
        var bins = new[] { new List<int>(), new List<int>() };
        double b0 = 0, b1 = 0;
        foreach (int r in list) // sorted heaviest first
        {
            if (b0 <= b1) { bins[0].Add(r); b0 += work[r]; }
            else { bins[1].Add(r); b1 += work[r]; }
        }
        bins[0].Sort();
        bins[1].Sort();
        return new SubtreeSplit(bins, first);
    }
}
