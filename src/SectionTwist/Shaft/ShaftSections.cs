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
    /// <param name="notes">Receives one line per analysed section and per analysis warning (e.g. a sharp re-entrant corner); may be null.</param>
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
        var (r, outer) = Analyze(source, options, notes, cancellationToken);
        return Stiffness(r, source.TemplateSpec ?? Path.GetFileName(source.DxfPath), outer) with
        {
            Bending = SectionTwist.Bending.BendingSection.FromSection(r, outer),
            PolarMoment = r.PolarMoment,
        };
    }

    /// <summary>The shaft-model values of an analysed section, with its warping values when they were solved.</summary>
    internal static SectionStiffness Stiffness(SectionResult r, string? description, double? outer) =>
        new(r.TorsionConstant, r.MaxShearPerTorque, description, outer)
        {
            WarpingConstant = r.Warping?.WarpingConstant,
            MaxSectorialCoordinate = r.Warping?.MaxSectorialCoordinate,
            WarpingSensitive = r.Warping?.Classification == Warping.WarpingClass.WarpingSensitive,
        };

    /// <summary>
    /// Builds and analyses one section and returns the full result with the template's outer size (null for a DXF outline),
    /// for callers that keep the solved field (the report's pictures).
    /// </summary>
    internal static (SectionResult Result, double? OuterSize) Analyze(SectionSource source, AnalysisOptions? options, Action<string>? notes, CancellationToken ct = default)
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
        var r = SectionAnalyzer.Analyze(profile, (options ?? AnalysisOptions.Default) with { WarpingIfOpen = true }, ct);
        notes?.Invoke($"section '{source.Name}' ({source.TemplateSpec ?? Path.GetFileName(source.DxfPath)}): J = {r.TorsionConstant:G5} m^4, " +
                      $"peak shear per unit torque {r.MaxShearPerTorque:G5} 1/m^3 ({r.Mesh.Elements} elements)");
        foreach (var w in r.Warnings) notes?.Invoke($"section '{source.Name}': warning: {w.Message}");
        if (r.Warping is { Classification: Warping.WarpingClass.WarpingSensitive } wr)
            notes?.Invoke($"section '{source.Name}': open thin-walled, warping constant Iw = {wr.WarpingConstant:G5} m^6, warping length for steel {wr.SteelWarpingLength:G4} m");
        return (r, outer);
    }
}
