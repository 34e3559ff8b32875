namespace SectionTwist.Torsion;

/// <summary>Options for <see cref="SectionAnalyzer"/>.</summary>
public sealed record AnalysisOptions
{
    /// <summary>
    /// Requested relative accuracy of J (default 1e-4), at least <see cref="FinestAccuracy"/>; the peak shear is resolved
    /// to 50 times this, kept between 1e-3 and 5e-3. Values coarser than 0.1 are analysed at 0.1.
    /// </summary>
    public double Accuracy { get; init; } = 1e-4;

    /// <summary>
    /// The finest accuracy the analysis accepts, 1e-8: finer ones need more elements than <see cref="MaxElements"/>
    /// allows on sections with corners, and the linear solve's rounding floor in double precision (a relative residual
    /// near 1e-10 at a million unknowns) leaves no margin below it. A finer request is refused.
    /// </summary>
    public const double FinestAccuracy = 1e-8;

    /// <summary>Skip the Richardson refinement that estimates the error (faster; the estimate is then reported as unknown, NaN).</summary>
    public bool EstimateError { get; init; } = true;

    /// <summary>Upper limit on the number of elements of a single solve.</summary>
    public int MaxElements { get; init; } = 2_000_000;

    /// <summary>
    /// Memory the analysis may use, bytes (default <see cref="DefaultMemoryBudget"/>). The element count is estimated
    /// before meshing and solving: a section that would need more is refused with a message, and refinement stops with an
    /// accuracy warning before a pass would exceed it.
    /// </summary>
    public long MemoryBudgetBytes { get; init; } = DefaultMemoryBudget;

    /// <summary>The default memory budget: 4 GiB, or half the memory available to the process when that is less.</summary>
    public static long DefaultMemoryBudget { get; } = Math.Min(4L << 30, Math.Max(256L << 20, GC.GetGCMemoryInfo().TotalAvailableMemoryBytes / 2));

    /// <summary>Angle (degrees, measured inside the material) above which an unfilleted corner is reported as a singular re-entrant corner.</summary>
    public double ReentrantWarningAngleDeg { get; init; } = 185;

    /// <summary>
    /// Also solve the warping function on the same meshes: shear centre, warping constant and sectorial coordinate
    /// (<see cref="SectionResult.Warping"/>) and a second, upper-bound J that can tighten the error estimate. Off by
    /// default: the two extra solves (last coarse and fine mesh) share the stress-function solve's matrix and order but
    /// need their own factorization, measured at +10 to +90 % of the analysis time on a loaded machine (docs/performance.md).
    /// </summary>
    public bool Warping { get; init; }

    /// <summary>
    /// Solve the warping function only when the section looks open (J below half the polar moment): shaft files use this
    /// so that round, keyed and splined shafts pay nothing.
    /// </summary>
    internal bool WarpingIfOpen { get; init; }

    /// <summary>The default options.</summary>
    public static AnalysisOptions Default { get; } = new();
}

/// <summary>Progress of an analysis: a stage name and the fraction done (0..1).</summary>
/// <param name="Stage">What is running, e.g. <c>mesh</c>, <c>solve</c>, <c>refine</c>.</param>
/// <param name="Fraction">Fraction of the whole analysis done, 0 to 1; the last report is 1.</param>
public readonly record struct AnalysisProgress(string Stage, double Fraction);
