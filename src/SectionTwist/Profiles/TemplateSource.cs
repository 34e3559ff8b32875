using SectionTwist.Geometry;
using SectionTwist.Import;

namespace SectionTwist.Profiles;

/// <summary>The profile source for template specs such as <c>keyed:d=40,n=2</c> (see <see cref="ProfileTemplates"/>).</summary>
public sealed class TemplateSource : IProfileSource
{
    /// <inheritdoc />
    public string Name => "template";

    /// <inheritdoc />
    public IReadOnlyList<string> Extensions { get; } = [];

    /// <inheritdoc />
    public bool CanLoad(string source)
    {
        ArgumentNullException.ThrowIfNull(source);
        int colon = source.IndexOf(':', StringComparison.Ordinal);
        // A known template name, or a cross-hole request (answered with the out-of-scope message), but not a file path.
        return ProfileTemplates.IsSpec(source)
            || (colon > 1 && source[..colon].Trim().StartsWith("cross", StringComparison.OrdinalIgnoreCase) && !File.Exists(source));
    }

    /// <inheritdoc />
    public Profile Load(string source, ProfileSourceOptions options)
    {
        ArgumentNullException.ThrowIfNull(options);
        return ProfileTemplates.Create(source, options.Unit);
    }
}
