namespace SectionTwist.Sparse;

/// <summary>
/// A <see cref="TwoGridSolver"/> that falls back to a direct factorization, built on first need, when an iteration
/// stalls; the first solve may start from a given vector (the coarse solution interpolated), later ones start from zero.
/// </summary>
/// <param name="iterative">The two-grid preconditioned conjugate gradients.</param>
/// <param name="direct">Builds the direct solver of the same matrix (called at most once).</param>
internal sealed class TwoGridWithFallback(TwoGridSolver iterative, Func<ISpdSolver> direct) : ISpdSolver
{
    private ISpdSolver? _direct;

    /// <summary>True once a stalled iteration made the solver factorize the matrix.</summary>
    public bool UsedFallback => _direct is not null;

    /// <inheritdoc/>
    public void Solve(ReadOnlySpan<double> b, Span<double> x)
    {
        if (_direct is null)
        {
            iterative.Solve(b, x);
            iterative.Initial = null;
            if (iterative.LastOutcome.Converged) return;
        }
        _direct ??= direct();
        _direct.Solve(b, x);
    }
}
