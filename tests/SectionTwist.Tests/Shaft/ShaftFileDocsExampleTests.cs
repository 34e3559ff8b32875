using SectionTwist.Shaft;

namespace SectionTwist.Tests.Shaft;

public class ShaftFileDocsExampleTests
{
    // The commented example in docs/shaft-file.md must read and solve (the template section goes through a stub resolver
    // here; the analysed sections are tested elsewhere).
    [Fact]
    public void Docs_example_reads_and_solves()
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "docs", "shaft-file.md"))) dir = dir.Parent;
        Assert.NotNull(dir);
        string md = File.ReadAllText(Path.Combine(dir.FullName, "docs", "shaft-file.md"));
        int start = md.IndexOf("```yaml\n", StringComparison.Ordinal) + 8;
        string yaml = md[start..md.IndexOf("```", start, StringComparison.Ordinal)];
        var doc = ShaftFile.Parse(yaml, "shaft-file.md", dir.FullName, s => SectionStiffness.Round(0.05));
        var r = ShaftSolver.Solve(doc.Model);
        double applied = ShaftPower.TorqueFromKilowatts(15, 300) - 300 - 200 * 0.4;
        Tol.Rel(-applied, r.Reactions.Single().Torque, 1e-9, "statics: the fixed support takes the net applied torque");
        Assert.Equal("A", r.ReferenceStation);
    }
}
