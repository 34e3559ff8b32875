using System.Text.Json;
using SectionTwist.Cli;

namespace SectionTwist.Tests.Shaft;

public sealed class ShaftCommandTests : IDisposable
{
    private readonly string _dir = Directory.CreateTempSubdirectory("shaftcli").FullName;

    public void Dispose() => Directory.Delete(_dir, recursive: true);

    private (int Code, string Out, string Err) Run(params string[] argv) => SectionTwist.Tests.Cli.CliRunner.Run(argv);

    private string Write(string text, string name = "design.yaml")
    {
        string p = Path.Combine(_dir, name);
        File.WriteAllText(p, text);
        return p;
    }

    [Theory]
    [MemberData(nameof(ShaftFileTests.Broken), MemberType = typeof(ShaftFileTests))]
    public void File_errors_exit_2_with_file_line_and_key(string kind, string text, int line, string key, string expect)
    {
        var (code, o, err) = Run("shaft", Write(text));
        Assert.Equal(2, code);
        Assert.Equal("", o);
        Assert.Contains($"design.yaml:{line}:", err, StringComparison.Ordinal);
        Assert.Contains($": {key}: ", err, StringComparison.Ordinal);
        Assert.Contains(expect, err, StringComparison.Ordinal);
        Assert.DoesNotContain("   at ", err, StringComparison.Ordinal); // no stack trace
        Assert.NotEmpty(kind);
    }

    [Fact]
    public void Loose_shaft_exits_2_naming_the_file_and_the_torque()
    {
        var (code, _, err) = Run("shaft", Write(ShaftFileTests.Good.Replace("supports: {fixed: [A]}", "supports: free", StringComparison.Ordinal)));
        Assert.Equal(2, code);
        Assert.Contains("design.yaml: loose shaft", err, StringComparison.Ordinal);
        Assert.Contains("net torque 100 N·m", err, StringComparison.Ordinal);
    }

    [Fact]
    public void Json_is_si_with_the_documented_keys()
    {
        var (code, o, _) = Run("shaft", Write(ShaftFileTests.Good), "--json");
        Assert.Equal(0, code);
        using var doc = JsonDocument.Parse(o);
        var root = doc.RootElement;
        var c = root.GetProperty("stations")[2];
        Assert.Equal("C", c.GetProperty("name").GetString());
        Tol.Rel(0.5, c.GetProperty("position").GetDouble(), 1e-15, "500 mm in metres");
        double phi = 100 * 0.3 / (79.3e9 * ShaftTestModels.JRound(0.04)) + 100 * 0.2 / (79.3e9 * ShaftTestModels.JRound(0.03));
        Tol.Rel(phi, c.GetProperty("rotation").GetDouble(), 1e-12, "sum T L / (G J), radians");
        var s1 = root.GetProperty("segments")[1];
        Assert.Equal("B", s1.GetProperty("from").GetString());
        Assert.Equal("C", s1.GetProperty("to").GetString());
        Tol.Rel(100, s1.GetProperty("internalTorque").GetDouble(), 1e-12);
        Tol.Rel(100 * 0.2 / (79.3e9 * ShaftTestModels.JRound(0.03)), s1.GetProperty("twist").GetDouble(), 1e-12);
        double tau = 16 * 100 / (Math.PI * 0.03 * 0.03 * 0.03);
        Tol.Rel(tau, s1.GetProperty("maxShear").GetDouble(), 1e-12, "16 T / (pi d^3), Pa");
        Tol.Rel(60e6 / tau, s1.GetProperty("safetyFactor").GetDouble(), 1e-12);
        var re = root.GetProperty("reactions")[0];
        Assert.Equal("A", re.GetProperty("station").GetString());
        Tol.Rel(-100, re.GetProperty("torque").GetDouble(), 1e-12);
    }

    [Fact]
    public void Exceeded_limits_are_flagged_in_table_and_json_with_exit_0()
    {
        string text = ShaftFileTests.Good.Replace("torque: 100}", "torque: 800}", StringComparison.Ordinal) + "\ntwistLimit: 0.25 deg/m\n";
        var (code, o, _) = Run("shaft", Write(text));
        Assert.Equal(0, code);
        Assert.Contains("!! SHEAR OVER ALLOWABLE, TWIST RATE OVER LIMIT", o, StringComparison.Ordinal);
        Assert.Contains("caution: results assume linear elastic, Saint-Venant torsion", o, StringComparison.Ordinal);
        var (code2, json, _) = Run("shaft", Write(text), "--json");
        Assert.Equal(0, code2);
        using var doc = JsonDocument.Parse(json);
        Assert.True(doc.RootElement.GetProperty("anyLimitExceeded").GetBoolean());
        Assert.True(doc.RootElement.GetProperty("segments")[1].GetProperty("exceedsShearLimit").GetBoolean());
        Assert.True(doc.RootElement.GetProperty("segments")[1].GetProperty("exceedsTwistRateLimit").GetBoolean());
    }

    [Fact]
    public void Csv_writes_stations_and_segments()
    {
        string outDir = Path.Combine(_dir, "out");
        var (code, _, err) = Run("shaft", Write(ShaftFileTests.Good), "--csv", outDir);
        Assert.Equal(0, code);
        Assert.Contains("stations.csv", err, StringComparison.Ordinal);
        var st = File.ReadAllLines(Path.Combine(outDir, "stations.csv"));
        Assert.Equal(4, st.Length);
        // the file's units (mm, N*m) unless --units says otherwise; the unit is part of each column name
        Assert.StartsWith("name,position_mm,rotation_rad", st[0], StringComparison.Ordinal);
        var sg = File.ReadAllLines(Path.Combine(outDir, "segments.csv"));
        Assert.Equal(3, sg.Length);
        Assert.StartsWith("A-B,A,B,300,", sg[1], StringComparison.Ordinal);
        Assert.EndsWith(",ok", sg[1], StringComparison.Ordinal);
        Assert.Equal(["code,message"], File.ReadAllLines(Path.Combine(outDir, "warnings.csv")));
        Assert.Empty(Directory.GetFiles(outDir, "*.tmp"));
    }

    [Fact]
    public void Report_option_writes_the_html_report()
    {
        // the report's content is tested in Cli/ShaftReportCliTests and Cli/DemoCommandTests
        string report = Path.Combine(_dir, "r.html");
        var (code, _, err) = Run("shaft", Write(ShaftFileTests.Good), "--report", report);
        Assert.True(code == 0, err);
        Assert.StartsWith("<!DOCTYPE html>", File.ReadAllText(report), StringComparison.Ordinal);
    }
}
