using SectionTwist.Geometry;
using SectionTwist.Units;

namespace SectionTwist.Shaft;

/// <summary>
/// A cross-section named in a shaft file that needs the section analysis: a template spec or a DXF outline. The shaft
/// file reader hands it to the resolver given to <see cref="ShaftFile.Load"/>, which returns the section's J and peak
/// shear per unit torque.
/// </summary>
/// <param name="Name">The section's name in the file.</param>
/// <param name="TemplateSpec">A template spec such as <c>keyed:d=40</c>, or null for a DXF section.</param>
/// <param name="DxfPath">Full path of the DXF file, or null for a template section.</param>
/// <param name="Layer">DXF layers holding the outline (a name, a comma list or patterns with * and ?), or null for all layers.</param>
/// <param name="Part">Which candidate region (its number, largest first) when the drawing holds several, or null.</param>
/// <param name="Location">Where the section is defined, <c>file:line</c>, for messages.</param>
public sealed record SectionSource(string Name, string? TemplateSpec, string? DxfPath, string? Layer, string? Part, string Location)
{
    /// <summary>The drawing's region around this point (drawing units), or null.</summary>
    public Point2? At { get; init; }

    /// <summary>Only entities inside this box (drawing units), or null.</summary>
    public Box2? Window { get; init; }

    /// <summary>Take the outline from HATCH boundaries.</summary>
    public bool UseHatches { get; init; }

    /// <summary>Fit arcs through faceted curves within this fraction of the part size, or null.</summary>
    public double? FitArcs { get; init; }

    /// <summary>Snap tolerance (fraction of the drawing's size), or null for the default.</summary>
    public double? SnapTolerance { get; init; }

    /// <summary>Leave out entities that do not close.</summary>
    public bool SkipOpen { get; init; }

    /// <summary>
    /// A composite section: each part (a composite template's part or a drawing layer) with its material; null for a
    /// homogeneous section.
    /// </summary>
    public IReadOnlyList<KeyValuePair<string, Material>>? Materials { get; init; }

    /// <summary>Length unit of the drawing (overrides its $INSUNITS), or null.</summary>
    public LengthUnit? Unit { get; init; }
}
