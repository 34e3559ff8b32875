using SectionTwist.Geometry;
using SectionTwist.Meshing;
using SectionTwist.Sparse;
using SectionTwist.Torsion;

namespace SectionTwist.Plastic;

/// <summary>
/// Elastic-perfectly-plastic torsion on one quadratic mesh, scaled by the yield shear: psi = phi / tau_y (m), the
/// twist parameter lambda = G theta / tau_y (1/m). The stress function minimises 1/2 a(psi, psi) - lambda (2 int psi +
/// 2 sum c_k A_k) under |grad psi| &lt;= 1. For a region without holes this variational inequality is the obstacle
/// problem psi &lt;= d, d = distance to the boundary (Brezis and Sibony, "Equivalence de deux inequations
/// variationnelles et applications", Arch. Rational Mech. Anal. 41 (1971) 254-265; Ting, "Elastic-plastic torsion of
/// a square bar", Trans. AMS 123 (1966) 369-401). With holes the slope bound along straight paths from every loop gives
/// the two-sided obstacle max(-d_0, c_k - d_k) &lt;= psi &lt;= min(d_0, c_k + d_k) for fixed hole constants c_k; the
/// reduced energy is convex in c (the constraints are linear in psi and c together), and its derivative follows from
/// the solution by the envelope theorem: dE/dc_k = sum of the residuals r = K psi - lambda f over the hole's nodes and
/// the nodes held at an obstacle of that hole, minus 2 lambda A_k (the discrete form of the hole's circulation
/// condition). The constants are the sign changes of these derivatives, found hole by hole by a bracketing root search
/// (<see cref="MonotoneRoot"/>), which needs a few solves and reaches round-off where a search on the energy alone stalls
/// at the square root of its precision. The constraint is imposed at the nodes (the usual discrete obstacle problem).
/// The torque is T = tau_y (f . psi + 2 sum c_k A_k), f the element loads 2 int N.
/// </summary>
internal sealed class ElasticPlasticProblem
{
    private readonly Mesh _mesh;
    private readonly CscMatrix _kFull;
    private readonly CscMatrix _kFree;
    private readonly double[] _f;
    private readonly int[] _free;
    private readonly double[] _d0;
    private readonly double[][] _dh;
    private readonly double[] _holeArea;
    private readonly double[] _outerGap;
    private readonly double[,] _holeGap;
    private readonly SectionDistances _dist;
    private readonly BoxQpCache _cache = new();
    private double[] _warm;
    private double _lastLambda;

    public ElasticPlasticProblem(Mesh mesh, double[] loopArea, CancellationToken ct = default)
    {
        _mesh = mesh;
        int n = mesh.NodeCount;
        var trip = new TripletMatrix(n, mesh.ElementCount * 36);
        _f = new double[n];
        Span<double> ke = stackalloc double[36], fe = stackalloc double[6], xe = stackalloc double[6], ye = stackalloc double[6];
        for (int e = 0; e < mesh.ElementCount; e++)
        {
            if ((e & 4095) == 0) ct.ThrowIfCancellationRequested();
            TorsionSolver.Gather(mesh, e, xe, ye);
            TorsionSolver.ElementMatrices(xe, ye, ke, fe);
            for (int a = 0; a < 6; a++)
            {
                int na = mesh.Elements[6 * e + a];
                _f[na] += fe[a];
                for (int b = 0; b < 6; b++) trip.Add(na, mesh.Elements[6 * e + b], ke[6 * a + b]);
            }
        }
        _kFull = trip.ToCsc();
        _free = Enumerable.Range(0, n).Where(i => mesh.NodeLoop[i] < 0).ToArray();
        var map = new int[n];
        Array.Fill(map, -1);
        for (int i = 0; i < _free.Length; i++) map[_free[i]] = i;
        var ft = new TripletMatrix(_free.Length, _kFull.NonZeros);
        for (int c = 0; c < n; c++)
        {
            if (map[c] < 0) continue;
            for (int p = _kFull.ColPtr[c]; p < _kFull.ColPtr[c + 1]; p++)
                if (map[_kFull.RowIdx[p]] >= 0) ft.Add(map[_kFull.RowIdx[p]], map[c], _kFull.Values[p]);
        }
        _kFree = ft.ToCsc();

        _dist = new SectionDistances(mesh);
        var nodeRegion = new int[n];
        for (int e = 0; e < mesh.ElementCount; e++) for (int a = 0; a < 6; a++) nodeRegion[mesh.Elements[6 * e + a]] = mesh.ElementRegion[e];
        _d0 = new double[_free.Length];
        _dh = new double[_dist.HoleCount][];
        for (int k = 0; k < _dh.Length; k++) _dh[k] = new double[_free.Length];
        for (int i = 0; i < _free.Length; i++)
        {
            if ((i & 255) == 0) ct.ThrowIfCancellationRequested(); // distances cost the loops' segment count per node
            var p = mesh.Node(_free[i]);
            _d0[i] = _dist.ToOuter(p, nodeRegion[_free[i]]);
            for (int k = 0; k < _dh.Length; k++) _dh[k][i] = _dist.ToHole(p, nodeRegion[_free[i]], k);
        }
        _holeArea = _dist.HoleLoops.Select(l => loopArea[l]).ToArray();
        (_outerGap, _holeGap) = _dist.HoleCount > 0 ? _dist.Gaps(ct) : ([], new double[0, 0]);
        HoleConstants = new double[_dist.HoleCount];
        _warm = new double[_free.Length];
    }

    /// <summary>Hole constants / tau_y of the last solve, m.</summary>
    public double[] HoleConstants { get; private set; }

    /// <summary>The mesh.</summary>
    public Mesh Mesh => _mesh;

    /// <summary>
    /// Solves at twist parameter <paramref name="lambda"/> (G theta / tau_y, 1/m), warm-started from the previous call.
    /// </summary>
    public ElasticPlasticState Solve(double lambda, CancellationToken ct = default)
    {
        int nh = HoleConstants.Length;
        if (nh == 0) return Evaluate(lambda, HoleConstants, ct);
        var c = (double[])HoleConstants.Clone();
        // the constants grow with the twist (in proportion while elastic): scale the last ones as the first guess
        double scale = _lastLambda > 0 ? lambda / _lastLambda : 1;
        ElasticPlasticState? last = null;
        for (int sweep = 0; sweep < (nh > 1 ? 4 : 1); sweep++)
        {
            for (int k = 0; k < nh; k++)
            {
                var (lo, hi) = SectionDistances.HoleRange(k, c, _outerGap, _holeGap);
                var seen = new List<ElasticPlasticState>();
                double start = sweep == 0 ? c[k] * scale : c[k];
                c[k] = MonotoneRoot.Find(v =>
                {
                    var t = (double[])c.Clone();
                    t[k] = v;
                    var state = Evaluate(lambda, t, ct);
                    seen.Add(state);
                    return state.HoleSlopes[k];
                }, lo, hi, start, HoleTolerance * Math.Max(hi, 1e-300));
                last = seen.FindLast(x => x.HoleConstants[k] == c[k]);
            }
        }
        HoleConstants = c;
        _lastLambda = lambda;
        // the search ends on a value it has solved for; solve again only when it did not (an end of the interval)
        return last is not null && last.HoleConstants.AsSpan().SequenceEqual(c) ? last : Evaluate(lambda, c, ct);
    }

    /// <summary>Relative tolerance of the hole constants (of their largest possible value).</summary>
    internal const double HoleTolerance = 1e-9;

    /// <summary>The discrete obstacle problem for fixed hole constants.</summary>
    internal ElasticPlasticState Evaluate(double lambda, double[] c, CancellationToken ct)
    {
        int n = _mesh.NodeCount, m = _free.Length;
        var psi = new double[n];
        for (int i = 0; i < n; i++)
        {
            int l = _mesh.NodeLoop[i];
            if (l >= 0 && _dist.HoleOfLoop[l] >= 0) psi[i] = c[_dist.HoleOfLoop[l]];
        }
        var kpsi = new double[n];
        _kFull.Multiply(psi, kpsi);
        var b = new double[m];
        var lo = new double[m];
        var hi = new double[m];
        var upHole = c.Length > 0 ? new int[m] : [];
        var dnHole = c.Length > 0 ? new int[m] : [];
        for (int i = 0; i < m; i++)
        {
            b[i] = lambda * _f[_free[i]] - kpsi[_free[i]];
            double up = _d0[i], dn = -_d0[i];
            int ku = -1, kd = -1;
            for (int k = 0; k < c.Length; k++)
            {
                if (c[k] + _dh[k][i] < up) { up = c[k] + _dh[k][i]; ku = k; }
                if (c[k] - _dh[k][i] > dn) { dn = c[k] - _dh[k][i]; kd = k; }
            }
            if (c.Length > 0) { upHole[i] = ku; dnHole[i] = kd; }
            hi[i] = up; lo[i] = Math.Min(dn, up);
        }
        var x = (double[])_warm.Clone();
        var outcome = BoxQp.Solve(_kFree, b, lo, hi, x, _cache, ct);
        _warm = x;
        for (int i = 0; i < m; i++) psi[_free[i]] = x[i];
        _kFull.Multiply(psi, kpsi);
        double quad = 0, load = 0;
        for (int i = 0; i < n; i++) { quad += psi[i] * kpsi[i]; load += _f[i] * psi[i]; }
        for (int k = 0; k < c.Length; k++) load += 2 * c[k] * _holeArea[k];
        var yielded = new bool[n];
        var gap = new double[n]; // distance of psi from the nearer obstacle; 0 on the boundary
        double tol = 1e-9 * _d0.DefaultIfEmpty(0).Max();
        for (int i = 0; i < m; i++)
        {
            gap[_free[i]] = Math.Max(0, Math.Min(hi[i] - x[i], x[i] - lo[i]));
            yielded[_free[i]] = gap[_free[i]] <= tol;
        }
        return new ElasticPlasticState(lambda, load, 0.5 * quad - lambda * load, psi, yielded, (double[])c.Clone(), outcome)
            { PlasticFraction = PlasticArea(psi, gap, tol), HoleSlopes = HoleSlopes(lambda, c, kpsi, x, lo, hi, upHole, dnHole, tol) };
    }

    /// <summary>
    /// dE/dc_k by the envelope theorem: the residuals r = K psi - lambda f summed over hole k's nodes (psi = c_k there) and
    /// over the free nodes held at an obstacle of hole k (psi = c_k +- d_k there; the multiplier of the bound is -r or
    /// +r), minus 2 lambda A_k.
    /// </summary>
    private double[] HoleSlopes(double lambda, double[] c, double[] kpsi, double[] x, double[] lo, double[] hi, int[] upHole, int[] dnHole, double tol)
    {
        if (c.Length == 0) return [];
        var slope = new double[c.Length];
        for (int i = 0; i < _mesh.NodeCount; i++)
        {
            int l = _mesh.NodeLoop[i];
            if (l >= 0 && _dist.HoleOfLoop[l] is var k && k >= 0) slope[k] += kpsi[i] - lambda * _f[i];
        }
        for (int i = 0; i < _free.Length; i++)
        {
            int k = hi[i] - x[i] <= tol ? upHole[i] : x[i] - lo[i] <= tol ? dnHole[i] : -1;
            if (k >= 0) slope[k] += kpsi[_free[i]] - lambda * _f[_free[i]];
        }
        for (int k = 0; k < c.Length; k++) slope[k] -= 2 * lambda * _holeArea[k];
        return slope;
    }

    /// <summary>
    /// Fraction of the section area that has yielded: quadrature points (7 per element) where the interpolated gap
    /// between psi and its obstacle vanishes or the shear is within 0.5 % of yield (|grad psi| &gt;= 0.995). Resolves the
    /// elastic-plastic border to a fraction of an element.
    /// </summary>
    private double PlasticArea(double[] psi, double[] gap, double tol)
    {
        var rule = P2Triangle.Degree5;
        double total = 0, plastic = 0;
        Span<double> xe = stackalloc double[6], ye = stackalloc double[6], dx = stackalloc double[6], dy = stackalloc double[6];
        for (int e = 0; e < _mesh.ElementCount; e++)
        {
            TorsionSolver.Gather(_mesh, e, xe, ye);
            for (int q = 0; q < rule.Count; q++)
            {
                double w = rule.W[q] * P2Triangle.Gradients(rule, q, xe, ye, dx, dy);
                var nq = rule.N.AsSpan(q * 6, 6);
                double g = 0, gx = 0, gy = 0;
                for (int a = 0; a < 6; a++)
                {
                    int nd = _mesh.Elements[6 * e + a];
                    g += nq[a] * gap[nd]; gx += dx[a] * psi[nd]; gy += dy[a] * psi[nd];
                }
                total += w;
                if (g <= tol || gx * gx + gy * gy >= 0.995 * 0.995) plastic += w;
            }
        }
        return total > 0 ? plastic / total : 0;
    }
}

/// <summary>One solved load level of <see cref="ElasticPlasticProblem"/>.</summary>
/// <param name="Lambda">G theta / tau_y, 1/m.</param>
/// <param name="TorquePerYield">T / tau_y, m^3.</param>
/// <param name="Energy">Reduced energy (for the hole-constant search).</param>
/// <param name="Psi">phi / tau_y at every node, m.</param>
/// <param name="Yielded">Nodes held at the obstacle (plastic).</param>
/// <param name="HoleConstants">Hole constants / tau_y, m.</param>
/// <param name="Outcome">How the obstacle solve went.</param>
internal sealed record ElasticPlasticState(double Lambda, double TorquePerYield, double Energy, double[] Psi, bool[] Yielded,
    double[] HoleConstants, BoxQpOutcome Outcome)
{
    /// <summary>Fraction of the area that has yielded.</summary>
    public double PlasticFraction { get; init; }
    /// <summary>dE/dc_k, the derivative of the reduced energy by each hole constant (zero at the solution).</summary>
    public double[] HoleSlopes { get; init; } = [];
}
