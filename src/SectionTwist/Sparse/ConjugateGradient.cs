namespace SectionTwist.Sparse;

/// <summary>
/// Preconditioned conjugate gradients (Hestenes and Stiefel 1952; algorithm as in Saad, Iterative Methods for Sparse
/// Linear Systems, 2nd ed., SIAM 2003, alg. 9.1). Stops on the true relative residual ||b - A x|| / ||b||: when the
/// recurrence says converged, the residual is recomputed and the iteration continues from it if needed.
/// <para>
/// In double precision the true residual cannot fall much below the rounding of its own computation,
/// about u || |b| + |A| |x| || with u the unit round-off (Higham, Accuracy and Stability of Numerical Algorithms, 2nd ed.,
/// SIAM 2002, sec. 3.5 and 7.1; Greenbaum, "Estimating the attainable accuracy of recursive computed residual methods",
/// SIAM J. Matrix Anal. Appl. 18, 1997). That floor grows with ||A|| ||x|| / ||b||, i.e. with the condition number of a
/// finely graded mesh. The iteration therefore stops at the larger of the requested residual and
/// <see cref="FloorFactor"/> times that floor, and it stops as stalled when a restart from the true residual does not
/// halve it; the caller decides what to do with a stalled solve.
/// </para>
/// </summary>
internal static class ConjugateGradient
{
    /// <summary>The attainable relative residual is taken as this many unit round-offs times || |b| + |A||x| || / ||b||.</summary>
    public const double FloorFactor = 16;

    /// <summary>Unit round-off of IEEE double precision, 2^-53.</summary>
    public const double UnitRoundoff = 1.1102230246251565e-16;

    /// <summary>How a solve ended.</summary>
    /// <param name="Iterations">Iterations done.</param>
    /// <param name="RelativeResidual">The true relative residual ||b - A x|| / ||b|| of the returned x.</param>
    /// <param name="Floor">The attainable relative residual in double precision for this x (see the class remarks).</param>
    /// <param name="Converged">True when the residual met the tolerance or the floor.</param>
    internal readonly record struct Outcome(int Iterations, double RelativeResidual, double Floor, bool Converged);

    /// <summary>
    /// Solves A x = b from x = 0, or from <paramref name="initial"/> when given (a good start, e.g. a coarser mesh's
    /// solution interpolated, saves the iterations that would reduce its error); never throws for lack of convergence
    /// (see <see cref="Outcome.Converged"/>).
    /// </summary>
    public static Outcome Solve(Amg.CsrMatrix a, Action<double[], double[]> precondition, ReadOnlySpan<double> b, Span<double> x,
        double tolerance, int maxIterations, CancellationToken ct, double[]? initial = null)
    {
        int n = a.Rows;
        var bb = b.ToArray();
        var xx = initial is null ? new double[n] : (double[])initial.Clone();
        var r = (double[])bb.Clone();
        if (initial is not null) a.Residual(bb, xx, r);
        var z = new double[n];
        var p = new double[n];
        var q = new double[n];
        double nb = Math.Sqrt(Dot(bb, bb));
        if (nb == 0) { x.Clear(); return new Outcome(0, 0, 0, true); }
        double target = tolerance * nb;
        int it = 0;
        double previous = double.PositiveInfinity, floor = 0, trueRes;
        var best = (double[])xx.Clone();
        double bestRes = initial is null ? nb : Math.Sqrt(Dot(r, r));
        if (bestRes <= target) { best.AsSpan().CopyTo(x); return new Outcome(0, bestRes / nb, 0, true); }
        bool converged;
        while (true)
        {
            precondition(r, z);
            Array.Copy(z, p, n);
            double rz = Dot(r, z);
            for (; it < maxIterations; it++)
            {
                ct.ThrowIfCancellationRequested();
                a.Multiply(p, q);
                double alpha = rz / Dot(p, q);
                double rr = 0;
                for (int i = 0; i < n; i++) { xx[i] += alpha * p[i]; r[i] -= alpha * q[i]; rr += r[i] * r[i]; }
                if (Math.Sqrt(rr) <= 0.5 * Math.Max(target, floor * nb)) { it++; break; }
                precondition(r, z);
                double rz2 = Dot(r, z), beta = rz2 / rz;
                rz = rz2;
                for (int i = 0; i < n; i++) p[i] = z[i] + beta * p[i];
            }
            a.Residual(bb, xx, r);
            trueRes = Math.Sqrt(Dot(r, r));
            floor = FloorFactor * Floor(a, bb, xx) / nb;
            if (trueRes < bestRes) { bestRes = trueRes; Array.Copy(xx, best, n); }
            if (trueRes <= Math.Max(target, floor * nb)) { converged = true; break; }
            if (it >= maxIterations || trueRes > 0.5 * previous) { converged = false; break; }
            previous = trueRes;
        }
        best.AsSpan().CopyTo(x);
        return new Outcome(it, bestRes / nb, floor, converged);
    }

    /// <summary>|| |b| + |A| |x| ||_2 times the unit round-off: the rounding level of a computed residual.</summary>
    private static double Floor(Amg.CsrMatrix a, double[] b, double[] x)
    {
        double s = 0;
        int[] rp = a.RowPtr, ci = a.ColIdx;
        double[] v = a.Values;
        for (int i = 0; i < a.Rows; i++)
        {
            double t = Math.Abs(b[i]);
            for (int k = rp[i]; k < rp[i + 1]; k++) t += Math.Abs(v[k] * x[ci[k]]);
            s += t * t;
        }
        return Math.Sqrt(s) * UnitRoundoff;
    }

    [System.Runtime.CompilerServices.MethodImpl(System.Runtime.CompilerServices.MethodImplOptions.AggressiveOptimization)] // Vector<T>: not in ReadyToRun images
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
