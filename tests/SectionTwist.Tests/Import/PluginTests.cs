using System.Runtime.Loader;
using System.Text.Json.Nodes;
using SectionTwist.Cli;
using SectionTwist.Import;
using SectionTwist.Torsion;
using SectionTwist.Verification;

namespace SectionTwist.Tests.Import;

/// <summary>
/// A host loads the test plugin (tests/SectionTwist.TestPlugin, a source for <c>sq:SIDE</c> specs, built with the tests
/// but not referenced) from a plugins folder into its own <see cref="AssemblyLoadContext"/> and analyses its profile.
/// </summary>
public sealed class PluginTests : IDisposable
{
    private const string PluginFile = "SectionTwist.TestPlugin.dll";
    private readonly string _dir = Directory.CreateTempSubdirectory("plugins").FullName;

    public void Dispose() => Directory.Delete(_dir, recursive: true);

    /// <summary>The folder the test build copies the plugin to; never deleted, so tests may share it.</summary>
    private static string BuiltPluginFolder => Path.Combine(AppContext.BaseDirectory, "test-plugin");

    private string PluginFolder()
    {
        string folder = Directory.CreateDirectory(Path.Combine(_dir, "plugins")).FullName;
        File.Copy(Path.Combine(BuiltPluginFolder, PluginFile), Path.Combine(folder, PluginFile));
        return folder;
    }

    // Square a x a: J = beta a^4 with beta from the series of Timoshenko and Goodier, sec. 109 (0.1406 for a square).
    private static double SquareJ(double a) => SectionTwist.Tests.References.Published.Rectangle(a, a).Beta * Math.Pow(a, 4);

    [Fact]
    public void A_plugin_from_a_folder_loads_isolated_and_supplies_a_profile_that_analyses()
    {
        Assert.DoesNotContain(AppDomain.CurrentDomain.GetAssemblies(), a => a.GetName().Name == "SectionTwist.TestPlugin"
                                                                         && AssemblyLoadContext.GetLoadContext(a) == AssemblyLoadContext.Default);
        string folder = PluginFolder();
        var sources = ProfileSources.LoadPlugins(folder);

        var src = Assert.Single(sources);
        Assert.Equal("square-plugin", src.Name);
        var ctx = AssemblyLoadContext.GetLoadContext(src.GetType().Assembly);
        Assert.NotSame(AssemblyLoadContext.Default, ctx);
        Assert.Equal(Path.Combine(folder, PluginFile), src.GetType().Assembly.Location);
        // The contract is the host's: the plugin's interface type is the one the host compiled against.
        Assert.Same(typeof(IProfileSource).Assembly, src.GetType().GetInterfaces().Single(i => i.Name == nameof(IProfileSource)).Assembly);

        var profile = ProfileSources.Load("sq:20");
        Assert.Equal(4e-4, profile.Properties.Area, 15); // a^2
        var r = SectionAnalyzer.Analyze(profile);
        Tol.Rel(SquareJ(0.020), r.TorsionConstant, 2e-4, "Timoshenko & Goodier sec. 109 series, square");
    }

    [Fact]
    public void Loading_the_same_folder_twice_registers_its_sources_once()
    {
        string folder = PluginFolder();
        var first = ProfileSources.LoadPlugins(folder);
        int registered = ProfileSources.All.Count(s => ReferenceEquals(s, first[0]));
        var second = ProfileSources.LoadPlugins(folder);
        Assert.Same(first[0], second[0]);
        Assert.Equal(1, registered);
        Assert.Equal(1, ProfileSources.All.Count(s => ReferenceEquals(s, first[0])));
    }

    [Fact]
    public void A_file_that_is_not_an_assembly_is_a_one_line_error_naming_it()
    {
        string folder = Directory.CreateDirectory(Path.Combine(_dir, "bad")).FullName;
        File.WriteAllText(Path.Combine(folder, "notes.dll"), "not a program");
        var e = Assert.Throws<SectionTwistException>(() => ProfileSources.LoadPlugins(folder));
        Assert.Equal("bad-plugin", e.Code);
        Assert.Contains("notes.dll", e.Message, StringComparison.Ordinal);
        Assert.DoesNotContain('\n', e.Message);
    }

    [Fact]
    public void A_missing_folder_is_an_error()
    {
        var e = Assert.Throws<SectionTwistException>(() => ProfileSources.LoadPlugins(Path.Combine(_dir, "nowhere")));
        Assert.Equal("no-plugin-folder", e.Code);
    }

    private static (int Code, string Out, string Err) Run(params string[] argv) => SectionTwist.Tests.Cli.CliRunner.Run(argv);

    [Fact]
    public void The_section_command_loads_plugins_from_the_plugins_option()
    {
        var (code, output, err) = Run("section", "sq:25", "--plugins", PluginFolder(), "--accuracy", "1e-4", "--json");
        Assert.True(code == 0, err);
        double j = (double)JsonNode.Parse(output)!["torsionConstant"]!;
        Tol.Rel(SquareJ(0.025), j, 2e-4, "Timoshenko & Goodier sec. 109 series, square");
    }

    [Fact]
    public void The_section_command_loads_plugins_from_the_environment_variable()
    {
        string? before = Environment.GetEnvironmentVariable(SectionCommand.PluginsVariable);
        try
        {
            Environment.SetEnvironmentVariable(SectionCommand.PluginsVariable, BuiltPluginFolder);
            var (code, output, err) = Run("section", "sq:0.5", "--unit", "in", "--accuracy", "1e-3", "--json");
            Assert.True(code == 0, err);
            double j = (double)JsonNode.Parse(output)!["torsionConstant"]!;
            Tol.Rel(SquareJ(0.5 * 0.0254), j, 2e-3, "Timoshenko & Goodier sec. 109 series, square");
        }
        finally
        {
            Environment.SetEnvironmentVariable(SectionCommand.PluginsVariable, before);
        }
    }

    [Fact]
    public void The_section_command_reports_a_missing_plugins_folder_in_one_line()
    {
        var (code, _, err) = Run("section", "circle:d=10", "--plugins", Path.Combine(_dir, "missing"));
        Assert.Equal(2, code);
        Assert.Contains("plugins folder", err, StringComparison.Ordinal);
        Assert.DoesNotContain("   at ", err, StringComparison.Ordinal);
    }
}
