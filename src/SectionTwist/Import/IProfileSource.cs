using SectionTwist.Geometry;
using SectionTwist.Units;

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

/// <summary>Options passed to a profile source.</summary>
public sealed record ProfileSourceOptions
{
    /// <summary>Length unit of the input (overrides the file's own unit; default unit for specs). Null: the source's default.</summary>
    public LengthUnit? Unit { get; init; }

    /// <summary>Take only the entities on this layer (drawings).</summary>
    public string? Layer { get; init; }

    /// <summary>Take only part N (1-based) when the drawing holds several separate parts.</summary>
    public int? Part { get; init; }

    /// <summary>Requested relative accuracy; sources that flatten curves tie their chord tolerance to it.</summary>
    public double Accuracy { get; init; } = 1e-4;

    /// <summary>Relative snap tolerance for joining segment ends (fraction of the part size). Null: the source's default.</summary>
    public double? SnapTolerance { get; init; }

    /// <summary>Receives non-fatal notes (skipped entities, gaps closed).</summary>
    public Action<string>? Notes { get; init; }
}
