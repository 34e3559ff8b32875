namespace SectionTwist.WarpingTorsion;

/// <summary>
/// The exact element of non-uniform (Vlasov) torsion for constant properties: E Iw phi'''' - G J phi'' = m, freedoms
/// (phi, phi') at both ends. The shape functions are the homogeneous solutions 1, x and hyperbolic functions of k x,
/// k = sqrt(G J / (E Iw)) = 1 / a (Vlasov, Thin-Walled Elastic Beams, 2nd ed., ch. 5; the exact-element form of
/// Barsoum and Gallagher, "Finite element analysis of torsional and torsional-flexural stability problems",
/// Int. J. Numer. Meth. Eng. 2, 1970). For k L below 1 the basis is 1, x, (cosh kx - 1)/k^2, (sinh kx - kx)/k^3 (series
/// near zero, so it tends to the cubic Hermite beam as a grows without bound); above, 1, x, e^(-kx), e^(-k(L-x)) (no
/// overflow as a tends to zero). The stiffness is K = E H^-1 with H the end values and E the end actions of the basis,
/// so no quadrature is needed; a uniform torque m enters through a particular solution, so nodal values and the field
/// inside the element are exact.
/// </summary>
internal sealed class VlasovElement
{
    private readonly double _l, _gj, _eiw, _k, _m;
    private readonly bool _exponential;
    private readonly double[] _hInv = new double[16];

    public VlasovElement(double length, double gj, double eiw, double torquePerLength)
    {
        _l = length; _gj = gj; _eiw = eiw; _m = torquePerLength;
        _k = Math.Sqrt(gj / eiw);
        _exponential = _k * length >= 1;
        Span<double> h = stackalloc double[16];
        Span<double> d = stackalloc double[4];
        for (int j = 0; j < 4; j++)
        {
            Basis(j, 0, d); h[0 * 4 + j] = d[0]; h[1 * 4 + j] = d[1];
            Basis(j, length, d); h[2 * 4 + j] = d[0]; h[3 * 4 + j] = d[1];
        }
        Invert4(h, _hInv);
        Stiffness = new double[16];
        Span<double> act = stackalloc double[16];
        for (int j = 0; j < 4; j++)
        {
            Basis(j, 0, d); EndActions(d, out act[0 * 4 + j], out act[1 * 4 + j], atStart: true);
            Basis(j, length, d); EndActions(d, out act[2 * 4 + j], out act[3 * 4 + j], atStart: false);
        }
        for (int r = 0; r < 4; r++)
            for (int c = 0; c < 4; c++)
            {
                double s = 0;
                for (int q = 0; q < 4; q++) s += act[r * 4 + q] * _hInv[q * 4 + c];
                Stiffness[r * 4 + c] = s;
            }
        for (int r = 0; r < 4; r++) for (int c = 0; c < r; c++) Stiffness[r * 4 + c] = Stiffness[c * 4 + r] = 0.5 * (Stiffness[r * 4 + c] + Stiffness[c * 4 + r]);
        // equivalent nodal load f = K d_p - F_p of the particular solution
        Load = new double[4];
        Span<double> p0 = stackalloc double[4];
        Span<double> p1 = stackalloc double[4];
        Particular(0, p0); Particular(length, p1);
        Span<double> dp = [p0[0], p0[1], p1[0], p1[1]];
        Span<double> fp = stackalloc double[4];
        EndActions(p0, out fp[0], out fp[1], atStart: true);
        EndActions(p1, out fp[2], out fp[3], atStart: false);
        for (int r = 0; r < 4; r++)
        {
            double s = -fp[r];
            for (int c = 0; c < 4; c++) s += Stiffness[r * 4 + c] * dp[c];
            Load[r] = s;
        }
    }

    /// <summary>4 x 4 stiffness, row-major, freedoms (phi_0, phi'_0, phi_L, phi'_L).</summary>
    public double[] Stiffness { get; }
    /// <summary>Equivalent nodal load of the uniform torque.</summary>
    public double[] Load { get; }

    /// <summary>phi and its first three derivatives at <paramref name="x"/> (0..L) for the end freedoms <paramref name="ends"/>.</summary>
    public void Field(ReadOnlySpan<double> ends, double x, Span<double> phi)
    {
        Span<double> p0 = stackalloc double[4];
        Span<double> p1 = stackalloc double[4];
        Particular(0, p0); Particular(_l, p1);
        Span<double> rel = [ends[0] - p0[0], ends[1] - p0[1], ends[2] - p1[0], ends[3] - p1[1]];
        Particular(x, phi);
        Span<double> d = stackalloc double[4];
        for (int j = 0; j < 4; j++)
        {
            double c = 0;
            for (int q = 0; q < 4; q++) c += _hInv[j * 4 + q] * rel[q];
            Basis(j, x, d);
            for (int o = 0; o < 4; o++) phi[o] += c * d[o];
        }
    }

    /// <summary>End actions conjugate to (phi, phi'): at the start (-T, -E Iw phi''), at the end (T, E Iw phi''), T = G J phi' - E Iw phi'''.</summary>
    private void EndActions(ReadOnlySpan<double> d, out double torque, out double bimomentLike, bool atStart)
    {
        double t = _gj * d[1] - _eiw * d[3], b = _eiw * d[2];
        torque = atStart ? -t : t;
        bimomentLike = atStart ? -b : b;
    }

    /// <summary>Basis function <paramref name="j"/> and its derivatives 0..3 at x.</summary>
    private void Basis(int j, double x, Span<double> d)
    {
        double k = _k;
        switch (j)
        {
            case 0: d[0] = 1; d[1] = 0; d[2] = 0; d[3] = 0; return;
            case 1: d[0] = x; d[1] = 1; d[2] = 0; d[3] = 0; return;
        }
        if (_exponential)
        {
            double e = j == 2 ? Math.Exp(-k * x) : Math.Exp(-k * (_l - x));
            double s = j == 2 ? -k : k;
            d[0] = e; d[1] = s * e; d[2] = k * k * e; d[3] = s * k * k * e;
            return;
        }
        double z = k * x;
        double f0 = CoshM1OverK2(x), f1 = SinhOverK(x), f2 = Math.Cosh(z), f3 = k * Math.Sinh(z);
        if (j == 2) { d[0] = f0; d[1] = f1; d[2] = f2; d[3] = f3; }
        else { d[0] = Series(x, 3); d[1] = f0; d[2] = f1; d[3] = f2; }
    }

    /// <summary>A particular solution for the uniform torque m and its derivatives 0..3.</summary>
    private void Particular(double x, Span<double> d)
    {
        if (_exponential)
        {
            double c = -_m / _gj; // phi = -m x^2 / (2 G J)
            d[0] = 0.5 * c * x * x; d[1] = c * x; d[2] = c; d[3] = 0;
            return;
        }
        double s = _m / _eiw; // phi = (m / E Iw) (cosh kx - 1 - (kx)^2 / 2) / k^4
        d[0] = s * Series(x, 4); d[1] = s * Series(x, 3); d[2] = s * CoshM1OverK2(x); d[3] = s * SinhOverK(x);
    }

    private double CoshM1OverK2(double x)
    {
        double h = 0.5 * _k * x;
        return _k == 0 ? 0.5 * x * x : 2 * Math.Sinh(h) * Math.Sinh(h) / (_k * _k);
    }

    private double SinhOverK(double x) => _k == 0 ? x : Math.Sinh(_k * x) / _k;

    /// <summary>sum over n of k^(2n) x^(p + 2n) / (p + 2n)!: (sinh kx - kx)/k^3 for p = 3, (cosh kx - 1 - (kx)^2/2)/k^4 for p = 4 (k x &lt;= 1).</summary>
    private double Series(double x, int p)
    {
        double term = Math.Pow(x, p);
        for (int i = 2; i <= p; i++) term /= i;
        double sum = term, z2 = _k * _k * x * x;
        for (int n = 1; n < 30 && Math.Abs(term) > 1e-18 * Math.Abs(sum); n++)
        {
            term *= z2 / ((p + 2 * n - 1) * (p + 2 * n));
            sum += term;
        }
        return sum;
    }

    /// <summary>Gauss-Jordan inverse with partial pivoting (4 x 4, row-major).</summary>
    private static void Invert4(ReadOnlySpan<double> a, Span<double> inv)
    {
        Span<double> m = stackalloc double[32];
        for (int r = 0; r < 4; r++) { for (int c = 0; c < 4; c++) m[r * 8 + c] = a[r * 4 + c]; m[r * 8 + 4 + r] = 1; }
        for (int c = 0; c < 4; c++)
        {
            int piv = c;
            for (int r = c + 1; r < 4; r++) if (Math.Abs(m[r * 8 + c]) > Math.Abs(m[piv * 8 + c])) piv = r;
            if (piv != c) for (int q = 0; q < 8; q++) (m[c * 8 + q], m[piv * 8 + q]) = (m[piv * 8 + q], m[c * 8 + q]);
            double d = m[c * 8 + c];
            for (int q = 0; q < 8; q++) m[c * 8 + q] /= d;
            for (int r = 0; r < 4; r++)
            {
                if (r == c) continue;
                double f = m[r * 8 + c];
                if (f != 0) for (int q = 0; q < 8; q++) m[r * 8 + q] -= f * m[c * 8 + q];
            }
        }
        for (int r = 0; r < 4; r++) for (int c = 0; c < 4; c++) inv[r * 4 + c] = m[r * 8 + 4 + c];
    }
}
