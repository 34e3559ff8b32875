using System.Diagnostics;
using SectionTwist.Tests.Cli;

namespace SectionTwist.Tests.Composite;

/// <summary>Hostile composite input: the element budget reaches the composite mesher (fuzz finding, shaft input 25280 of seed 7).</summary>
public sealed class CompositeHostileTests
{
    [Fact]
    public void A_thin_sleeve_on_a_huge_core_is_refused_by_the_element_budget_not_meshed_without_end()
    {
        // a 5 mm sleeve on a 1 km core: the envelope's element estimate passes, the sleeve needs millions of elements; the
        // composite mesher had no element cap and grew past 4 GB without observing the budget
        var clock = Stopwatch.StartNew();
        var (exit, _, err) = CliRunner.Run("section", "sleeved:d=1e6,t=5", "--material", "core=steel-1045-cd,sleeve=brass");
        Assert.Equal(2, exit);
        Assert.Contains("the mesh exceeds", err, StringComparison.Ordinal);
        Assert.Contains("--memory-budget", err, StringComparison.Ordinal);
        Assert.True(clock.Elapsed.TotalSeconds < 60, $"{clock.Elapsed.TotalSeconds:F1} s");
    }
}
