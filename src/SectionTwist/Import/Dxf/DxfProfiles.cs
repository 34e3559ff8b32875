using SectionTwist.Geometry;

namespace SectionTwist.Import.Dxf;

/// <summary>
/// Reads cross-section outlines from DXF drawings (ASCII R12 to current, and binary DXF) and writes profiles back to DXF.
/// Lines, arcs, circles, polylines with bulges, splines, ellipses and block inserts become closed loops; arcs stay exact.
/// </summary>
public static class DxfProfiles
{
    /// <summary>Reads a profile from a DXF file. Throws <see cref="SectionTwistException"/> with a one-line message on bad input.</summary>
    /// <param name="path">The drawing file.</param>
    /// <param name="options">Unit override, layer, part, tolerances.</param>
    /// <param name="cancellationToken">Stops reading a large drawing.</param>
    public static DxfImport Read(string path, DxfReadOptions? options = null, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(path);
        return Read(ReadBytes(path, cancellationToken), Path.GetFileName(path), options, cancellationToken);
    }

    /// <summary>Reads a profile from a stream holding a DXF file; <paramref name="name"/> is used in messages.</summary>
    /// <param name="stream">The drawing.</param>
    /// <param name="name">Name used in messages.</param>
    /// <param name="options">Unit override, layer, part, tolerances.</param>
    /// <param name="cancellationToken">Stops reading a large drawing.</param>
    public static DxfImport Read(Stream stream, string name, DxfReadOptions? options = null, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(stream);
        return Read(ReadBytes(stream, name), name, options, cancellationToken);
    }

    /// <summary>Reads a profile from the bytes of a DXF file; <paramref name="name"/> is used in messages.</summary>
    /// <param name="data">The bytes of the drawing.</param>
    /// <param name="name">Name used in messages.</param>
    /// <param name="options">Unit override, layer, part, tolerances.</param>
    /// <param name="cancellationToken">Stops reading a large drawing.</param>
    public static DxfImport Read(ReadOnlySpan<byte> data, string name, DxfReadOptions? options = null, CancellationToken cancellationToken = default)
    {
        var (report, profile) = Guard(name, data, options ?? new DxfReadOptions(), false, cancellationToken);
        return new DxfImport(profile!, report);
    }

    /// <summary>
    /// Reports what a drawing holds (layers, entity counts, units, loops, parts, gaps closed, skipped types) without
    /// requiring a unit; a problem that stops loop building is returned in <see cref="DxfImportReport.Problem"/>.
    /// </summary>
    /// <param name="path">The drawing file.</param>
    /// <param name="options">Unit override, layer, part, tolerances.</param>
    /// <param name="cancellationToken">Stops reading a large drawing.</param>
    public static DxfImportReport Inspect(string path, DxfReadOptions? options = null, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(path);
        return Guard(Path.GetFileName(path), ReadBytes(path, cancellationToken), options ?? new DxfReadOptions(), true, cancellationToken).Report;
    }

    /// <summary>Writes a profile (and optional extra polylines) to a DXF file through a temporary file.</summary>
    public static void Write(Profile profile, string path, DxfWriteOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(profile);
        ArgumentNullException.ThrowIfNull(path);
        AtomicFile.Write(path, s => DxfWriter.Write(profile, s, options ?? new DxfWriteOptions()));
    }

    /// <summary>Writes a profile (and optional extra polylines) as DXF to a stream.</summary>
    public static void Write(Profile profile, Stream stream, DxfWriteOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(profile);
        ArgumentNullException.ThrowIfNull(stream);
        DxfWriter.Write(profile, stream, options ?? new DxfWriteOptions());
    }

    private static (DxfImportReport Report, Profile? Profile) Guard(string name, ReadOnlySpan<byte> data, DxfReadOptions o, bool inspect, CancellationToken ct)
    {
        try
        {
            return DxfReader.Read(data, name, o, inspect, ct);
        }
        catch (Exception e) when (e is not SectionTwistException and not OperationCanceledException and not OutOfMemoryException and not InsufficientExecutionStackException)
        {
            // A safety net: damaged files must give a one-line message, never a stack trace. Tests assert it is never hit.
            throw new SectionTwistException("dxf-internal",
                $"{name}: the drawing could not be read ({e.GetType().Name}: {e.Message}); re-save it as DXF and report the file if it persists", e);
        }
    }

    private static byte[] ReadBytes(string path, CancellationToken ct) =>
        Limits.InputFile.ReadAllBytes(path, DxfTokenizer.MaxBytes, "DXF drawing", ct);

    private static byte[] ReadBytes(Stream s, string name)
    {
        using var ms = new MemoryStream();
        var buf = new byte[81920];
        int n;
        while ((n = s.Read(buf, 0, buf.Length)) > 0)
        {
            ms.Write(buf, 0, n);
            if (ms.Length > DxfTokenizer.MaxBytes)
                throw new SectionTwistException("dxf-too-large", $"{name}: larger than the {DxfTokenizer.MaxBytes >> 20} MB limit; export only the section outline");
        }
        return ms.ToArray();
    }
}
