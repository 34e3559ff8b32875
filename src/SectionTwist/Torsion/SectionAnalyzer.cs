using SectionTwist.Geometry;

namespace SectionTwist.Torsion;

/// <summary>
/// Computes the torsion constant J and the peak shear stress per unit torque of a cross-section by finite elements
/// on the Prandtl stress function (Saint-Venant torsion; Timoshenko and Goodier, Theory of Elasticity, ch. 10).
/// </summary>
public static class SectionAnalyzer
{
    /// <summary>Analyses <paramref name="profile"/> to the requested accuracy.</summary>
    /// <param name="profile">The cross-section (coordinates in metres).</param>
    /// <param name="options">Accuracy and limits; null for the defaults.</param>
    /// <param name="cancellationToken">Stops a long analysis.</param>
    /// <param name="progress">Receives progress reports in order, the last at 100 %.</param>
    public static SectionResult Analyze(Profile profile, AnalysisOptions? options = null,
        CancellationToken cancellationToken = default, IProgress<AnalysisProgress>? progress = null)
    {
        ArgumentNullException.ThrowIfNull(profile);
        return new SectionAnalysis(profile, options ?? AnalysisOptions.Default, cancellationToken, progress).Compute();
    }
}
