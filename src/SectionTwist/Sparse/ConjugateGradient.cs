namespace SectionTwist.Sparse;

/// <summary>
/// Preconditioned conjugate gradients (Hestenes and Stiefel 1952; algorithm as in Saad, Iterative Methods for Sparse
/// Linear Systems, 2nd ed., SIAM 2003, alg. 9.1). Stops on the true relative residual ||b - A x|| / ||b||: when the
/// recurrence says converged, the residual is recomputed and the iteration continues from it if needed.
/// </summary>
internal static class ConjugateGradient
{
    /// <summary>Solves A x = b from x = 0; returns the iteration count. Throws if not converged in maxIterations.</summary>
    public static int Solve(Amg.CsrMatrix a, Action<double[], double[]> precondition, ReadOnlySpan<double> b, Span<double> x,
        double tolerance, int maxIterations, CancellationToken ct)
    {
        int n = a.Rows;
        var bb = b.ToArray();
        var xx = new double[n];
        var r = (double[])bb.Clone();
        var z = new double[n];
        var p = new double[n];
        var q = new double[n];
        double nb = Math.Sqrt(Dot(bb, bb));
        if (nb == 0) { x.Clear(); return 0; }
        double target = tolerance * nb;
        int it = 0;
        while (true)
        {
            precondition(r, z);
            Array.Copy(z, p, n);
            double rz = Dot(r, z);
            double rr = double.MaxValue;
            for (; it < maxIterations; it++)
            {
                ct.ThrowIfCancellationRequested();
                a.Multiply(p, q);
                double alpha = rz / Dot(p, q);
                rr = 0;
                for (int i = 0; i < n; i++) { xx[i] += alpha * p[i]; r[i] -= alpha * q[i]; rr += r[i] * r[i]; }
                if (Math.Sqrt(rr) <= 0.5 * target) { it++; break; }
                precondition(r, z);
                double rz2 = Dot(r, z), beta = rz2 / rz;
                rz = rz2;
                for (int i = 0; i < n; i++) p[i] = z[i] + beta * p[i];
            }
            a.Residual(bb, xx, r);
            double trueRes = Math.Sqrt(Dot(r, r));
            if (trueRes <= target) break;
            if (it >= maxIterations)
                throw new InvalidOperationException($"conjugate gradients did not reach {Units.NumberText.Exponent(tolerance)} in {maxIterations} iterations (residual {Units.NumberText.Exponent(trueRes / nb, 3)})");
        }
        xx.AsSpan().CopyTo(x);
        return it;
    }

    private static double Dot(double[] u, double[] v)
    {
        var vu = System.Numerics.Vector<double>.Count;
        var acc = System.Numerics.Vector<double>.Zero;
        int i = 0;
        var su = System.Runtime.InteropServices.MemoryMarshal.Cast<double, System.Numerics.Vector<double>>(u.AsSpan());
        var sv = System.Runtime.InteropServices.MemoryMarshal.Cast<double, System.Numerics.Vector<double>>(v.AsSpan());
        for (int k = 0; k < su.Length; k++) acc += su[k] * sv[k];
        i = su.Length * vu;
        double s = System.Numerics.Vector.Sum(acc);
        for (; i < u.Length; i++) s += u[i] * v[i];
        return s;
    }
}
