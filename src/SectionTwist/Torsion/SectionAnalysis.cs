using SectionTwist.Geometry;

namespace SectionTwist.Torsion;

/// <summary>The stateful analysis behind <see cref="SectionAnalyzer"/> (the meshing pass lands with the triangulator).</summary>
internal sealed class SectionAnalysis(Profile profile, AnalysisOptions options, CancellationToken ct, IProgress<AnalysisProgress>? progress)
{
    public SectionResult Compute()
    {
        _ = (profile, options, progress);
        ct.ThrowIfCancellationRequested();
        throw new InvalidOperationException("the triangulator has not landed yet");
    }
}
