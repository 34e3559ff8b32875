namespace SectionTwist.Shaft;

/// <summary>
/// A cross-section named in a shaft file that needs the section analysis: a template spec or a DXF outline. The shaft
/// file reader hands it to the resolver given to <see cref="ShaftFile.Load"/>, which returns the section's J and peak
/// shear per unit torque.
/// </summary>
/// <param name="Name">The section's name in the file.</param>
/// <param name="TemplateSpec">A template spec such as <c>keyed:d=40</c>, or null for a DXF section.</param>
/// <param name="DxfPath">Full path of the DXF file, or null for a template section.</param>
/// <param name="Layer">DXF layer holding the outline, or null for all layers.</param>
/// <param name="Part">Which closed outline (part name or number) when the drawing holds several, or null.</param>
/// <param name="Location">Where the section is defined, <c>file:line</c>, for messages.</param>
public sealed record SectionSource(string Name, string? TemplateSpec, string? DxfPath, string? Layer, string? Part, string Location);
