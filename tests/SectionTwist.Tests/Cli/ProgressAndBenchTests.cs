namespace SectionTwist.Tests.Cli;

/// <summary>
/// Progress on standard error for long commands, and the bench accounting for its wall time (issue 11: bench --m 50 took
/// 39 s while the printed times added to under 0.5 s; the reference solves were not shown). Wording is ours (no source).
/// </summary>
public sealed class ProgressAndBenchTests
{
    [Theory]
    [InlineData(0.25, 10, "analysis (solve): 25 %, 10 s so far, about 30 s left")]
    [InlineData(0.5, 120, "analysis (solve): 50 %, 2 min so far, about 2 min left")]
    [InlineData(0.01, 1, "analysis (solve): 1 %, 1 s so far")] // too early for an estimate
    [InlineData(double.NaN, 7, "analysis (solve): 7 s so far")] // work without its own progress: the time only
    public void Progress_line_gives_the_time_left(double fraction, double seconds, string expected) =>
        Assert.Equal(expected, SectionTwist.Cli.ProgressLine.Text("analysis", "solve", fraction, TimeSpan.FromSeconds(seconds)));

    [Fact]
    public void Section_shows_progress_on_a_terminal_and_nothing_otherwise()
    {
        var quiet = CliRunner.Run("section", "circle:d=20", "--accuracy", "1e-3");
        Assert.Equal("", quiet.Err);
        var shown = CliRunner.Run(true, "section", "circle:d=20", "--accuracy", "1e-3");
        Assert.Contains("section circle:d=20 (analysis: done): 100 %", shown.Err, StringComparison.Ordinal);
        Assert.DoesNotContain("%", shown.Out, StringComparison.Ordinal);
    }

    [Fact]
    public void Bench_accounts_for_its_wall_time_in_one_exponent_style()
    {
        var (code, output, err) = CliRunner.Run("bench", "--m", "6", "--sections", "skip");
        Assert.True(code == 0, err);
        Assert.Matches(@"wall time \d+\.\d s: timed runs \d+\.\d s, warm-up \d+\.\d s", output);
        Assert.Matches(@"  \d\.\dE-\d\d ", output);              // the residual, two exponent digits
        Assert.DoesNotMatch(@"E[+-]\d{3}", output);               // never E-015
    }

    [Fact]
    public void Sweep_csv_carries_the_unbounded_flag_and_the_warnings()
    {
        var (code, output, err) = CliRunner.Run("sweep", "keyed:d=40", "--vary", "r=0:0.4:2", "--accuracy", "1e-3", "--csv");
        Assert.True(code == 0, err);
        var lines = output.Split('\n', StringSplitOptions.RemoveEmptyEntries);
        Assert.EndsWith(",spec,peakShearUnbounded,warnings", lines[0], StringComparison.Ordinal);
        Assert.Contains(",yes,\"[sharp-reentrant-corner]", lines[1], StringComparison.Ordinal); // r = 0: sharp keyseat floor
        Assert.EndsWith(",no,\"\"", lines[2], StringComparison.Ordinal);                       // r = 0.4 mm: filleted
    }
}
