namespace SectionTwist.Tests.Rendering;

/// <summary>The report of a shaft with restrained warping carries the warping chapter and its cautions.</summary>
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
}
