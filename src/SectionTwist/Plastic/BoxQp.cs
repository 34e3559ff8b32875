using SectionTwist.Sparse;

namespace SectionTwist.Plastic;

/// <summary>
/// Minimises 1/2 x'Kx - b'x subject to lo &lt;= x &lt;= hi for a sparse symmetric positive definite K: the discrete
/// obstacle problem. Primal-dual active set method (Hintermueller, Ito and Kunisch, "The primal-dual active set
/// strategy as a semismooth Newton method", SIAM J. Optim. 13 (2002) 865-888, algorithm of sec. 2): with the
/// multiplier mu = b - Kx, a node is held at its upper bound when mu_i + c (x_i - hi_i) &gt; 0, at its lower bound when
/// mu_i + c (x_i - lo_i) &lt; 0, free otherwise; the free block is solved by sparse Cholesky; stop when the sets repeat.
/// The quadratic-element stiffness is not an M-matrix, so the sets may cycle: then projected Gauss-Seidel (Cryer,
/// SIAM J. Control 9 (1971) 385-392), which converges for every SPD matrix, finishes from the last iterate.
/// The returned KKT residual is the convergence check.
/// </summary>
internal static class BoxQp
{
    private const int MaxActiveSetIterations = 40;
    private const int MaxSweeps = 20000;

    /// <summary>
    /// Solves in place; <paramref name="x"/> is the warm start and the answer. <paramref name="cache"/> keeps the last
    /// factorization of the free block, reused while the free set stays the same.
    /// </summary>
    public static BoxQpOutcome Solve(CscMatrix k, double[] b, double[] lo, double[] hi, double[] x, BoxQpCache? cache = null, CancellationToken ct = default)
    {
        cache ??= new BoxQpCache();
        int n = k.N;
        var diag = Diagonal(k);
        var state = new sbyte[n];
        var mu = new double[n];
        for (int i = 0; i < n; i++) x[i] = Math.Clamp(x[i], lo[i], hi[i]);
        Residual(k, b, x, mu);
        for (int i = 0; i < n; i++) state[i] = Classify(mu[i], x[i], lo[i], hi[i], diag[i]);
        int it = 0;
        bool settled = false;
        var seen = new HashSet<string>();
        for (; it < MaxActiveSetIterations; it++)
        {
            ct.ThrowIfCancellationRequested();
            SolveFree(k, b, lo, hi, state, x, cache, ct);
            Residual(k, b, x, mu);
            bool changed = false;
            for (int i = 0; i < n; i++)
            {
                var s = Classify(mu[i], x[i], lo[i], hi[i], diag[i]);
                if (s != state[i]) { state[i] = s; changed = true; }
            }
            if (!changed) { settled = true; break; }
            if (!seen.Add(Convert.ToBase64String((byte[])(Array)state))) break; // a repeated set: cycling
        }
        int sweeps = 0;
        if (!settled) sweeps = ProjectedGaussSeidel(k, b, lo, hi, diag, x, ct);
        Residual(k, b, x, mu);
        return new BoxQpOutcome(it + 1, sweeps, settled, Kkt(mu, x, lo, hi, b));
    }

    /// <summary>
    /// The node's set. A node whose bounds coincide (to 1e-12 of their size: the two obstacles of a hollow section meet
    /// where the wall is thinnest once the hole constant reaches its largest value) is held at its upper bound for good;
    /// classified by the sign of its multiplier it would flip between the two bounds and make the sets cycle.
    /// </summary>
    private static sbyte Classify(double mu, double x, double lo, double hi, double c) =>
        Pinned(lo, hi) ? (sbyte)1
        : mu + c * (x - hi) > 0 ? (sbyte)1 : mu + c * (x - lo) < 0 ? (sbyte)-1 : (sbyte)0;

    private static double[] Diagonal(CscMatrix k)
    {
        var d = new double[k.N];
        for (int c = 0; c < k.N; c++)
            for (int p = k.ColPtr[c]; p < k.ColPtr[c + 1]; p++) if (k.RowIdx[p] == c) d[c] = k.Values[p];
        return d;
    }

    private static void Residual(CscMatrix k, double[] b, double[] x, double[] mu)
    {
        k.Multiply(x, mu);
        for (int i = 0; i < mu.Length; i++) mu[i] = b[i] - mu[i];
    }

    /// <summary>Holds the active nodes at their bounds and solves the free block K_II x_I = b_I - K_IA x_A.</summary>
    private static void SolveFree(CscMatrix k, double[] b, double[] lo, double[] hi, sbyte[] state, double[] x, BoxQpCache cache, CancellationToken ct)
    {
        int n = k.N;
        var map = new int[n];
        int m = 0;
        for (int i = 0; i < n; i++)
        {
            if (state[i] == 0) map[i] = m++;
            else { map[i] = -1; x[i] = state[i] > 0 ? hi[i] : lo[i]; }
        }
        if (m == 0) return;
        var rhs = new double[m];
        for (int i = 0; i < n; i++) if (map[i] >= 0) rhs[map[i]] = b[i];
        for (int c = 0; c < n; c++)
        {
            if (map[c] >= 0) continue;
            double xc = x[c];
            for (int p = k.ColPtr[c]; p < k.ColPtr[c + 1]; p++)
                if (map[k.RowIdx[p]] >= 0) rhs[map[k.RowIdx[p]]] -= k.Values[p] * xc;
        }
        bool same = cache.Free is { } f && f.Length == n;
        for (int i = 0; same && i < n; i++) same = cache.Free![i] == (state[i] == 0);
        if (!same)
        {
            cache.Free = state.Select(v => v == 0).ToArray();
            // one fill-reducing order of the whole matrix, restricted to each free set: the free block is a principal
            // submatrix, so the restricted order fills no more than the whole order does (George and Liu, Computer
            // Solution of Large Sparse Positive Definite Systems, 1981, sec. 5.1), and the ordering runs once, not per set
            cache.Order ??= n > SymbolicCholesky.NestedDissectionThreshold ? NestedDissection.Order(k, null, ct) : Amd.Order(k, ct);
            var block = FreeBlock(k, map, m);
            cache.Solver = SpdSolver.Factorize(SymbolicCholesky.AnalyzeOrdered(block, CscRestriction.RestrictOrder(cache.Order, map, m), ct), block, ct);
        }
        var u = new double[m];
        cache.Solver!.Solve(rhs, u);
        for (int i = 0; i < n; i++) if (map[i] >= 0) x[i] = u[map[i]];
    }

    private static CscMatrix FreeBlock(CscMatrix k, int[] map, int m)
    {
        int n = k.N;
        var colPtr = new int[m + 1];
        var rows = new List<int>(k.NonZeros);
        var vals = new List<double>(k.NonZeros);
        for (int c = 0; c < n; c++)
        {
            if (map[c] < 0) continue;
            for (int p = k.ColPtr[c]; p < k.ColPtr[c + 1]; p++)
                if (map[k.RowIdx[p]] >= 0) { rows.Add(map[k.RowIdx[p]]); vals.Add(k.Values[p]); }
            colPtr[map[c] + 1] = rows.Count;
        }
        return new CscMatrix(m, colPtr, rows.ToArray(), vals.ToArray());
    }

    /// <summary>Projected Gauss-Seidel sweeps until the largest change is below 1e-13 of the largest value.</summary>
    private static int ProjectedGaussSeidel(CscMatrix k, double[] b, double[] lo, double[] hi, double[] diag, double[] x, CancellationToken ct)
    {
        // K is symmetric: column c holds row c.
        int n = k.N;
        for (int sweep = 1; sweep <= MaxSweeps; sweep++)
        {
            if ((sweep & 63) == 0) ct.ThrowIfCancellationRequested();
            double change = 0, scale = 0;
            for (int i = 0; i < n; i++)
            {
                double s = b[i];
                for (int p = k.ColPtr[i]; p < k.ColPtr[i + 1]; p++) if (k.RowIdx[p] != i) s -= k.Values[p] * x[k.RowIdx[p]];
                double v = Math.Clamp(s / diag[i], lo[i], hi[i]);
                change = Math.Max(change, Math.Abs(v - x[i]));
                scale = Math.Max(scale, Math.Abs(v));
                x[i] = v;
            }
            if (change <= 1e-13 * Math.Max(scale, 1e-300)) return sweep;
        }
        return MaxSweeps;
    }

    /// <summary>Largest violation of the optimality conditions, relative to the largest load entry.</summary>
    /// <summary>True when the bounds coincide to 1e-12 of their size: the node is fixed at them.</summary>
    private static bool Pinned(double lo, double hi) => hi - lo <= 1e-12 * (Math.Abs(hi) + Math.Abs(lo));

    private static double Kkt(double[] mu, double[] x, double[] lo, double[] hi, double[] b)
    {
        double worst = 0, scale = 0;
        for (int i = 0; i < mu.Length; i++)
        {
            scale = Math.Max(scale, Math.Abs(b[i]));
            double v;
            if (Pinned(lo[i], hi[i])) v = Math.Abs(x[i] - hi[i]); // any multiplier holds a node between coinciding bounds
            else if (x[i] >= hi[i]) v = Math.Max(0, -mu[i]) + (x[i] - hi[i]);
            else if (x[i] <= lo[i]) v = Math.Max(0, mu[i]) + (lo[i] - x[i]);
            else v = Math.Abs(mu[i]);
            worst = Math.Max(worst, v);
        }
        return scale > 0 ? worst / scale : worst;
    }
}

/// <summary>What <see cref="BoxQp.Solve"/> keeps between calls on one matrix: the fill-reducing order and the last free set's factorization.</summary>
internal sealed class BoxQpCache
{
    public bool[]? Free { get; set; }
    public int[]? Order { get; set; }
    public ISpdSolver? Solver { get; set; }
}

/// <summary>How a <see cref="BoxQp"/> solve went.</summary>
/// <param name="ActiveSetIterations">Active-set iterations run.</param>
/// <param name="GaussSeidelSweeps">Projected Gauss-Seidel sweeps after the active-set method cycled (0 normally).</param>
/// <param name="Settled">True when the active sets repeated exactly (finite termination).</param>
/// <param name="KktResidual">Largest violation of the optimality conditions relative to the largest load entry.</param>
internal readonly record struct BoxQpOutcome(int ActiveSetIterations, int GaussSeidelSweeps, bool Settled, double KktResidual);
