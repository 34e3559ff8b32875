namespace SectionTwist.Sparse;

/// <summary>
/// Entry point for symmetric positive definite systems: a sparse Cholesky factorization with a fill-reducing
/// ordering (<see cref="SymbolicCholesky"/>) up to <see cref="IterativeThreshold"/> unknowns, conjugate gradients
/// preconditioned by smoothed-aggregation multigrid (<see cref="AmgCgSolver"/>) above it, falling back to the
/// Cholesky factorization when the iteration stalls short of both its tolerance and the attainable floor.
/// </summary>
internal static class SpdSolver
{
    /// <summary>Unknowns above which <see cref="Create(CscMatrix, CancellationToken)"/> uses multigrid-CG.</summary>
    public static int IterativeThreshold { get; set; } = 200_000;

    /// <summary>Relative residual asked of the iterative solver when the caller names none.</summary>
    public const double DefaultTolerance = 1e-11;

    /// <summary>Prepares a solver for <paramref name="a"/> (full symmetric storage).</summary>
    public static ISpdSolver Create(CscMatrix a, CancellationToken cancellationToken = default)
        => Create(a, DefaultTolerance, cancellationToken);

    /// <summary>Prepares a solver whose iterative branch aims at the relative residual <paramref name="tolerance"/>.</summary>
    public static ISpdSolver Create(CscMatrix a, double tolerance, CancellationToken cancellationToken = default)
        => a.N > IterativeThreshold
            ? new IterativeWithFallback(a, AmgCgSolver.Create(a, tolerance, cancellationToken), cancellationToken)
            : CreateDirect(a, cancellationToken);

    /// <summary>Sparse Cholesky regardless of size.</summary>
    public static ISpdSolver CreateDirect(CscMatrix a, CancellationToken cancellationToken = default, double[]? coordinates = null)
    {
        var s = SymbolicCholesky.Analyze(a, FillOrdering.Auto, coordinates, cancellationToken);
        return Factorize(s, a, cancellationToken);
    }

    /// <summary>Numeric factorization reusing a symbolic analysis of the same pattern.</summary>
    public static ISpdSolver Factorize(SymbolicCholesky symbolic, CscMatrix a, CancellationToken cancellationToken = default)
        => symbolic.Flops / Math.Max(1, symbolic.NonZerosL) < SupernodalFlopsPerNonzero
            ? SimplicialCholesky.Factorize(symbolic, a, cancellationToken)
            : SupernodalCholesky.Factorize(symbolic, a, cancellationToken);

    /// <summary>
    /// flops / nnz(L) below which the simplicial factorization is used. Measured on the 6-node Laplacians of the
    /// section meshes (docs/performance.md, the warping solve): the supernodal factorization, its partition included, was
    /// as fast at 12, 1.2 times as fast at 17 and 1.6 to 2 times as fast at 25 to 30, where the former rule of thumb
    /// (40) still chose the simplicial one.
    /// </summary>
    public const double SupernodalFlopsPerNonzero = 15;

    /// <summary>Multigrid-CG first; the sparse Cholesky factorization when it stalls.</summary>
    internal sealed class IterativeWithFallback(CscMatrix a, AmgCgSolver iterative, CancellationToken ct) : ISpdSolver
    {
        private ISpdSolver? _direct;

        /// <summary>The iterative solver.</summary>
        public AmgCgSolver Iterative => iterative;

        /// <summary>True once a stalled iteration made the solver factorize the matrix.</summary>
        public bool UsedFallback => _direct is not null;

        /// <inheritdoc/>
        public void Solve(ReadOnlySpan<double> b, Span<double> x)
        {
            if (_direct is null)
            {
                iterative.Solve(b, x);
                if (iterative.LastOutcome.Converged) return;
            }
            _direct ??= CreateDirect(a, ct);
            _direct.Solve(b, x);
        }
    }
}
