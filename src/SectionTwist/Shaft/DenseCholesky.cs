namespace SectionTwist.Shaft;

/// <summary>In-place dense Cholesky solve for the small shaft systems (one unknown per station; Golub and Van Loan, Matrix Computations, 4th ed., sec. 4.2).</summary>
internal static class DenseCholesky
{
    /// <summary>Solves A x = b for a symmetric positive definite row-major <paramref name="a"/> (overwritten by L); b is overwritten by x.
    /// Returns the index of the first non-positive pivot, or -1 on success.</summary>
    public static int Solve(double[] a, int n, double[] b)
    {
        double scale = 0;
        for (int i = 0; i < n; i++) scale = Math.Max(scale, Math.Abs(a[i * n + i]));
        for (int j = 0; j < n; j++)
        {
            double d = a[j * n + j];
            for (int k = 0; k < j; k++) d -= a[j * n + k] * a[j * n + k];
            if (!(d > 1e-13 * scale)) return j;
            d = Math.Sqrt(d);
            a[j * n + j] = d;
            for (int i = j + 1; i < n; i++)
            {
                double s = a[i * n + j];
                for (int k = 0; k < j; k++) s -= a[i * n + k] * a[j * n + k];
                a[i * n + j] = s / d;
            }
        }
        for (int i = 0; i < n; i++)
        {
            double s = b[i];
            for (int k = 0; k < i; k++) s -= a[i * n + k] * b[k];
            b[i] = s / a[i * n + i];
        }
        for (int i = n - 1; i >= 0; i--)
        {
            double s = b[i];
            for (int k = i + 1; k < n; k++) s -= a[k * n + i] * b[k];
            b[i] = s / a[i * n + i];
        }
        return -1;
    }
}
