using SectionTwist.Rendering.Adapters;
using SectionTwist.Rendering.Report;
using SectionTwist.Shaft;

namespace SectionTwist.Tests.Bending;

public class BendingOutputTests
{
    private static string Sample => Path.Combine(RepoPaths.SampleProfiles, "conveyor-head-shaft.yaml");

    [Fact]
    public void Conveyor_sample_report_has_the_bending_chapter_figure_and_caution()
    {
        var catalog = new ShaftSectionCatalog();
        var doc = ShaftFile.Load(Sample, catalog.Resolver);
        var result = ShaftSolver.Solve(doc.Model);
        var b = result.Bending!;
        // statics of the whole shaft: the bearing forces balance the applied forces and the weight
        double weight = doc.Model.Segments.Sum(s => 7850 * 9.80665 * s.Section!.Bending!.Area *
            Math.Abs(result.Stations.Single(x => x.Name == s.To).Position - result.Stations.Single(x => x.Name == s.From).Position));
        Tol.Rel(-b.Loads.Sum(l => l.ForceY), b.Bearings.Sum(x => x.ForceY), 1e-10, "statics Y");
        Tol.Rel(weight - b.Loads.Sum(l => l.ForceZ), b.Bearings.Sum(x => x.ForceZ), 1e-10, "statics Z with the weight");
        var content = ShaftReport.Build(doc, result, catalog, []);
        var chapter = content.Model.Chapters.Single(c => c.Heading == "Bending with torsion");
        Assert.Equal(2, chapter.Figures.Count);              // the diagram and the governing section's boundary stresses
        Assert.All(chapter.Figures, f => Assert.Equal(0x89, f.Data[0]));   // PNG signature
        Assert.Contains(chapter.Tables, t => t.Caption.StartsWith("Fatigue at", StringComparison.Ordinal) && t.Rows.Any(r => r[3].Contains("from memory", StringComparison.Ordinal)));
        Assert.Contains("fretting", content.Model.Caution, StringComparison.Ordinal);
        // the picture's values are those of the governing point
        var g = b.Governing!;
        var seat = doc.Model.Segments.Single(s => s.Label == g.Label).Section!.Bending!;
        var sample = b.Samples.Where(p => p.Segment == g.Label && p.Position == g.Position).MaxBy(p => p.Stress.VonMises)!;
        Tol.Rel(g.Stress.VonMises, SectionTwist.Bending.CombinedStress.AtBoundary(seat, sample.AxialForce, -sample.MomentZ, sample.MomentY, sample.Torque, true).Max(p => p.VonMises), 1e-12);
        // the keyed seat's fatigue location shows the concentration its section resolves
        Assert.True(b.Fatigue[0].SectionTorsionConcentration > 1.5);
    }

    [Fact]
    public void Text_output_prints_the_bending_tables_and_caution()
    {
        var doc = ShaftFile.Load(Sample, ShaftSections.CreateResolver());
        var r = ShaftSolver.Solve(doc.Model);
        var w = new StringWriter();
        SectionTwist.Cli.ShaftCommand.PrintTables(w, doc, r, Sample);
        string text = w.ToString();
        Assert.Contains("BENDING WITH TORSION", text, StringComparison.Ordinal);
        Assert.Contains("keys and splines", text, StringComparison.Ordinal);
        Assert.Contains("licensed engineering practice", text, StringComparison.Ordinal);
        string csv = SectionTwist.Bending.BendingCsv.Samples(r.Bending!, doc.Units);
        Assert.Equal(r.Bending!.Samples.Count + 1, csv.Split('\n', StringSplitOptions.RemoveEmptyEntries).Length);
    }
}
