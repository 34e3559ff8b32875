namespace SectionTwist.Plastic;

/// <summary>Options for <see cref="PlasticAnalyzer"/>.</summary>
public sealed record PlasticOptions
{
    /// <summary>Target relative accuracy that sets the element size (default 1e-3); the result carries its own estimate.</summary>
    public double Accuracy { get; init; } = 1e-3;

    /// <summary>
    /// Twist rates of the torque-twist curve as multiples of the first-yield twist rate (1 to 50 of them, each from 1 to
    /// 1000; default 1, 1.25, 1.5, 2, 3, 5, 10).
    /// </summary>
    public IReadOnlyList<double> TwistRatios { get; init; } = [1, 1.25, 1.5, 2, 3, 5, 10];

    /// <summary>Upper limit on the elements of the finer of the two meshes.</summary>
    public int MaxElements { get; init; } = 200_000;

    /// <summary>
    /// Memory the plastic analysis may use, bytes (default <see cref="Torsion.AnalysisOptions.DefaultMemoryBudget"/>): with
    /// the holes' distances it sets an element limit below <see cref="MaxElements"/>; a first mesh above it is refused.
    /// </summary>
    public long MemoryBudgetBytes { get; init; } = Torsion.AnalysisOptions.DefaultMemoryBudget;

    /// <summary>The default options.</summary>
    public static PlasticOptions Default { get; } = new();
}
