namespace SectionTwist.Tests.Cli;

/// <summary>
/// The inputs of issue 11 ("a new user's first hour"), each with what the user must see: one line with the place and a
/// remedy that can be followed, exit code 2 for bad input. The table in docs/user-guide.md "Hostile inputs" lists the same
/// cases. Expected wording is ours (common practice, no source).
/// </summary>
public sealed class FirstHourTests : IDisposable
{
    private readonly string _dir = CliRunner.TempDir();

    public void Dispose() => Directory.Delete(_dir, recursive: true);

    private string Write(string name, string text)
    {
        string p = Path.Combine(_dir, name);
        File.WriteAllText(p, text);
        return p;
    }

    private static void Refused((int Code, string Out, string Err) r, params string[] expected)
    {
        Assert.True(r.Code == 2, $"exit {r.Code}: {r.Err}");
        Assert.Equal("", r.Out);
        foreach (var e in expected) Assert.Contains(e, r.Err, StringComparison.Ordinal);
        Assert.DoesNotContain("   at ", r.Err, StringComparison.Ordinal); // no stack trace
    }

    [Fact]
    public void Missing_file_is_reported_as_missing_with_the_full_path()
    {
        string missing = Path.Combine(_dir, "nofile.dxf");
        Refused(CliRunner.Run("section", missing), $"'{missing}': no such file (looked for {missing})", "check the path");
        Refused(CliRunner.Run("section", Path.Combine(_dir, "sub", "x.dxf")), "the folder", "does not exist");
    }

    [Fact]
    public void Missing_file_suggests_the_nearest_file_of_the_folder()
    {
        Write("winch-shaft.yaml", "title: x\n");
        Refused(CliRunner.Run("shaft", Path.Combine(_dir, "winch-shaft.yml")), "no such shaft file", "did you mean", "winch-shaft.yaml");
    }

    [Theory]
    [InlineData(new[] { "section", "keyd:d=40" }, "unknown template 'keyd' (did you mean 'keyed'?)")]
    [InlineData(new[] { "sectoin", "circle:d=40" }, "unknown command 'sectoin' (did you mean 'section'?)")]
    [InlineData(new[] { "section", "circle:d=40", "--acuracy", "1e-3" }, "unknown option --acuracy; did you mean --accuracy?")]
    [InlineData(new[] { "section", "keyed:d=40,tl=4" }, "has no key 'tl' (did you mean 't1'?)")]
    [InlineData(new[] { "section", "circle:d=40", "--units", "SI-cm" }, "unknown unit system 'SI-cm' (did you mean 'SI-mm'?)")]
    [InlineData(new[] { "section", "circle:d=40", "--unit", "mmm" }, "unknown length unit 'mmm' (did you mean 'mm'?)")]
    [InlineData(new[] { "templates", "keyd" }, "unknown template 'keyd' (did you mean 'keyed'?)")]
    [InlineData(new[] { "section", "circel" }, "did you mean the template 'circle'")]
    public void Typos_get_the_nearest_name(string[] argv, string expected) => Refused(CliRunner.Run(argv), expected);

    [Fact]
    public void Help_for_an_unknown_command_exits_2_with_the_list()
    {
        var r = CliRunner.Run("help", "foo");
        Refused(r, "unknown command 'foo'", "section", "shaft");
        Refused(CliRunner.Run("help", "shaf"), "(did you mean 'shaft'?)");
        Assert.Equal(0, CliRunner.Run("help", "shaft").Code);
    }

    [Theory]
    [InlineData("circle:d=1e300", "d: 1e300 is outside the sizes a cross-section can have here (1 µm to 1 km")]
    [InlineData("circle:d=1e-300", "write 0 for a sharp corner")]
    [InlineData("tube:D=40,d=2000m", "d: 2000m is outside")]
    [InlineData("polygon:0 0 1e9 0 0 1", "is outside")]
    public void Absurd_template_values_get_a_clear_line(string spec, string expected) => Refused(CliRunner.Run("section", spec), expected);

    private const string Head = "units: {length: mm, torque: N*m}\n";

    [Fact]
    public void Stations_out_of_axis_order_name_both_lines()
    {
        string f = Write("order.yaml", Head + """
            stations:
              - {name: A, at: 0}
              - {name: B, at: 200}
              - {name: C, at: 100}
            segments:
              - {from: A, to: B, section: {round: 40}, material: steel-1045-cd}
              - {from: B, to: C, section: {round: 40}, material: steel-1045-cd}
            supports: {fixed: [A]}
            """);
        Refused(CliRunner.Run("shaft", f), "order.yaml:5:", "station 'C' at 100 mm comes before the previous station 'B' at 200 mm (line 4)");
    }

    [Fact]
    public void Overlapping_segments_name_both_lines()
    {
        string f = Write("overlap.yaml", Head + """
            stations:
              - {name: A, at: 0}
              - {name: B, at: 100}
              - {name: C, at: 200}
            segments:
              - {from: A, to: C, section: {round: 40}, material: steel-1045-cd}
              - {from: B, to: C, section: {round: 40}, material: steel-1045-cd}
            supports: {fixed: [A]}
            """);
        Refused(CliRunner.Run("shaft", f), "overlap.yaml:8:", "segment B-C overlaps segment A-C (line 7) between 100 mm and 200 mm");
    }

    [Theory]
    [InlineData("supports: free")]
    [InlineData("supports: {fixed: [A]}")]
    [InlineData("supports: {fixed: [E]}")] // the orphan is the support: before, the message named the other stations
    public void An_orphan_station_is_named_on_its_line(string supports)
    {
        string f = Write("orphan.yaml", Head + """
            stations:
              - {name: A, at: 0}
              - {name: B, at: 200}
              - {name: E, at: 300}
            segments:
              - {from: A, to: B, section: {round: 40}, material: steel-1045-cd}

            """ + supports + "\n");
        Refused(CliRunner.Run("shaft", f), "orphan.yaml:5:", "station 'E' is joined to no segment or spring");
    }

    [Fact]
    public void A_tab_error_is_placed_on_its_own_line() =>
        Refused(CliRunner.Run("shaft", Write("tab.yaml", "title: t\nstations:\n\t- {name: A, at: 0}\n")), "tab.yaml:3:1: a tab in the indentation");

    [Fact]
    public void A_mistyped_library_material_suggests_1045_not_1018()
    {
        string f = Write("mat.yaml", Head + """
            materials:
              shaft: {library: steel-1054-cd}
            stations:
              - {name: A, at: 0}
              - {name: B, at: 200}
            segments:
              - {from: A, to: B, section: {round: 40}, material: shaft}
            supports: {fixed: [A]}
            """);
        Refused(CliRunner.Run("shaft", f), "mat.yaml:3:", "did you mean 'steel-1045-cd'?");
    }

    [Fact]
    public void Nm_and_lb_in_are_read_and_no_loads_means_no_governing_segment_and_no_request_for_an_allowable()
    {
        // 250 Nm at B of a 40 mm round fixed at A: tau = 16 T / (pi d^3) = 19.89 MPa (Timoshenko and Goodier, ch. 10)
        string one = Write("nm.yaml", """
            stations:
              - {name: A, at: 0 mm}
              - {name: B, at: 200 mm}
            segments:
              - {from: A, to: B, section: {round: 40 mm}, material: steel-1045-cd}
            loads:
              - {at: B, torque: 250 Nm}
            supports: {fixed: [A]}
            """);
        var r = CliRunner.Run("shaft", one);
        Assert.True(r.Code == 0, r.Err);
        Assert.Contains("19.89 MPa", r.Out, StringComparison.Ordinal);
        string none = Write("none.yaml", Head + """
            stations:
              - {name: A, at: 0}
              - {name: B, at: 200}
            segments:
              - {from: A, to: B, section: {round: 40}, material: steel-1045-cd}
            supports: {fixed: [A]}
            """);
        r = CliRunner.Run("shaft", none);
        Assert.True(r.Code == 0, r.Err);
        Assert.Contains("none; no segment carries torque", r.Out, StringComparison.Ordinal);
        Assert.DoesNotContain("allowableShear", r.Out, StringComparison.Ordinal);
    }

    [Fact]
    public void Templates_columns_do_not_run_into_the_descriptions_and_the_list_syntax_is_explained()
    {
        var (code, output, _) = CliRunner.Run("templates");
        Assert.Equal(0, code);
        // in each template block the 'meaning' column starts where its header says; a longer default moves it to the next line
        foreach (var block in output.Split("\n\n", StringSplitOptions.RemoveEmptyEntries))
        {
            var lines = block.Split('\n');
            int header = Array.FindIndex(lines, l => l.TrimStart().StartsWith("key ", StringComparison.Ordinal));
            if (header < 0) continue;
            int col = lines[header].IndexOf("meaning", StringComparison.Ordinal);
            for (int i = header + 1; i < lines.Length; i++)
            {
                string l = lines[i];
                // a parameter row that reaches the description column has two spaces before it (the default did not overflow);
                // a row whose default is wider ends before it, and its description follows indented on the next line
                bool continued = i + 1 < lines.Length && lines[i + 1].Length > col && lines[i + 1][..col].Trim().Length == 0;
                if (l.Length > col && l[..col].Trim().Length > 0 && !continued)
                    Assert.True(l[col - 2] == ' ' && l[col - 1] == ' ' && l[col] != ' ', $"row runs into the description:\n{l}");
            }
        }
        Assert.Contains("separated by '/'", output, StringComparison.Ordinal);
        Assert.Contains("at=90/270", output, StringComparison.Ordinal);
    }
}
