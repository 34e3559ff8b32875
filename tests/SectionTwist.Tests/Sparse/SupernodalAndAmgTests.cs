using SectionTwist.Sparse;

namespace SectionTwist.Tests.Sparse;

public class SupernodalAndAmgTests
{
    // Residual and cross-method checks on manufactured solutions (b = A x); tolerances are common practice, no source.

    [Theory]
    [InlineData(4)]
    [InlineData(20)]
    public void SupernodalEqualsSimplicial(int m)
    {
        var a = ReferenceProblems.P2Laplacian(m, out _);
        var (x, b) = SparseTestUtil.Manufactured(a);
        var s = SymbolicCholesky.Analyze(a, FillOrdering.Amd);
        SparseTestUtil.AssertSupernodalMatchesSimplicial(a, s, b, x);
    }

    [Fact]
    public void SupernodalSolvesRandomSpd()
    {
        var a = ReferenceProblems.RandomSpd(1500, 3, 11);
        var (x, b) = SparseTestUtil.Manufactured(a);
        var sol = new double[a.N];
        SupernodalCholesky.Factorize(SymbolicCholesky.Analyze(a, FillOrdering.Amd), a).Solve(b, sol);
        Assert.True(a.RelativeResidual(sol, b) < 1e-13);
        Assert.True(SparseTestUtil.RelativeError(sol, x) < 1e-11);
    }

    [Fact]
    public void SupernodesPartitionTheColumns()
    {
        var a = ReferenceProblems.P2Laplacian(15, out _);
        var sn = SymbolicCholesky.Analyze(a, FillOrdering.Amd).Supernodes;
        Assert.Equal(0, sn.Start[0]);
        Assert.Equal(a.N, sn.Start[sn.Count]);
        for (int k = 0; k < sn.Count; k++)
        {
            Assert.True(sn.Start[k + 1] > sn.Start[k]);
            Assert.True(sn.Parent[k] == -1 || sn.Parent[k] > k);
        }
        Assert.True(sn.Count < a.N / 2, $"{sn.Count} supernodes for {a.N} columns"); // P2 grids give wide supernodes
    }

    [Fact]
    public void AmgCgAgreesWithTheDirectSolve()
    {
        // m = 40 gives 6,241 unknowns: above the coarse size, so at least two levels are exercised.
        var a = ReferenceProblems.P2Laplacian(40, out _);
        var (x, b) = SparseTestUtil.Manufactured(a);
        var direct = new double[a.N];
        SpdSolver.CreateDirect(a).Solve(b, direct);
        var cg = AmgCgSolver.Create(a, 1e-10);
        Assert.True(cg.Hierarchy.Levels.Count >= 2);
        var sol = new double[a.N];
        cg.Solve(b, sol);
        Assert.True(a.RelativeResidual(sol, b) <= 1e-10, $"residual {a.RelativeResidual(sol, b)}");
        Assert.True(cg.LastIterations < 40, $"{cg.LastIterations} iterations");
        Assert.True(SparseTestUtil.RelativeError(sol, direct) < 1e-7);
    }

    [Fact]
    public void AmgCgSolvesRandomSpd()
    {
        var a = ReferenceProblems.RandomSpd(5000, 3, 5);
        var (_, b) = SparseTestUtil.Manufactured(a);
        var sol = new double[a.N];
        AmgCgSolver.Create(a, 1e-10).Solve(b, sol);
        Assert.True(a.RelativeResidual(sol, b) <= 1e-10);
    }

    [Fact]
    public void AmgCgHonoursCancellation()
    {
        var a = ReferenceProblems.P2Laplacian(40, out _);
        using var cts = new CancellationTokenSource();
        cts.Cancel();
        Assert.ThrowsAny<OperationCanceledException>(() => AmgCgSolver.Create(a, 1e-10, cts.Token));
    }

    // An unreachable tolerance is not an error: the iteration stops at the rounding floor of the residual,
    // u || |b| + |A||x| || / ||b|| times the floor factor (Higham, Accuracy and Stability, sec. 3.5), and says so.
    [Fact]
    public void AmgCgStopsAtTheRoundingFloorInsteadOfFailing()
    {
        var a = ReferenceProblems.P2Laplacian(40, out _);
        var (_, b) = SparseTestUtil.Manufactured(a);
        var direct = new double[a.N];
        SpdSolver.CreateDirect(a).Solve(b, direct);
        var cg = AmgCgSolver.Create(a, 1e-30);
        var sol = new double[a.N];
        cg.Solve(b, sol);
        var o = cg.LastOutcome;
        Assert.True(o.Converged, o.ToString());
        Assert.True(o.Floor > 0 && o.RelativeResidual <= o.Floor, o.ToString());
        Assert.True(o.Floor < 1e-12, o.ToString());
        Assert.True(SparseTestUtil.RelativeError(sol, direct) < 1e-9);
    }

    // A stalled iteration (here: cut off after 2 iterations) hands the system to the sparse Cholesky factorization.
    [Fact]
    public void StalledIterationFallsBackToCholesky()
    {
        var a = ReferenceProblems.P2Laplacian(40, out _);
        var (x, b) = SparseTestUtil.Manufactured(a);
        var solver = new SpdSolver.IterativeWithFallback(a, AmgCgSolver.Create(a, 1e-10, default, maxIterations: 2), default);
        var sol = new double[a.N];
        solver.Solve(b, sol);
        Assert.False(solver.Iterative.LastOutcome.Converged);
        Assert.True(solver.UsedFallback);
        Assert.True(a.RelativeResidual(sol, b) <= 1e-12, $"residual {a.RelativeResidual(sol, b)}");
        Assert.True(SparseTestUtil.RelativeError(sol, x) < 1e-8);
    }
}
