using System.Text.Json.Nodes;
using SectionTwist.Rendering.Adapters;
using SectionTwist.Rendering.Report;
using SectionTwist.Shaft;
using SectionTwist.Tests.Cli;
using SectionTwist.Torsion;
using SectionTwist.Units;
using static SectionTwist.Tests.Shaft.ShaftTestModels;

namespace SectionTwist.Tests.Shaft;

/// <summary>
/// A loaded segment whose section has a sharp re-entrant corner has no finite peak shear (Timoshenko and Goodier, Theory of
/// Elasticity, sec. 113; docs/references.md): issue 11 found "103.5 MPa, FoS 1.56, ok" for it on stdout, in JSON and in
/// CSV. Every output form must say "unbounded", give no factor of safety and carry the warnings.
/// </summary>
public sealed class ShaftUnboundedPeakTests : IDisposable
{
    private readonly string _dir = CliRunner.TempDir();

    public void Dispose() => Directory.Delete(_dir, recursive: true);

    private const string SharpKeyseat = """
        title: sharp keyseat
        units: {length: mm, torque: N*m}
        sections:
          keyed: {template: "keyed:d=50,r=0"}
        stations:
          - {name: A, at: 0}
          - {name: B, at: 100}
          - {name: C, at: 300}
        segments:
          - {from: A, to: B, section: keyed, material: steel-1045-cd}
          - {from: B, to: C, section: {round: 50}, material: steel-1045-cd}
        loads:
          - {at: B, torque: 500}
        supports: {fixed: [A]}
        """;

    /// <summary>A section with the flag, as the resolver builds it from a sharp keyseat.</summary>
    private static SectionStiffness Sharp(string name) =>
        new(3.4e-7, 1.9e5, name, 0.045) { PeakShearUnbounded = true, Warnings = [new AnalysisWarning("sharp-reentrant-corner", $"section '{name}': sharp corner")] };

    [Fact]
    public void Model_gives_no_factor_of_safety_and_the_check_unbounded_only_where_torque_flows()
    {
        // Cantilever A-B-C fixed at A, torque at B: B-C carries no torque (statics), so its sharp section is harmless there.
        var model = new ShaftModel
        {
            Stations = Stations(("A", 0), ("B", 0.1), ("C", 0.3)),
            Segments = [new ShaftSegment("A", "B", Sharp("loaded"), Steel), new ShaftSegment("B", "C", Sharp("idle"), Steel)],
            Loads = [new PointTorque("B", 200)], // 200 N*m x 1.9e5 /m^3 = 38 MPa on the mesh, under the 60 MPa allowable
            FixedStations = ["A"],
        };
        var r = ShaftSolver.Solve(model);
        var loaded = Segment(r, "A", "B");
        var idle = Segment(r, "B", "C");
        Assert.True(loaded.PeakShearUnbounded);
        Assert.Null(loaded.SafetyFactor);
        Assert.Equal("unbounded", loaded.Check);
        Assert.False(idle.PeakShearUnbounded);
        Assert.Equal("ok", idle.Check);
        Assert.Same(loaded, r.GoverningSegment);
        Assert.True(r.AnyPeakShearUnbounded);
        Assert.Equal(["sharp-reentrant-corner", "sharp-reentrant-corner", "unbounded-peak-shear"], r.Warnings.Select(w => w.Code));
        Assert.Contains("segment 'A-B'", r.Warnings[^1].Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Text_and_csv_say_unbounded_and_carry_the_warnings()
    {
        string file = Path.Combine(_dir, "sharp.yaml");
        File.WriteAllText(file, SharpKeyseat);
        string csv = Path.Combine(_dir, "csv");
        var (code, output, err) = CliRunner.Run("shaft", file, "--csv", csv);
        Assert.True(code == 0, err);
        string row = output.Split('\n').Single(l => l.TrimStart().StartsWith("A-B ", StringComparison.Ordinal));
        Assert.Contains("unbounded", row, StringComparison.Ordinal);
        Assert.EndsWith("!! UNBOUNDED", row.TrimEnd(), StringComparison.Ordinal);
        Assert.DoesNotContain(" ok", row, StringComparison.Ordinal);
        Assert.Contains("peak shear UNBOUNDED", output, StringComparison.Ordinal);
        Assert.Contains("warning [sharp-reentrant-corner]: section 'keyed'", output, StringComparison.Ordinal);
        Assert.Contains("warning [unbounded-peak-shear]", output, StringComparison.Ordinal);

        var segments = File.ReadAllLines(Path.Combine(csv, "segments.csv"));
        var header = segments[0].Split(',');
        // The section cell "keyed:d=50,r=0" is quoted (RFC 4180): split on commas outside quotes.
        var cells = System.Text.RegularExpressions.Regex.Split(segments[1], ",(?=(?:[^\"]*\"[^\"]*\")*[^\"]*$)");
        Assert.Equal("", cells[Array.IndexOf(header, "max_shear_MPa")]);
        Assert.Equal("", cells[Array.IndexOf(header, "safety_factor")]);
        Assert.Equal("yes", cells[Array.IndexOf(header, "peak_shear_unbounded")]);
        Assert.Equal("unbounded", cells[^1]);
        var warnings = File.ReadAllLines(Path.Combine(csv, "warnings.csv"));
        Assert.Equal("code,message", warnings[0]);
        Assert.Contains(warnings, l => l.StartsWith("unbounded-peak-shear,", StringComparison.Ordinal));
    }

    [Fact]
    public void Json_has_null_peak_the_check_and_the_warnings()
    {
        string file = Path.Combine(_dir, "sharp.yaml");
        File.WriteAllText(file, SharpKeyseat);
        var (code, output, err) = CliRunner.Run("shaft", file, "--json");
        Assert.True(code == 0, err);
        var n = JsonNode.Parse(output)!;
        var seg = n["segments"]![0]!;
        Assert.Null(seg["maxShear"]);
        Assert.Null(seg["safetyFactor"]);
        Assert.True((bool)seg["peakShearUnbounded"]!);
        Assert.Equal("unbounded", (string?)seg["check"]);
        Assert.True((bool)n["anyPeakShearUnbounded"]!);
        Assert.Contains(n["warnings"]!.AsArray(), w => (string?)w!["code"] == "unbounded-peak-shear");
    }

    [Fact]
    public void Report_and_diagram_say_unbounded()
    {
        var catalog = new ShaftSectionCatalog(new AnalysisOptions { Accuracy = 1e-3 });
        var doc = ShaftFile.Parse(SharpKeyseat, "sharp.yaml", resolver: catalog.Resolver);
        var result = ShaftSolver.Solve(doc.Model);
        var content = ShaftReport.Build(doc, result, catalog, [], new ShaftReportOptions());
        string html = HtmlReportWriter.Render(content.Model);
        Assert.Contains("peak shear UNBOUNDED", html, StringComparison.Ordinal);
        Assert.Contains("<td>unbounded</td>", html, StringComparison.Ordinal);
        Assert.Contains("unbounded-peak-shear", string.Join(" ", result.Warnings.Select(w => w.Code)), StringComparison.Ordinal);
        Assert.Contains(content.Model.Warnings, w => w.Contains("sharp re-entrant corner", StringComparison.Ordinal));
        Assert.Contains(content.Model.KeyFigures, f => f.Value.StartsWith("unbounded", StringComparison.Ordinal) && f.Alert);
        Assert.True(content.Diagram.Segments.Single(s => s.Label == "A-B").PeakShearUnbounded);
        Assert.True(content.SectionPictures.Count == 1);
    }

    [Fact]
    public void Us_units_apply_to_text_and_csv_and_json_stays_si()
    {
        string file = Path.Combine(_dir, "round.yaml");
        File.WriteAllText(file, SharpKeyseat.Replace("section: keyed,", "section: {round: 50},", StringComparison.Ordinal));
        string csv = Path.Combine(_dir, "us");
        var (code, output, err) = CliRunner.Run("shaft", file, "--units", "US", "--csv", csv);
        Assert.True(code == 0, err);
        // 500 N*m = 4425.4 lbf*in (1 lbf*in = 0.112984829 N*m exactly; NIST SP 811)
        Assert.Contains("4425.4", output, StringComparison.Ordinal);
        Assert.Contains("[lbf·in]", output, StringComparison.Ordinal);
        Assert.Contains("[deg/ft]", output, StringComparison.Ordinal);
        Assert.StartsWith("name,position_in,rotation_rad,rotation_deg,applied_torque_lbf_in", File.ReadAllLines(Path.Combine(csv, "stations.csv"))[0], StringComparison.Ordinal);
        var json = JsonNode.Parse(CliRunner.Run("shaft", file, "--units", "US", "--json").Out)!;
        Assert.Equal(500, (double)json["stations"]![1]!["appliedTorque"]!, 9);
    }
}
