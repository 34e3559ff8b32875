using SectionTwist.Geometry;

namespace SectionTwist.Import.Dxf;

/// <summary>The <c>.dxf</c> profile source: <see cref="DxfProfiles.Read(string, DxfReadOptions?, CancellationToken)"/> behind <see cref="IProfileSource"/>.</summary>
internal sealed class DxfSource : IProfileSource
{
    public string Name => "dxf";

    public IReadOnlyList<string> Extensions { get; } = [".dxf"];

    public bool CanLoad(string source) => string.Equals(Path.GetExtension(source), ".dxf", StringComparison.OrdinalIgnoreCase) && File.Exists(source);

    public Profile Load(string source, ProfileSourceOptions options)
    {
        var read = DxfProfiles.Read(source, ToDxf(options), options.Cancellation);
        Report(read.Report, options.Notes);
        return read.Profile;
    }

    /// <summary>
    /// Maps the generic source options. Splines become arcs within a thousandth of the requested accuracy (at most 1e-7
    /// of their size): the change of J is bounded by that deviation times the boundary integral of the squared shear
    /// (shape derivative of the torsion constant), a small fraction of the accuracy.
    /// </summary>
    internal static DxfReadOptions ToDxf(ProfileSourceOptions o) => new()
    {
        Unit = o.Unit,
        Layer = o.Layer,
        Part = o.Part,
        At = o.At,
        Window = o.Window,
        UseHatches = o.UseHatches,
        FitArcs = o.FitArcs,
        SkipOpen = o.SkipOpen,
        SnapTolerance = o.SnapTolerance ?? 1e-6,
        SplineTolerance = Math.Clamp(o.Accuracy / 1000, 1e-10, 1e-7),
        ShaftFileKeys = o.ShaftFileKeys,
        PartLayers = o.PartLayers,
    };

    /// <summary>True when the largest gap closed is zero or round-off (a millionth of the default snap tolerance, about 1e-12 of the part).</summary>
    internal static bool IsRoundOff(DxfImportReport r) => r.LargestGapClosed <= 1e-6 * r.SnapTolerance;

    internal static void Report(DxfImportReport r, Action<string>? notes)
    {
        if (notes is null) return;
        foreach (var w in r.Warnings) notes(w);
        // gaps of round-off size (end points that meet in exact arithmetic) are no news
        if (!IsRoundOff(r)) notes($"joined end points up to {Units.NumberText.Format(r.LargestGapClosed, 3)} {r.Unit?.Symbol ?? "drawing units"} apart");
        if (r.DuplicatesDropped > 0) notes($"dropped {r.DuplicatesDropped} duplicate or overlapping piece(s)");
    }
}
