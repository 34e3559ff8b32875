namespace SectionTwist.Sparse.Amg;

/// <summary>
/// Smoothed-aggregation algebraic multigrid hierarchy (Vanek, Mandel and Brezina, Computing 56, 1996): tentative
/// piecewise-constant prolongator on aggregates, smoothed by one damped Jacobi step P = (I - omega D^-1 A) T with
/// omega = 4 / (3 rho(D^-1 A)) (rho by power iteration), Galerkin coarse operators A_c = P' A P, and a sparse Cholesky
/// factor on the coarsest level. Used as a symmetric V-cycle preconditioner (<see cref="VCycle"/>).
/// </summary>
internal sealed class SmoothedAggregation
{
    /// <summary>One level: operator, smoother data, transfer to the next coarser level.</summary>
    internal sealed class Level
    {
        public required CsrMatrix A { get; init; }
        public required double[] InvDiag { get; init; }
        public CsrMatrix? P { get; set; }
        public CsrMatrix? R { get; set; }
        public double[] X { get; init; } = [];
        public double[] B { get; init; } = [];
        public double[] Res { get; init; } = [];
        public double[] Copy { get; init; } = [];
    }

    private SmoothedAggregation(List<Level> levels, ISpdSolver coarse)
    {
        Levels = levels; _coarse = coarse;
    }

    private readonly ISpdSolver _coarse;

    /// <summary>The levels, finest first.</summary>
    public IReadOnlyList<Level> Levels { get; }

    /// <summary>Sum of nonzeros over all levels divided by the nonzeros of the finest operator.</summary>
    public double OperatorComplexity => Levels.Sum(l => (double)l.A.NonZeros) / Levels[0].A.NonZeros;

    /// <summary>Levels are coarsened until at most this many unknowns remain.</summary>
    public const int CoarseSize = 3000;

    /// <summary>Builds the hierarchy for a symmetric positive definite matrix.</summary>
    public static SmoothedAggregation Build(CscMatrix a, double theta = 0.08, CancellationToken ct = default)
    {
        var levels = new List<Level>();
        var cur = CsrMatrix.FromSymmetric(a);
        while (true)
        {
            ct.ThrowIfCancellationRequested();
            var lvl = NewLevel(cur);
            levels.Add(lvl);
            if (cur.Rows <= CoarseSize || levels.Count >= 20) break;
            int nc = Aggregation.Build(cur, theta, out var agg, ct);
            if (nc >= cur.Rows * 0.9) break; // no useful coarsening
            ct.ThrowIfCancellationRequested();
            var p = SmoothedProlongator(cur, lvl.InvDiag, agg, nc, ct);
            var r = p.Transpose();
            ct.ThrowIfCancellationRequested();
            var ap = cur.Multiply(p, sortRows: false, ct);
            ct.ThrowIfCancellationRequested();
            cur = r.Multiply(ap, sortRows: true, ct);
            lvl.P = p; lvl.R = r;
            theta *= 0.5;
        }
        var coarseA = levels[^1].A.AsSymmetricCsc();
        var coarse = SpdSolver.CreateDirect(coarseA, ct);
        return new SmoothedAggregation(levels, coarse);
    }

    private static Level NewLevel(CsrMatrix a)
    {
        var d = Aggregation.Diagonal(a);
        var inv = new double[d.Length];
        for (int i = 0; i < d.Length; i++)
        {
            if (!(d[i] > 0))
                throw new SectionTwistException("not-positive-definite",
                    $"matrix diagonal entry {i} is {d[i]}: the system is not positive definite; check the mesh for degenerate elements");
            inv[i] = 1 / d[i];
        }
        int n = a.Rows;
        return new Level { A = a, InvDiag = inv, X = new double[n], B = new double[n], Res = new double[n], Copy = new double[n] };
    }

    /// <summary>P = (I - omega D^-1 A) T with T the aggregate indicator, built row by row.</summary>
    private static CsrMatrix SmoothedProlongator(CsrMatrix a, double[] invDiag, int[] agg, int nc, CancellationToken ct)
    {
        double rho = SpectralRadius(a, invDiag, ct);
        ct.ThrowIfCancellationRequested();
        double omega = 4.0 / (3.0 * rho);
        int n = a.Rows;
        int[] rp = a.RowPtr, ci = a.ColIdx;
        double[] v = a.Values;
        var pp = new int[n + 1];
        int blocks = Parallel2.Blocks(n, a.NonZeros);
        Parallel.For(0, blocks, Parallel2.Options, b =>
        {
            var (r0, r1) = Parallel2.Range(n, blocks, b);
            var mark = new int[nc];
            Array.Fill(mark, -1);
            for (int i = r0; i < r1; i++)
            {
                int c = 0;
                if (mark[agg[i]] != i) { mark[agg[i]] = i; c++; }
                for (int p = rp[i]; p < rp[i + 1]; p++) { int g = agg[ci[p]]; if (mark[g] != i) { mark[g] = i; c++; } }
                pp[i + 1] = c;
            }
        });
        ct.ThrowIfCancellationRequested();
        for (int i = 0; i < n; i++) pp[i + 1] += pp[i];
        var pi = new int[pp[n]];
        var pv = new double[pp[n]];
        Parallel.For(0, blocks, Parallel2.Options, b =>
        {
            var (r0, r1) = Parallel2.Range(n, blocks, b);
            var pos = new int[nc];
            Array.Fill(pos, -1);
            for (int i = r0; i < r1; i++)
            {
                int start = pp[i], w = start;
                double s = -omega * invDiag[i];
                pos[agg[i]] = w; pi[w] = agg[i]; pv[w] = 1; w++;
                for (int p = rp[i]; p < rp[i + 1]; p++)
                {
                    int g = agg[ci[p]];
                    int at = pos[g];
                    if (at < start) { pos[g] = w; pi[w] = g; pv[w] = s * v[p]; w++; }
                    else pv[at] += s * v[p];
                }
            }
        });
        return new CsrMatrix(n, nc, pp, pi, pv);
    }

    /// <summary>Largest eigenvalue of D^-1 A by 12 power iterations from a fixed pseudo-random start (slightly inflated).</summary>
    private static double SpectralRadius(CsrMatrix a, double[] invDiag, CancellationToken ct)
    {
        int n = a.Rows;
        var x = new double[n];
        var y = new double[n];
        var rng = new Random(12345);
        for (int i = 0; i < n; i++) x[i] = rng.NextDouble() + 0.5;
        double lambda = 1;
        for (int it = 0; it < 12; it++)
        {
            ct.ThrowIfCancellationRequested();
            a.Multiply(x, y);
            double num = 0, den = 0;
            for (int i = 0; i < n; i++) { y[i] *= invDiag[i]; num += y[i] * y[i]; den += x[i] * y[i]; }
            lambda = num / den; // Rayleigh-type quotient in the D inner product
            double norm = Math.Sqrt(num);
            for (int i = 0; i < n; i++) x[i] = y[i] / norm;
        }
        return 1.05 * lambda;
    }

    /// <summary>
    /// z = M^-1 r by one V(1,1)-cycle: forward Gauss-Seidel before, backward after (so M is symmetric), block-wise
    /// over the cores on large levels (Gauss-Seidel inside blocks, Jacobi between them).
    /// </summary>
    public void VCycle(double[] r, double[] z)
    {
        Array.Copy(r, Levels[0].B, r.Length);
        Cycle(0);
        Array.Copy(Levels[0].X, z, z.Length);
    }

    private void Cycle(int l)
    {
        var lv = Levels[l];
        if (l == Levels.Count - 1)
        {
            _coarse.Solve(lv.B, lv.X);
            return;
        }
        Array.Clear(lv.X);
        Smoother.GaussSeidel(lv.A, lv.InvDiag, lv.B, lv.X, lv.Copy, forward: true, initialZero: true);
        lv.A.Residual(lv.B, lv.X, lv.Res);
        var next = Levels[l + 1];
        lv.R!.Multiply(lv.Res, next.B);
        Cycle(l + 1);
        lv.P!.MultiplyAdd(next.X, lv.X);
        Smoother.GaussSeidel(lv.A, lv.InvDiag, lv.B, lv.X, lv.Copy, forward: false, initialZero: false);
    }
}
