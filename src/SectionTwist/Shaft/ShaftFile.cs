namespace SectionTwist.Shaft;

/// <summary>
/// Reads a shaft description file (YAML, schema in docs/shaft-file.md) into a <see cref="ShaftModel"/>. Errors name the
/// file, line, column and key and say how to fix them (<see cref="SectionTwistException"/>, code <c>shaft-file</c>).
/// </summary>
public static class ShaftFile
{
    /// <summary>Reads the file at <paramref name="path"/>.</summary>
    /// <param name="path">The shaft file.</param>
    /// <param name="resolver">Turns template and DXF sections into J and peak shear per unit torque; null when the host has no section analysis (then such sections are an error).</param>
    public static ShaftDocument Load(string path, Func<SectionSource, SectionStiffness>? resolver = null) => Read(path, resolver, requireDynamics: false);

    /// <summary>As <see cref="Load"/>; with <paramref name="requireDynamics"/> a file without a 'dynamics' block is refused before any section is analysed.</summary>
    internal static ShaftDocument Read(string path, Func<SectionSource, SectionStiffness>? resolver, bool requireDynamics)
    {
        ArgumentNullException.ThrowIfNull(path);
        string ext = Path.GetExtension(path);
        if (File.Exists(path) && new[] { ".dxf", ".csv", ".pts" }.Contains(ext, StringComparer.OrdinalIgnoreCase))
            throw new SectionTwistException("not-a-shaft-file",
                $"{Path.GetFileName(path)}: a drawing or point list ({ext}), not a shaft file; analyse the section with 'sectiontwist section {path}', or name it in a shaft file's 'sections:' (dxf: {Path.GetFileName(path)})");
        string text = Limits.InputFile.ReadAllText(path, Limits.InputLimits.MaxShaftFileBytes, "shaft file");
        string dir = Path.GetDirectoryName(Path.GetFullPath(path)) ?? ".";
        return new ShaftFileReader(Path.GetFileName(path), dir, resolver) { RequireDynamics = requireDynamics }.Read(path, text);
    }

    /// <summary>Reads shaft-file text.</summary>
    /// <param name="text">The YAML text.</param>
    /// <param name="fileName">Name used in messages.</param>
    /// <param name="baseDirectory">Folder that relative DXF paths are resolved against.</param>
    /// <param name="resolver">As for <see cref="Load"/>.</param>
    public static ShaftDocument Parse(string text, string fileName = "shaft.yaml", string? baseDirectory = null, Func<SectionSource, SectionStiffness>? resolver = null)
    {
        ArgumentNullException.ThrowIfNull(text);
        return new ShaftFileReader(fileName, baseDirectory ?? Directory.GetCurrentDirectory(), resolver).Read(fileName, text);
    }
}
