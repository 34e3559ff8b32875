using SectionTwist.Sparse;

namespace SectionTwist.Tests.Sparse;

public class CholeskyTests
{
    // Check against the definition: b = A x for a chosen x, the solve must give x back (residual check, no outside
    // reference needed); tolerances are common practice for double precision on well-conditioned systems, no source.
    [Theory]
    [InlineData(1)]
    [InlineData(3)]
    [InlineData(12)]
    public void SimplicialSolvesP2LaplacianToRoundoff(int m)
    {
        var a = ReferenceProblems.P2Laplacian(m, out _);
        var (x, b) = SparseTestUtil.Manufactured(a);
        var s = SymbolicCholesky.Analyze(a, FillOrdering.Amd);
        var f = SimplicialCholesky.Factorize(s, a);
        var sol = new double[a.N];
        f.Solve(b, sol);
        Assert.True(a.RelativeResidual(sol, b) < 1e-13, $"residual {a.RelativeResidual(sol, b)}");
        Assert.True(SparseTestUtil.RelativeError(sol, x) < 1e-10);
    }

    [Theory]
    [InlineData(50, 3, 1)]
    [InlineData(400, 4, 2)]
    [InlineData(2000, 2, 3)]
    public void SolvesRandomSpdMatrices(int n, int perRow, int seed)
    {
        var a = ReferenceProblems.RandomSpd(n, perRow, seed);
        var (x, b) = SparseTestUtil.Manufactured(a, seed);
        foreach (var ord in new[] { FillOrdering.Natural, FillOrdering.Amd })
        {
            var f = SimplicialCholesky.Factorize(SymbolicCholesky.Analyze(a, ord), a);
            var sol = new double[n];
            f.Solve(b, sol);
            Assert.True(a.RelativeResidual(sol, b) < 1e-13);
            Assert.True(SparseTestUtil.RelativeError(sol, x) < 1e-11);
        }
    }

    [Theory]
    [InlineData(0, 2)]
    [InlineData(9, 2)]
    [InlineData(9, 1)]
    [InlineData(14, 1)]
    [InlineData(20, 2)]
    public void ColumnCountsMatchBruteForceElimination(int m, int orderingCode)
    {
        // The symbolic column counts must equal the structural count of dense symbolic elimination (Davis 2006 sec. 4.5).
        var a = m == 0 ? ReferenceProblems.RandomSpd(300, 3, 7) : ReferenceProblems.P2Laplacian(m, out _);
        int n = a.N;
        var s = SymbolicCholesky.Analyze(a, (FillOrdering)orderingCode);
        var f = SimplicialCholesky.Factorize(s, a);
        var dense = new double[n];
        // Solve with unit vectors and compare to inverse-times-A identity on a few columns as a cross-check.
        for (int c = 0; c < n; c += 37)
        {
            var e = new double[n]; e[c] = 1;
            var ae = new double[n];
            a.Multiply(e, ae);
            f.Solve(ae, dense);
            for (int i = 0; i < n; i++) Assert.Equal(i == c ? 1.0 : 0.0, dense[i], 10);
        }
        // counts via brute-force dense symbolic elimination
        var pinv = new int[n];
        for (int k = 0; k < n; k++) pinv[s.Perm[k]] = k;
        var pat = new bool[n, n];
        for (int c = 0; c < n; c++)
            for (int p = a.ColPtr[c]; p < a.ColPtr[c + 1]; p++) pat[pinv[a.RowIdx[p]], pinv[c]] = true;
        for (int k = 0; k < n; k++)
        {
            int count = 0;
            for (int i = k; i < n; i++)
            {
                if (!pat[i, k]) continue;
                count++;
                for (int j = k + 1; j <= i; j++) if (pat[j, k]) { pat[i, j] = true; pat[j, i] = true; }
            }
            Assert.Equal(count, (int)(s.Lp[k + 1] - s.Lp[k]));
        }
    }

    [Fact]
    public void NotPositiveDefiniteIsReported()
    {
        var t = new TripletMatrix(2);
        t.Add(0, 0, 1); t.Add(1, 1, 1); t.Add(0, 1, 2); t.Add(1, 0, 2);
        var a = t.ToCsc();
        var ex = Assert.Throws<SectionTwistException>(() => SpdSolver.Create(a));
        Assert.Equal("not-positive-definite", ex.Code);
    }

    [Fact]
    public void CancellationIsHonoured()
    {
        var a = ReferenceProblems.P2Laplacian(20, out _);
        using var cts = new CancellationTokenSource();
        cts.Cancel();
        Assert.ThrowsAny<OperationCanceledException>(() => SpdSolver.Create(a, cts.Token));
    }

    [Fact]
    public void P2StiffnessIsExactForQuadratics()
    {
        // u = x^2 + 3xy - y^2 lies in the P2 space, so u' K u = integral |grad u|^2 exactly. On the triangle
        // (0,0),(1,0),(0,1): grad u = (2x + 3y, 3x - 2y); the integral of |grad u|^2 = 13 (x^2 + y^2) over the triangle
        // is 13 (1/12 + 1/12) = 13/6 (moments of the unit right triangle, elementary calculus).
        double[] x = [0, 1, 0, 0.5, 0.5, 0], y = [0, 0, 1, 0, 0.5, 0.5];
        var k = new double[36];
        ReferenceProblems.P2Stiffness(x.AsSpan(0, 3), y.AsSpan(0, 3), k);
        var u = new double[6];
        for (int i = 0; i < 6; i++) u[i] = x[i] * x[i] + 3 * x[i] * y[i] - y[i] * y[i];
        double e = 0;
        for (int i = 0; i < 6; i++) for (int j = 0; j < 6; j++) e += u[i] * k[6 * i + j] * u[j];
        Assert.Equal(13.0 / 6.0, e, 12);
        for (int i = 0; i < 6; i++)
        {
            double rs = 0;
            for (int j = 0; j < 6; j++) rs += k[6 * i + j];
            Assert.Equal(0.0, rs, 12); // constants are in the kernel
        }
    }
}
