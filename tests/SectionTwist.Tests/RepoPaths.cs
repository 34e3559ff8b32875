namespace SectionTwist.Tests;

/// <summary>Locates the repository root (the folder holding SectionTwist.sln) from the test binaries.</summary>
internal static class RepoPaths
{
    public static string Root { get; } = Find();

    public static string SampleProfiles => Path.Combine(Root, "sample-profiles");

    private static string Find()
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "SectionTwist.sln"))) dir = dir.Parent;
        return dir?.FullName ?? throw new InvalidOperationException("SectionTwist.sln not found above " + AppContext.BaseDirectory);
    }
}
