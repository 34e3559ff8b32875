using SectionTwist.Composite;
using SectionTwist.Shaft;
using Xunit;
using static SectionTwist.Tests.Composite.CompositeShapes;

namespace SectionTwist.Tests.Composite;

/// <summary>
/// A stepped bimetal strip (steel 40 x 3 mm with a 20 x 3 mm aluminium strip bonded on its middle) has re-entrant
/// corners of 270 degrees where the interface meets the outline: the shear there is singular (Saint-Venant torsion at a
/// re-entrant corner, e.g. Timoshenko and Goodier, Theory of Elasticity, torsion chapter), so the mesh value of the peak
/// is no bound. Such a material must be flagged, get no allowable torque in the text, and give a shaft segment no factor
/// of safety, as a sharp re-entrant corner of a one-material section does.
/// </summary>
public class CompositeSingularPeakTests
{
    private static CompositeSection Stepped()
    {
        var steel = CompositeExactTests.Steel;
        var alu = steel with { Name = "alu", ShearModulus = 26e9 };
        return new CompositeSection([
            new CompositePart("steel", Shape(Rect(0, 0, 0.040, 0.003)), steel),
            new CompositePart("alu", Shape(Rect(0.010, 0.003, 0.030, 0.006)), alu)], "stepped strip");
    }

    [Fact]
    public void A_peak_at_a_reentrant_corner_is_flagged_unbounded()
    {
        var r = CompositeAnalyzer.Analyze(Stepped());
        Assert.Contains(r.Materials, m => m.MaxShearUnbounded);
        Assert.All(r.Materials, m => Assert.Equal(m.EstimatedRelativeError > CompositeAnalyzer.PeakTolerance, m.MaxShearUnbounded));
        Assert.Contains(r.Warnings, w => w.Code == "composite-peak-unconverged");
    }

    [Fact]
    public void A_concentric_bar_has_bounded_peaks()
    {
        // the exact compound bar (G_i r / GJ per material) converges: nothing is flagged
        var r = CompositeAnalyzer.Analyze(CompositeExactTests.CoreAndSleeve(0.010, 0.015, CompositeExactTests.Steel, CompositeExactTests.Brass));
        Assert.All(r.Materials, m => Assert.False(m.MaxShearUnbounded));
    }
}
