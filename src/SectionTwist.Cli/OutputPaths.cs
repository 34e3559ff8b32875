namespace SectionTwist.Cli;

/// <summary>
/// Checks output locations before the work starts, so a bad path fails at once with a one-line message naming the option
/// and the remedy, not after the analysis (and not with a stack trace).
/// </summary>
internal static class OutputPaths
{
    /// <summary>Creates <paramref name="folder"/> when missing and checks that a file can be written there.</summary>
    /// <param name="folder">The folder.</param>
    /// <param name="option">The option that named it, for the message (e.g. <c>--out</c>).</param>
    public static void PrepareFolder(string folder, string option)
    {
        if (string.IsNullOrWhiteSpace(folder)) throw new SectionTwistException("bad-output", $"{option}: the folder name is empty; give a folder, e.g. '{option} results'");
        if (File.Exists(folder))
            throw new SectionTwistException("bad-output", $"{option} {folder}: a file of that name exists, not a folder; give a folder path");
        string probe = Path.Combine(folder, $".sectiontwist-probe-{Environment.ProcessId}");
        try
        {
            Directory.CreateDirectory(folder);
            File.WriteAllBytes(probe, []);
            File.Delete(probe);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or NotSupportedException or ArgumentException)
        {
            throw new SectionTwistException("bad-output", $"{option} {folder}: cannot write there ({OneLine(e.Message)}); give a writable folder");
        }
    }

    /// <summary>Checks that <paramref name="file"/> is not a folder and that its folder can be written (creating it when missing).</summary>
    public static void CheckFile(string file, string option)
    {
        if (string.IsNullOrWhiteSpace(file)) throw new SectionTwistException("bad-output", $"{option}: the file name is empty");
        if (Directory.Exists(file))
            throw new SectionTwistException("bad-output", $"{option} {file}: that is a folder; give a file name, e.g. '{Path.Combine(file, "report.html")}'");
        string dir = Path.GetDirectoryName(Path.GetFullPath(file)) ?? ".";
        PrepareFolder(dir, option);
    }

    private static string OneLine(string s) => s.ReplaceLineEndings(" ").Trim().TrimEnd('.');
}
