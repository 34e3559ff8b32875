using SectionTwist.Sparse;

namespace SectionTwist.Tests.Sparse;

public class OrderingTests
{
    [Theory]
    [InlineData(1)]
    [InlineData(6)]
    [InlineData(25)]
    public void AmdIsAPermutation(int m)
    {
        var a = ReferenceProblems.P2Laplacian(m, out _);
        Assert.True(SparseTestUtil.IsPermutation(Amd.Order(a), a.N));
    }

    [Fact]
    public void AmdHandlesDenseRowsAndIsolatedNodes()
    {
        // arrow matrix: node 0 couples to all (a dense row), plus an isolated diagonal node
        int n = 400;
        var t = new TripletMatrix(n);
        for (int i = 0; i < n - 1; i++) t.Add(i, i, 4);
        t.Add(n - 1, n - 1, 1);
        for (int i = 1; i < n - 1; i++) { t.Add(0, i, -0.001); t.Add(i, 0, -0.001); }
        for (int i = 1; i < n - 2; i++) { t.Add(i, i + 1, -1); t.Add(i + 1, i, -1); }
        var a = t.ToCsc();
        var p = Amd.Order(a);
        Assert.True(SparseTestUtil.IsPermutation(p, n));
        var s = SymbolicCholesky.Analyze(a, FillOrdering.Amd);
        // a tridiagonal chain plus one dense row ordered last has no fill: nnz(L) <= nnz(lower A)
        Assert.True(s.NonZerosL <= (a.NonZeros + n) / 2, $"nnz(L) = {s.NonZerosL}");
    }

    [Fact]
    public void AmdFillIsFarBelowNaturalOrderingOnAGrid()
    {
        // Minimum-degree type orderings reduce fill on 2D grids far below the banded natural ordering
        // (Davis 2006, ch. 7; George and Liu, Computer Solution of Large Sparse Positive Definite Systems, 1981).
        var a = ReferenceProblems.P2Laplacian(20, out _);
        var nat = SymbolicCholesky.Analyze(a, FillOrdering.Natural);
        var amd = SymbolicCholesky.Analyze(a, FillOrdering.Amd);
        Assert.True(amd.NonZerosL < 0.6 * nat.NonZerosL, $"amd {amd.NonZerosL} natural {nat.NonZerosL}");
        Assert.True(amd.Flops < 0.5 * nat.Flops, $"amd {amd.Flops} natural {nat.Flops}");
    }
}

public class NestedDissectionTests
{
    [Fact]
    public void GeometricAndGraphDissectionArePermutationsWithLessFillThanNatural()
    {
        // m = 35 gives 4,761 unknowns, above the AMD leaf size, so at least one separator level is built.
        var a = ReferenceProblems.P2Laplacian(35, out var xy);
        var nat = SymbolicCholesky.Analyze(a, FillOrdering.Natural);
        foreach (var coords in new[] { xy, null })
        {
            var p = NestedDissection.Order(a, coords);
            Assert.True(SparseTestUtil.IsPermutation(p, a.N));
            var s = SymbolicCholesky.Analyze(a, FillOrdering.NestedDissection, coords);
            Assert.True(s.NonZerosL < 0.6 * nat.NonZerosL, $"nd {s.NonZerosL} natural {nat.NonZerosL}");
            var (x, b) = SparseTestUtil.Manufactured(a);
            var sol = new double[a.N];
            SpdSolver.Factorize(s, a).Solve(b, sol);
            Assert.True(SparseTestUtil.RelativeError(sol, x) < 1e-10);
        }
    }
}
