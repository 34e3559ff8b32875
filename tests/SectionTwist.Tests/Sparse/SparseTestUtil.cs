using SectionTwist.Sparse;

namespace SectionTwist.Tests.Sparse;

internal static class SparseTestUtil
{
    /// <summary>
    /// The supernodal and the simplicial factorization of the same analysis solve A x = b alike: residual below 1e-13,
    /// the two answers within 1e-11 of each other and within 1e-10 of the manufactured solution.
    /// </summary>
    public static void AssertSupernodalMatchesSimplicial(CscMatrix a, SymbolicCholesky s, double[] b, double[] x)
    {
        var x1 = new double[a.N];
        var x2 = new double[a.N];
        SimplicialCholesky.Factorize(s, a).Solve(b, x1);
        SupernodalCholesky.Factorize(s, a).Solve(b, x2);
        Xunit.Assert.True(a.RelativeResidual(x2, b) < 1e-13);
        Xunit.Assert.True(RelativeError(x2, x1) < 1e-11);
        Xunit.Assert.True(RelativeError(x2, x) < 1e-10);
    }

    /// <summary>Manufactured solution x (smooth plus noise) and its right-hand side b = A x.</summary>
    public static (double[] X, double[] B) Manufactured(CscMatrix a, int seed = 1)
    {
        var rng = new Random(seed);
        var x = new double[a.N];
        for (int i = 0; i < a.N; i++) x[i] = Math.Sin(0.37 * i) + rng.NextDouble();
        var b = new double[a.N];
        a.Multiply(x, b);
        return (x, b);
    }

    public static double RelativeError(double[] x, double[] exact)
    {
        double e = 0, n = 0;
        for (int i = 0; i < x.Length; i++) { e += (x[i] - exact[i]) * (x[i] - exact[i]); n += exact[i] * exact[i]; }
        return Math.Sqrt(e / n);
    }

    public static bool IsPermutation(int[] p, int n)
    {
        if (p.Length != n) return false;
        var seen = new bool[n];
        foreach (int i in p)
        {
            if (i < 0 || i >= n || seen[i]) return false;
            seen[i] = true;
        }
        return true;
    }
}
