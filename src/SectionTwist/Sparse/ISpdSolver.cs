namespace SectionTwist.Sparse;

/// <summary>A prepared solver for A x = b with a fixed symmetric positive definite A.</summary>
internal interface ISpdSolver
{
    /// <summary>Solves A x = b.</summary>
    void Solve(ReadOnlySpan<double> b, Span<double> x);
}
