namespace SectionTwist;

/// <summary>Writes an output file through a temporary name in the same folder, then moves it into place.</summary>
internal static class AtomicFile
{
    public static void Write(string path, Action<Stream> write)
    {
        string full = Path.GetFullPath(path);
        string dir = Path.GetDirectoryName(full) ?? ".";
        Directory.CreateDirectory(dir);
        string tmp = Path.Combine(dir, $".{Path.GetFileName(full)}.{Environment.ProcessId}.tmp");
        try
        {
            using (var fs = new FileStream(tmp, FileMode.Create, FileAccess.Write, FileShare.None)) write(fs);
            File.Move(tmp, full, overwrite: true);
        }
        finally
        {
            if (File.Exists(tmp)) File.Delete(tmp);
        }
    }

    public static void WriteText(string path, string text) =>
        Write(path, s => { using var w = new StreamWriter(s, new System.Text.UTF8Encoding(false)); w.Write(text); });
}
