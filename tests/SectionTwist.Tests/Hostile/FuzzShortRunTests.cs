using SectionTwist.Fuzz;

namespace SectionTwist.Tests.Hostile;

/// <summary>
/// The short deterministic run of our fuzz harness (tests/SectionTwist.Fuzz; the long campaign is documented in
/// docs/verification.md): a fixed seed, a few hundred mutated inputs per target, run in-process with a time budget;
/// no input may crash, give a non-finite result, run out of memory or overrun its budget.
/// </summary>
public class FuzzShortRunTests
{
    [Theory]
    [InlineData("dxf", 100)]
    [InlineData("points", 120)]
    [InlineData("shaft", 120)]
    public void Mutated_inputs_end_ok_or_in_a_clean_error(string target, int count)
    {
        var t = FuzzTarget.Get(target);
        var failures = new List<string>();
        var seen = new HashSet<Outcome>();
        for (int i = 0; i < count; i++)
        {
            var (o, message) = Runner.RunOne(t, Runner.Make(target, 20260, i), 20_000);
            seen.Add(o);
            if (o.IsFailure() || o == Outcome.Slow) failures.Add($"{target} #{i}: {o.Name()}: {message}");
        }
        Assert.True(failures.Count == 0, string.Join("\n", failures));
        // the mutations reach both the error paths and the full analysis
        Assert.Contains(Outcome.Ok, seen);
        Assert.Contains(Outcome.CleanError, seen);
    }

    [Fact]
    public void Inputs_are_the_same_in_every_process()
    {
        // the campaign re-creates an offending input from (seed, target, index) in another process
        Assert.Equal(Runner.Mix(1, "dxf", 12345), Runner.Mix(1, "dxf", 12345));
        Assert.NotEqual(Runner.Mix(1, "dxf", 12345), Runner.Mix(1, "shaft", 12345));
        Assert.Equal(Runner.Make("shaft", 5, 77), Runner.Make("shaft", 5, 77));
    }

    [Fact]
    public void The_minimizer_keeps_the_outcome_and_shrinks()
    {
        var input = System.Text.Encoding.Latin1.GetBytes("a\nb\nBAD\nc\nd\ne\nf\n");
        var min = Minimizer.Minimize(input, candidate => System.Text.Encoding.Latin1.GetString(candidate).Contains("BAD", StringComparison.Ordinal));
        Assert.Equal("BAD", System.Text.Encoding.Latin1.GetString(min).Trim('\n'));
    }
}
