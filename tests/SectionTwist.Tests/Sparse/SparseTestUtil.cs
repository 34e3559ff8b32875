using SectionTwist.Sparse;

namespace SectionTwist.Tests.Sparse;

internal static class SparseTestUtil
{
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
