namespace SectionTwist;

/// <summary>One-line messages for input files that are not there: where the program looked and the nearest file name.</summary>
internal static class FileHints
{
    /// <summary>
    /// <c>'x.dxf': no such file (looked for /full/path/x.dxf) (did you mean 'y.dxf'?)</c>, or that the folder itself is
    /// missing. <paramref name="what"/> names the kind of file (e.g. <c>drawing</c>, <c>shaft file</c>).
    /// </summary>
    public static string Missing(string path, string what)
    {
        string full = Path.GetFullPath(path);
        string? dir = Path.GetDirectoryName(full);
        if (dir is not null && !Directory.Exists(dir))
            return $"'{path}': no such {what}: the folder {dir} does not exist";
        string hint = "";
        if (dir is not null)
        {
            try
            {
                var names = Directory.EnumerateFiles(dir).Select(Path.GetFileName).OfType<string>().Take(2000).ToList();
                if (Suggest.Nearest(Path.GetFileName(full), names) is { } near) hint = $" (did you mean '{Path.Combine(Path.GetDirectoryName(path) ?? "", near)}'?)";
            }
            catch (Exception e) when (e is IOException or UnauthorizedAccessException) { }
        }
        return $"'{path}': no such {what} (looked for {full}){hint}";
    }
}
