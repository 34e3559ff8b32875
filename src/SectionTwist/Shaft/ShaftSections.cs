using System.Globalization;
using SectionTwist.Import;
using SectionTwist.Profiles;
using SectionTwist.Torsion;

namespace SectionTwist.Shaft;

/// <summary>
/// The standard section resolver for shaft files: a template spec is built with <see cref="ProfileTemplates.Create"/>,
/// a DXF outline is read with <see cref="ProfileSources.Load"/> (layer and part passed on), and the profile is analysed
/// with <see cref="SectionAnalyzer.Analyze"/>: J = <see cref="SectionResult.TorsionConstant"/>, peak shear per unit torque =
/// <see cref="SectionResult.MaxShearPerTorque"/>.
/// </summary>
public static class ShaftSections
{
    /// <summary>Creates a resolver for <see cref="ShaftFile.Load"/>.</summary>
    /// <param name="options">Section analysis options; null for the defaults.</param>
    /// <param name="notes">Receives one line per analysed section (the analysis warnings travel with the result, <see cref="SectionStiffness.Warnings"/>); may be null.</param>
    public static Func<SectionSource, SectionStiffness> CreateResolver(AnalysisOptions? options = null, Action<string>? notes = null) =>
        source => Resolve(source, options, notes);

    /// <summary>Builds and analyses one section.</summary>
    public static SectionStiffness Resolve(SectionSource source, AnalysisOptions? options = null, Action<string>? notes = null)
    {
        var (r, outer) = Analyze(source, options, notes);
        return Stiffness(source, r, outer);
    }

    /// <summary>
    /// The shaft's view of a solved section: J, peak shear per unit torque, description, outer size, whether the peak is
    /// unbounded (a sharp re-entrant corner) and the analysis warnings, each prefixed with the section's name.
    /// </summary>
    internal static SectionStiffness Stiffness(SectionSource source, SectionResult r, double? outer) =>
        SectionStiffness.FromAnalysis(r, source.Name, outer) with { Description = source.TemplateSpec ?? Path.GetFileName(source.DxfPath) };

    /// <summary>
    /// Builds and analyses one section and returns the full result with the template's outer size (null for a DXF outline),
    /// for callers that keep the solved field (the report's pictures).
    /// </summary>
    internal static (SectionResult Result, double? OuterSize) Analyze(SectionSource source, AnalysisOptions? options, Action<string>? notes,
        IProgress<AnalysisProgress>? progress = null)
    {
        ArgumentNullException.ThrowIfNull(source);
        Geometry.Profile profile;
        double? outer = null;
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
                    throw new SectionTwistException("bad-section", $"part '{p}' must be a whole number from 1 (the n-th closed outline of the drawing)");
                part = n;
            }
            profile = ProfileSources.Load(path, new ProfileSourceOptions { Layer = source.Layer, Part = part, Notes = notes });
        }
        else throw new SectionTwistException("bad-section", $"{source.Location}: section '{source.Name}' names neither a template nor a DXF file");

        var r = SectionAnalyzer.Analyze(profile, options, default, progress);
        // the values and the warnings go into the results (tables, JSON, CSV, report); the note only says what was done
        notes?.Invoke($"section '{source.Name}' ({source.TemplateSpec ?? Path.GetFileName(source.DxfPath)}): analysed, {r.Mesh.Elements} elements" +
                      (r.Warnings.Count > 0 ? $", {r.Warnings.Count} warning(s) (listed with the results)" : ""));
        return (r, outer);
    }
}
