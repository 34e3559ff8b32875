namespace SectionTwist.Dynamics;

/// <summary>
/// The lowest m eigenpairs of a dense symmetric matrix, for m much smaller than n (Golub and Van Loan, Matrix Computations,
/// 4th ed.): Householder reduction to tridiagonal form T = Q^T A Q (sec. 8.3.1, Householder vectors kept, Q not formed),
/// eigenvalues of T by bisection on Sturm sequence counts (sec. 8.4.1), eigenvectors of T by inverse iteration with a
/// pivoted tridiagonal LU and Gram-Schmidt against the vectors of close eigenvalues (sec. 8.2.2 and 8.4.2), then z = Q y.
/// Cost about 4/3 n^3 for the reduction plus O(n m) per eigenpair.
/// </summary>
internal static class LowestEigenpairs
{
    /// <summary>Eigenvalues ascending (the lowest <paramref name="m"/>) and their orthonormal eigenvectors; <paramref name="a"/> (row-major, n x n) is destroyed.</summary>
    public static (double[] Values, double[][] Vectors) Solve(double[] a, int n, int m, CancellationToken ct = default)
    {
        m = Math.Min(m, n);
        var d = new double[n];
        var e = new double[Math.Max(n - 1, 0)];
        var beta = new double[n];
        Tridiagonalize(a, n, d, e, beta, ct);
        double norm = 0;
        for (int i = 0; i < n; i++) norm = Math.Max(norm, Math.Abs(d[i]) + (i > 0 ? Math.Abs(e[i - 1]) : 0) + (i < n - 1 ? Math.Abs(e[i]) : 0));
        if (norm == 0) norm = 1;
        var values = new double[m];
        for (int k = 0; k < m; k++) values[k] = Bisect(d, e, n, k, norm);
        var vectors = new double[m][];
        var tVectors = new double[m][];
        var rnd = new Random(12345);
        for (int k = 0; k < m; k++)
        {
            ct.ThrowIfCancellationRequested();
            tVectors[k] = InverseIteration(d, e, n, values[k], norm, rnd, tVectors, values, k);
            var y = (double[])tVectors[k].Clone();
            BackTransform(a, n, beta, y);
            vectors[k] = y;
        }
        return (values, vectors);
    }

    /// <summary>Householder tridiagonalisation; v_k stored below the subdiagonal of column k (v_k[0] = 1 implied).</summary>
    private static void Tridiagonalize(double[] a, int n, double[] d, double[] e, double[] beta, CancellationToken ct)
    {
        var p = new double[n];
        var v = new double[n];
        for (int k = 0; k < n - 2; k++)
        {
            if ((k & 15) == 0) ct.ThrowIfCancellationRequested();
            int len = n - k - 1;
            double sigma = 0, x0 = a[(k + 1) * n + k];
            for (int i = k + 2; i < n; i++) sigma += a[i * n + k] * a[i * n + k];
            if (sigma == 0) { beta[k] = 0; e[k] = x0; continue; }
            double mu = Math.Sqrt(x0 * x0 + sigma);
            double v0 = x0 <= 0 ? x0 - mu : -sigma / (x0 + mu);
            double b = 2 * v0 * v0 / (sigma + v0 * v0);
            for (int i = k + 2; i < n; i++) a[i * n + k] /= v0;
            a[(k + 1) * n + k] = 1;
            beta[k] = b;
            e[k] = mu; // H x = mu e1 with this choice of v (Golub and Van Loan, Alg. 5.1.1)
            // p = b A22 v, using the lower triangle of A22 (v copied to a contiguous array: column access is cache-unfriendly)
            for (int i = 0; i < len; i++) { p[i] = 0; v[i] = a[(k + 1 + i) * n + k]; }
            for (int i = 0; i < len; i++)
            {
                var row = a.AsSpan((k + 1 + i) * n + k + 1, i + 1);
                double vi = v[i], s = row[i] * vi;
                for (int j = 0; j < i; j++)
                {
                    s += row[j] * v[j];
                    p[j] += row[j] * vi;
                }
                p[i] += s;
            }
            double pv = 0;
            for (int i = 0; i < len; i++) { p[i] *= b; pv += p[i] * v[i]; }
            double half = b * pv / 2;
            for (int i = 0; i < len; i++) p[i] -= half * v[i];   // w
            for (int i = 0; i < len; i++)
            {
                var row = a.AsSpan((k + 1 + i) * n + k + 1, i + 1);
                double vi = v[i], wi = p[i];
                for (int j = 0; j <= i; j++) row[j] -= vi * p[j] + wi * v[j];
            }
        }
        for (int i = 0; i < n; i++) d[i] = a[i * n + i];
        if (n >= 2) { e[n - 2] = a[(n - 1) * n + n - 2]; beta[n - 2] = 0; }
    }

    /// <summary>Number of eigenvalues of T below x (Sturm count from the LDL^T pivots of T - x I).</summary>
    private static int Count(double[] d, double[] e, int n, double x, double norm)
    {
        int c = 0;
        double q = d[0] - x;
        double tiny = 1e-300 + norm * 1e-30;
        if (q < 0) c++;
        for (int i = 1; i < n; i++)
        {
            if (Math.Abs(q) < tiny) q = -tiny;
            q = d[i] - x - e[i - 1] * e[i - 1] / q;
            if (q < 0) c++;
        }
        return c;
    }

    /// <summary>The k-th smallest eigenvalue (0-based) by bisection to round-off.</summary>
    private static double Bisect(double[] d, double[] e, int n, int k, double norm)
    {
        double lo = -norm * 1.01 - 1e-300, hi = norm * 1.01 + 1e-300;
        for (int it = 0; it < 200; it++)
        {
            double mid = 0.5 * (lo + hi);
            if (mid == lo || mid == hi) break;
            if (Count(d, e, n, mid, norm) > k) hi = mid; else lo = mid;
            if (hi - lo <= 2 * double.Epsilon * Math.Max(Math.Abs(lo), Math.Abs(hi)) + 1e-300) break;
        }
        return 0.5 * (lo + hi);
    }

    private static double[] InverseIteration(double[] d, double[] e, int n, double lambda, double norm, Random rnd, double[][] previous, double[] values, int k)
    {
        var x = new double[n];
        for (int i = 0; i < n; i++) x[i] = rnd.NextDouble() - 0.5;
        // pivoted LU of T - lambda I (tridiagonal; LAPACK gttrf pattern); a zero pivot is replaced by eps * norm
        var dl = new double[n]; var dd = new double[n]; var du = new double[n]; var du2 = new double[n]; var piv = new bool[n];
        for (int i = 0; i < n; i++) dd[i] = d[i] - lambda;
        for (int i = 0; i < n - 1; i++) { dl[i] = e[i]; du[i] = e[i]; }
        for (int i = 0; i < n - 1; i++)
        {
            if (Math.Abs(dd[i]) >= Math.Abs(dl[i]))
            {
                if (dd[i] == 0) dd[i] = 1e-16 * norm;
                double f = dl[i] / dd[i];
                dl[i] = f;
                dd[i + 1] -= f * du[i];
                du2[i] = 0;
                piv[i] = false;
            }
            else
            {
                double f = dd[i] / dl[i];
                dd[i] = dl[i]; dl[i] = f;
                double t = du[i];
                du[i] = dd[i + 1]; dd[i + 1] = t - f * dd[i + 1];
                if (i < n - 2) { du2[i] = du[i + 1]; du[i + 1] = -f * du[i + 1]; }
                piv[i] = true;
            }
        }
        if (dd[n - 1] == 0) dd[n - 1] = 1e-16 * norm;
        for (int it = 0; it < 3; it++)
        {
            // solve L U x = P b
            for (int i = 0; i < n - 1; i++)
            {
                if (piv[i]) { (x[i], x[i + 1]) = (x[i + 1], x[i]); }
                x[i + 1] -= dl[i] * x[i];
            }
            x[n - 1] /= dd[n - 1];
            if (n >= 2) x[n - 2] = (x[n - 2] - du[n - 2] * x[n - 1]) / dd[n - 2];
            for (int i = n - 3; i >= 0; i--) x[i] = (x[i] - du[i] * x[i + 1] - du2[i] * x[i + 2]) / dd[i];
            // orthogonalise against the eigenvectors of T of close eigenvalues (within 1e-3 of the norm, as LAPACK's stein)
            for (int j = 0; j < k; j++)
            {
                if (Math.Abs(values[j] - lambda) > 1e-3 * norm) continue;
                var yj = previous[j];
                double s = 0;
                for (int i = 0; i < n; i++) s += yj[i] * x[i];
                for (int i = 0; i < n; i++) x[i] -= s * yj[i];
            }
            double nrm = 0;
            for (int i = 0; i < n; i++) nrm += x[i] * x[i];
            nrm = Math.Sqrt(nrm);
            for (int i = 0; i < n; i++) x[i] /= nrm;
        }
        return x;
    }

    /// <summary>y := Q y with Q = H_0 H_1 ... H_{n-3}.</summary>
    private static void BackTransform(double[] a, int n, double[] beta, double[] y)
    {
        for (int k = n - 3; k >= 0; k--)
        {
            if (beta[k] == 0) continue;
            double s = 0;
            for (int i = k + 1; i < n; i++) s += a[i * n + k] * y[i];
            s *= beta[k];
            for (int i = k + 1; i < n; i++) y[i] -= s * a[i * n + k];
        }
    }
}
