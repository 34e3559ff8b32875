using System.Diagnostics;
using SectionTwist.Profiles;
using SectionTwist.Torsion;

namespace SectionTwist.Tests.Torsion;

/// <summary>
/// A host's view of a long analysis: cancellation stops it promptly wherever it is (mesh, assembly, factorisation,
/// refinement), and progress arrives in order on the calling thread, ending at 1.0 only when the analysis completes.
/// The latency bound (2 s after the token fires) is common practice for an interactive host, no source.
/// </summary>
public class CancellationAndProgressTests
{
    [Theory]
    [InlineData(200)]
    [InlineData(900)]
    public void Cancelling_a_large_analysis_returns_promptly(int cancelAfterMs)
    {
        // Accuracy 1e-8 on a keyed shaft asks for far more work than a few seconds (the sharp keyseat corners make
        // J converge slowly), so the token always fires mid-analysis.
        var profile = ProfileTemplates.Create("keyed:d=40");
        var options = new AnalysisOptions { Accuracy = 1e-8 };
        var reports = new List<AnalysisProgress>();
        using var cts = new CancellationTokenSource();
        var clock = Stopwatch.StartNew();
        long firedAt = -1;
        CancelSoon.After(cts, cancelAfterMs, () => firedAt = clock.ElapsedMilliseconds);
        Assert.ThrowsAny<OperationCanceledException>(() =>
            SectionAnalyzer.Analyze(profile, options, cts.Token, new ListProgress(reports)));
        long returnedAt = clock.ElapsedMilliseconds;
        Assert.True(firedAt >= 0, "the analysis finished before the token fired; the test profile is too small");
        Assert.True(returnedAt - firedAt < 2000, $"cancellation took {returnedAt - firedAt} ms after the token fired (limit 2000 ms)");
        Assert.DoesNotContain(reports, r => r.Fraction >= 1.0);
    }

    [Fact]
    public void Progress_of_a_multi_pass_analysis_is_ordered_and_ends_at_one()
    {
        // A keyed shaft needs adaptive passes at 1e-4, so several stages report.
        var reports = new List<AnalysisProgress>();
        var thread = Environment.CurrentManagedThreadId;
        var threads = new HashSet<int>();
        var progress = new ListProgress(reports, () => threads.Add(Environment.CurrentManagedThreadId));
        var r = SectionAnalyzer.Analyze(ProfileTemplates.Create("keyed:d=40"), new AnalysisOptions { Accuracy = 1e-4 }, default, progress);
        Assert.True(r.TorsionConstant > 0);
        Assert.True(reports.Count >= 4, $"only {reports.Count} reports");
        Assert.Equal(0.0, reports[0].Fraction);
        for (int i = 1; i < reports.Count; i++)
            Assert.True(reports[i].Fraction >= reports[i - 1].Fraction, $"report {i} went back: {reports[i - 1]} then {reports[i]}");
        Assert.All(reports, x => Assert.InRange(x.Fraction, 0.0, 1.0));
        Assert.All(reports, x => Assert.Contains(x.Stage, new[] { "mesh", "solve", "refine", "done" }));
        Assert.Equal(new AnalysisProgress("done", 1.0), reports[^1]);
        Assert.Single(reports, x => x.Fraction >= 1.0);
        Assert.Equal([thread], threads);
    }

    [Fact]
    public void A_token_cancelled_before_the_start_reports_nothing_and_throws()
    {
        var reports = new List<AnalysisProgress>();
        using var cts = new CancellationTokenSource();
        cts.Cancel();
        Assert.ThrowsAny<OperationCanceledException>(() =>
            SectionAnalyzer.Analyze(ProfileTemplates.Create("circle:d=40"), null, cts.Token, new ListProgress(reports)));
        Assert.DoesNotContain(reports, r => r.Fraction >= 1.0);
    }

    private sealed class ListProgress(List<AnalysisProgress> log, Action? onReport = null) : IProgress<AnalysisProgress>
    {
        public void Report(AnalysisProgress value) { onReport?.Invoke(); log.Add(value); }
    }
}
