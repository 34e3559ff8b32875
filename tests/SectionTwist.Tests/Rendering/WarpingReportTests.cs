namespace SectionTwist.Tests.Rendering;

/// <summary>The report and CSV files of a shaft with restrained warping carry the warping results and their cautions.</summary>
public sealed class WarpingReportTests : IDisposable
{
    private readonly string _dir = Directory.CreateTempSubdirectory("warpreport").FullName;

    public void Dispose() => Directory.Delete(_dir, recursive: true);

    [Fact]
    public void Restrained_warping_chapter_and_cautions_are_in_the_report()
    {
        string report = Path.Combine(_dir, "beam.html");
        var (code, o, err) = SectionTwist.Tests.Cli.CliRunner.Run("shaft", Path.Combine(RepoPaths.SampleProfiles, "conveyor-cross-beam.yaml"), "--report", report);
        Assert.True(code == 0, err);
        Assert.Contains("restrained warping (non-uniform torsion, Vlasov)", o, StringComparison.Ordinal);
        string html = File.ReadAllText(report);
        Assert.Contains("Restrained warping (non-uniform torsion)", html, StringComparison.Ordinal);
        Assert.Contains("lateral-torsional buckling", html, StringComparison.Ordinal);
        Assert.Contains("bimoment at restraint", html, StringComparison.Ordinal);
    }

    // The free-warping main tables of a shaft that restrains warping say so, and the report's assumptions do not deny the
    // restrained-warping or bending chapters it contains (common practice, no source: a report must not contradict itself).
    [Fact]
    public void Free_warping_tables_and_assumptions_name_the_restrained_solve()
    {
        string report = Path.Combine(_dir, "beam.html");
        var (code, o, err) = SectionTwist.Tests.Cli.CliRunner.Run("shaft", Path.Combine(RepoPaths.SampleProfiles, "conveyor-cross-beam.yaml"), "--report", report);
        Assert.True(code == 0, err);
        int main = o.IndexOf("free warping (Saint-Venant) in these tables", StringComparison.Ordinal);
        Assert.InRange(main, 0, o.IndexOf("stations", StringComparison.Ordinal));
        string html = File.ReadAllText(report);
        Assert.DoesNotContain("warping restraint near supports and load points is not modelled", html, StringComparison.Ordinal);
        Assert.Contains("non-uniform (Vlasov) torsion (chapter", html, StringComparison.Ordinal);

        var (code2, o2, err2) = SectionTwist.Tests.Cli.CliRunner.Run("shaft", Path.Combine(RepoPaths.SampleProfiles, "conveyor-head-shaft.yaml"), "--report", report);
        Assert.True(code2 == 0, err2);
        Assert.DoesNotContain("free warping (Saint-Venant) in these tables", o2, StringComparison.Ordinal);
        html = File.ReadAllText(report);
        Assert.DoesNotContain("No bending, axial force or dynamic effects", html, StringComparison.Ordinal);
        Assert.Contains("Bending and axial force as in the chapter", html, StringComparison.Ordinal);
    }

    // --csv writes the restrained-warping solve beside the free-warping tables; a warping spring's station carries the
    // bimoment K phi' (the definition of the spring, exact), here 25 kN*m^3 in a millimetre file.
    [Fact]
    public void Restrained_warping_results_are_written_as_csv()
    {
        string file = Path.Combine(_dir, "spring.yaml");
        File.WriteAllText(file, """
            units: {length: mm, torque: N*m}
            materials: {s: {library: steel-s355}}
            stations: [{name: A, at: 0}, {name: B, after: 1500}, {name: C, after: 1500}]
            segments:
              - {from: A, to: B, section: {template: "ipe:200"}, material: s}
              - {from: B, to: C, section: {template: "ipe:200"}, material: s}
            loads: [{at: B, torque: 400}]
            supports: {fixed: [A, C]}
            warping: {A: restrained, C: {spring: 25 kN*m^3}}
            """);
        string dir = Path.Combine(_dir, "csv");
        var (code, _, err) = SectionTwist.Tests.Cli.CliRunner.Run("shaft", file, "--csv", dir);
        Assert.True(code == 0, err);
        var rows = File.ReadAllLines(Path.Combine(dir, "warping-stations.csv"));
        Assert.Equal("name,position_mm,rotation_rad,rotation_deg,rate_of_twist_deg_per_m,reaction_torque_Nm,reaction_bimoment_Nm2", rows[0]);
        var c = rows[3].Split(',');
        Assert.Equal("C", c[0]);
        double rate = double.Parse(c[4], System.Globalization.CultureInfo.InvariantCulture) * Math.PI / 180;
        double bimoment = double.Parse(c[6], System.Globalization.CultureInfo.InvariantCulture);
        Assert.NotEqual(0, rate);
        Tol.Rel(25e3 * Math.Abs(rate), Math.Abs(bimoment), 1e-9, "warping spring bimoment K phi'");
        var segs = File.ReadAllLines(Path.Combine(dir, "warping-segments.csv"));
        Assert.Equal(3, segs.Length);
        Assert.StartsWith("name,warping_length_mm,max_rotation_rad,max_bimoment_Nm2,", segs[0], StringComparison.Ordinal);
    }
}
