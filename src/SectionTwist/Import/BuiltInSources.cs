namespace SectionTwist.Import;

/// <summary>The profile sources that ship with the library, lowest precedence first.</summary>
internal static class BuiltInSources
{
    public static IEnumerable<IProfileSource> Create() => [new PointListSource(), new Profiles.TemplateSource(), new Dxf.DxfSource()];
}
