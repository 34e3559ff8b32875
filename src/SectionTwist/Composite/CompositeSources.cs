using SectionTwist.Geometry;
using SectionTwist.Import;
using SectionTwist.Profiles;
using SectionTwist.Shaft;

namespace SectionTwist.Composite;

/// <summary>
/// Builds composite sections from the sources a user names: a composite template spec (its parts, e.g. <c>core</c> and
/// <c>sleeve</c> of <c>sleeved:d=40,t=5</c>) or a drawing whose layers are the parts (each layer read as its own profile).
/// </summary>
public static class CompositeSources
{
    /// <summary>
    /// The composite section of <paramref name="source"/> with a material for each part. For a composite template every
    /// part needs a material; for a drawing (or any other source) each entry names a layer, read with the other
    /// <paramref name="options"/> (part choice, window, snap) unchanged. A template that is not composite is refused.
    /// </summary>
    /// <param name="source">A composite template spec or a drawing file.</param>
    /// <param name="materials">Part (layer) name to material, in the order the parts are listed.</param>
    /// <param name="options">Reader options; <see cref="ProfileSourceOptions.Layer"/> must be null (the parts name the layers).</param>
    public static CompositeSection Load(string source, IReadOnlyList<KeyValuePair<string, Material>> materials, ProfileSourceOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(source);
        ArgumentNullException.ThrowIfNull(materials);
        options ??= new ProfileSourceOptions();
        var parts = new List<CompositePart>();
        if (ProfileTemplates.IsComposite(source))
        {
            var shapes = ProfileTemplates.BuildParts(source, options.Unit);
            var names = shapes.Select(s => s.Name).ToArray();
            foreach (var (name, _) in materials)
                if (!names.Contains(name, StringComparer.OrdinalIgnoreCase))
                    throw new SectionTwistException("unknown-part",
                        $"{source.Trim()}: the template has no part '{name}'{Suggest.DidYouMean(name, names)}; its parts are {string.Join(", ", names)}");
            foreach (var (name, shape) in shapes)
            {
                var m = materials.FirstOrDefault(kv => string.Equals(kv.Key, name, StringComparison.OrdinalIgnoreCase));
                if (m.Value is null)
                    throw new SectionTwistException("no-material",
                        $"{source.Trim()}: part '{name}' of this composite template has no material; give one for each of {string.Join(", ", names)} (e.g. --material {string.Join(",", names.Select(n => n + "=steel-1045-cd"))})");
                parts.Add(new CompositePart(name, shape, m.Value));
            }
            return new CompositeSection(parts, source.Trim());
        }
        if (ProfileTemplates.IsSpec(source))
            throw new SectionTwistException("not-composite",
                $"{source.Trim()}: '{source[..source.IndexOf(':', StringComparison.Ordinal)].Trim()}' is not a composite template, so it has no parts to give materials; " +
                $"use a composite one ({string.Join(", ", ProfileTemplates.All.Where(t => ProfileTemplates.IsComposite(t.Name + ":")).Select(t => t.Name))}) or a drawing whose layers are the parts, or analyse it without materials");
        if (materials.Count == 0)
            throw new SectionTwistException("no-material", $"{source}: a composite section needs a material for each part (drawing layer), e.g. --material SHAFT=steel-1045-cd,SLEEVE=brass");
        if (options.Layer is not null)
            throw new SectionTwistException("bad-option", $"{source}: the materials name the layers to read; leave out the layer filter (--layer) and map each layer to its material");
        foreach (var (layer, material) in materials)
        {
            Profile shape;
            try
            {
                shape = ProfileSources.Load(source, options with { Layer = layer, PartLayers = materials.Select(m => m.Key).ToArray() });
            }
            catch (SectionTwistException ex)
            {
                // say which layer refused: each part is read from its own layer, so a remedy naming a layer choice does
                // not apply, and one such as another --at point names a part of that layer only
                string choice = options.At is not null || options.Window is not null || options.Part is not null
                    ? $"a part choice applies to each part's layer on its own; {(options.ShaftFileKeys ? "a 'window:'" : "a --window")} around the whole section, or none, suits every layer"
                    : $"each part is read from its own layer, so a {(options.ShaftFileKeys ? "'layer:'" : "--layer")} choice does not apply";
                throw new SectionTwistException(ex.Code, $"{ex.Message} (while reading layer '{layer}' of the composite: {choice})");
            }
            parts.Add(new CompositePart(layer, shape.With(name: $"{Path.GetFileName(source)} layer {layer}"), material));
        }
        return new CompositeSection(parts, Path.GetFileName(source));
    }
}
