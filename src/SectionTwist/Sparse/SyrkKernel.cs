using System.Runtime.CompilerServices;
using System.Runtime.InteropServices;
using System.Runtime.Intrinsics;
using System.Runtime.Intrinsics.X86;

namespace SectionTwist.Sparse;

/// <summary>
/// Register-blocked lower-trapezoidal product C = A A' (the BLAS SYRK/GEMM step of a supernodal Cholesky update) on a
/// column-major block, with <see cref="Vector256{T}"/> fused multiply-adds: C is computed in 8 x 4 tiles held in eight
/// vector registers over a block of at most <see cref="DepthBlock"/> columns of A, so each A element loaded feeds four
/// multiply-adds (the micro-kernel structure of Goto and van de Geijn, "Anatomy of high-performance matrix
/// multiplication", ACM TOMS 34(3), 2008, sec. 5, without packing: the supernode's columns are already contiguous).
/// Tiles on the diagonal are computed whole, so entries of C just above its diagonal (row &lt; column, within
/// the tile) are overwritten too: callers use only the lower trapezoid and must allow the strict upper part to change.
/// </summary>
internal static class SyrkKernel
{
    /// <summary>Columns of A (the inner dimension) per pass over C, to keep an A tile in the first-level cache.</summary>
    public const int DepthBlock = 192;

    /// <summary>
    /// True where 256-bit vectors and fused multiply-add run in hardware (the register-blocked path); elsewhere, e.g.
    /// a Native AOT build for the baseline x64 instruction set or ARM64, <see cref="LowerProduct"/> takes a portable
    /// <see cref="System.Numerics.Vector{T}"/> path (emulated 256-bit vectors would be many times slower). Settable for tests.
    /// </summary>
    internal static bool Accelerated { get; set; } = Vector256.IsHardwareAccelerated && Fma.IsSupported;

    /// <summary>Multiply-adds above which <see cref="LowerProductParallel"/> splits the columns over two threads.</summary>
    public const long ParallelWork = 1_500_000;

    /// <summary>
    /// <see cref="LowerProduct"/> over columns [0, <paramref name="ncols"/>), on two threads when the product is large:
    /// the columns are split where the two parts of the trapezoid hold about the same work (a multiple of 4 columns),
    /// each entry is computed by one thread in the same order either way, so the result does not depend on the split.
    /// </summary>
    public static void LowerProductParallel(double[] a, long aOff, int lda, int m, int k, double[] c, long cOff, int ldc,
        bool overwrite, int ncols)
    {
        double work = ((double)m * ncols - 0.5 * ncols * (double)ncols) * k;
        if (work < ParallelWork || !KernelThreads.MayUseMore || ncols < 8)
        {
            LowerProduct(a, aOff, lda, m, k, c, cOff, ldc, overwrite, 0, ncols);
            return;
        }
        // columns [0, s) hold half of the trapezoid: s m - s^2 / 2 = (ncols m - ncols^2 / 2) / 2
        double half = 0.5 * ((double)m * ncols - 0.5 * ncols * (double)ncols);
        double s = m - Math.Sqrt(Math.Max(0, (double)m * m - 2 * half));
        int split = Math.Clamp((int)Math.Round(s / 4) * 4, 4, ncols - 1);
        Parallel.Invoke(
            () => LowerProduct(a, aOff, lda, m, k, c, cOff, ldc, overwrite, 0, split),
            () => LowerProduct(a, aOff, lda, m, k, c, cOff, ldc, overwrite, split, ncols));
    }

    /// <summary>
    /// For <paramref name="col0"/> &lt;= j &lt; <paramref name="col1"/> and j &lt;= i &lt; <paramref name="m"/>: with <paramref name="overwrite"/>,
    /// C[i, j] = -S[i, j], otherwise C[i, j] -= S[i, j], where S[i, j] = sum over t &lt; <paramref name="k"/> of
    /// A[i, t] A[j, t]; A[i, t] = <paramref name="a"/>[aOff + i + t lda], C[i, j] = <paramref name="c"/>[cOff + i + j ldc].
    /// Columns [<paramref name="col0"/>, <paramref name="col1"/>) of C only (a thread's share), col0 a multiple of 4.
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static void LowerProduct(double[] a, long aOff, int lda, int m, int k, double[] c, long cOff, int ldc,
        bool overwrite, int col0, int col1)
    {
        if (m <= 0 || col1 <= col0) return;
        if (aOff < 0 || aOff + (long)Math.Max(k - 1, 0) * lda + m > a.Length) throw new ArgumentOutOfRangeException(nameof(aOff));
        if (cOff < 0 || cOff + (long)(col1 - 1) * ldc + m > c.Length) throw new ArgumentOutOfRangeException(nameof(cOff));
        if (!Accelerated)
        {
            Portable(a, aOff, lda, m, k, c, cOff, ldc, overwrite, col0, col1);
            return;
        }
        ref double pa = ref Unsafe.Add(ref MemoryMarshal.GetArrayDataReference(a), (nint)aOff);
        ref double pc = ref Unsafe.Add(ref MemoryMarshal.GetArrayDataReference(c), (nint)cOff);
        if (k == 0)
        {
            if (overwrite)
                for (int j = col0; j < col1; j++) c.AsSpan((int)(cOff + (long)j * ldc + j), m - j).Clear();
            return;
        }
        for (int t0 = 0; t0 < k; t0 += DepthBlock)
        {
            int kb = Math.Min(DepthBlock, k - t0);
            bool ow = overwrite && t0 == 0;
            ref double pat = ref Unsafe.Add(ref pa, (nint)((long)t0 * lda));
            int j0 = col0;
            for (; j0 + 4 <= col1; j0 += 4)
            {
                int i0 = j0;
                for (; i0 + 8 <= m; i0 += 8) Tile8x4(ref pat, lda, kb, i0, j0, ref pc, ldc, ow);
                if (i0 + 4 <= m) { Tile4x4(ref pat, lda, kb, i0, j0, ref pc, ldc, ow); i0 += 4; }
                for (; i0 < m; i0++)
                    for (int j = j0; j < j0 + 4; j++) Single(ref pat, lda, kb, i0, j, ref pc, ldc, ow);
            }
            for (; j0 < col1; j0++) Column(ref pat, lda, kb, m, j0, ref pc, ldc, ow);
        }
    }

    /// <summary>
    /// The same product as column axpys grouped four source columns at a time on <see cref="System.Numerics.Vector{T}"/>
    /// (Golub and Van Loan, sec. 4.2.5), for hardware without 256-bit vectors and fused multiply-add.
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)] // Vector<T> code is left out of ReadyToRun images: JIT it optimized at once
    private static void Portable(double[] a, long aOff, int lda, int m, int k, double[] c, long cOff, int ldc,
        bool overwrite, int col0, int col1)
    {
        if (overwrite)
            for (int j = col0; j < col1; j++) c.AsSpan((int)(cOff + (long)j * ldc + j), m - j).Clear();
        int t = 0;
        for (; t + 3 < k; t += 4)
        {
            var a0 = a.AsSpan((int)(aOff + (long)t * lda), m);
            var a1 = a.AsSpan((int)(aOff + (long)(t + 1) * lda), m);
            var a2 = a.AsSpan((int)(aOff + (long)(t + 2) * lda), m);
            var a3 = a.AsSpan((int)(aOff + (long)(t + 3) * lda), m);
            for (int j = col0; j < col1; j++)
                DenseKernels.Axpy4(c.AsSpan((int)(cOff + (long)j * ldc + j), m - j), a0[j..], a1[j..], a2[j..], a3[j..],
                    -a0[j], -a1[j], -a2[j], -a3[j]);
        }
        for (; t < k; t++)
        {
            var a0 = a.AsSpan((int)(aOff + (long)t * lda), m);
            for (int j = col0; j < col1; j++) DenseKernels.Axpy(c.AsSpan((int)(cOff + (long)j * ldc + j), m - j), a0[j..], -a0[j]);
        }
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining | MethodImplOptions.AggressiveOptimization)]
    private static void Tile8x4(ref double a, int lda, int k, int i0, int j0, ref double c, int ldc, bool overwrite)
    {
        var c00 = Vector256<double>.Zero; var c10 = Vector256<double>.Zero;
        var c01 = Vector256<double>.Zero; var c11 = Vector256<double>.Zero;
        var c02 = Vector256<double>.Zero; var c12 = Vector256<double>.Zero;
        var c03 = Vector256<double>.Zero; var c13 = Vector256<double>.Zero;
        ref double ai = ref Unsafe.Add(ref a, i0);
        ref double aj = ref Unsafe.Add(ref a, j0);
        for (int t = 0; t < k; t++)
        {
            var x0 = Vector256.LoadUnsafe(ref ai);
            var x1 = Vector256.LoadUnsafe(ref ai, 4);
            var b0 = Vector256.Create(aj);
            var b1 = Vector256.Create(Unsafe.Add(ref aj, 1));
            var b2 = Vector256.Create(Unsafe.Add(ref aj, 2));
            var b3 = Vector256.Create(Unsafe.Add(ref aj, 3));
            c00 = Vector256.FusedMultiplyAdd(x0, b0, c00); c10 = Vector256.FusedMultiplyAdd(x1, b0, c10);
            c01 = Vector256.FusedMultiplyAdd(x0, b1, c01); c11 = Vector256.FusedMultiplyAdd(x1, b1, c11);
            c02 = Vector256.FusedMultiplyAdd(x0, b2, c02); c12 = Vector256.FusedMultiplyAdd(x1, b2, c12);
            c03 = Vector256.FusedMultiplyAdd(x0, b3, c03); c13 = Vector256.FusedMultiplyAdd(x1, b3, c13);
            ai = ref Unsafe.Add(ref ai, lda);
            aj = ref Unsafe.Add(ref aj, lda);
        }
        ref double d = ref Unsafe.Add(ref c, (nint)((long)j0 * ldc + i0));
        Store(ref d, c00, c10, overwrite);
        Store(ref Unsafe.Add(ref d, ldc), c01, c11, overwrite);
        Store(ref Unsafe.Add(ref d, 2 * ldc), c02, c12, overwrite);
        Store(ref Unsafe.Add(ref d, 3 * ldc), c03, c13, overwrite);
    }

    /// <summary>Rows [j, m) of column j: 8 and 4 rows at a time in vector registers, the last rows scalar.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static void Column(ref double a, int lda, int k, int m, int j, ref double c, int ldc, bool overwrite)
    {
        int i0 = j;
        ref double dcol = ref Unsafe.Add(ref c, (nint)((long)j * ldc));
        for (; i0 + 8 <= m; i0 += 8)
        {
            var c0 = Vector256<double>.Zero; var c1 = Vector256<double>.Zero;
            ref double ai = ref Unsafe.Add(ref a, i0);
            ref double aj = ref Unsafe.Add(ref a, j);
            for (int t = 0; t < k; t++)
            {
                var b = Vector256.Create(aj);
                c0 = Vector256.FusedMultiplyAdd(Vector256.LoadUnsafe(ref ai), b, c0);
                c1 = Vector256.FusedMultiplyAdd(Vector256.LoadUnsafe(ref ai, 4), b, c1);
                ai = ref Unsafe.Add(ref ai, lda);
                aj = ref Unsafe.Add(ref aj, lda);
            }
            Store(ref Unsafe.Add(ref dcol, i0), c0, c1, overwrite);
        }
        if (i0 + 4 <= m)
        {
            var c0 = Vector256<double>.Zero;
            ref double ai = ref Unsafe.Add(ref a, i0);
            ref double aj = ref Unsafe.Add(ref a, j);
            for (int t = 0; t < k; t++)
            {
                c0 = Vector256.FusedMultiplyAdd(Vector256.LoadUnsafe(ref ai), Vector256.Create(aj), c0);
                ai = ref Unsafe.Add(ref ai, lda);
                aj = ref Unsafe.Add(ref aj, lda);
            }
            Store4(ref Unsafe.Add(ref dcol, i0), c0, overwrite);
            i0 += 4;
        }
        for (; i0 < m; i0++) Single(ref a, lda, k, i0, j, ref c, ldc, overwrite);
    }

    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static void Tile4x4(ref double a, int lda, int k, int i0, int j0, ref double c, int ldc, bool overwrite)
    {
        var c0 = Vector256<double>.Zero; var c1 = Vector256<double>.Zero;
        var c2 = Vector256<double>.Zero; var c3 = Vector256<double>.Zero;
        ref double ai = ref Unsafe.Add(ref a, i0);
        ref double aj = ref Unsafe.Add(ref a, j0);
        for (int t = 0; t < k; t++)
        {
            var x0 = Vector256.LoadUnsafe(ref ai);
            c0 = Vector256.FusedMultiplyAdd(x0, Vector256.Create(aj), c0);
            c1 = Vector256.FusedMultiplyAdd(x0, Vector256.Create(Unsafe.Add(ref aj, 1)), c1);
            c2 = Vector256.FusedMultiplyAdd(x0, Vector256.Create(Unsafe.Add(ref aj, 2)), c2);
            c3 = Vector256.FusedMultiplyAdd(x0, Vector256.Create(Unsafe.Add(ref aj, 3)), c3);
            ai = ref Unsafe.Add(ref ai, lda);
            aj = ref Unsafe.Add(ref aj, lda);
        }
        ref double d = ref Unsafe.Add(ref c, (nint)((long)j0 * ldc + i0));
        Store4(ref d, c0, overwrite);
        Store4(ref Unsafe.Add(ref d, ldc), c1, overwrite);
        Store4(ref Unsafe.Add(ref d, 2 * ldc), c2, overwrite);
        Store4(ref Unsafe.Add(ref d, 3 * ldc), c3, overwrite);
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static void Store4(ref double d, Vector256<double> v, bool overwrite)
        => (overwrite ? -v : Vector256.LoadUnsafe(ref d) - v).StoreUnsafe(ref d);

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static void Store(ref double d, Vector256<double> lo, Vector256<double> hi, bool overwrite)
    {
        if (overwrite)
        {
            lo = -lo;
            hi = -hi;
        }
        else
        {
            lo = Vector256.LoadUnsafe(ref d) - lo;
            hi = Vector256.LoadUnsafe(ref d, 4) - hi;
        }
        lo.StoreUnsafe(ref d);
        hi.StoreUnsafe(ref d, 4);
    }

    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static void Single(ref double a, int lda, int k, int i, int j, ref double c, int ldc, bool overwrite)
    {
        double s = 0;
        ref double ai = ref Unsafe.Add(ref a, i);
        ref double aj = ref Unsafe.Add(ref a, j);
        for (int t = 0; t < k; t++)
        {
            s = Math.FusedMultiplyAdd(ai, aj, s);
            ai = ref Unsafe.Add(ref ai, lda);
            aj = ref Unsafe.Add(ref aj, lda);
        }
        ref double d = ref Unsafe.Add(ref c, (nint)((long)j * ldc + i));
        d = overwrite ? -s : d - s;
    }
}
