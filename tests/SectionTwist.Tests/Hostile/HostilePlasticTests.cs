using System.Diagnostics;
using SectionTwist.Geometry;
using SectionTwist.Limits;
using SectionTwist.Plastic;
using SectionTwist.Profiles;
using SectionTwist.Torsion;
using SectionTwist.Units;

namespace SectionTwist.Tests.Hostile;

/// <summary>
/// Issue 12 leftover: the plastic analyzer checks its inputs and its memory budget before the work and observes the
/// cancellation token in its loops (distances, hole constants, obstacle solves). The limits are ours
/// (docs/user-guide.md, "Limits"); the one-second bound on a late cancellation is common practice for an interactive
/// host, no source.
/// </summary>
public sealed class HostilePlasticTests
{
    private static SectionResult Circle() =>
        SectionAnalyzer.Analyze(ProfileTemplates.Create("circle:d=40", LengthUnit.Millimetre), new AnalysisOptions { Accuracy = 1e-3 });

    [Theory]
    [InlineData(double.NaN)]
    [InlineData(0.5)]        // below first yield
    [InlineData(1e300)]      // the twist overflows
    [InlineData(double.PositiveInfinity)]
    public void Twist_ratios_outside_1_to_1000_are_refused_naming_the_range(double ratio)
    {
        var e = Assert.Throws<SectionTwistException>(() => PlasticAnalyzer.Analyze(Circle(), 100e6, new PlasticOptions { TwistRatios = [1, ratio] }));
        Assert.Equal("bad-option", e.Code);
        Assert.Contains("between 1 (first yield) and 1000", e.Message, StringComparison.Ordinal);
        Assert.DoesNotContain('\n', e.Message);
    }

    [Fact]
    public void Bad_counts_accuracies_and_yields_are_refused_before_any_work()
    {
        var elastic = Circle();
        var many = Enumerable.Range(0, 10_000).Select(i => 1 + i * 0.01).ToArray();
        Assert.Equal("bad-option", Assert.Throws<SectionTwistException>(() => PlasticAnalyzer.Analyze(elastic, 100e6, new PlasticOptions { TwistRatios = many })).Code);
        Assert.Equal("bad-option", Assert.Throws<SectionTwistException>(() => PlasticAnalyzer.Analyze(elastic, 100e6, new PlasticOptions { TwistRatios = [] })).Code);
        Assert.Equal("bad-option", Assert.Throws<SectionTwistException>(() => PlasticAnalyzer.Analyze(elastic, 100e6, new PlasticOptions { Accuracy = double.NaN })).Code);
        Assert.Equal("bad-option", Assert.Throws<SectionTwistException>(() => PlasticAnalyzer.Analyze(elastic, 100e6, new PlasticOptions { MaxElements = -5 })).Code);
        Assert.Equal("bad-option", Assert.Throws<SectionTwistException>(() => PlasticAnalyzer.Analyze(elastic, 100e6, new PlasticOptions { MemoryBudgetBytes = 0 })).Code);
        Assert.Equal("bad-yield", Assert.Throws<SectionTwistException>(() => PlasticAnalyzer.Analyze(elastic, double.NaN)).Code);
    }

    [Fact]
    public void A_fine_plastic_mesh_beyond_the_memory_budget_is_refused_with_the_remedy()
    {
        // 1 byte of budget: the floor of 1000 elements; the circle at 1e-5 needs about 3000 on its first mesh
        var clock = Stopwatch.StartNew();
        var e = Assert.Throws<SectionTwistException>(() =>
            PlasticAnalyzer.Analyze(Circle(), 100e6, new PlasticOptions { Accuracy = 1e-5, MemoryBudgetBytes = 1 }));
        Assert.Equal("memory-budget", e.Code);
        Assert.Contains("--memory-budget MB", e.Message, StringComparison.Ordinal);
        Assert.True(clock.Elapsed.TotalSeconds < 20, $"{clock.Elapsed.TotalSeconds:F1} s");
    }

    [Fact]
    public void More_holes_than_the_limit_are_refused_before_meshing()
    {
        // a 200 x 40 mm plate with 17 holes of 4 mm in a row (the limit is 16)
        const double mm = 1e-3;
        var loops = new List<Loop> { new LoopBuilder(0, 0).LineTo(new Point2(200 * mm, 0)).LineTo(new Point2(200 * mm, 40 * mm)).LineTo(new Point2(0, 40 * mm)).Close() };
        for (int i = 0; i < InputLimits.MaxPlasticHoles + 1; i++) loops.Add(LoopBuilder.Circle(new Point2((8 + 11 * i) * mm, 20 * mm), 2 * mm));
        var profile = Profile.FromLoops(loops, LengthUnit.Millimetre, "perforated strip");
        var elastic = SectionAnalyzer.Analyze(profile, new AnalysisOptions { Accuracy = 1e-2 });
        var e = Assert.Throws<SectionTwistException>(() => PlasticAnalyzer.Analyze(elastic, 100e6));
        Assert.Equal("plastic-too-many-holes", e.Code);
        Assert.StartsWith("perforated strip: the section has 17 holes", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_plastic_analysis_returns_promptly_after_cancellation()
    {
        var elastic = SectionAnalyzer.Analyze(ProfileTemplates.Create("tube:D=40,d=24", LengthUnit.Millimetre), new AnalysisOptions { Accuracy = 1e-3 });
        using var cts = new CancellationTokenSource();
        var clock = Stopwatch.StartNew();
        long firedAt = -1;
        CancelSoon.After(cts, 200, () => firedAt = clock.ElapsedMilliseconds);
        try
        {
            // a fine mesh and a hole constant searched on every curve point: many seconds uncancelled
            PlasticAnalyzer.Analyze(elastic, 100e6, new PlasticOptions { Accuracy = 1e-5 }, cts.Token);
            Assert.Fail("the analysis finished before the token fired; the test problem is too small");
        }
        catch (OperationCanceledException) { }
        long late = clock.ElapsedMilliseconds - firedAt;
        Assert.True(firedAt >= 0);
        Assert.True(late < 1500, $"the plastic analysis returned {late} ms after the token fired (limit 1500 ms)");
    }
}
