using System.Globalization;
using SectionTwist.Geometry;
using SectionTwist.Import;
using SectionTwist.Profiles;
using SectionTwist.Shaft;
using SectionTwist.Torsion;

namespace SectionTwist.Rendering.Adapters;

/// <summary>
/// A section resolver for <see cref="ShaftFile.Load"/> that keeps what it analysed: a template spec is built with
/// <see cref="ProfileTemplates.Create"/>, a DXF outline read with <see cref="ProfileSources.Load"/>, and the profile solved
/// with <see cref="SectionAnalyzer.Analyze"/>. The shaft model gets J and the peak shear per unit torque; the report
/// gets the full <see cref="SectionResult"/> (field, mesh, warnings) of every section the shaft actually uses, for its
/// contour pictures and property tables.
/// </summary>
public sealed class ShaftSectionCatalog
{
    private readonly AnalysisOptions? _options;
    private readonly Action<string>? _notes;
    private readonly List<AnalysedSection> _sections = [];

    /// <summary>Creates an empty catalog.</summary>
    /// <param name="options">Section analysis options; null for the defaults.</param>
    /// <param name="notes">Receives one line per section analysed and per analysis warning; may be null.</param>
    public ShaftSectionCatalog(AnalysisOptions? options = null, Action<string>? notes = null)
    {
        _options = options;
        _notes = notes;
    }

    /// <summary>The sections analysed so far, in the order the shaft file's segments first used them.</summary>
    public IReadOnlyList<AnalysedSection> Sections => _sections;

    /// <summary>The resolver to hand to <see cref="ShaftFile.Load"/> or <see cref="ShaftFile.Parse"/>.</summary>
    public Func<SectionSource, SectionStiffness> Resolver => Resolve;

    /// <summary>Builds and analyses one section and remembers the result.</summary>
    public SectionStiffness Resolve(SectionSource source)
    {
        ArgumentNullException.ThrowIfNull(source);
        Profile profile;
        double outer;
        if (source.TemplateSpec is { } spec)
        {
            profile = ProfileTemplates.Create(spec);
            outer = ProfileTemplates.OuterSize(spec);
        }
        else if (source.DxfPath is { } path)
        {
            int? part = null;
            if (source.Part is { } p)
            {
                if (!int.TryParse(p, NumberStyles.Integer, CultureInfo.InvariantCulture, out int n) || n < 1)
                    throw new SectionTwistException("bad-section", $"{source.Location}: part '{p}' must be a whole number from 1 (the n-th closed outline of the drawing)");
                part = n;
            }
            profile = ProfileSources.Load(path, new ProfileSourceOptions { Layer = source.Layer, Part = part, Notes = _notes });
            outer = Math.Max(profile.Bounds.Width, profile.Bounds.Height);
        }
        else throw new SectionTwistException("bad-section", $"{source.Location}: section '{source.Name}' names neither a template nor a DXF file; give 'template' or 'dxf'");

        _notes?.Invoke($"analysing section '{source.Name}' ({source.TemplateSpec ?? Path.GetFileName(source.DxfPath)})");
        var r = SectionAnalyzer.Analyze(profile, _options);
        foreach (var w in r.Warnings) _notes?.Invoke($"section '{source.Name}': warning: {w.Message}");
        var stiffness = new SectionStiffness(r.TorsionConstant, r.MaxShearPerTorque, source.TemplateSpec ?? Path.GetFileName(source.DxfPath), outer);
        _sections.Add(new AnalysedSection(source, r, outer, LargestHole(profile)));
        return stiffness;
    }

    /// <summary>
    /// The analysed section whose J and peak shear per unit torque are exactly those of <paramref name="section"/> (the shaft
    /// file reader copies both values unchanged), or null for a section that was not analysed (round, tube, given J).
    /// </summary>
    public AnalysedSection? Find(SectionStiffness? section) =>
        section is null ? null : _sections.FirstOrDefault(a => a.Result.TorsionConstant == section.TorsionConstant
                                                                && a.Result.MaxShearPerTorque == section.ShearPerTorque);

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
