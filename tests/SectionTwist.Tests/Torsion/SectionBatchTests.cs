using SectionTwist.Geometry;
using SectionTwist.Profiles;
using SectionTwist.Torsion;
using Xunit;

namespace SectionTwist.Tests.Torsion;

public class SectionBatchTests
{
    private static readonly AnalysisOptions Coarse = new() { Accuracy = 1e-3 };

    [Fact]
    public void Batch_gives_the_same_results_as_one_by_one_in_input_order()
    {
        string[] specs = ["circle:d=40", "rect:b=30,h=10", "tube:D=40,d=30", "hex:s=24"];
        var profiles = specs.Select(s => ProfileTemplates.Create(s)).ToArray();
        var batch = SectionBatch.Analyze(profiles, Coarse, maxParallelism: 2);
        Assert.Equal(specs.Length, batch.Count);
        for (int i = 0; i < specs.Length; i++)
        {
            Assert.Equal(i, batch[i].Index);
            Assert.Null(batch[i].Error);
            var single = SectionAnalyzer.Analyze(profiles[i], Coarse);
            // The analysis is deterministic: the same mesh and solve whichever thread runs it.
            Assert.Equal(single.TorsionConstant, batch[i].Result!.TorsionConstant);
            Assert.Equal(single.MaxShearPerTorque, batch[i].Result!.MaxShearPerTorque);
        }
        // Exact J of the solid circle, pi d^4 / 32 (Timoshenko and Goodier, Theory of Elasticity, sec. 101).
        Assert.Equal(Math.PI * Math.Pow(0.040, 4) / 32, batch[0].Result!.TorsionConstant, 1e-3 * Math.PI * Math.Pow(0.040, 4) / 32);
    }

    [Fact]
    public void A_bad_source_is_reported_in_its_item_and_the_others_still_run()
    {
        int calls = 0;
        var batch = SectionBatch.Analyze(["circle:d=20", "circle:d=-5", "no-such-file.dxf", "hex:s=10"], null, Coarse,
            completed: _ => Interlocked.Increment(ref calls));
        Assert.Equal(4, calls);
        Assert.NotNull(batch[0].Result);
        Assert.Null(batch[1].Result);
        Assert.Contains("circle", batch[1].Error!.Message, StringComparison.Ordinal);
        Assert.Null(batch[2].Result);
        Assert.Contains("no-such-file.dxf", batch[2].Error!.Message, StringComparison.Ordinal);
        Assert.NotNull(batch[3].Result);
        Assert.Equal("hex:s=10", batch[3].Source);
    }
}
