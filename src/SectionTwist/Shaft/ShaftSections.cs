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
    /// <param name="cancellationToken">Stops the reading and analysis of the sections.</param>
    public static Func<SectionSource, SectionStiffness> CreateResolver(AnalysisOptions? options = null, Action<string>? notes = null, CancellationToken cancellationToken = default) =>
        source => Resolve(source, options, notes, cancellationToken);

    /// <summary>Builds and analyses one section.</summary>
    /// <param name="source">The section.</param>
    /// <param name="options">Section analysis options; null for the defaults.</param>
    /// <param name="notes">Receives one line per analysed section and per analysis warning; may be null.</param>
    /// <param name="cancellationToken">Stops the reading and analysis.</param>
    public static SectionStiffness Resolve(SectionSource source, AnalysisOptions? options = null, Action<string>? notes = null, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(source);
        if (source.Materials is { } materials) return ResolveComposite(source, materials, options, notes, cancellationToken);
        var (r, outer) = Analyze(source, options, notes, cancellationToken);
        return Stiffness(source, r, outer) with
        {
            Bending = SectionTwist.Bending.BendingSection.FromSection(r, outer),
            PolarMoment = r.PolarMoment,
        };
    }

    /// <summary>
    /// A composite section (<see cref="SectionSource.Materials"/>): analysed with <see cref="Composite.CompositeAnalyzer"/>;
    /// J of the first part's material (each segment re-refers it to its own material), the largest peak shear per unit
    /// torque of all materials, each material's own peak for its check, and the bonding caution among the warnings.
    /// </summary>
    private static SectionStiffness ResolveComposite(SectionSource source, IReadOnlyList<KeyValuePair<string, Material>> materials, AnalysisOptions? options,
        Action<string>? notes, CancellationToken ct)
    {
        var section = Composite.CompositeSources.Load(source.TemplateSpec ?? source.DxfPath!, materials, new ProfileSourceOptions
        {
            Part = source.Part is { } p && int.TryParse(p, NumberStyles.Integer, CultureInfo.InvariantCulture, out int n) ? n : null,
            At = source.At, Window = source.Window, UseHatches = source.UseHatches, FitArcs = source.FitArcs,
            SnapTolerance = source.SnapTolerance, SkipOpen = source.SkipOpen, Unit = source.Unit, Notes = notes, ShaftFileKeys = true, Cancellation = ct,
        });
        var r = Composite.CompositeAnalyzer.Analyze(section, null, options, ct);
        notes?.Invoke($"section '{source.Name}' ({source.TemplateSpec ?? Path.GetFileName(source.DxfPath)}): composite, analysed, {r.Mesh.Elements} elements");
        var warnings = r.Warnings.Append(new AnalysisWarning("composite-bonding", Composite.CompositeResult.Caution))
            .Select(w => new AnalysisWarning(w.Code, $"section '{source.Name}': {w.Message}")).ToList().AsReadOnly();
        var p0 = section.Envelope.Properties;
        return new SectionStiffness(r.EquivalentTorsionConstant, r.Materials.Max(m => m.MaxShearPerTorque), source.TemplateSpec ?? Path.GetFileName(source.DxfPath),
            source.TemplateSpec is { } spec ? ProfileTemplates.OuterSize(spec) : null)
        {
            TorsionalRigidity = r.TorsionalRigidity,
            MaterialShears = r.Materials.Select(m => new MaterialShear(m.Material, m.MaxShearPerTorque)).ToList().AsReadOnly(),
            // a material whose peak does not converge (a sharp corner): no factor of safety for the segment, as for a
            // sharp re-entrant corner of a one-material section
            PeakShearUnbounded = r.Materials.Any(m => m.MaxShearUnbounded),
            Warnings = warnings,
            PolarMoment = p0.PolarMoment,
            Profile = section.Envelope,
        };
    }

    /// <summary>
    /// The shaft's view of a solved section: J, peak shear per unit torque, description, outer size, whether the peak is
    /// unbounded (a sharp re-entrant corner), the analysis warnings (each prefixed with the section's name) and the warping
    /// values when they were solved.
    /// </summary>
    internal static SectionStiffness Stiffness(SectionSource source, SectionResult r, double? outer) =>
        SectionStiffness.FromAnalysis(r, source.Name, outer) with { Description = source.TemplateSpec ?? Path.GetFileName(source.DxfPath) };

    /// <summary>
    /// Builds and analyses one section and returns the full result with the template's outer size (null for a DXF outline),
    /// for callers that keep the solved field (the report's pictures).
    /// </summary>
    internal static (SectionResult Result, double? OuterSize) Analyze(SectionSource source, AnalysisOptions? options, Action<string>? notes,
        CancellationToken ct = default, IProgress<AnalysisProgress>? progress = null)
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
                    throw new SectionTwistException("bad-section", $"part '{p}' must be a whole number from 1 (the n-th part of the drawing, largest first, as 'sectiontwist inspect' lists them)");
                part = n;
            }
            profile = ProfileSources.Load(path, new ProfileSourceOptions
            {
                Layer = source.Layer,
                Part = part,
                At = source.At,
                Window = source.Window,
                UseHatches = source.UseHatches,
                FitArcs = source.FitArcs,
                SnapTolerance = source.SnapTolerance,
                SkipOpen = source.SkipOpen,
                Unit = source.Unit,
                Accuracy = options?.Accuracy ?? new AnalysisOptions().Accuracy,
                Notes = notes,
                ShaftFileKeys = true,
                Cancellation = ct,
            });
        }
        else throw new SectionTwistException("bad-section", $"{source.Location}: section '{source.Name}' names neither a template nor a DXF file");

        // open-looking sections also get their warping function (restrained-warping check of the shaft)
        var r = SectionAnalyzer.Analyze(profile, (options ?? AnalysisOptions.Default) with { WarpingIfOpen = true }, ct, progress);
        // the values and the warnings go into the results (tables, JSON, CSV, report); the note only says what was done
        notes?.Invoke($"section '{source.Name}' ({source.TemplateSpec ?? Path.GetFileName(source.DxfPath)}): analysed, {r.Mesh.Elements} elements" +
                      (r.Warnings.Count > 0 ? $", {r.Warnings.Count} warning(s) (listed with the results)" : ""));
        if (r.Warping is { Classification: Warping.WarpingClass.WarpingSensitive } wr)
            notes?.Invoke($"section '{source.Name}': open thin-walled, warping constant Iw = {Units.NumberText.Format(wr.WarpingConstant, 5)} m⁶, " +
                          $"warping length for steel {Units.NumberText.Format(wr.SteelWarpingLength, 4)} m");
        return (r, outer);
    }
}
