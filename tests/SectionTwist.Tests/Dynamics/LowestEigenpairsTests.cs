using MathNet.Numerics.LinearAlgebra;
using SectionTwist.Dynamics;
using Xunit;

namespace SectionTwist.Tests.Dynamics;

/// <summary>The lowest-eigenpair solver against Math.NET's full symmetric decomposition and exact spectra.</summary>
public class LowestEigenpairsTests
{
    [Theory]
    [InlineData(7, 3, 1)]
    [InlineData(40, 10, 2)]
    [InlineData(120, 12, 3)]
    public void Random_symmetric_matrices_agree_with_the_full_decomposition(int n, int m, int seed)
    {
        var rnd = new Random(seed);
        var a = new double[n * n];
        for (int i = 0; i < n; i++) for (int j = 0; j <= i; j++) a[i * n + j] = a[j * n + i] = rnd.NextDouble() - 0.5;
        var evd = Matrix<double>.Build.Dense(n, n, (double[])a.Clone()).Evd(Symmetricity.Symmetric);
        var exact = evd.EigenValues.Select(v => v.Real).OrderBy(v => v).ToArray();
        var (values, vectors) = LowestEigenpairs.Solve((double[])a.Clone(), n, m);
        for (int k = 0; k < m; k++)
        {
            Assert.True(Math.Abs(exact[k] - values[k]) < 1e-12 * n, $"eigenvalue {k}: {values[k]} against {exact[k]}");
            // residual ||A y - lambda y|| and orthonormality
            double res = 0;
            for (int i = 0; i < n; i++)
            {
                double s = -values[k] * vectors[k][i];
                for (int j = 0; j < n; j++) s += a[i * n + j] * vectors[k][j];
                res = Math.Max(res, Math.Abs(s));
            }
            Assert.True(res < 1e-10, $"residual {res:E2} of pair {k}");
            for (int q = 0; q <= k; q++)
                Tol.Abs(q == k ? 1 : 0, vectors[k].Zip(vectors[q], (x, y) => x * y).Sum(), 1e-10, "orthonormal eigenvectors");
        }
    }

    [Fact]
    public void Repeated_eigenvalues_get_orthogonal_vectors()
    {
        // two identical uncoupled blocks: each eigenvalue of [[2, -1], [-1, 2]] (1 and 3) appears twice (exact)
        int n = 4;
        double[] a = [2, -1, 0, 0, -1, 2, 0, 0, 0, 0, 2, -1, 0, 0, -1, 2];
        var (values, vectors) = LowestEigenpairs.Solve(a, n, 3);
        Tol.Abs(1, values[0], 1e-14); Tol.Abs(1, values[1], 1e-14); Tol.Abs(3, values[2], 1e-14);
        Tol.Abs(0, vectors[0].Zip(vectors[1], (x, y) => x * y).Sum(), 1e-12, "orthogonal within the repeated pair");
    }
}
