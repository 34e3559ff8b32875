using System.Text.RegularExpressions;
using SectionTwist.Geometry;
using SectionTwist.Import.Dxf;
using SectionTwist.Profiles;
using SectionTwist.Shaft;
using SectionTwist.Torsion;
using SectionTwist.Units;
using SectionTwist.Verification;

namespace SectionTwist.Tests.Api;

/// <summary>
/// Keeps docs/api.md honest: every C# block of the document is in <see cref="ApiExamples"/> (so it compiles with the
/// tests), and each example runs here with its output checked against an outside reference.
/// </summary>
public partial class ApiDocsTests
{
    private static readonly Lazy<SectionResult> Round = new(ApiExamples.RoundBarFromTemplate);

    [GeneratedRegex(@"```csharp\r?\n(.*?)```", RegexOptions.Singleline)]
    private static partial Regex CsharpBlock();

    [GeneratedRegex(@"\s+")]
    private static partial Regex Space();

    private static string Normalise(string s) => Space().Replace(s, " ").Trim();

    [Fact]
    public void Every_csharp_block_of_the_api_document_is_in_ApiExamples_verbatim()
    {
        string doc = File.ReadAllText(Path.Combine(RepoPaths.Root, "docs", "api.md"));
        string code = Normalise(File.ReadAllText(Path.Combine(RepoPaths.Root, "tests", "SectionTwist.Tests", "Api", "ApiExamples.cs")));
        var blocks = CsharpBlock().Matches(doc).Select(m => m.Groups[1].Value).ToList();
        Assert.True(blocks.Count >= 8, $"docs/api.md has only {blocks.Count} csharp blocks");
        foreach (var b in blocks)
            Assert.True(code.Contains(Normalise(b), StringComparison.Ordinal),
                $"this docs/api.md block is not in tests/SectionTwist.Tests/Api/ApiExamples.cs (copy it there verbatim):\n{b}");
    }

    [Fact]
    public void Template_round_bar_matches_the_exact_solution()
    {
        // Exact: J = pi d^4 / 32, tau/T = 16 / (pi d^3) (Timoshenko and Goodier, Theory of Elasticity, ch. 10).
        var r = Round.Value;
        double d = 0.040;
        Tol.Rel(Math.PI * Math.Pow(d, 4) / 32, r.TorsionConstant, 2e-4);
        Tol.Rel(16 / (Math.PI * d * d * d), r.MaxShearPerTorque, 5e-3);
    }

    [Fact]
    public void Dxf_file_drum_tube_matches_the_exact_tube_solution()
    {
        // Exact: J = pi (D^4 - d^4) / 32 for a 219.1 x 8 tube (Timoshenko and Goodier, ch. 10).
        var r = ApiExamples.TubeFromDxfFile(Path.Combine(RepoPaths.SampleProfiles, "winch-drum-tube.dxf"));
        double D = 0.2191, d = D - 2 * 0.008;
        Tol.Rel(Math.PI * (Math.Pow(D, 4) - Math.Pow(d, 4)) / 32, r.TorsionConstant, 2e-4);
    }

    [Fact]
    public void Largest_part_of_a_sheet_is_the_tube_of_its_section_view()
    {
        // Exact: J = pi (D^4 - d^4) / 32 for the sheet's 40/16 mm tube (Timoshenko and Goodier, ch. 10).
        var r = ApiExamples.LargestPartOfSheet(SectionTwist.Tests.Import.SheetDrawingTests.Write(SectionTwist.Tests.Import.RegressionDrawings.Sheet()));
        Tol.Rel(Math.PI * (Math.Pow(0.040, 4) - Math.Pow(0.016, 4)) / 32, r.TorsionConstant, 2e-4);
    }

    [Fact]
    public void Dxf_stream_reads_back_the_written_profile_area()
    {
        var original = ProfileTemplates.Create("tube:D=50,d=40");
        using var ms = new MemoryStream();
        DxfProfiles.Write(original, ms);
        ms.Position = 0;
        var back = ApiExamples.ProfileFromDxfStream(ms);
        // Exact annulus area pi (D^2 - d^2) / 4 (elementary geometry); arcs stay arcs through DXF.
        Tol.Rel(Math.PI * (0.05 * 0.05 - 0.04 * 0.04) / 4, back.Properties.Area, 1e-9);
    }

    [Fact]
    public void Any_source_loads_specs_and_drawings()
    {
        var spec = ApiExamples.ProfileFromAnySource("rect:b=60,h=20");
        Tol.Rel(0.06 * 0.02, spec.Properties.Area, 1e-12); // b h
        var dxf = ApiExamples.ProfileFromAnySource(Path.Combine(RepoPaths.SampleProfiles, "winch-drum-tube.dxf"));
        double D = 0.2191, d = D - 2 * 0.008;
        Tol.Rel(Math.PI * (D * D - d * d) / 4, dxf.Properties.Area, 1e-9);
    }

    [Fact]
    public void Loops_built_in_code_give_the_exact_area()
    {
        var p = ApiExamples.TubeWithFlatInCode();
        // Disc minus the circular segment below the flat, r^2 acos(e/r) - e sqrt(r^2 - e^2), minus the bore
        // (elementary geometry).
        double r = 0.025, e = 0.021, bore = 0.010;
        double segment = r * r * Math.Acos(e / r) - e * Math.Sqrt(r * r - e * e);
        Tol.Rel(Math.PI * r * r - segment - Math.PI * bore * bore, p.Properties.Area, 1e-12);
        Assert.Single(p.Regions);
        Assert.Single(p.Regions[0].Holes);
    }

    [Fact]
    public void Point_list_example_has_a_square_and_a_circle()
    {
        var p = ApiExamples.SquareAndCircleFromPointList();
        Assert.Equal(2, p.Regions.Count);
        Tol.Rel(400e-6 + Math.PI * 25e-6, p.Properties.Area, 1e-12); // a^2 + pi r^2
    }

    [Fact]
    public void Progress_example_reports_in_order_and_ends_at_one()
    {
        var log = new List<AnalysisProgress>();
        var r = ApiExamples.AnalyseWithProgress(ProfileTemplates.Create("circle:d=40"), TimeSpan.FromMinutes(5), log);
        Assert.NotNull(r);
        // Accuracy 1e-5 requested: J within it of pi d^4 / 32 (Timoshenko and Goodier, ch. 10), with margin 2x.
        Tol.Rel(Math.PI * Math.Pow(0.04, 4) / 32, r.TorsionConstant, 2e-5);
        Assert.NotEmpty(log);
        for (int i = 1; i < log.Count; i++) Assert.True(log[i].Fraction >= log[i - 1].Fraction, $"report {i} went back: {log[i - 1]} then {log[i]}");
        Assert.Equal(1.0, log[^1].Fraction);
    }

    [Fact]
    public void Progress_example_returns_null_when_the_time_runs_out()
    {
        var log = new List<AnalysisProgress>();
        // a zero time limit cancels before the analysis starts: a limit of a millisecond raced the timer, which waits for
        // the thread pool, against an analysis that now ends in tens of milliseconds
        var r = ApiExamples.AnalyseWithProgress(ProfileTemplates.Create("keyed:d=40"), TimeSpan.Zero, log);
        Assert.Null(r);
        Assert.DoesNotContain(log, p => p.Fraction >= 1);
    }

    [Fact]
    public void Describe_prints_stress_and_twist_rate_from_the_result()
    {
        // T = 100 N*m on d = 40 mm: tau = 16 T / (pi d^3) = 7.96 MPa; G = 79.3 GPa: T / (G J) = 0.0050 rad/m = 0.287 deg/m
        // (Timoshenko and Goodier, ch. 10).
        string s = ApiExamples.Describe(Round.Value, 100, 79.3e9);
        Assert.Contains("tau=8.0 MPa", s, StringComparison.Ordinal);
        Assert.Contains("twist 0.287 deg/m", s, StringComparison.Ordinal);
        Assert.Contains("A=0.0012566 m^2", s, StringComparison.Ordinal);
    }

    [Fact]
    public void Drivetrain_modes_in_code_match_the_two_rotor_formula()
    {
        var modes = ApiExamples.MotorAndDrumModes();
        // omega^2 = k (I1 + I2) / (I1 I2), k = G J / L (Thomson, Theory of Vibration with Applications, two-rotor system);
        // the shaft's own inertia (7850 * 1.9e-4 kg*m^2 over 0.6 m, about 0.001 kg*m^2) moves it by well under 1 %
        double k = 79.3e9 * Math.PI * Math.Pow(0.040, 4) / 32 / 0.600;
        double w = Math.Sqrt(k * (0.05 + 1.2) / (0.05 * 1.2));
        Assert.True(modes.Modes[0].IsRigidBody);
        Tol.Rel(w, modes.Modes[1].AngularFrequency, 0.01, "two-rotor formula");
        Assert.True(modes.Modes[1].AngularFrequency < w, "the shaft's own inertia lowers the frequency");
    }

    [Fact]
    public void Shaft_in_code_twists_by_the_sum_of_T_L_over_G_J()
    {
        var res = ApiExamples.TwoStepShaft();
        // T = P / omega; a determinate shaft twists by sum T L_i / (G J_i) (Gere, Mechanics of Materials, torsion of
        // stepped bars); the support reaction balances the applied torque.
        double t = 2200 / (90 * 2 * Math.PI / 60);
        double g = 79.3e9;
        double j1 = Math.PI * Math.Pow(0.030, 4) / 32;
        double j2 = res.Model.Segments[1].Section!.TorsionConstant;
        Tol.Rel(t * (0.120 / (g * j1) + 0.280 / (g * j2)), Math.Abs(res.EndToEndTwist), 1e-9);
        Tol.Rel(t, Math.Abs(res.Reactions[0].Torque), 1e-9);
        // tau in the journal = 16 T / (pi d^3) (exact)
        Tol.Rel(16 * t / (Math.PI * Math.Pow(0.030, 3)), res.Segments[0].MaxShear, 1e-9);
    }

    [Fact]
    public void Shaft_summary_in_US_units_converts_the_torque_and_flags_the_sharp_keyseat()
    {
        // T = P / omega = 2200 W / (90 rpm) = 233.4 N*m; 1 lbf*in = 4.4482216152605 N x 0.0254 m exactly (the international
        // pound-force and inch), so T = 2066 lbf*in. The keyed body (keyed:d=40,r=0, no floor radius) has a sharp re-entrant
        // corner: its peak shear is unbounded (Timoshenko and Goodier, sec. 113; docs/references.md), so the summary says so.
        var res = ApiExamples.TwoStepShaft();
        string s = ApiExamples.ShaftSummary(res, UnitSystem.US);
        double lbfIn = 2200 / (90 * 2 * Math.PI / 60) / (4.4482216152605 * 0.0254);
        Assert.Contains($"T = {NumberText.Format(Math.Sign(res.Segments[0].InternalTorque) * lbfIn, 5)} lbf·in", s, StringComparison.Ordinal);
        Assert.Contains("psi", s, StringComparison.Ordinal);
        Assert.Contains("deg/ft", s, StringComparison.Ordinal);
        Assert.Contains("peak shear unbounded", s, StringComparison.Ordinal);
        Assert.Contains("check unbounded", s, StringComparison.Ordinal);
        Assert.Contains("warning [sharp-reentrant-corner]: section 'keyed d=40 mm'", s, StringComparison.Ordinal);
        Assert.Contains("warning [unbounded-peak-shear]", s, StringComparison.Ordinal);
        Assert.Null(res.Segments[1].SafetyFactor);
    }

    [Fact]
    public void Own_source_bar_matches_the_rectangle_series()
    {
        // 60 x 10 bar: J = beta a b^3 from the series of Timoshenko and Goodier, sec. 109.
        var r = ApiExamples.AnalyseWithOwnSource();
        var (beta, _) = SectionTwist.Tests.References.Published.Rectangle(0.060, 0.010);
        Tol.Rel(beta * 0.060 * Math.Pow(0.010, 3), r.TorsionConstant, 2e-4);
        Assert.Equal("bar:60x10", r.Profile.Name);
    }

    [Fact]
    public void Plastic_summary_of_the_round_bar_has_shape_factor_4_3()
    {
        // d = 40 mm, tau_y = 100 MPa: T_y = pi r^3 tau_y / 2 = 1257 N*m (Timoshenko and Goodier sec. 101),
        // T_p = 2 pi r^3 tau_y / 3 = 1676 N*m (Nadai sand heap), shape factor 4/3; at 10 x the first-yield twist
        // T / T_y = 4/3 (1 - 1/4000) = 1.333 (Beer, Johnston and DeWolf sec. 3.9, from memory).
        string s = ApiExamples.PlasticSummary(Round.Value, 100e6);
        Assert.Contains("T_y=1257 N*m", s, StringComparison.Ordinal);
        Assert.Contains("T_p=1676 N*m", s, StringComparison.Ordinal);
        Assert.Contains("shape factor 1.333", s, StringComparison.Ordinal);
        Assert.Contains("T=1.333 T_y", s, StringComparison.Ordinal);
    }

    // Cantilever restrained at the wall: phi(L) = T/(GJ) (L - a tanh(L/a)) (Vlasov, Thin-Walled Elastic Beams, 2nd ed.,
    // ch. 5; AISC Design Guide 9, from memory), with J and Iw of the same analysed channel.
    [Fact]
    public void Warping_member_example_matches_the_cantilever_closed_form()
    {
        var r = ApiExamples.EndPlatedChannel();
        var steel = ShaftMaterials.All["steel-s355"];
        var sec = SectionAnalyzer.Analyze(ProfileTemplates.Create("channel:h=100,b=50,tw=6,tf=8.5,r=8.5"), new AnalysisOptions { Warping = true });
        double gj = steel.ShearModulus * sec.TorsionConstant, a = Math.Sqrt(steel.YoungsModulus!.Value * sec.Warping!.WarpingConstant / gj);
        Tol.Rel(150 / gj * (1.2 - a * Math.Tanh(1.2 / a)), r.Stations[1].Rotation, 1e-9, "Vlasov ch. 5");
    }

    [Fact]
    public void Composite_example_matches_the_exact_bonded_bar()
    {
        var r = ApiExamples.SteelCoreInBrassSleeve();
        // exact: GJ = G1 J1 + G2 J2 for bonded rings (Gere, Mechanics of Materials, sec. 3.8, from memory of the section)
        double j1 = Math.PI * Math.Pow(0.020, 4) / 2, j2 = Math.PI * (Math.Pow(0.025, 4) - Math.Pow(0.020, 4)) / 2;
        double gj = 79.3e9 * j1 + 37e9 * j2;
        Tol.Rel(gj, r.TorsionalRigidity, 1e-6, "Gere sec. 3.8 (from memory of the section)");
        Tol.Rel(79.3e9 * j1 / gj, r.Materials[0].TorqueShare, 1e-5, "Gere sec. 3.8 (from memory of the section)");
    }
}
