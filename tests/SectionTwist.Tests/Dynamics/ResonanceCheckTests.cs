using SectionTwist.Dynamics;
using Xunit;

namespace SectionTwist.Tests.Dynamics;

/// <summary>The interference check: crossing speeds n = 60 f / order and the margin bands (common practice, no source).</summary>
public class ResonanceCheckTests
{
    private static ModalResult TwoDiscs(out double f)
    {
        double k = 2e4, i1 = 0.1, i2 = 0.3;
        f = Math.Sqrt(k * (i1 + i2) / (i1 * i2)) / (2 * Math.PI);
        var model = new DrivetrainModel
        {
            Shafts = [TrainModels.SpringChain("fast", ["a"], []), TrainModels.SpringChain("slow", ["b", "c"], [k])],
            Stages = [new GearStage("a", "b", 3)],
            Inertias = TrainModels.Inertias(("a", i1 * 0), ("b", 1e-9), ("c", i2)).Where(x => x.Inertia > 0).Append(new PointInertia("a", i1)).ToList(),
        };
        return ModalAnalysis.Solve(model, new ModalOptions { ModeCount = 1 });
    }

    [Fact]
    public void Crossing_speed_is_sixty_f_over_the_order_on_the_orders_own_shaft()
    {
        var modes = TwoDiscs(out _);
        double f = modes.ElasticModes.First().Frequency;
        // order 2 of the slow shaft (1/3 of the fast one's speed); range given on the fast shaft
        double nSlow = 60 * f / 2, nFast = 3 * nSlow;   // rpm
        var spec = new ExcitationSpec
        {
            Range = new SpeedRange("fast", nFast * 0.95 * Math.PI / 30, nFast * 1.02 * Math.PI / 30),
            Orders = [new ExcitationOrder("slow 2x", "slow", 2)],
        };
        var c = Assert.Single(ResonanceCheck.Evaluate(modes, spec).Crossings);
        Tol.Rel(nFast * Math.PI / 30, c.CrossingSpeed, 1e-12, "n = 60 f / order");
        Assert.Equal(CrossingStatus.Resonance, c.Status);
    }

    [Theory]
    [InlineData(1.05, CrossingStatus.Avoid)]
    [InlineData(1.15, CrossingStatus.Check)]
    [InlineData(1.25, CrossingStatus.Clear)]
    [InlineData(0.85, CrossingStatus.Check)]
    public void Margins_are_measured_to_the_nearer_end_of_the_range(double factor, CrossingStatus expected)
    {
        var modes = TwoDiscs(out _);
        double n = 2 * Math.PI * modes.ElasticModes.First().Frequency;   // fast-shaft speed (rad/s) of the 1x crossing
        var range = factor > 1 ? new SpeedRange("fast", 0.5 * n / factor, n / factor) : new SpeedRange("fast", n / factor, 2 * n / factor);
        var c = Assert.Single(ResonanceCheck.Evaluate(modes, new ExcitationSpec { Range = range, Orders = [new ExcitationOrder("1x", "fast", 1)] }).Crossings);
        Assert.Equal(expected, c.Status);
        Tol.Rel(factor > 1 ? factor - 1 : 1 - factor, c.Margin, 1e-9, "margin to the nearer end");
    }
}
