using SectionTwist.Torsion;

namespace SectionTwist.Plastic;

/// <summary>
/// Elastic-perfectly-plastic torsion of a cross-section: the first-yield torque, the fully plastic torque (sand-heap
/// analogy, Nadai), the shape factor and the torque-twist curve between them, by finite elements on the stress
/// function bounded by |grad phi| &lt;= tau_y (solved as an obstacle problem; see docs/theory.md). Ideal plasticity:
/// strain hardening and residual stresses are not modelled; limit-state design follows the applicable code.
/// </summary>
public static class PlasticAnalyzer
{
    /// <summary>Analyses the section of <paramref name="elastic"/> for shear yield stress <paramref name="yieldShear"/> (Pa).</summary>
    /// <param name="elastic">The elastic result of the section (J and the peak shear per unit torque give first yield).</param>
    /// <param name="yieldShear">Shear yield stress tau_y, Pa (for example 0.577 times the tensile yield, von Mises).</param>
    /// <param name="options">Accuracy and curve points; null for the defaults.</param>
    /// <param name="cancellationToken">Stops a long analysis.</param>
    /// <exception cref="SectionTwistException">Options or section beyond the limits (twist ratios, holes, memory budget; docs/user-guide.md, "Limits").</exception>
    public static PlasticResult Analyze(SectionResult elastic, double yieldShear, PlasticOptions? options = null, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(elastic);
        return new PlasticAnalysis(elastic, yieldShear, options ?? PlasticOptions.Default, cancellationToken).Compute();
    }
}
