namespace SectionTwist.Geometry;

/// <summary>
/// A caution that a profile source attaches to the outline it built, e.g. a template default quoted from memory of a
/// standard. Every analysis of the profile repeats it among its own warnings.
/// </summary>
/// <param name="Code">Stable short code, e.g. <c>default-from-memory</c>.</param>
/// <param name="Message">One-line explanation with the remedy.</param>
public sealed record ProfileWarning(string Code, string Message);
