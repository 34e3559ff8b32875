using SectionTwist.Geometry;

namespace SectionTwist.Import;

/// <summary>
/// A geometry source that turns a file or a spec string into a <see cref="Profile"/>. Sources are chosen by file
/// extension (e.g. <c>.dxf</c>) or by spec prefix (e.g. <c>keyed:</c>). Register your own with
/// <see cref="ProfileSources.Register"/> or drop an assembly with a public implementation into a plugins folder
/// (<see cref="ProfileSources.LoadPlugins"/>).
/// </summary>
public interface IProfileSource
{
    /// <summary>A short name for lists and messages, e.g. <c>dxf</c>.</summary>
    string Name { get; }

    /// <summary>File extensions this source reads, with the dot, lower case (e.g. <c>.dxf</c>); empty for spec sources.</summary>
    IReadOnlyList<string> Extensions { get; }

    /// <summary>True when <paramref name="source"/> (a path or a spec) is for this source.</summary>
    bool CanLoad(string source);

    /// <summary>Loads the profile; throws <see cref="SectionTwistException"/> with a one-line message on bad input.</summary>
    Profile Load(string source, ProfileSourceOptions options);
}
