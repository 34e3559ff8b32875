using System.Globalization;
using SectionTwist.Geometry;
using SectionTwist.Limits;
using SectionTwist.Torsion;

namespace SectionTwist.Plastic;

/// <summary>
/// The input limits and the memory budget of a plastic analysis, checked before any work (docs/user-guide.md, "Limits").
/// The cost of the analysis grows with the holes: every hole has a distance per quadrature point and per node (memory
/// grows with elements times holes) and a constant found by a one-dimensional search per hole and sweep (time grows with
/// the square of the holes), so the holes are capped at <see cref="InputLimits.MaxPlasticHoles"/> and the element limit
/// comes from the memory budget over the bytes per element including the holes' distances.
/// </summary>
internal static class PlasticLimits
{
    /// <summary>Most points of the torque-twist curve.</summary>
    internal const int MaxTwistRatios = 50;

    /// <summary>Largest twist ratio: at 1000 times the first-yield twist every practical section carries its fully plastic torque to 1e-6.</summary>
    internal const double MaxTwistRatio = 1000;

    /// <summary>
    /// Peak bytes per element of the finer mesh without holes: the elastic solve's measured 8 kB
    /// (<see cref="AnalysisBudget.BytesPerElement"/>), which covers the assembly and the direct factorization of the free block.
    /// </summary>
    internal const long BytesPerElement = AnalysisBudget.BytesPerElement;

    /// <summary>Bytes per element and hole: 7 quadrature-point distances and about 2 node distances, 8 bytes each.</summary>
    internal const long BytesPerElementAndHole = 9 * 8;

    /// <summary>Checks the options and the section; returns the element limit of the finer mesh.</summary>
    public static int Check(Profile profile, double yieldShear, PlasticOptions options)
    {
        string name = profile.Name;
        if (!(yieldShear > 0) || double.IsInfinity(yieldShear))
            throw new SectionTwistException("bad-yield", $"{name}: the shear yield stress must be a positive number of Pa, got {Show(yieldShear)}");
        if (!(options.Accuracy > 0 && options.Accuracy < 0.5))
            throw new SectionTwistException("bad-option", $"{name}: the plastic accuracy {Show(options.Accuracy)} must be between 0 and 0.5 (e.g. 1e-3)");
        ArgumentNullException.ThrowIfNull(options.TwistRatios);
        if (options.TwistRatios.Count == 0 || options.TwistRatios.Count > MaxTwistRatios)
            throw new SectionTwistException("bad-option", $"{name}: give 1 to {MaxTwistRatios} twist ratios for the torque-twist curve, got {options.TwistRatios.Count}");
        foreach (double r in options.TwistRatios)
            if (!(r >= 1 && r <= MaxTwistRatio))
                throw new SectionTwistException("bad-option", $"{name}: twist ratio {Show(r)} must be between 1 (first yield) and {MaxTwistRatio.ToString(CultureInfo.InvariantCulture)} (fully plastic to 1e-6)");
        if (options.MaxElements < 100)
            throw new SectionTwistException("bad-option", $"{name}: the plastic element limit {options.MaxElements} must be at least 100");
        if (options.MemoryBudgetBytes <= 0)
            throw new SectionTwistException("bad-option", $"{name}: the memory budget {options.MemoryBudgetBytes} bytes must be positive");
        int holes = profile.Regions.Sum(r => r.Holes.Count);
        if (holes > InputLimits.MaxPlasticHoles)
            throw new SectionTwistException("plastic-too-many-holes",
                $"{name}: the section has {holes} holes, more than the {InputLimits.MaxPlasticHoles} a plastic analysis takes (each hole adds a search over its constant); " +
                "analyse one part (--part N, --layer NAME) or leave out small holes that do not carry torque");
        long perElement = BytesPerElement + holes * BytesPerElementAndHole;
        long byMemory = Math.Max(1000, options.MemoryBudgetBytes / perElement);
        return (int)Math.Min(Math.Min(options.MaxElements, byMemory), int.MaxValue / 4);
    }

    /// <summary>The refusal when the first mesh alone exceeds the element limit.</summary>
    public static SectionTwistException TooLarge(Profile profile, double accuracy, int limit, PlasticOptions options) =>
        new("memory-budget",
            $"{profile.Name}: the plastic analysis at accuracy {Show(accuracy)} needs more than {limit.ToString(CultureInfo.InvariantCulture)} elements " +
            $"(element limit {options.MaxElements.ToString(CultureInfo.InvariantCulture)}, memory budget {Math.Ceiling(options.MemoryBudgetBytes / 1048576.0).ToString("0", CultureInfo.InvariantCulture)} MB); " +
            "raise --memory-budget MB (hosts: a coarser PlasticOptions.Accuracy), or analyse one part (--part N, --layer NAME)");

    private static string Show(double v) => v.ToString("G4", CultureInfo.InvariantCulture);
}
