namespace SectionTwist.Sparse;

/// <summary>
/// Entry point for symmetric positive definite systems: a sparse Cholesky factorization with a fill-reducing
/// ordering (<see cref="SymbolicCholesky"/>) up to <see cref="IterativeThreshold"/> unknowns, conjugate gradients
/// preconditioned by smoothed-aggregation multigrid (<see cref="AmgCgSolver"/>) above it.
/// </summary>
internal static class SpdSolver
{
    /// <summary>Unknowns above which <see cref="Create(CscMatrix, CancellationToken)"/> uses multigrid-CG.</summary>
    public static int IterativeThreshold { get; set; } = 200_000;

    /// <summary>Prepares a solver for <paramref name="a"/> (full symmetric storage).</summary>
    public static ISpdSolver Create(CscMatrix a, CancellationToken cancellationToken = default)
        => Create(a, null, cancellationToken);

    /// <summary>Prepares a solver, optionally with node coordinates for the ordering.</summary>
    public static ISpdSolver Create(CscMatrix a, double[]? coordinates, CancellationToken cancellationToken = default)
        => a.N > IterativeThreshold
            ? AmgCgSolver.Create(a, 1e-11, cancellationToken)
            : CreateDirect(a, cancellationToken, coordinates);

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
    /// flops / nnz(L) below which the simplicial factorization is used (a common rule of thumb for choosing, about 40;
    /// see the solver notes).
    /// </summary>
    public const double SupernodalFlopsPerNonzero = 40;
}
