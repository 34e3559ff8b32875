using SectionTwist.Sparse;

namespace SectionTwist.Tests.Sparse;

public class DenseKernelTests
{
    // The blocked kernels against plain triple loops on random data; tolerances are round-off bounds for sums of
    // at most a few hundred products of numbers of order 1 (common practice, no source).

    [Theory]
    [InlineData(1, 1, 0)]
    [InlineData(3, 2, 1)]
    [InlineData(8, 4, 5)]
    [InlineData(13, 7, 9)]
    [InlineData(37, 21, 200)] // crosses the depth block
    [InlineData(300, 60, 100)] // large enough for two threads
    [InlineData(41, 41, 3)]
    public void LowerProductMatchesTripleLoop(int m, int ncols, int k)
    {
        bool accelerated = SyrkKernel.Accelerated;
        try
        {
            foreach (bool fast in new[] { true, false })
            {
                SyrkKernel.Accelerated = fast && accelerated; // the portable path too
                CheckLowerProduct(m, ncols, k);
            }
        }
        finally
        {
            SyrkKernel.Accelerated = accelerated;
        }
    }

    private static void CheckLowerProduct(int m, int ncols, int k)
    {
        var rng = new Random(m * 1000 + k);
        int lda = m + 3, ldc = m + 1;
        var a = new double[5 + lda * Math.Max(k, 1)];
        for (int i = 0; i < a.Length; i++) a[i] = rng.NextDouble() - 0.5;
        foreach (bool overwrite in new[] { true, false })
        {
            var c = new double[2 + ldc * ncols];
            for (int i = 0; i < c.Length; i++) c[i] = rng.NextDouble();
            var before = (double[])c.Clone();
            SyrkKernel.LowerProductParallel(a, 5, lda, m, k, c, 2, ldc, overwrite, ncols);
            for (int j = 0; j < ncols; j++)
                for (int i = j; i < m; i++)
                {
                    double s = 0;
                    for (int t = 0; t < k; t++) s += a[5 + i + t * lda] * a[5 + j + t * lda];
                    double expected = overwrite ? -s : before[2 + i + j * ldc] - s;
                    Assert.True(Math.Abs(c[2 + i + j * ldc] - expected) < 1e-12 * (1 + k), $"C[{i},{j}] overwrite {overwrite}");
                }
            Assert.Equal(before[0], c[0]); // nothing before the block is touched
        }
    }

    [Theory]
    [InlineData(5, 5)]
    [InlineData(70, 45)]
    [InlineData(200, 100)]
    public void FactorPanelMatchesDenseCholesky(int nr, int nc)
    {
        var rng = new Random(nr + nc);
        // A = B B' + nr I on the nr x nc column block (lower trapezoid)
        var bm = new double[nr * nc];
        for (int i = 0; i < bm.Length; i++) bm[i] = rng.NextDouble() - 0.5;
        var l = new double[3 + nr * nc];
        for (int j = 0; j < nc; j++)
            for (int i = j; i < nr; i++)
            {
                double s = i == j ? nr : 0;
                for (int t = 0; t < nc; t++) s += bm[i + t * nr] * bm[j + t * nr];
                l[3 + i + j * nr] = s;
            }
        var a = (double[])l.Clone();
        Assert.Equal(-1, DenseKernels.FactorPanel(l, 3, nr, nc));
        // L L' reproduces A on the lower trapezoid
        for (int j = 0; j < nc; j++)
            for (int i = j; i < nr; i++)
            {
                double s = 0;
                for (int t = 0; t <= j; t++) s += l[3 + i + t * nr] * l[3 + j + t * nr];
                Assert.True(Math.Abs(s - a[3 + i + j * nr]) < 1e-10 * nr, $"(L L')[{i},{j}]");
            }
    }

    [Fact]
    public void FactorPanelReportsTheFailingPivot()
    {
        int n = 20;
        var l = new double[n * n];
        for (int i = 0; i < n; i++) l[i + i * n] = i == 17 ? -1 : 1;
        Assert.Equal(17, DenseKernels.FactorPanel(l, 0, n, n));
    }

    [Fact]
    public void RelabelledTreeIsTheTreeOfThePostorderedMatrix()
    {
        var a = ReferenceProblems.P2Laplacian(20, out _);
        foreach (var ord in new[] { FillOrdering.Amd, FillOrdering.Natural })
        {
            var s = SymbolicCholesky.Analyze(a, ord);
            Assert.Equal(EliminationTree.Parents(a.N, s.Fp, s.Fi), s.Parent);
        }
    }

    [Fact]
    public void SupernodalEqualsSimplicialWithWideSupernodes()
    {
        // nested dissection at 14,161 unknowns: separator supernodes wider than one panel block, updates on two threads
        var a = ReferenceProblems.P2Laplacian(60, out var coords);
        var (x, b) = SparseTestUtil.Manufactured(a);
        var s = SymbolicCholesky.Analyze(a, FillOrdering.NestedDissection, coords);
        Assert.Contains(Enumerable.Range(0, s.Supernodes.Count), k => s.Supernodes.Start[k + 1] - s.Supernodes.Start[k] > 2 * DenseKernels.PanelBlock);
        Assert.True(s.Flops >= SupernodalFactorizer.ParallelWork);
        var split = SubtreeSplit.Choose(s.Supernodes);
        Assert.NotNull(split); // the two-thread phase runs (on a machine with two or more cores)
        var owner = new int[s.Supernodes.Count];
        for (int t = 0; t < 2; t++)
            foreach (int r in split[t])
                for (int k = split.First[r]; k <= r; k++) { Assert.Equal(0, owner[k]); owner[k] = t + 1; }
        Assert.Contains(1, owner);
        Assert.Contains(2, owner);
        SparseTestUtil.AssertSupernodalMatchesSimplicial(a, s, b, x);
    }

    [Fact]
    public void ParallelFactorizationReportsAnIndefiniteMatrix()
    {
        var a = ReferenceProblems.P2Laplacian(60, out var coords);
        var s = SymbolicCholesky.Analyze(a, FillOrdering.NestedDissection, coords);
        // flip the sign of the first pivot's diagonal entry: it lies in a subtree of the two-thread phase
        int c = s.Perm[0];
        for (int p = a.ColPtr[c]; p < a.ColPtr[c + 1]; p++) if (a.RowIdx[p] == c) a.Values[p] = -a.Values[p];
        var e = Assert.Throws<SectionTwistException>(() => SupernodalCholesky.Factorize(s, a));
        Assert.Contains("not positive definite", e.Message);
    }
}
