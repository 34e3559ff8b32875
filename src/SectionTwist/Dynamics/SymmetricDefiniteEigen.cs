using MathNet.Numerics.LinearAlgebra;

namespace SectionTwist.Dynamics;

/// <summary>
/// The symmetric-definite generalized eigenproblem K x = lambda M x for small dense matrices (Golub and Van Loan, Matrix
/// Computations, 4th ed., sec. 8.7.2): Cholesky M = L L^T, the standard symmetric problem C y = lambda y with
/// C = L^-1 K L^-T, x = L^-T y. When only the lowest few pairs are wanted, C y = lambda y is solved by
/// <see cref="LowestEigenpairs"/> (tridiagonalisation, bisection, inverse iteration); when all are wanted (forced response),
/// by Math.NET's symmetric eigenvalue decomposition (Householder tridiagonalisation and the implicit QL iteration). Unknowns without inertia (a station held only by springs) are first removed by exact
/// static condensation, K* = K_rr - K_rz K_zz^-1 K_zr, and recovered from x_z = -K_zz^-1 K_zr x_r.
/// </summary>
internal static class SymmetricDefiniteEigen
{
    /// <summary>Eigenvalues ascending and the first <paramref name="wanted"/> eigenvectors (M-orthonormal), each of length n.</summary>
    public static (double[] Values, double[][] Vectors) Solve(double[] k, double[] m, int n, int wanted, Func<int, string> describe, CancellationToken ct = default)
    {
        ct.ThrowIfCancellationRequested();
        double mScale = 0;
        for (int i = 0; i < n; i++) mScale = Math.Max(mScale, m[i * n + i]);
        if (!(mScale > 0)) throw new SectionTwistException("bad-drivetrain", "the train has no inertia at all; give the materials a density or add inertias at stations");
        var massless = new List<int>();
        var massive = new List<int>();
        for (int i = 0; i < n; i++) (m[i * n + i] > 1e-14 * mScale ? massive : massless).Add(i);

        int r = massive.Count, z = massless.Count;
        var kr = Sub(k, n, massive, massive);
        var mr = Sub(m, n, massive, massive);
        double[]? kzzL = null, kzr = null;
        if (z > 0)
        {
            kzzL = Sub(k, n, massless, massless);
            kzr = Sub(k, n, massless, massive);
            int bad = Cholesky(kzzL, z);
            if (bad >= 0)
                throw new SectionTwistException("bad-drivetrain",
                    $"{describe(massless[bad])} has no inertia and is not held by any stiffness; connect it, give it an inertia, or remove it");
            // K* = K_rr - K_rz K_zz^-1 K_zr: solve K_zz W = K_zr column-wise (row-major z x r)
            var w = (double[])kzr.Clone();
            SolveLower(kzzL, z, w, r);
            SolveUpperT(kzzL, z, w, r);
            for (int i = 0; i < r; i++)
            {
                ct.ThrowIfCancellationRequested();
                for (int j = 0; j < r; j++)
                {
                    double s = 0;
                    for (int q = 0; q < z; q++) s += kzr[q * r + i] * w[q * r + j];
                    kr[i * r + j] -= s;
                }
            }
        }
        if (Cholesky(mr, r) is int badM && badM >= 0)
            throw new SectionTwistException("bad-drivetrain", $"the inertia matrix is not positive definite at {describe(massive[badM])}; check the densities and inertias");
        // C = L^-1 K L^-T: W = L^-1 K (row operations), C = L^-1 W^T (K symmetric)
        ct.ThrowIfCancellationRequested();
        var c = (double[])kr.Clone();
        SolveLower(mr, r, c, r);
        Transpose(c, r);
        SolveLower(mr, r, c, r);
        for (int i = 0; i < r; i++)
            for (int j = 0; j < i; j++) { double a = 0.5 * (c[i * r + j] + c[j * r + i]); c[i * r + j] = a; c[j * r + i] = a; }
        int take = Math.Min(wanted, r);
        double[] values;
        double[][] ys;
        ct.ThrowIfCancellationRequested();
        if (take < r) (values, ys) = LowestEigenpairs.Solve(c, r, take, ct);
        else
        {
            var evd = Matrix<double>.Build.Dense(r, r, c).Evd(Symmetricity.Symmetric);
            var order = Enumerable.Range(0, r).OrderBy(i => evd.EigenValues[i].Real).ToArray();
            values = [.. order.Select(i => evd.EigenValues[i].Real)];
            ys = [.. order.Select(j => Enumerable.Range(0, r).Select(i => evd.EigenVectors[i, j]).ToArray())];
        }
        var vectors = new double[take][];
        ct.ThrowIfCancellationRequested();
        for (int q = 0; q < take; q++)
        {
            var y = ys[q];
            SolveUpperT(mr, r, y, 1);
            var x = new double[n];
            for (int i = 0; i < r; i++) x[massive[i]] = y[i];
            if (z > 0)
            {
                var xz = new double[z];
                for (int p = 0; p < z; p++)
                {
                    double s = 0;
                    for (int i = 0; i < r; i++) s -= kzr![p * r + i] * y[i];
                    xz[p] = s;
                }
                SolveLower(kzzL!, z, xz, 1);
                SolveUpperT(kzzL!, z, xz, 1);
                for (int p = 0; p < z; p++) x[massless[p]] = xz[p];
            }
            vectors[q] = x;
        }
        return (values, vectors);
    }

    private static double[] Sub(double[] a, int n, List<int> rows, List<int> cols)
    {
        var s = new double[rows.Count * cols.Count];
        for (int i = 0; i < rows.Count; i++)
            for (int j = 0; j < cols.Count; j++) s[i * cols.Count + j] = a[rows[i] * n + cols[j]];
        return s;
    }

    /// <summary>In-place lower Cholesky (row-major, upper part left as is); index of the first bad pivot or -1.</summary>
    internal static int Cholesky(double[] a, int n)
    {
        double scale = 0;
        for (int i = 0; i < n; i++) scale = Math.Max(scale, Math.Abs(a[i * n + i]));
        for (int j = 0; j < n; j++)
        {
            double d = a[j * n + j];
            for (int q = 0; q < j; q++) d -= a[j * n + q] * a[j * n + q];
            if (!(d > 1e-13 * scale)) return j;
            d = Math.Sqrt(d);
            a[j * n + j] = d;
            for (int i = j + 1; i < n; i++)
            {
                double s = a[i * n + j];
                if (s == 0 && RowZero(a, n, i, j)) continue;
                for (int q = 0; q < j; q++) s -= a[i * n + q] * a[j * n + q];
                a[i * n + j] = s / d;
            }
        }
        return -1;
    }

    // true when row i of L has no entry before column j (so the update of a zero stays zero: banded matrices stay cheap)
    private static bool RowZero(double[] a, int n, int i, int j)
    {
        for (int q = 0; q < j; q++) if (a[i * n + q] != 0) return false;
        return true;
    }

    /// <summary>Solves L X = B in place for B row-major n x cols, skipping zero entries of L.</summary>
    private static void SolveLower(double[] l, int n, double[] b, int cols)
    {
        for (int i = 0; i < n; i++)
        {
            var bi = b.AsSpan(i * cols, cols);
            for (int q = 0; q < i; q++)
            {
                double f = l[i * n + q];
                if (f == 0) continue;
                var bq = b.AsSpan(q * cols, cols);
                for (int j = 0; j < cols; j++) bi[j] -= f * bq[j];
            }
            double d = l[i * n + i];
            for (int j = 0; j < cols; j++) bi[j] /= d;
        }
    }

    /// <summary>Solves L^T X = B in place.</summary>
    private static void SolveUpperT(double[] l, int n, double[] b, int cols)
    {
        for (int i = n - 1; i >= 0; i--)
        {
            var bi = b.AsSpan(i * cols, cols);
            double d = l[i * n + i];
            for (int j = 0; j < cols; j++) bi[j] /= d;
            for (int q = 0; q < i; q++)
            {
                double f = l[i * n + q];
                if (f == 0) continue;
                var bq = b.AsSpan(q * cols, cols);
                for (int j = 0; j < cols; j++) bq[j] -= f * bi[j];
            }
        }
    }

    private static void Transpose(double[] a, int n)
    {
        for (int i = 0; i < n; i++)
            for (int j = 0; j < i; j++) (a[i * n + j], a[j * n + i]) = (a[j * n + i], a[i * n + j]);
    }
}
