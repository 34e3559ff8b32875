namespace SectionTwist.Sparse;

/// <summary>
/// Entry point for symmetric positive definite systems: a sparse Cholesky factorization with a fill-reducing
/// ordering (see <see cref="SymbolicCholesky"/>).
/// </summary>
internal static class SpdSolver
{
    /// <summary>Prepares a solver for <paramref name="a"/> (full symmetric storage).</summary>
    public static ISpdSolver Create(CscMatrix a, CancellationToken cancellationToken = default)
        => Create(a, null, cancellationToken);

    /// <summary>Prepares a solver, optionally with node coordinates for the ordering.</summary>
    public static ISpdSolver Create(CscMatrix a, double[]? coordinates, CancellationToken cancellationToken = default)
    {
        var s = SymbolicCholesky.Analyze(a, FillOrdering.Auto, coordinates, cancellationToken);
        return Factorize(s, a, cancellationToken);
    }

    /// <summary>Numeric factorization reusing a symbolic analysis of the same pattern.</summary>
    public static ISpdSolver Factorize(SymbolicCholesky symbolic, CscMatrix a, CancellationToken cancellationToken = default)
        => SimplicialCholesky.Factorize(symbolic, a, cancellationToken);
}
