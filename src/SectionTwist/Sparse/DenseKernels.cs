using System.Numerics;
using System.Runtime.CompilerServices;
using System.Runtime.InteropServices;

namespace SectionTwist.Sparse;

/// <summary>
/// Dense kernels on column-major blocks stored in flat <c>double[]</c> for the supernodal Cholesky factorization:
/// an in-place Cholesky of a diagonal block together with the triangular solve of the rows below it (POTRF + TRSM),
/// blocked: the block update by <see cref="SyrkKernel"/>, the columns inside a block as axpy updates grouped four
/// source columns at a time and vectorized with <see cref="Vector{T}"/> (Golub and Van Loan, Matrix Computations,
/// 4th ed., sec. 4.2.5, gaxpy Cholesky).
/// </summary>
internal static class DenseKernels
{
    /// <summary>Columns per block of the blocked panel factorization (<see cref="FactorPanel"/>).</summary>
    public const int PanelBlock = 16;

    /// <summary>
    /// In-place Cholesky of the nc x nc diagonal block of an nr x nc column-major block (leading dimension nr) and
    /// L21 = A21 L11^-T for the rows below; returns the local column of a non-positive pivot, or -1. Blocked
    /// left-looking (Golub and Van Loan, sec. 4.2.9, block Cholesky): each block of <see cref="PanelBlock"/> columns
    /// is first updated by all columns before it with the register-blocked product of <see cref="SyrkKernel"/>
    /// (SYRK on the diagonal block, GEMM below it, in one call), then factored column by column. The strict upper
    /// triangle of the diagonal block is used as scratch and holds no meaning afterwards. With
    /// <paramref name="parallelKernels"/> large block updates run on two threads.
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)] // Vector<T> code is left out of ReadyToRun images: JIT it optimized at once
    public static int FactorPanel(double[] l, long off, int nr, int nc, bool parallelKernels = true)
    {
        for (int j0 = 0; j0 < nc; j0 += PanelBlock)
        {
            int jb = Math.Min(PanelBlock, nc - j0);
            if (j0 > 0 && parallelKernels)
                SyrkKernel.LowerProductParallel(l, off + j0, nr, nr - j0, j0, l, off + (long)j0 * nr + j0, nr, false, jb);
            else if (j0 > 0)
                SyrkKernel.LowerProduct(l, off + j0, nr, nr - j0, j0, l, off + (long)j0 * nr + j0, nr, false, 0, jb);
            int bad = FactorColumns(l, off, nr, j0, jb);
            if (bad >= 0) return bad;
        }
        return -1;
    }

    /// <summary>Unblocked gaxpy Cholesky of columns [j0, j0 + jb), already updated by the columns before j0.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)] // Vector<T> code is left out of ReadyToRun images: JIT it optimized at once
    private static int FactorColumns(double[] l, long off, int nr, int j0, int jb)
    {
        for (int j = j0; j < j0 + jb; j++)
        {
            var cj = l.AsSpan((int)(off + (long)j * nr + j), nr - j);
            int t = j0;
            for (; t + 3 < j; t += 4)
            {
                var a0 = l.AsSpan((int)(off + (long)t * nr + j), nr - j);
                var a1 = l.AsSpan((int)(off + (long)(t + 1) * nr + j), nr - j);
                var a2 = l.AsSpan((int)(off + (long)(t + 2) * nr + j), nr - j);
                var a3 = l.AsSpan((int)(off + (long)(t + 3) * nr + j), nr - j);
                Axpy4(cj, a0, a1, a2, a3, -a0[0], -a1[0], -a2[0], -a3[0]);
            }
            for (; t < j; t++)
            {
                var a0 = l.AsSpan((int)(off + (long)t * nr + j), nr - j);
                Axpy1(cj, a0, -a0[0]);
            }
            double d = cj[0];
            if (!(d > 0)) return j;
            d = Math.Sqrt(d);
            cj[0] = d;
            Scale(cj[1..], 1 / d);
        }
        return -1;
    }

    /// <summary>y += s0 x0 + s1 x1 + s2 x2 + s3 x3.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)] // Vector<T> code is left out of ReadyToRun images: JIT it optimized at once
    internal static void Axpy4(Span<double> y, ReadOnlySpan<double> x0, ReadOnlySpan<double> x1, ReadOnlySpan<double> x2,
        ReadOnlySpan<double> x3, double s0, double s1, double s2, double s3)
    {
        int n = y.Length, i = 0, w = Vector<double>.Count;
        if (n >= w)
        {
            var v0 = new Vector<double>(s0); var v1 = new Vector<double>(s1);
            var v2 = new Vector<double>(s2); var v3 = new Vector<double>(s3);
            for (; i + w <= n; i += w)
            {
                var acc = new Vector<double>(y[i..]);
                acc += v0 * new Vector<double>(x0[i..]) + v1 * new Vector<double>(x1[i..])
                     + v2 * new Vector<double>(x2[i..]) + v3 * new Vector<double>(x3[i..]);
                acc.CopyTo(y[i..]);
            }
        }
        for (; i < n; i++) y[i] += s0 * x0[i] + s1 * x1[i] + s2 * x2[i] + s3 * x3[i];
    }

    /// <summary>y += s x (for the triangular solves).</summary>
    public static void Axpy(Span<double> y, ReadOnlySpan<double> x, double s) => Axpy1(y, x, s);

    /// <summary>Dot product of two spans of equal length.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)] // Vector<T> code is left out of ReadyToRun images: JIT it optimized at once
    public static double Dot(ReadOnlySpan<double> x, ReadOnlySpan<double> y)
    {
        int n = x.Length, i = 0, w = Vector<double>.Count;
        var acc = Vector<double>.Zero;
        for (; i + w <= n; i += w) acc += new Vector<double>(x[i..]) * new Vector<double>(y[i..]);
        double s = Vector.Sum(acc);
        for (; i < n; i++) s += x[i] * y[i];
        return s;
    }

    /// <summary>y += x.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)] // Vector<T> code is left out of ReadyToRun images: JIT it optimized at once
    public static void AddTo(Span<double> y, ReadOnlySpan<double> x)
    {
        int n = y.Length, i = 0, w = Vector<double>.Count;
        for (; i + w <= n; i += w) (new Vector<double>(y[i..]) + new Vector<double>(x[i..])).CopyTo(y[i..]);
        for (; i < n; i++) y[i] += x[i];
    }

    /// <summary>y += s x.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)] // Vector<T> code is left out of ReadyToRun images: JIT it optimized at once
    private static void Axpy1(Span<double> y, ReadOnlySpan<double> x, double s)
    {
        int n = y.Length, i = 0, w = Vector<double>.Count;
        var vs = new Vector<double>(s);
        for (; i + w <= n; i += w) (new Vector<double>(y[i..]) + vs * new Vector<double>(x[i..])).CopyTo(y[i..]);
        for (; i < n; i++) y[i] += s * x[i];
    }

    [MethodImpl(MethodImplOptions.AggressiveOptimization)] // Vector<T> code is left out of ReadyToRun images: JIT it optimized at once
    private static void Scale(Span<double> y, double s)
    {
        int n = y.Length, i = 0, w = Vector<double>.Count;
        var vs = new Vector<double>(s);
        for (; i + w <= n; i += w) (new Vector<double>(y[i..]) * vs).CopyTo(y[i..]);
        for (; i < n; i++) y[i] *= s;
    }
}
