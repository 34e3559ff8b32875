using SectionTwist.Geometry;
using SectionTwist.Tests.Cli;
using SectionTwist.Torsion;

namespace SectionTwist.Tests.Torsion;

/// <summary>
/// Every accuracy the commands accept is either reached or refused up front with the finest available (1e-8); none ends
/// without the documented one-line message. (That 1e-8 is reached, e.g. on hex:s=24, is measured by the benchmark runs listed in
/// docs/verification.md: a unit test cannot afford the million-element solves.)
/// </summary>
public class AccuracyRangeTests
{
    [Fact]
    public void The_library_refuses_an_accuracy_finer_than_the_finest_available()
    {
        var circle = new Profile([new Region(LoopBuilder.Circle(default, 0.01))]);
        var e = Assert.Throws<SectionTwistException>(() => SectionAnalyzer.Analyze(circle, new AnalysisOptions { Accuracy = 1e-9 }));
        Assert.Equal("accuracy-out-of-range", e.Code);
        Assert.Contains("finer than the finest available, 1E-8", e.Message, StringComparison.Ordinal);
        Assert.Contains("ask for 1E-8 or coarser", e.Message, StringComparison.Ordinal);
        Assert.Equal("accuracy-out-of-range", Assert.Throws<SectionTwistException>(() => SectionAnalyzer.Analyze(circle, new AnalysisOptions { Accuracy = 0 })).Code);
        Assert.Equal(1e-8, AnalysisOptions.FinestAccuracy);
    }

    [Theory]
    [InlineData("section", "hex:s=24")]
    [InlineData("sweep", "hex:s=24", "--vary", "s=20:30:2")]
    [InlineData("verify")]
    public void The_commands_refuse_it_with_the_range_and_exit_2(params string[] command)
    {
        var (code, output, err) = CliRunner.Run([.. command, "--accuracy", "1e-9"]);
        Assert.Equal(2, code);
        Assert.Equal("", output);
        // one line with the problem and the remedy (the usage line follows, as for every usage error)
        Assert.Contains("--accuracy 1E-09: use a relative accuracy between 1E-8 (the finest available) and 0.5", err.Split('\n')[0], StringComparison.Ordinal);
        Assert.DoesNotContain("internal error", err, StringComparison.Ordinal);
    }
}
