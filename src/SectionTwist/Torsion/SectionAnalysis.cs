using SectionTwist.Geometry;

namespace SectionTwist.Torsion;

/// <summary>The stateful analysis behind <see cref="SectionAnalyzer"/>; <see cref="Compute"/> runs once and caches.</summary>
internal sealed class SectionAnalysis(Profile profile, AnalysisOptions options, CancellationToken ct, IProgress<AnalysisProgress>? progress)
{
    private SectionResult? _result;

    public SectionResult Compute() => _result ??= Run();

    private SectionResult Run()
    {
        _ = (profile, options, ct, progress);
        throw new InvalidOperationException("the torsion solve is being built");
    }
}
