namespace SectionTwist.Tests.Rendering;

/// <summary>Writes rendered files for a person to look at when SECTIONTWIST_RENDER_DUMP names a folder (off by default).</summary>
internal static class Dump
{
    public static void Write(string name, byte[] bytes)
    {
        string? dir = Environment.GetEnvironmentVariable("SECTIONTWIST_RENDER_DUMP");
        if (string.IsNullOrEmpty(dir)) return;
        Directory.CreateDirectory(dir);
        File.WriteAllBytes(Path.Combine(dir, name), bytes);
    }
}
