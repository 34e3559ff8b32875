namespace SectionTwist.Limits;

/// <summary>
/// Reads an input file with a size limit, refusing devices and endless streams (a path that links to /dev/zero) after
/// one byte, and observing cancellation between chunks. Messages name the file and never echo its content.
/// </summary>
internal static class InputFile
{
    public static byte[] ReadAllBytes(string path, long maxBytes, string what, CancellationToken ct = default)
    {
        var fi = new FileInfo(path);
        if (Directory.Exists(path)) throw new SectionTwistException("file-not-found", $"{path}: is a folder, not a {what}; give the file's path");
        if (!fi.Exists) throw new SectionTwistException("file-not-found", FileHints.Missing(path, what) + "; check the path and the file name");
        using var fs = new FileStream(path, FileMode.Open, FileAccess.Read, FileShare.Read, 1, FileOptions.SequentialScan);
        long declared = fs.CanSeek ? fs.Length : -1;
        if (declared > maxBytes) throw TooLarge(path, declared, maxBytes, what);
        // A regular file yields exactly its declared length; a device or pipe declares 0 (or nothing) and yields more.
        long cap = declared >= 0 ? declared : maxBytes;
        var buffer = new byte[Math.Min(cap, maxBytes) + 1];
        int read = 0;
        while (true)
        {
            ct.ThrowIfCancellationRequested();
            int n = fs.Read(buffer, read, (int)Math.Min(buffer.Length - read, 1 << 20));
            if (n <= 0) break;
            read += n;
            if (read == buffer.Length)
            {
                if (declared >= 0)
                    throw new SectionTwistException("not-a-file",
                        $"{path}: is not a regular file (a device or a growing stream: it gives more than its declared {declared} bytes); save the {what} to a file and give that path");
                throw TooLarge(path, read, maxBytes, what);
            }
        }
        return read == buffer.Length ? buffer : buffer.AsSpan(0, read).ToArray();
    }

    public static string ReadAllText(string path, long maxBytes, string what, CancellationToken ct = default)
    {
        var bytes = ReadAllBytes(path, maxBytes, what, ct);
        using var reader = new StreamReader(new MemoryStream(bytes), detectEncodingFromByteOrderMarks: true);
        return reader.ReadToEnd();
    }

    private static SectionTwistException TooLarge(string path, long size, long max, string what) =>
        new("file-too-large", $"{path}: {Mb(size)} is larger than the {Mb(max)} limit for a {what}; give only the part that is needed");

    internal static string Mb(long bytes) => bytes >= 1 << 20 ? $"{bytes / (double)(1 << 20):0.#} MB" : $"{bytes / 1024.0:0.#} kB";
}
