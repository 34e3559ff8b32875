using SectionTwist.Cli;

namespace SectionTwist.Tests.Import;

/// <summary>The <c>inspect</c> command on sample drawings.</summary>
public class InspectCommandTests
{
    private static (int Code, string Out, string Err) Run(params string[] argv) => SectionTwist.Tests.Cli.CliRunner.Run(argv);

    [Fact]
    public void Lists_layers_entities_units_loops_and_parts()
    {
        var (code, output, _) = Run("inspect", Path.Combine(SampleProfileTests.SampleDir(), "winch-drum-tube.dxf"));
        Assert.Equal(0, code);
        Assert.Contains("millimetre (mm) from $INSUNITS", output);
        Assert.Matches(@"\n\s+2  DRUM\n", output);
        Assert.Contains("CIRCLE 2", output);
        Assert.Contains("loops          2", output);
        Assert.Contains("1 hole(s)", output);
    }

    [Fact]
    public void Reports_a_problem_with_exit_code_2_and_a_missing_unit_without_failing()
    {
        string tmp = Path.Combine(Path.GetTempPath(), $"inspect-{Guid.NewGuid():N}.dxf");
        File.WriteAllText(tmp, new DxfText().Header(0).Entities().Line(0, 0, 10, 0).Line(10, 0, 10, 10).End().ToString());
        try
        {
            var (code, output, err) = Run("inspect", tmp);
            Assert.Equal(2, code);
            Assert.Contains("error: ", err);
            Assert.Contains("pass --unit", output);
            Assert.Contains("problem: ", output);
            Assert.Contains("open outline", output);
        }
        finally { File.Delete(tmp); }
    }

    [Fact]
    public void Missing_file_is_a_one_line_error()
    {
        var (code, _, err) = Run("inspect", "/nonexistent/x.dxf");
        Assert.Equal(2, code);
        Assert.Contains("no such", err);
    }
}
