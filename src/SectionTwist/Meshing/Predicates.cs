using System.Runtime.CompilerServices;

namespace SectionTwist.Meshing;

/// <summary>
/// Robust geometric predicates: a port of J. R. Shewchuk, "Adaptive Precision Floating-Point Arithmetic and Fast
/// Robust Geometric Predicates", Discrete &amp; Computational Geometry 18(3), 1997. <see cref="Orient2D"/> is the full
/// adaptive orient2d (stages A, B, C, D of section 4.2); <see cref="InCircle"/> runs the error-bound filter, the
/// adaptive stages B and C of incircleadapt (section 4.3) and falls back to the exact expansion evaluation
/// (incircleexact) in place of the final stage. The sign of each result is exact; the magnitude is approximate.
/// Two_Product uses a fused multiply-add for the rounding error where the hardware has one (exact, Ogita-Rump-Oishi 2005)
/// and Dekker's splitting otherwise, as in the paper.
/// </summary>
internal static class Predicates
{
    private const double Epsilon = 1.1102230246251565e-16; // 2^-53
    private const double Splitter = 134217729.0;            // 2^27 + 1
    private const double ResultErrBound = (3.0 + 8.0 * Epsilon) * Epsilon;
    private const double CcwErrBoundA = (3.0 + 16.0 * Epsilon) * Epsilon;
    private const double CcwErrBoundB = (2.0 + 12.0 * Epsilon) * Epsilon;
    private const double CcwErrBoundC = (9.0 + 64.0 * Epsilon) * Epsilon * Epsilon;
    private const double IccErrBoundA = (10.0 + 96.0 * Epsilon) * Epsilon;
    private const double IccErrBoundB = (4.0 + 48.0 * Epsilon) * Epsilon;
    private const double IccErrBoundC = (44.0 + 576.0 * Epsilon) * Epsilon * Epsilon;

    /// <summary>
    /// Positive when a, b, c run counter-clockwise, negative when clockwise, zero when collinear (exact sign);
    /// the value approximates twice the signed triangle area.
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static double Orient2D(double ax, double ay, double bx, double by, double cx, double cy)
    {
        double detleft = (ax - cx) * (by - cy);
        double detright = (ay - cy) * (bx - cx);
        double det = detleft - detright;
        double detsum;
        if (detleft > 0.0)
        {
            if (detright <= 0.0) return det;
            detsum = detleft + detright;
        }
        else if (detleft < 0.0)
        {
            if (detright >= 0.0) return det;
            detsum = -detleft - detright;
        }
        else return det;
        double errbound = CcwErrBoundA * detsum;
        if (det >= errbound || -det >= errbound) return det;
        return Orient2DAdapt(ax, ay, bx, by, cx, cy, detsum);
    }

    /// <summary>
    /// Positive when d lies inside the circle through a, b, c (which must run counter-clockwise), negative outside,
    /// zero on it (exact sign).
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static double InCircle(double ax, double ay, double bx, double by, double cx, double cy, double dx, double dy)
    {
        double adx = ax - dx, bdx = bx - dx, cdx = cx - dx;
        double ady = ay - dy, bdy = by - dy, cdy = cy - dy;
        double bdxcdy = bdx * cdy, cdxbdy = cdx * bdy, alift = adx * adx + ady * ady;
        double cdxady = cdx * ady, adxcdy = adx * cdy, blift = bdx * bdx + bdy * bdy;
        double adxbdy = adx * bdy, bdxady = bdx * ady, clift = cdx * cdx + cdy * cdy;
        double det = alift * (bdxcdy - cdxbdy) + blift * (cdxady - adxcdy) + clift * (adxbdy - bdxady);
        double permanent = (Math.Abs(bdxcdy) + Math.Abs(cdxbdy)) * alift
                         + (Math.Abs(cdxady) + Math.Abs(adxcdy)) * blift
                         + (Math.Abs(adxbdy) + Math.Abs(bdxady)) * clift;
        double errbound = IccErrBoundA * permanent;
        if (det > errbound || -det > errbound) return det;
        return InCircleAdapt(ax, ay, bx, by, cx, cy, dx, dy, permanent);
    }

    private static double Orient2DAdapt(double ax, double ay, double bx, double by, double cx, double cy, double detsum)
    {
        Span<double> b = stackalloc double[4];
        Span<double> u = stackalloc double[4];
        Span<double> c1 = stackalloc double[8];
        Span<double> c2 = stackalloc double[12];
        Span<double> d = stackalloc double[16];

        double acx = ax - cx, bcx = bx - cx, acy = ay - cy, bcy = by - cy;
        TwoProduct(acx, bcy, out double detleft, out double detlefttail);
        TwoProduct(acy, bcx, out double detright, out double detrighttail);
        TwoTwoDiff(detleft, detlefttail, detright, detrighttail, b);
        double det = Estimate(b);
        double errbound = CcwErrBoundB * detsum;
        if (det >= errbound || -det >= errbound) return det;

        double acxtail = TwoDiffTail(ax, cx, acx), bcxtail = TwoDiffTail(bx, cx, bcx);
        double acytail = TwoDiffTail(ay, cy, acy), bcytail = TwoDiffTail(by, cy, bcy);
        if (acxtail == 0.0 && acytail == 0.0 && bcxtail == 0.0 && bcytail == 0.0) return det;

        errbound = CcwErrBoundC * detsum + ResultErrBound * Math.Abs(det);
        det += (acx * bcytail + bcy * acxtail) - (acy * bcxtail + bcx * acytail);
        if (det >= errbound || -det >= errbound) return det;

        TwoProduct(acxtail, bcy, out double s1, out double s0);
        TwoProduct(acytail, bcx, out double t1, out double t0);
        TwoTwoDiff(s1, s0, t1, t0, u);
        int c1len = FastExpansionSumZeroElim(b, u, c1);
        TwoProduct(acx, bcytail, out s1, out s0);
        TwoProduct(acy, bcxtail, out t1, out t0);
        TwoTwoDiff(s1, s0, t1, t0, u);
        int c2len = FastExpansionSumZeroElim(c1[..c1len], u, c2);
        TwoProduct(acxtail, bcytail, out s1, out s0);
        TwoProduct(acytail, bcxtail, out t1, out t0);
        TwoTwoDiff(s1, s0, t1, t0, u);
        int dlen = FastExpansionSumZeroElim(c2[..c2len], u, d);
        return d[dlen - 1];
    }

    private static double InCircleAdapt(double ax, double ay, double bx, double by, double cx, double cy, double dx, double dy, double permanent)
    {
        double adx = ax - dx, bdx = bx - dx, cdx = cx - dx;
        double ady = ay - dy, bdy = by - dy, cdy = cy - dy;
        Span<double> bc = stackalloc double[4];
        Span<double> ca = stackalloc double[4];
        Span<double> ab = stackalloc double[4];
        Span<double> adet = stackalloc double[32];
        Span<double> bdet = stackalloc double[32];
        Span<double> cdet = stackalloc double[32];
        Span<double> abdet = stackalloc double[64];
        Span<double> fin = stackalloc double[96];

        TwoProduct(bdx, cdy, out double p1, out double p0);
        TwoProduct(cdx, bdy, out double q1, out double q0);
        TwoTwoDiff(p1, p0, q1, q0, bc);
        int alen = LiftedTerm(bc, adx, ady, adet);
        TwoProduct(cdx, ady, out p1, out p0);
        TwoProduct(adx, cdy, out q1, out q0);
        TwoTwoDiff(p1, p0, q1, q0, ca);
        int blen = LiftedTerm(ca, bdx, bdy, bdet);
        TwoProduct(adx, bdy, out p1, out p0);
        TwoProduct(bdx, ady, out q1, out q0);
        TwoTwoDiff(p1, p0, q1, q0, ab);
        int clen = LiftedTerm(ab, cdx, cdy, cdet);
        int ablen = FastExpansionSumZeroElim(adet[..alen], bdet[..blen], abdet);
        int finlen = FastExpansionSumZeroElim(abdet[..ablen], cdet[..clen], fin);

        double det = Estimate(fin[..finlen]);
        double errbound = IccErrBoundB * permanent;
        if (det >= errbound || -det >= errbound) return det;

        double adxtail = TwoDiffTail(ax, dx, adx), adytail = TwoDiffTail(ay, dy, ady);
        double bdxtail = TwoDiffTail(bx, dx, bdx), bdytail = TwoDiffTail(by, dy, bdy);
        double cdxtail = TwoDiffTail(cx, dx, cdx), cdytail = TwoDiffTail(cy, dy, cdy);
        if (adxtail == 0.0 && bdxtail == 0.0 && cdxtail == 0.0 && adytail == 0.0 && bdytail == 0.0 && cdytail == 0.0)
            return det; // the expansion above is exact

        errbound = IccErrBoundC * permanent + ResultErrBound * Math.Abs(det);
        det += ((adx * adx + ady * ady) * ((bdx * cdytail + cdy * bdxtail) - (bdy * cdxtail + cdx * bdytail))
                + 2.0 * (adx * adxtail + ady * adytail) * (bdx * cdy - bdy * cdx))
             + ((bdx * bdx + bdy * bdy) * ((cdx * adytail + ady * cdxtail) - (cdy * adxtail + adx * cdytail))
                + 2.0 * (bdx * bdxtail + bdy * bdytail) * (cdx * ady - cdy * adx))
             + ((cdx * cdx + cdy * cdy) * ((adx * bdytail + bdy * adxtail) - (ady * bdxtail + bdx * adytail))
                + 2.0 * (cdx * cdxtail + cdy * cdytail) * (adx * bdy - ady * bdx));
        if (det >= errbound || -det >= errbound) return det;
        return InCircleExact(ax, ay, bx, by, cx, cy, dx, dy);
    }

    /// <summary>(x^2 + y^2) * e as an expansion (e has 4 components).</summary>
    private static int LiftedTerm(ReadOnlySpan<double> e, double x, double y, Span<double> h)
    {
        Span<double> t8 = stackalloc double[8];
        Span<double> xx = stackalloc double[16];
        Span<double> yy = stackalloc double[16];
        int n = ScaleExpansionZeroElim(e, x, t8);
        int xl = ScaleExpansionZeroElim(t8[..n], x, xx);
        n = ScaleExpansionZeroElim(e, y, t8);
        int yl = ScaleExpansionZeroElim(t8[..n], y, yy);
        return FastExpansionSumZeroElim(xx[..xl], yy[..yl], h);
    }

    /// <summary>incircleexact of the paper: the determinant expanded in products of the raw coordinates, exactly.</summary>
    internal static double InCircleExact(double ax, double ay, double bx, double by, double cx, double cy, double dx, double dy)
    {
        Span<double> ab = stackalloc double[4], bc = stackalloc double[4], cd = stackalloc double[4];
        Span<double> da = stackalloc double[4], ac = stackalloc double[4], bd = stackalloc double[4];
        Cross(ax, ay, bx, by, ab); Cross(bx, by, cx, cy, bc); Cross(cx, cy, dx, dy, cd);
        Cross(dx, dy, ax, ay, da); Cross(ax, ay, cx, cy, ac); Cross(bx, by, dx, dy, bd);

        Span<double> temp8 = stackalloc double[8];
        Span<double> abc = stackalloc double[12], bcd = stackalloc double[12], cda = stackalloc double[12], dab = stackalloc double[12];
        int tl = FastExpansionSumZeroElim(cd, da, temp8);
        int cdalen = FastExpansionSumZeroElim(temp8[..tl], ac, cda);
        tl = FastExpansionSumZeroElim(da, ab, temp8);
        int dablen = FastExpansionSumZeroElim(temp8[..tl], bd, dab);
        for (int i = 0; i < 4; i++) { bd[i] = -bd[i]; ac[i] = -ac[i]; }
        tl = FastExpansionSumZeroElim(ab, bc, temp8);
        int abclen = FastExpansionSumZeroElim(temp8[..tl], ac, abc);
        tl = FastExpansionSumZeroElim(bc, cd, temp8);
        int bcdlen = FastExpansionSumZeroElim(temp8[..tl], bd, bcd);

        Span<double> adet = stackalloc double[96], bdet = stackalloc double[96], cdet = stackalloc double[96], ddet = stackalloc double[96];
        int alen = LiftedScaled(bcd[..bcdlen], ax, ay, 1, adet);
        int blen = LiftedScaled(cda[..cdalen], bx, by, -1, bdet);
        int clen = LiftedScaled(dab[..dablen], cx, cy, 1, cdet);
        int dlen = LiftedScaled(abc[..abclen], dx, dy, -1, ddet);

        Span<double> abdet = stackalloc double[192], cddet = stackalloc double[192], deter = stackalloc double[384];
        int ablen = FastExpansionSumZeroElim(adet[..alen], bdet[..blen], abdet);
        int cdlen = FastExpansionSumZeroElim(cdet[..clen], ddet[..dlen], cddet);
        int deterlen = FastExpansionSumZeroElim(abdet[..ablen], cddet[..cdlen], deter);
        return deter[deterlen - 1];
    }

    private static void Cross(double px, double py, double qx, double qy, Span<double> r)
    {
        TwoProduct(px, qy, out double a1, out double a0);
        TwoProduct(qx, py, out double b1, out double b0);
        TwoTwoDiff(a1, a0, b1, b0, r);
    }

    private static int LiftedScaled(ReadOnlySpan<double> e, double x, double y, double sign, Span<double> h)
    {
        Span<double> d24x = stackalloc double[24], d24y = stackalloc double[24];
        Span<double> d48x = stackalloc double[48], d48y = stackalloc double[48];
        int xl = ScaleExpansionZeroElim(e, x, d24x);
        xl = ScaleExpansionZeroElim(d24x[..xl], sign * x, d48x);
        int yl = ScaleExpansionZeroElim(e, y, d24y);
        yl = ScaleExpansionZeroElim(d24y[..yl], sign * y, d48y);
        return FastExpansionSumZeroElim(d48x[..xl], d48y[..yl], h);
    }

    // ---- expansion arithmetic (section 2 of the paper) ----

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static void TwoSum(double a, double b, out double x, out double y)
    {
        x = a + b;
        double bvirt = x - a, avirt = x - bvirt;
        y = (a - avirt) + (b - bvirt);
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static void FastTwoSum(double a, double b, out double x, out double y)
    {
        x = a + b;
        y = b - (x - a);
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static double TwoDiffTail(double a, double b, double x)
    {
        double bvirt = a - x, avirt = x + bvirt;
        return (a - avirt) + (bvirt - b);
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static void TwoDiff(double a, double b, out double x, out double y)
    {
        x = a - b;
        y = TwoDiffTail(a, b, x);
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static void Split(double a, out double hi, out double lo)
    {
        double c = Splitter * a, abig = c - a;
        hi = c - abig;
        lo = a - hi;
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal static void TwoProduct(double a, double b, out double x, out double y)
    {
        x = a * b;
        if (System.Runtime.Intrinsics.X86.Fma.IsSupported || System.Runtime.Intrinsics.Arm.AdvSimd.IsSupported)
        {
            y = Math.FusedMultiplyAdd(a, b, -x);
            return;
        }
        Split(a, out double ahi, out double alo);
        Split(b, out double bhi, out double blo);
        double err1 = x - ahi * bhi, err2 = err1 - alo * bhi, err3 = err2 - ahi * blo;
        y = alo * blo - err3;
    }

    /// <summary>Two_Two_Diff: (a1 + a0) - (b1 + b0) as a four-component expansion r[0..3] (r[3] largest).</summary>
    private static void TwoTwoDiff(double a1, double a0, double b1, double b0, Span<double> r)
    {
        // Two_One_Diff(a1, a0, b0) -> (j, z, r0)
        TwoDiff(a0, b0, out double i, out double r0);
        TwoSum(a1, i, out double j, out double z);
        // Two_One_Diff(j, z, b1) -> (r3, r2, r1)
        TwoDiff(z, b1, out double i2, out double r1);
        TwoSum(j, i2, out double r3, out double r2);
        r[0] = r0; r[1] = r1; r[2] = r2; r[3] = r3;
    }

    private static double Estimate(ReadOnlySpan<double> e)
    {
        double q = e[0];
        for (int i = 1; i < e.Length; i++) q += e[i];
        return q;
    }

    /// <summary>fast_expansion_sum_zeroelim: h = e + f, zero components removed; returns the length of h.</summary>
    private static int FastExpansionSumZeroElim(ReadOnlySpan<double> e, ReadOnlySpan<double> f, Span<double> h)
    {
        int elen = e.Length, flen = f.Length;
        double enow = e[0], fnow = f[0], q, qnew, hh;
        int ei = 0, fi = 0, hi = 0;
        if ((fnow > enow) == (fnow > -enow)) { q = enow; enow = ++ei < elen ? e[ei] : 0; }
        else { q = fnow; fnow = ++fi < flen ? f[fi] : 0; }
        if (ei < elen && fi < flen)
        {
            if ((fnow > enow) == (fnow > -enow)) { FastTwoSum(enow, q, out qnew, out hh); enow = ++ei < elen ? e[ei] : 0; }
            else { FastTwoSum(fnow, q, out qnew, out hh); fnow = ++fi < flen ? f[fi] : 0; }
            q = qnew;
            if (hh != 0.0) h[hi++] = hh;
            while (ei < elen && fi < flen)
            {
                if ((fnow > enow) == (fnow > -enow)) { TwoSum(q, enow, out qnew, out hh); enow = ++ei < elen ? e[ei] : 0; }
                else { TwoSum(q, fnow, out qnew, out hh); fnow = ++fi < flen ? f[fi] : 0; }
                q = qnew;
                if (hh != 0.0) h[hi++] = hh;
            }
        }
        while (ei < elen)
        {
            TwoSum(q, enow, out qnew, out hh); enow = ++ei < elen ? e[ei] : 0;
            q = qnew;
            if (hh != 0.0) h[hi++] = hh;
        }
        while (fi < flen)
        {
            TwoSum(q, fnow, out qnew, out hh); fnow = ++fi < flen ? f[fi] : 0;
            q = qnew;
            if (hh != 0.0) h[hi++] = hh;
        }
        if (q != 0.0 || hi == 0) h[hi++] = q;
        return hi;
    }

    /// <summary>scale_expansion_zeroelim: h = b * e, zero components removed; returns the length of h.</summary>
    private static int ScaleExpansionZeroElim(ReadOnlySpan<double> e, double b, Span<double> h)
    {
        TwoProduct(e[0], b, out double q, out double hh);
        int hi = 0;
        if (hh != 0) h[hi++] = hh;
        for (int i = 1; i < e.Length; i++)
        {
            TwoProduct(e[i], b, out double p1, out double p0);
            TwoSum(q, p0, out double sum, out hh);
            if (hh != 0) h[hi++] = hh;
            FastTwoSum(p1, sum, out q, out hh);
            if (hh != 0) h[hi++] = hh;
        }
        if (q != 0.0 || hi == 0) h[hi++] = q;
        return hi;
    }
}
