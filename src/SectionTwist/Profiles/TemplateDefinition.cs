using SectionTwist.Geometry;

namespace SectionTwist.Profiles;

/// <summary>
/// A template: its description, how to build its regions (metres) from typed arguments, and its outer size D
/// (metres) for the comparison with a plain round. <see cref="Positional"/> turns a positional item (an item
/// without '=') into key/value items; <see cref="RawBody"/> templates receive the spec body unsplit.
/// </summary>
internal sealed record TemplateDefinition(
    TemplateInfo Info,
    Func<TemplateArguments, IReadOnlyList<Region>> Build,
    Func<TemplateArguments, IReadOnlyList<Region>, double> OuterSize)
{
    /// <summary>Converts a positional item into key/value items; null when the template takes none.</summary>
    public Func<string, string, IEnumerable<(string Key, string Value)>>? Positional { get; init; }

    /// <summary>Builds from the whole body text (polygon coordinates); null for key/value templates.</summary>
    public Func<TemplateArguments, string, IReadOnlyList<Region>>? RawBody { get; init; }

    /// <summary>Composite templates: the named parts (each of one material); null for homogeneous templates.</summary>
    public Func<TemplateArguments, IReadOnlyList<(string Name, IReadOnlyList<Region> Regions)>>? Parts { get; init; }

    /// <summary>Shorthand for a parameter list.</summary>
    public static TemplateParameter[] Params(params TemplateParameter[] p) => p;
}
