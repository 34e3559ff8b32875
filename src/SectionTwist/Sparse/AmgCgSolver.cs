using SectionTwist.Sparse.Amg;

namespace SectionTwist.Sparse;

/// <summary>
/// Conjugate gradients preconditioned by a smoothed-aggregation multigrid V-cycle (<see cref="SmoothedAggregation"/>),
/// solved to a relative residual (or to the attainable floor, see <see cref="ConjugateGradient"/>).
/// </summary>
internal sealed class AmgCgSolver : ISpdSolver
{
    private readonly CsrMatrix _a;
    private readonly CancellationToken _ct;

    private AmgCgSolver(CsrMatrix a, SmoothedAggregation h, double tol, int maxIterations, CancellationToken ct)
    {
        _a = a; Hierarchy = h; Tolerance = tol; _maxIterations = maxIterations; _ct = ct;
    }

    private readonly int _maxIterations;

    /// <summary>The multigrid hierarchy.</summary>
    public SmoothedAggregation Hierarchy { get; }

    /// <summary>Relative residual target.</summary>
    public double Tolerance { get; }

    /// <summary>Iterations used by the last solve.</summary>
    public int LastIterations => LastOutcome.Iterations;

    /// <summary>How the last solve ended.</summary>
    public ConjugateGradient.Outcome LastOutcome { get; private set; }

    /// <summary>Default iteration limit per solve.</summary>
    public const int MaxIterations = 1000;

    /// <summary>Builds the multigrid hierarchy for <paramref name="a"/>.</summary>
    public static AmgCgSolver Create(CscMatrix a, double tolerance = 1e-11, CancellationToken ct = default, int maxIterations = MaxIterations)
        => new(CsrMatrix.FromSymmetric(a), SmoothedAggregation.Build(a, ct: ct), tolerance, maxIterations, ct);

    /// <summary>Solves; a stalled iteration returns its best iterate (see <see cref="LastOutcome"/>).</summary>
    public void Solve(ReadOnlySpan<double> b, Span<double> x)
        => LastOutcome = ConjugateGradient.Solve(_a, Hierarchy.VCycle, b, x, Tolerance, _maxIterations, _ct);
}
