using SectionTwist.Geometry;
using SectionTwist.Import;
using SectionTwist.Profiles;
using SectionTwist.Torsion;
using SectionTwist.Units;

namespace SectionTwist.Tests.Import;

/// <summary>
/// The example point-list source against the templates: the same square and the same circle (drawn with three-point
/// arcs) give the same exact area and J within the solver accuracy, and both match the exact values.
/// </summary>
public sealed class PointListTests : IDisposable
{
    private readonly string _dir = Directory.CreateTempSubdirectory("pointlist").FullName;

    public void Dispose() => Directory.Delete(_dir, recursive: true);

    private string Write(string name, string text)
    {
        string p = Path.Combine(_dir, name);
        File.WriteAllText(p, text);
        return p;
    }

    [Fact]
    public void Square_matches_the_square_template()
    {
        string path = Write("square.csv", "# 30 mm square\n0,0\n30,0\n30,30\n0,30\n");
        var fromList = ProfileSources.Load(path);
        var fromTemplate = ProfileTemplates.Create("square:s=30");
        Assert.Equal(fromTemplate.Properties.Area, fromList.Properties.Area, 15); // both exactly s^2 (elementary)
        Tol.Rel(9e-4, fromList.Properties.Area, 1e-14);
        var a = SectionAnalyzer.Analyze(fromList);
        var b = SectionAnalyzer.Analyze(fromTemplate);
        // Both within the requested 1e-4 of the same exact value, so within 2e-4 of each other.
        Tol.Rel(b.TorsionConstant, a.TorsionConstant, 2e-4);
        var (beta, _) = SectionTwist.Tests.References.Published.Rectangle(0.03, 0.03);
        Tol.Rel(beta * Math.Pow(0.03, 4), a.TorsionConstant, 2e-4, "Timoshenko & Goodier sec. 109 series, square");
    }

    [Fact]
    public void Circle_from_three_point_arcs_matches_the_circle_template()
    {
        // Two half circles through the top and bottom points, in inches: d = 1.5 in.
        string path = Write("round.pts", "unit, in\n-0.75, 0\narc, 0, 0.75, 0.75, 0\narc, 0, -0.75, -0.75, 0\n");
        var fromList = ProfileSources.Load(path);
        var fromTemplate = ProfileTemplates.Create("circle:d=1.5in");
        double d = 1.5 * 0.0254;
        Assert.Equal(LengthUnit.Inch, fromList.Unit);
        Assert.All(fromList.Regions[0].Outer.Segments, s => Assert.IsType<ArcSegment>(s)); // arcs stay exact
        Tol.Rel(Math.PI * d * d / 4, fromList.Properties.Area, 1e-13);               // pi d^2 / 4
        Tol.Rel(fromTemplate.Properties.Area, fromList.Properties.Area, 1e-13);
        var a = SectionAnalyzer.Analyze(fromList);
        var b = SectionAnalyzer.Analyze(fromTemplate);
        Tol.Rel(b.TorsionConstant, a.TorsionConstant, 2e-4);
        Tol.Rel(Math.PI * Math.Pow(d, 4) / 32, a.TorsionConstant, 1e-4, "Timoshenko & Goodier ch. 10, exact");
    }

    [Fact]
    public void Tube_with_a_hole_from_nested_loops()
    {
        string path = Write("tube.csv", "25,0\narc,0,25,-25,0\narc,0,-25,25,0\n\n20,0\narc,0,20,-20,0\narc,0,-20,20,0\n");
        var p = ProfileSources.Load(path);
        Assert.Single(p.Regions);
        Assert.Single(p.Regions[0].Holes);
        var r = SectionAnalyzer.Analyze(p);
        Tol.Rel(Math.PI * (Math.Pow(0.05, 4) - Math.Pow(0.04, 4)) / 32, r.TorsionConstant, 2e-4, "Timoshenko & Goodier ch. 10, exact tube");
    }

    [Theory]
    [InlineData("0,0\n1,0,5\n1,1\n", "bad.csv:2:")]
    [InlineData("0,0\n1,zero\n1,1\n", "bad.csv:2:")]
    [InlineData("arc,1,1,2,0\n", "bad.csv:1:")]
    [InlineData("unit\n0,0\n1,0\n1,1\n", "bad.csv:1:")]
    [InlineData("# nothing\n", "bad.csv: no points")]
    public void Bad_lines_are_one_line_errors_with_file_and_line(string text, string where)
    {
        string path = Write("bad.csv", text);
        var e = Assert.Throws<SectionTwistException>(() => ProfileSources.Load(path));
        Assert.StartsWith(where, e.Message, StringComparison.Ordinal);
        Assert.DoesNotContain('\n', e.Message);
    }
}
