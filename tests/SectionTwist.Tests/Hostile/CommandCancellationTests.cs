using System.Diagnostics;
using SectionTwist.Cli;
using SectionTwist.Tests.Cli;

namespace SectionTwist.Tests.Hostile;

/// <summary>
/// Issue 12 leftover: every command observes the cancellation token (Ctrl+C) and <c>--timeout</c>, bench and templates
/// included. Expected behaviour is the house rule (docs/user-guide.md, "Hostile inputs"): exit 2 with the time-limit line,
/// or 130 "cancelled" on Ctrl+C, well before the work would have ended. Common practice, no source.
/// </summary>
public sealed class CommandCancellationTests
{
    [Theory]
    [InlineData("bench", "--m", "400", "--solver", "direct", "--sections", "skip")] // a 638,401-unknown factorization: minutes uncancelled
    [InlineData("bench", "--sections", "only")]                                        // five analyses with 1e-6 reference solves
    public void Bench_stops_at_the_time_limit(params string[] args)
    {
        var clock = Stopwatch.StartNew();
        var (code, _, err) = CliRunner.Run([.. args, "--timeout", "0.5"]);
        Assert.Equal(2, code);
        Assert.True(clock.Elapsed.TotalSeconds < 20, $"{clock.Elapsed.TotalSeconds:F1} s");
        Assert.Contains("time limit of 0.5 s", err, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("templates")]
    [InlineData("templates", "--json")]
    [InlineData("bench", "--m", "6", "--sections", "skip")]
    public void A_cancelled_command_writes_nothing_and_says_so(params string[] args)
    {
        using var interrupt = new CancellationTokenSource();
        interrupt.Cancel(); // Ctrl+C before the command runs
        var o = new StringWriter(); var e = new StringWriter();
        int code = Program.Run(args, new CliContext(o, e), interrupt.Token);
        Assert.Equal(130, code);
        Assert.Contains("cancelled", e.ToString(), StringComparison.Ordinal);
        Assert.DoesNotContain("keyed", o.ToString(), StringComparison.Ordinal);  // no template listed
        Assert.DoesNotMatch(@"(?m)^ +6 +121 ", o.ToString());                     // no bench row (m = 6: 121 unknowns)
    }
}
