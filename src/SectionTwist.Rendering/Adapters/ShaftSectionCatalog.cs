using SectionTwist.Geometry;
using SectionTwist.Shaft;
using SectionTwist.Torsion;

namespace SectionTwist.Rendering.Adapters;

/// <summary>
/// A section resolver for <see cref="ShaftFile.Load"/> that keeps what it analysed: the sections are built and solved as
/// by <see cref="ShaftSections.Resolve"/> (template spec or DXF outline, then the section analysis). The shaft model gets J
/// and the peak shear per unit torque; the report gets the full <see cref="SectionResult"/> (field, mesh, warnings) of
/// every section the shaft actually uses, for its contour pictures and property tables.
/// </summary>
public sealed class ShaftSectionCatalog
{
    private readonly AnalysisOptions? _options;
    private readonly Action<string>? _notes;
    private readonly CancellationToken _ct;
    private readonly List<AnalysedSection> _sections = [];

    /// <summary>Creates an empty catalog.</summary>
    /// <param name="options">Section analysis options; null for the defaults.</param>
    /// <param name="notes">Receives one line per section analysed (the warnings travel with the results); may be null.</param>
    /// <param name="cancellationToken">Stops the reading and analysis of the sections.</param>
    public ShaftSectionCatalog(AnalysisOptions? options = null, Action<string>? notes = null, CancellationToken cancellationToken = default)
    {
        _options = options;
        _notes = notes;
        _ct = cancellationToken;
    }

    /// <summary>Receives the progress of each section analysis with the section's name (for a progress display); may be null.</summary>
    public Action<string, AnalysisProgress>? Progress { get; init; }

    /// <summary>The sections analysed so far, in the order the shaft file's segments first used them.</summary>
    public IReadOnlyList<AnalysedSection> Sections => _sections;

    /// <summary>The resolver to hand to <see cref="ShaftFile.Load"/> or <see cref="ShaftFile.Parse"/>.</summary>
    public Func<SectionSource, SectionStiffness> Resolver => Resolve;

    /// <summary>Builds and analyses one section (as <see cref="ShaftSections.Resolve"/> does) and remembers the result.</summary>
    public SectionStiffness Resolve(SectionSource source)
    {
        ArgumentNullException.ThrowIfNull(source);
        // composite sections: the numbers only (the report has no composite pictures yet)
        if (source.Materials is not null) return ShaftSections.Resolve(source, _options, _notes, _ct);
        var progress = Progress is { } report ? new ProgressSink(p => report(source.Name, p)) : null;
        var (r, templateOuter) = ShaftSections.Analyze(source, _options, _notes, _ct, progress);
        // a template knows its outer size; a drawing's is the larger side of its bounds
        double outer = templateOuter ?? Math.Max(r.Profile.Bounds.Width, r.Profile.Bounds.Height);
        _sections.Add(new AnalysedSection(source, r, outer, LargestHole(r.Profile)));
        return ShaftSections.Stiffness(source, r, outer) with
        {
            Bending = SectionTwist.Bending.BendingSection.FromSection(r, templateOuter),
            PolarMoment = r.PolarMoment,
        };
    }

    /// <summary>
    /// The analysed section whose J and peak shear per unit torque are exactly those of <paramref name="section"/> (the shaft
    /// file reader copies both values unchanged), or null for a section that was not analysed (round, tube, given J).
    /// </summary>
    public AnalysedSection? Find(SectionStiffness? section) =>
        section is null ? null : _sections.FirstOrDefault(a => a.Result.TorsionConstant == section.TorsionConstant
                                                                && a.Result.MaxShearPerTorque == section.ShearPerTorque);

    /// <summary>Reports on the calling thread, in order.</summary>
    private sealed class ProgressSink(Action<AnalysisProgress> report) : IProgress<AnalysisProgress>
    {
        public void Report(AnalysisProgress value) => report(value);
    }

    /// <summary>Largest extent of the largest hole of a single-region profile (a bore), m; 0 for none.</summary>
    private static double LargestHole(Profile p) =>
        p.Regions.Count != 1 || p.Regions[0].Holes.Count == 0 ? 0
            : p.Regions[0].Holes.Max(h => Math.Max(h.Bounds.Width, h.Bounds.Height));
}

/// <summary>A section of a shaft file that went through the section analysis.</summary>
/// <param name="Source">Where the file defines it (name, template spec or DXF file).</param>
/// <param name="Result">The solved section.</param>
/// <param name="OuterSize">Outer size for drawings, m: the template's outer size, or the larger side of a DXF outline's bounds.</param>
/// <param name="BoreSize">Size of the largest hole, m (0 for a solid section).</param>
public sealed record AnalysedSection(SectionSource Source, SectionResult Result, double OuterSize, double BoreSize)
{
    /// <summary>The section's name in the shaft file.</summary>
    public string Name => Source.Name;
}
