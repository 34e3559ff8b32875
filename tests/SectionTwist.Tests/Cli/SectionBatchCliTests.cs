using System.Globalization;
using System.Text.Json.Nodes;
using SectionTwist.Torsion;

namespace SectionTwist.Tests.Cli;

/// <summary><c>section SOURCE SOURCE ...</c>: one table, CSV or JSON lines; a failing source gets its own row.</summary>
public class SectionBatchCliTests
{
    // Exact J of the solid circle, pi d^4 / 32, and of the tube, pi (D^4 - d^4) / 32 (Timoshenko and Goodier, Theory of
    // Elasticity, 3rd ed., sec. 101).
    private static double Circle(double d) => Math.PI * Math.Pow(d, 4) / 32;

    [Fact]
    public void Json_lines_give_one_object_per_source_in_input_order_with_the_exact_values()
    {
        var (code, output, err) = CliRunner.Run("section", "circle:d=40", "tube:D=50,d=40", "--accuracy", "1e-4", "--json");
        Assert.True(code == 0, err);
        var lines = output.TrimEnd().Split('\n');
        Assert.Equal(2, lines.Length);
        var a = JsonNode.Parse(lines[0])!;
        var b = JsonNode.Parse(lines[1])!;
        Assert.Equal("circle:d=40", (string?)a["source"]);
        Assert.Equal(1, (int)b["index"]!);
        Tol.Rel(Circle(0.040), (double)a["torsionConstant"]!, 1e-4, "circle J = pi d^4/32 (Timoshenko and Goodier sec. 101)");
        Tol.Rel(Circle(0.050) - Circle(0.040), (double)b["torsionConstant"]!, 1e-4, "tube J = pi (D^4 - d^4)/32 (Timoshenko and Goodier sec. 101)");
        // circle: tau = 16 T / (pi d^3) (same source)
        Tol.Rel(16 / (Math.PI * Math.Pow(0.040, 3)), (double)a["maxShearPerTorque"]!, 5e-3, "circle tau/T = 16/(pi d^3)");
    }

    [Fact]
    public void A_failing_source_gets_its_error_row_the_others_run_and_the_exit_code_is_2()
    {
        var (code, output, err) = CliRunner.Run("section", "circle:d=40", "circle:d=-5", "no-such-drawing.dxf", "hex:s=10", "--accuracy", "1e-3");
        Assert.Equal(2, code);
        var rows = output.Split('\n');
        Assert.Contains(rows, r => r.TrimStart().StartsWith("circle:d=40", StringComparison.Ordinal) && !r.Contains("error", StringComparison.Ordinal));
        Assert.Contains(rows, r => r.Contains("circle:d=-5", StringComparison.Ordinal) && r.Contains("error: ", StringComparison.Ordinal));
        Assert.Contains(rows, r => r.Contains("no-such-drawing.dxf", StringComparison.Ordinal) && r.Contains("error: ", StringComparison.Ordinal));
        Assert.Contains(rows, r => r.TrimStart().StartsWith("hex:s=10", StringComparison.Ordinal) && !r.Contains("error", StringComparison.Ordinal));
        Assert.Single(err.TrimEnd().Split('\n'));
        Assert.Contains("2 of 4 sources failed", err, StringComparison.Ordinal);
        Assert.DoesNotContain("   at ", err + output, StringComparison.Ordinal);
    }

    [Fact]
    public void Csv_rows_carry_si_values_status_and_warnings()
    {
        var (code, output, err) = CliRunner.Run("section", "keyed:d=40,r=0", "circle:d=20", "--accuracy", "1e-3", "--csv");
        Assert.True(code == 0, err);
        var lines = output.TrimEnd().Split('\n');
        Assert.Equal(3, lines.Length);
        Assert.StartsWith("source,status,", lines[0], StringComparison.Ordinal);
        Assert.Contains("sharp-reentrant-corner", lines[1], StringComparison.Ordinal);
        Assert.Contains(",yes,", lines[1], StringComparison.Ordinal);
        var cells = lines[2].Split(',');
        Assert.Equal("ok", cells[1]);
        Tol.Rel(Circle(0.020), double.Parse(cells[4], CultureInfo.InvariantCulture), 1e-3, "circle J = pi d^4/32 (Timoshenko and Goodier sec. 101)");
    }

    [Fact]
    public void A_wildcard_expands_to_the_drawings_sorted_by_name()
    {
        string dir = CliRunner.TempDir();
        string sample = Path.Combine(RepoPaths.Root, "sample-profiles", "winch-hex-drive-bar.dxf");
        File.Copy(sample, Path.Combine(dir, "b.dxf"));
        File.Copy(sample, Path.Combine(dir, "a.dxf"));
        File.WriteAllText(Path.Combine(dir, "notes.txt"), "not a drawing");
        var (code, output, err) = CliRunner.Run("section", Path.Combine(dir, "*.dxf"), "--accuracy", "1e-3", "--json");
        Assert.True(code == 0, err);
        var lines = output.TrimEnd().Split('\n').Select(l => JsonNode.Parse(l)!).ToList();
        Assert.Equal(2, lines.Count);
        Assert.EndsWith("a.dxf", (string?)lines[0]["source"], StringComparison.Ordinal);
        Assert.EndsWith("b.dxf", (string?)lines[1]["source"], StringComparison.Ordinal);
        Assert.Equal((double)lines[0]["torsionConstant"]!, (double)lines[1]["torsionConstant"]!);
    }

    [Theory]
    [InlineData("--plot", "x.png")]
    [InlineData("--plastic", "140MPa")]
    public void Single_source_options_are_refused_in_a_batch(string option, string value)
    {
        var (code, _, err) = CliRunner.Run("section", "circle:d=10", "circle:d=20", option, value);
        Assert.Equal(2, code);
        Assert.Contains($"{option} works on one SOURCE", err, StringComparison.Ordinal);
    }

    [Fact]
    public void Parallel_workers_share_the_memory_budget()
    {
        // common practice, no source: an equal share per worker, so the batch stays within the one budget
        Assert.Equal(1L << 30, SectionBatch.WorkerBudget(2L << 30, 2));
        Assert.Equal(16L << 20, SectionBatch.WorkerBudget(20L << 20, 4));
        // A budget that admits the analysis of this section alone; in a batch of two workers each gets half, and the
        // analysis is refused or its refinement stops there, either way naming the halved memory budget.
        var circle = SectionTwist.Profiles.ProfileTemplates.Create("circle:d=40");
        var options = new AnalysisOptions { Accuracy = 1e-6, MemoryBudgetBytes = 128L << 20 };
        var alone = SectionAnalyzer.Analyze(circle, options);
        Assert.Empty(alone.Warnings);
        var batch = SectionBatch.Analyze([circle, circle], options, maxParallelism: 2);
        Assert.All(batch, x => Assert.True(
            x.Error is { Code: "memory-budget" } e ? e.Message.Contains("memory budget (64 MB)", StringComparison.Ordinal)
                : x.Result!.Warnings.Any(w => w.Code == "accuracy-not-reached" && w.Message.Contains("memory budget (64 MB)", StringComparison.Ordinal)),
            $"{x.Source}: neither refused nor stopped by the halved budget"));
    }
}
