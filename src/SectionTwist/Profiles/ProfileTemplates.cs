using SectionTwist.Geometry;
using SectionTwist.Units;

namespace SectionTwist.Profiles;

/// <summary>
/// Parametric profiles from a one-line spec <c>name:key=value,key=value</c>, e.g. <c>keyed:d=40mm,n=2</c>,
/// <c>shs:B=3in,t=0.25in</c>, <c>iso14:8x32x36</c> or <c>polygon:0 0 40 0 40 10</c>. Lengths may carry a unit
/// (mm, cm, m, in, ft, um); a bare number takes the default unit. Angles are degrees unless written with rad.
/// </summary>
public static class ProfileTemplates
{
    private static readonly TemplateDefinition[] Definitions =
    [
        .. RoundTemplates.All(),
        .. PolygonTemplates.All(),
        KeyedShaftTemplate.Definition,
        FlatsTemplate.Definition,
        StraightSplineTemplate.Definition,
        InvoluteSplineTemplate.Definition,
        .. HollowSectionTemplates.All(),
        .. RolledSectionTemplates.All(),
        .. SteelSectionTemplates.All(),
        .. CompositeTemplates.All(),
    ];

    private static readonly string[] OutOfScope = ["crosshole", "cross-hole", "crossbore", "crossdrilled", "cross-drilled"];

    /// <summary>Every template, in listing order.</summary>
    public static IReadOnlyList<TemplateInfo> All { get; } = Definitions.Select(d => d.Info).ToArray();

    /// <summary>
    /// Builds the profile a spec describes. Coordinates are metres; <see cref="Profile.Unit"/> is the first unit the spec
    /// writes on a length, else <paramref name="defaultUnit"/> (millimetres when null). Throws a
    /// <see cref="SectionTwistException"/> naming the spec, the key and the remedy on any bad input.
    /// </summary>
    /// <param name="spec">The spec, e.g. <c>keyed:d=40,n=2</c>.</param>
    /// <param name="defaultUnit">The unit of bare numbers; millimetres when null.</param>
    public static Profile Create(string spec, LengthUnit? defaultUnit = null) => Build(spec, defaultUnit).Profile;

    /// <summary>
    /// The outer size D (metres) of a spec's profile: the diameter of the plain round bar it is compared with
    /// (see <see cref="TemplateInfo.OuterSize"/>).
    /// </summary>
    public static double OuterSize(string spec, LengthUnit? defaultUnit = null) => Build(spec, defaultUnit).OuterSize;

    /// <summary>The template a name or alias selects, or null.</summary>
    public static TemplateInfo? Find(string name) => FindDefinition(name)?.Info;

    /// <summary>True when <paramref name="source"/> looks like a template spec (a known name or alias before the colon).</summary>
    public static bool IsSpec(string source)
    {
        ArgumentNullException.ThrowIfNull(source);
        int colon = source.IndexOf(':', StringComparison.Ordinal);
        return colon > 0 && FindDefinition(source[..colon].Trim()) is not null;
    }

    private static TemplateDefinition? FindDefinition(string name) =>
        Definitions.FirstOrDefault(d => string.Equals(d.Info.Name, name, StringComparison.OrdinalIgnoreCase)
            || d.Info.Aliases.Any(a => string.Equals(a, name, StringComparison.OrdinalIgnoreCase)));

    /// <summary>The template named <paramref name="name"/>; throws naming the known templates (or the 3D cross-hole case) otherwise.</summary>
    internal static TemplateInfo RequireInfo(string name, string specText) => Require(name, specText).Info;

    private static TemplateDefinition Require(string name, string specText)
    {
        if (OutOfScope.Any(o => string.Equals(o, name, StringComparison.OrdinalIgnoreCase)))
            throw new SectionTwistException("out-of-scope",
                $"{specText}: a shaft with a cross hole is a 3D stress problem, outside a cross-section (Saint-Venant) analysis; analyse the plain section (e.g. circle:d=...) and apply a stress-concentration factor from a handbook for the hole");
        return FindDefinition(name) ?? throw new SectionTwistException("unknown-template",
            $"{specText}: unknown template '{name}'{Suggest.DidYouMean(name, Definitions.SelectMany(d => d.Info.Aliases.Prepend(d.Info.Name)))}; known templates: {string.Join(", ", Definitions.Select(d => d.Info.Name))} (run 'sectiontwist templates' for their parameters)");
    }

    /// <summary>True when the spec names a composite template (one whose parts need materials).</summary>
    public static bool IsComposite(string source)
    {
        ArgumentNullException.ThrowIfNull(source);
        int colon = source.IndexOf(':', StringComparison.Ordinal);
        return colon > 0 && FindDefinition(source[..colon].Trim())?.Parts is not null;
    }

    /// <summary>The named parts of a composite template's spec (e.g. core and sleeve of <c>sleeved:d=40,t=5</c>), metres.</summary>
    internal static IReadOnlyList<(string Name, Profile Shape)> BuildParts(string spec, LengthUnit? defaultUnit)
    {
        var (profile, _, info, args) = Build(spec, defaultUnit);
        var def = Require(info.Name, spec.Trim());
        if (def.Parts is null)
            throw new SectionTwistException("not-composite", $"{spec.Trim()}: '{info.Name}' is not a composite template; the composite ones are {string.Join(", ", Definitions.Where(d => d.Parts is not null).Select(d => d.Info.Name))}");
        return def.Parts(args).Select(p => (p.Name, new Profile(p.Regions, profile.Unit, $"{profile.Name} {p.Name}"))).ToArray();
    }

    /// <summary>Builds the profile, its outer size (m) and its template description.</summary>
    internal static (Profile Profile, double OuterSize, TemplateInfo Info, TemplateArguments Arguments) Build(string spec, LengthUnit? defaultUnit)
    {
        var parsed = TemplateSpec.Parse(spec);
        string specText = spec.Trim();
        var def = Require(parsed.Name, specText);
        var unit = defaultUnit ?? LengthUnit.Millimetre;
        IReadOnlyList<Region> regions;
        TemplateArguments args;
        if (def.RawBody is { } raw)
        {
            args = new TemplateArguments(specText, def.Info, [], unit);
            regions = raw(args, parsed.Body);
        }
        else
        {
            var items = new List<(string, string)>();
            foreach (var (key, value) in parsed.Items)
            {
                if (key is not null) { items.Add((key, value)); continue; }
                if (def.Positional is null)
                    throw new SectionTwistException("bad-spec",
                        $"{specText}: item '{value}' has no key; write key=value (keys of '{def.Info.Name}': {string.Join(", ", def.Info.Parameters.Select(p => p.Key))})");
                items.AddRange(def.Positional(specText, value));
            }
            var dup = items.GroupBy(i => i.Item1).FirstOrDefault(g => g.Count() > 1);
            if (dup is not null) throw new SectionTwistException("bad-spec", $"{specText}: key '{dup.Key}' is given twice; keep one");
            args = new TemplateArguments(specText, def.Info, items, unit);
            regions = def.Build(args);
        }
        var profile = new Profile(regions, args.DisplayUnit, specText) { Warnings = args.Warnings.ToArray() };
        return (profile, def.OuterSize(args, regions), def.Info, args);
    }
}
