using System.Text;
using SectionTwist.Import;
using SectionTwist.Import.Dxf;
using SectionTwist.Shaft;
using SectionTwist.Torsion;
using SectionTwist.Units;

namespace SectionTwist.Fuzz;

/// <summary>One thing under test: its seeds, its file extension and how one input is run.</summary>
public abstract class FuzzTarget
{
    /// <summary>Short name: dxf, points, shaft.</summary>
    public abstract string Name { get; }

    /// <summary>Extension of saved inputs.</summary>
    public abstract string Extension { get; }

    /// <summary>Runs one input; throws what the library throws; returns false when a result holds a non-finite number.</summary>
    public abstract bool Run(byte[] input, CancellationToken ct);

    /// <summary>Coarse analysis options: per-input cost of milliseconds, memory bounded well below the worker's limit.</summary>
    internal static readonly AnalysisOptions Coarse = new() { Accuracy = 0.05, EstimateError = false, MemoryBudgetBytes = 512L << 20 };

    /// <summary>Coarse spline flattening for the drawings (the logic is under test, not the accuracy).</summary>
    internal static readonly DxfReadOptions CoarseDxf = new() { SplineTolerance = 1e-3 };

    /// <summary>The three targets.</summary>
    public static IReadOnlyList<FuzzTarget> All { get; } = [new DxfTarget(), new PointListTarget(), new ShaftTarget()];

    /// <summary>The target named <paramref name="name"/>.</summary>
    public static FuzzTarget Get(string name) => All.FirstOrDefault(t => t.Name == name)
        ?? throw new ArgumentException($"unknown target '{name}' (dxf, points, shaft)");

    internal static bool Finite(SectionResult r) =>
        double.IsFinite(r.TorsionConstant) && double.IsFinite(r.MaxShearPerTorque) && double.IsFinite(r.Properties.Area)
        && double.IsFinite(r.MaxShearLocation.X) && double.IsFinite(r.MaxShearLocation.Y) && r.TorsionConstant > 0;
}

/// <summary>DXF reader plus section analysis (millimetres when the drawing has no unit).</summary>
public sealed class DxfTarget : FuzzTarget
{
    /// <inheritdoc/>
    public override string Name => "dxf";

    /// <inheritdoc/>
    public override string Extension => ".dxf";

    /// <inheritdoc/>
    public override bool Run(byte[] input, CancellationToken ct)
    {
        DxfImport read;
        try { read = DxfProfiles.Read(input, "fuzz.dxf", CoarseDxf, ct); }
        catch (SectionTwistException e) when (e.Code == "dxf-unitless")
        {
            read = DxfProfiles.Read(input, "fuzz.dxf", CoarseDxf with { Unit = LengthUnit.Millimetre }, ct);
        }
        return Finite(SectionAnalyzer.Analyze(read.Profile, Coarse, ct));
    }
}

/// <summary>Point-list reader plus section analysis.</summary>
public sealed class PointListTarget : FuzzTarget
{
    /// <inheritdoc/>
    public override string Name => "points";

    /// <inheritdoc/>
    public override string Extension => ".csv";

    /// <inheritdoc/>
    public override bool Run(byte[] input, CancellationToken ct)
    {
        var profile = PointListSource.Parse(new StringReader(Encoding.UTF8.GetString(input)), "fuzz.csv", null, ct);
        return Finite(SectionAnalyzer.Analyze(profile, Coarse, ct));
    }
}

/// <summary>Shaft-file reader, template sections analysed coarsely, the solver and the JSON writer.</summary>
public sealed class ShaftTarget : FuzzTarget
{
    private readonly Dictionary<string, SectionStiffness> _cache = new(StringComparer.Ordinal);

    /// <inheritdoc/>
    public override string Name => "shaft";

    /// <inheritdoc/>
    public override string Extension => ".yaml";

    /// <inheritdoc/>
    public override bool Run(byte[] input, CancellationToken ct)
    {
        string text = Encoding.UTF8.GetString(input);
        var doc = ShaftFile.Parse(text, "fuzz.yaml", Path.GetTempPath(), source => Resolve(source, ct));
        var r = ShaftSolver.Solve(doc.Model);
        string json = ShaftResultJson.Write(r, "fuzz.yaml");
        if (json.Contains("Infinity", StringComparison.Ordinal) || json.Contains("NaN", StringComparison.Ordinal)) return false;
        foreach (var s in r.Stations) if (!double.IsFinite(s.Rotation)) return false;
        foreach (var s in r.Segments)
            if (!double.IsFinite(s.TorqueAtFrom) || !double.IsFinite(s.TorqueAtTo) || !double.IsFinite(s.Twist) || !double.IsFinite(s.MaxShear) || !double.IsFinite(s.MaxTwistRate))
                return false;
        foreach (var x in r.Reactions) if (!double.IsFinite(x.Torque)) return false;
        return true;
    }

    private SectionStiffness Resolve(SectionSource source, CancellationToken ct)
    {
        // DXF sections of mutated files point nowhere useful; templates are analysed once per spec
        string key = source.TemplateSpec ?? source.DxfPath ?? "";
        if (_cache.TryGetValue(key, out var s)) return s;
        s = ShaftSections.Resolve(source, Coarse, null, ct);
        if (_cache.Count > 2000) _cache.Clear();
        _cache[key] = s;
        return s;
    }
}
