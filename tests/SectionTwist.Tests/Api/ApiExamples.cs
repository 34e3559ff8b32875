using System.Globalization;
using SectionTwist.Composite;
using SectionTwist.Dynamics;
using SectionTwist.Geometry;
using SectionTwist.Import;
using SectionTwist.Import.Dxf;
using SectionTwist.Plastic;
using SectionTwist.Profiles;
using SectionTwist.Shaft;
using SectionTwist.Torsion;
using SectionTwist.Units;
using SectionTwist.Warping;
using SectionTwist.WarpingTorsion;

namespace SectionTwist.Tests.Api;

/// <summary>
/// The code examples of docs/api.md, verbatim. <see cref="ApiDocsTests"/> checks that every <c>csharp</c> block of the
/// document appears here (whitespace-normalised) and runs each example against an outside reference.
/// </summary>
public static class ApiExamples
{
    // --- docs/api.md: "A profile from a template spec" ---
    public static SectionResult RoundBarFromTemplate()
    {
        // Bare lengths in a spec are millimetres; the profile itself is in metres.
        Profile profile = ProfileTemplates.Create("circle:d=40");
        SectionResult result = SectionAnalyzer.Analyze(profile);
        // result.TorsionConstant is J in m^4 (about 2.513e-7 here, pi d^4 / 32).
        return result;
    }

    // --- docs/api.md: "A profile from a DXF file or stream" ---
    public static SectionResult LargestPartOfSheet(string path)
    {
        // List the parts of the sheet, then analyse the largest one, chosen by a point inside it.
        DxfImportReport sheet = DxfProfiles.Inspect(path, new DxfReadOptions());
        DxfPartInfo largest = sheet.Parts[0];
        var options = new DxfReadOptions { At = largest.Inside };
        return SectionAnalyzer.Analyze(DxfProfiles.Read(path, options).Profile);
    }

    public static SectionResult TubeFromDxfFile(string path)
    {
        DxfImport import = DxfProfiles.Read(path, new DxfReadOptions { Layer = "DRUM" });
        Console.WriteLine($"{import.Report.Loops} loops, unit {import.Report.Unit?.Symbol}");
        return SectionAnalyzer.Analyze(import.Profile);
    }

    public static Profile ProfileFromDxfStream(Stream stream)
    {
        // A unitless drawing needs the unit; the name is used in error messages only.
        var options = new DxfReadOptions { Unit = LengthUnit.Millimetre };
        return DxfProfiles.Read(stream, "upload.dxf", options).Profile;
    }

    public static Profile ProfileFromAnySource(string pathOrSpec)
    {
        // Picks the source by extension (.dxf, .csv, .pts, plugins) or spec prefix (keyed:, circle:, ...).
        return ProfileSources.Load(pathOrSpec, new ProfileSourceOptions { Unit = LengthUnit.Millimetre });
    }

    // --- docs/api.md: "A profile built in code" ---
    public static Profile TubeWithFlatInCode()
    {
        const double mm = 1e-3;
        // Outer boundary: a 50 mm round with one flat 21 mm from the centre (a line and an arc).
        double r = 25 * mm, e = 21 * mm, half = Math.Sqrt(r * r - e * e);
        Loop outer = new LoopBuilder(half, -e)
            .ArcTo(new Point2(-half, -e), center: new Point2(0, 0), counterClockwise: true)
            .Close();                                   // Close() adds the straight flat back to the start
        // A 20 mm bore; FromLoops nests loops by containment, so it becomes a hole.
        Loop bore = LoopBuilder.Circle(new Point2(0, 0), 10 * mm);
        return Profile.FromLoops([outer, bore], LengthUnit.Millimetre, "flatted tube");
    }

    public static Profile SquareAndCircleFromPointList()
    {
        // The plain-text point list: "x, y" per line, "arc, xm, ym, xe, ye" through a middle point, blank line ends a loop.
        const string text = """
            unit, mm
            # a 20 x 20 square with its lower left corner at the origin
            0, 0
            20, 0
            20, 20
            0, 20

            # a 10 mm circle from two three-point arcs, well away from the square
            45, 10
            arc, 50, 15, 55, 10
            arc, 50, 5, 45, 10
            """;
        return PointListSource.Parse(new StringReader(text), "two-parts.csv");
    }

    // --- docs/api.md: "Accuracy, cancellation and progress" ---
    public static SectionResult? AnalyseWithProgress(Profile profile, TimeSpan timeLimit, IList<AnalysisProgress> log)
    {
        using var cancel = new CancellationTokenSource(timeLimit);
        var options = new AnalysisOptions { Accuracy = 1e-5 };   // relative accuracy of J
        var progress = new ListProgress(log);                      // reports arrive in order, the last at 1.0
        try
        {
            return SectionAnalyzer.Analyze(profile, options, cancel.Token, progress);
        }
        catch (OperationCanceledException)
        {
            return null; // the time limit ran out; nothing half-done is returned
        }
    }

    /// <summary>An <see cref="IProgress{T}"/> that records reports on the calling thread, in order.</summary>
    public sealed class ListProgress(IList<AnalysisProgress> log) : IProgress<AnalysisProgress>
    {
        public void Report(AnalysisProgress value) => log.Add(value);
    }

    // --- docs/api.md: "Reading the result" ---
    public static string Describe(SectionResult result, double torqueNewtonMetres, double shearModulusPascal)
    {
        double j = result.TorsionConstant;                                  // m^4
        double tau = torqueNewtonMetres * result.MaxShearPerTorque;         // Pa
        double twistRate = torqueNewtonMetres / (shearModulusPascal * j);   // rad/m
        double errJ = result.EstimatedRelativeError.TorsionConstant;       // fraction, NaN if not estimated
        string warnings = string.Join("; ", result.Warnings.Select(w => w.Code));
        return string.Create(CultureInfo.InvariantCulture,
            $"J={j:G5} m^4 (+-{errJ:P3}) tau={tau / 1e6:F1} MPa at ({result.MaxShearLocation.X:G3}, {result.MaxShearLocation.Y:G3}) m, " +
            $"twist {twistRate * 180 / Math.PI:F3} deg/m, A={result.Properties.Area:G5} m^2, {result.Mesh.Elements} elements [{warnings}]");
    }

    // --- docs/api.md: "A shaft model in code" ---
    public static ShaftResult TwoStepShaft()
    {
        Material steel = ShaftMaterials.All["steel-1045-cd"];
        SectionStiffness journal = SectionStiffness.Round(0.030);           // d = 30 mm, exact
        SectionResult keyed = SectionAnalyzer.Analyze(ProfileTemplates.Create("keyed:d=40,r=0")); // r=0: a sharp keyseat floor
        SectionStiffness body = SectionStiffness.FromAnalysis(keyed, "keyed d=40 mm", 0.040); // J, peak shear, warnings
        var model = new ShaftModel
        {
            Title = "drum shaft",
            Stations = [new Station("bearing", 0.0), new Station("step", 0.120), new Station("gear", 0.400)],
            Segments =
            [
                new ShaftSegment("bearing", "step", journal, steel),
                new ShaftSegment("step", "gear", body, steel),
            ],
            FixedStations = ["bearing"],
            Loads = [PointTorque.FromPower("gear", power: 2200, angularSpeed: ShaftPower.RpmToRadiansPerSecond(90))],
            TwistRateLimit = 0.25 * Math.PI / 180,                            // rad/m
        };
        ShaftResult result = ShaftSolver.Solve(model);
        // result.EndToEndTwist in rad, result.Segments[i].MaxShear in Pa, result.Reactions[0].Torque in N*m.
        return result;
    }

    // --- docs/api.md: "Showing results in a unit system" ---
    public static string ShaftSummary(ShaftResult result, UnitSystem units)
    {
        var lines = new List<string>();
        foreach (SegmentResult s in result.Segments)
            lines.Add($"{s.Label}: T = {units.Torque.Text(s.InternalTorque)}, " +
                      $"peak shear {(s.PeakShearUnbounded ? "unbounded" : units.Stress.Text(s.MaxShear, 4))}, " +
                      $"twist rate {units.TwistRate.Text(s.MaxTwistRate, 4)}, check {s.Check}");
        lines.AddRange(result.Warnings.Select(w => $"warning [{w.Code}]: {w.Message}"));
        return string.Join(Environment.NewLine, lines);
    }

    // --- docs/api.md: "Your own profile source" ---
    /// <summary>Reads specs like <c>bar:60x10</c>: a solid rectangular bar, millimetres unless options say otherwise.</summary>
    public sealed class BarSource : IProfileSource
    {
        public string Name => "bar";
        public IReadOnlyList<string> Extensions => [];
        public bool CanLoad(string source) => source.StartsWith("bar:", StringComparison.OrdinalIgnoreCase);

        public Profile Load(string source, ProfileSourceOptions options)
        {
            var unit = options.Unit ?? LengthUnit.Millimetre;
            string[] size = source[4..].Split('x');
            if (size.Length != 2 || !double.TryParse(size[0], CultureInfo.InvariantCulture, out double b)
                                 || !double.TryParse(size[1], CultureInfo.InvariantCulture, out double h))
                throw new SectionTwistException("bad-bar", $"'{source}': write bar:WIDTHxHEIGHT, e.g. bar:60x10");
            b = unit.ToMetres(b);
            h = unit.ToMetres(h);
            Loop loop = LoopBuilder.Polygon([new(0, 0), new(b, 0), new(b, h), new(0, h)]);
            return Profile.FromLoops([loop], unit, source);
        }
    }

    public static SectionResult AnalyseWithOwnSource()
    {
        ProfileSources.Register(new BarSource());          // or: ProfileSources.LoadPlugins("plugins")
        Profile bar = ProfileSources.Load("bar:60x10");
        return SectionAnalyzer.Analyze(bar);
    }

    // --- docs/api.md: "Yield and the fully plastic torque" ---
    public static string PlasticSummary(SectionResult elastic, double shearYieldPascal)
    {
        // Elastic-perfectly-plastic: first yield, fully plastic torque (sand heap), torque-twist curve.
        PlasticResult plastic = PlasticAnalyzer.Analyze(elastic, shearYieldPascal);
        TorqueTwistPoint last = plastic.Curve[^1];
        return string.Create(CultureInfo.InvariantCulture,
            $"T_y={plastic.FirstYieldTorque:F0} N*m, T_p={plastic.FullyPlasticTorque:F0} N*m (+-{plastic.FullyPlasticTorqueError:P2}), " +
            $"shape factor {plastic.ShapeFactor:F3}; at {last.TwistRatio} x first-yield twist T={last.TorqueRatio:F3} T_y, " +
            $"{last.PlasticFraction:P0} yielded");
    }

    // --- docs/api.md: "Torsional modes of a drivetrain in code" ---
    public static ModalResult MotorAndDrumModes()
    {
        Material steel = ShaftMaterials.All["steel-1045-cd"];                // density 7850 kg/m^3
        var shaft = new ShaftModel
        {
            Stations = [new Station("motor", 0.0), new Station("drum", 0.600)],
            Segments = [new ShaftSegment("motor", "drum", SectionStiffness.Round(0.040), steel)],
        };
        var train = new DrivetrainModel
        {
            Shafts = [new ShaftBranch("drive shaft", shaft)],
            Inertias = [new PointInertia("motor", 0.05), new PointInertia("drum", 1.2)],   // kg*m^2
        };
        ModalResult modes = ModalAnalysis.Solve(train, new ModalOptions { ModeCount = 2 });
        // modes.Modes[0] is the rigid-body mode of the free train; modes.Modes[1].Frequency in Hz.
        return modes;
    }

    // --- docs/api.md: "Open sections: warping and restrained-warping members" ---
    public static WarpingMemberResult EndPlatedChannel()
    {
        // The warping function is solved on request; it gives the shear centre, Iw and the largest |omega|.
        var options = new AnalysisOptions { Warping = true };
        SectionResult channel = SectionAnalyzer.Analyze(ProfileTemplates.Create("channel:h=100,b=50,tw=6,tf=8.5,r=8.5"), options);
        WarpingResult w = channel.Warping!;          // w.ShearCentre (m), w.WarpingConstant (m^6), w.Classification
        var member = new WarpingMember
        {
            Stations = [new Station("wall", 0.0), new Station("tip", 1.2)],
            Segments = [new WarpingSegment("wall", "tip", WarpingSection.From(channel), ShaftMaterials.All["steel-s355"])],
            Loads = [new PointTorque("tip", 150)],   // N*m, applied through the shear centre
            FixedStations = ["wall"],
            Warping = new Dictionary<string, WarpingEnd> { ["wall"] = WarpingEnd.Restrained },
        };
        WarpingMemberResult result = WarpingMemberSolver.Solve(member);
        // result.Stations[1].Rotation in rad; result.Segments[0].MaxWarpingNormalStress in Pa.
        return result;
    }

    // --- docs/api.md: "Composite sections" ---
    public static CompositeResult SteelCoreInBrassSleeve()
    {
        // A steel bar of 20 mm radius in a bonded brass sleeve to 25 mm: the interface circle is drawn by both parts.
        Loop interfaceCircle = LoopBuilder.Circle(default, 0.020);
        var core = new CompositePart("core", new Profile([new Region(interfaceCircle)]), ShaftMaterials.All["steel-1045-cd"]);
        var sleeve = new CompositePart("sleeve",
            new Profile([new Region(LoopBuilder.Circle(default, 0.025), [interfaceCircle])]), ShaftMaterials.All["brass"]);
        var section = new CompositeSection([core, sleeve], "sleeved shaft");
        // GJ in N*m^2; J of the reference material (here the steel) in m^4; per material tau/T in 1/m^3 and torque share.
        return CompositeAnalyzer.Analyze(section, reference: core.Material);
    }
}
