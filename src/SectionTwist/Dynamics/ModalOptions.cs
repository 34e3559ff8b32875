namespace SectionTwist.Dynamics;

/// <summary>What <see cref="ModalAnalysis.Solve"/> computes.</summary>
public sealed record ModalOptions
{
    /// <summary>Number of elastic (non-zero) modes wanted, lowest first; rigid-body modes come on top. Default 6.</summary>
    public int ModeCount { get; init; } = 6;

    /// <summary>
    /// Discretisation tolerance: relative error allowed in each listed natural frequency from the element subdivision of the
    /// shaft segments. Default 0.001 (0.1 %).
    /// </summary>
    public double Tolerance { get; init; } = 1e-3;

    /// <summary>Largest number of elements per segment. Default 400.</summary>
    public int MaxElementsPerSegment { get; init; } = 400;

    /// <summary>Fixed number of elements per segment (no adaptive choice); null for automatic. For convergence studies.</summary>
    public int? ElementsPerSegment { get; init; }
}
