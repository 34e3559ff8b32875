using SectionTwist.Geometry;
using SectionTwist.Profiles;

namespace SectionTwist.Tests.Profiles;

/// <summary>Every fillet and corner rounding is tangent to both neighbouring edges (no kink where it joins).</summary>
public class FilletTangencyTests
{
    [Theory]
    [InlineData("keyed:d=40,n=2,r=0.6", 0.6)]
    [InlineData("iso14:8x32x36,r=0.5", 0.5)]
    [InlineData("involute:m=2,z=20,r=0.4", 0.4)]          // fillet on the involute (root above the base circle)
    [InlineData("involute:m=2,z=12,alpha=30,Df=19,r=0.3", 0.3)] // fillet on the radial flank below the base circle
    [InlineData("ibeam:h=200,b=100,tw=6,tf=9,r=12,r2=3,taper=14", 12)]
    [InlineData("ibeam:h=200,b=100,tw=6,tf=9,r=12,r2=3,taper=14", 3)]
    [InlineData("channel:h=100,b=50,tw=6,tf=8.5,r=8.5,r2=4,taper=8", 8.5)]
    [InlineData("tee:h=50,b=50,tw=6,tf=6,r=6,r2=3", 6)]
    [InlineData("angle:h=60,b=40,t=6,r=8,r2=4", 8)]
    [InlineData("shs:B=80,t=5", 7.5)]
    [InlineData("hex:s=24,r=2", 2)]
    public void Fillet_arcs_are_tangent_to_their_neighbours(string spec, double radiusMm)
    {
        var profile = ProfileTemplates.Create(spec);
        int found = 0;
        foreach (var loop in profile.Loops)
        {
            var s = loop.Segments;
            for (int i = 0; i < s.Count; i++)
            {
                if (s[i] is not ArcSegment arc || Math.Abs(arc.Radius - radiusMm * 1e-3) > 1e-12) continue;
                found++;
                AssertTangent(s[(i + s.Count - 1) % s.Count], arc, spec, Kink(spec));
                AssertTangent(arc, s[(i + 1) % s.Count], spec, Kink(spec));
            }
        }
        Assert.True(found > 0, $"{spec}: no arc of radius {radiusMm} mm");
    }

    // Exact constructions: tangent to rounding. Involute flanks are arcs fitted through involute points within
    // 5e-5 module, so their end tangents differ from the true involute's by up to about 2.5e-3 rad.
    private static double Kink(string spec) => spec.StartsWith("involute", StringComparison.Ordinal) ? 4e-3 : 1e-7;

    private static void AssertTangent(Segment a, Segment b, string spec, double tol)
    {
        Point2 ta = a.DerivativeAt(1), tb = b.DerivativeAt(0);
        ta = (1 / ta.Length) * ta;
        tb = (1 / tb.Length) * tb;
        Assert.True(Math.Abs(Point2.Cross(ta, tb)) < tol && Point2.Dot(ta, tb) > 0,
            $"{spec}: kink of {Math.Asin(Math.Clamp(Point2.Cross(ta, tb), -1, 1)) * 180 / Math.PI:G3} deg between {a} and {b}");
    }
}
