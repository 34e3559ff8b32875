namespace SectionTwist.Sparse;

/// <summary>
/// Entry point for symmetric positive definite systems. (Placeholder implementation: Jacobi-preconditioned conjugate
/// gradients to a relative residual of 1e-13; the sparse Cholesky replaces it.)
/// </summary>
internal static class SpdSolver
{
    /// <summary>Prepares a solver for <paramref name="a"/> (full symmetric storage).</summary>
    public static ISpdSolver Create(CscMatrix a, CancellationToken cancellationToken = default) => new JacobiCg(a, cancellationToken);

    private sealed class JacobiCg(CscMatrix a, CancellationToken ct) : ISpdSolver
    {
        public void Solve(ReadOnlySpan<double> b, Span<double> x)
        {
            int n = a.N;
            var d = new double[n];
            for (int c = 0; c < n; c++)
                for (int p = a.ColPtr[c]; p < a.ColPtr[c + 1]; p++) if (a.RowIdx[p] == c) d[c] = a.Values[p];
            var r = b.ToArray(); var z = new double[n]; var pv = new double[n]; var q = new double[n];
            x.Clear();
            double nb = Math.Sqrt(r.Sum(v => v * v));
            if (nb == 0) return;
            for (int i = 0; i < n; i++) { z[i] = r[i] / d[i]; pv[i] = z[i]; }
            double rz = Dot(r, z);
            for (int it = 0; it < 20 * n + 100; it++)
            {
                if ((it & 63) == 0) ct.ThrowIfCancellationRequested();
                a.Multiply(pv, q);
                double alpha = rz / Dot(pv, q);
                double rr = 0;
                for (int i = 0; i < n; i++) { x[i] += alpha * pv[i]; r[i] -= alpha * q[i]; rr += r[i] * r[i]; }
                if (Math.Sqrt(rr) <= 1e-13 * nb) return;
                for (int i = 0; i < n; i++) z[i] = r[i] / d[i];
                double rz2 = Dot(r, z), beta = rz2 / rz; rz = rz2;
                for (int i = 0; i < n; i++) pv[i] = z[i] + beta * pv[i];
            }
        }

        private static double Dot(double[] u, double[] v) { double s = 0; for (int i = 0; i < u.Length; i++) s += u[i] * v[i]; return s; }
    }
}
