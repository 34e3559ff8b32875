using SectionTwist.Sparse.Amg;

namespace SectionTwist.Sparse;

/// <summary>
/// Conjugate gradients on a fine system preconditioned by a symmetric two-grid cycle whose coarse level is a nested
/// coarser discretization already factorized: a forward Gauss-Seidel sweep, the coarse-grid correction
/// P A_c^-1 P^T r with the coarse factorization, and a backward sweep (the classical two-grid method, Hackbusch,
/// Multi-Grid Methods and Applications, Springer 1985, ch. 2 and 10; as a CG preconditioner see Saad, Iterative
/// Methods for Sparse Linear Systems, 2nd ed., 2003, sec. 13.3). The iteration starts from the coarse solution
/// interpolated (P u_c), whose error is the small coarse-to-fine change, so it needs few iterations; the fine matrix
/// is never factorized. When the iteration stalls the caller falls back to the direct solver.
/// </summary>
internal sealed class TwoGridSolver : ISpdSolver
{
    private readonly CsrMatrix _a;
    private readonly CsrMatrix _p;
    private readonly ISpdSolver _coarse;
    private readonly double[] _invDiag;
    private readonly double[] _work, _copy, _rc, _ec;
    private readonly double _tolerance;
    private readonly CancellationToken _ct;

    /// <summary>Iteration limit: the cycle reduces the error by a fixed factor per iteration, so a stall shows early.</summary>
    public const int MaxIterations = 200;

    /// <param name="a">The fine matrix (full symmetric storage).</param>
    /// <param name="prolongation">P, fine rows by coarse columns: the coarse shape functions at the fine unknowns.</param>
    /// <param name="coarse">A direct solver of the coarse matrix.</param>
    /// <param name="tolerance">Relative residual asked.</param>
    /// <param name="ct">Cancellation.</param>
    public TwoGridSolver(CscMatrix a, CsrMatrix prolongation, ISpdSolver coarse, double tolerance, CancellationToken ct)
    {
        _a = CsrMatrix.FromSymmetric(a);
        _p = prolongation;
        _coarse = coarse;
        _tolerance = tolerance;
        _ct = ct;
        int n = a.N;
        _invDiag = new double[n];
        for (int c = 0; c < n; c++)
            for (int k = a.ColPtr[c]; k < a.ColPtr[c + 1]; k++)
                if (a.RowIdx[k] == c) _invDiag[c] = 1 / a.Values[k];
        _work = new double[n]; _copy = new double[n];
        _rc = new double[prolongation.Cols]; _ec = new double[prolongation.Cols];
    }

    /// <summary>The start for the next <see cref="Solve"/> (P times the coarse solution), or null to start from zero.</summary>
    public double[]? Initial { get; set; }

    /// <summary>How the last solve ended.</summary>
    public ConjugateGradient.Outcome LastOutcome { get; private set; }

    /// <summary>y = P x.</summary>
    public void Prolong(ReadOnlySpan<double> x, double[] y)
    {
        int[] rp = _p.RowPtr, ci = _p.ColIdx; double[] v = _p.Values;
        for (int i = 0; i < _p.Rows; i++)
        {
            double s = 0;
            for (int k = rp[i]; k < rp[i + 1]; k++) s += v[k] * x[ci[k]];
            y[i] = s;
        }
    }

    /// <inheritdoc/>
    public void Solve(ReadOnlySpan<double> b, Span<double> x)
        => LastOutcome = ConjugateGradient.Solve(_a, Cycle, b, x, _tolerance, MaxIterations, _ct, Initial);

    /// <summary>z = M^-1 r: forward sweep from zero, coarse correction, backward sweep (symmetric).</summary>
    private void Cycle(double[] r, double[] z)
    {
        Array.Clear(z);
        Smoother.GaussSeidel(_a, _invDiag, r, z, _copy, forward: true, initialZero: true);
        _a.Residual(r, z, _work);
        Array.Clear(_rc);
        int[] rp = _p.RowPtr, ci = _p.ColIdx; double[] v = _p.Values;
        for (int i = 0; i < _p.Rows; i++)
        {
            double ri = _work[i];
            for (int k = rp[i]; k < rp[i + 1]; k++) _rc[ci[k]] += v[k] * ri;
        }
        _coarse.Solve(_rc, _ec);
        for (int i = 0; i < _p.Rows; i++)
        {
            double s = 0;
            for (int k = rp[i]; k < rp[i + 1]; k++) s += v[k] * _ec[ci[k]];
            z[i] += s;
        }
        Smoother.GaussSeidel(_a, _invDiag, r, z, _copy, forward: false, initialZero: false);
    }
}
