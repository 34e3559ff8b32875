namespace SectionTwist.Import.Dxf;

/// <summary>The parsed content of a DXF file that matters for outlines: header, layers, blocks, model-space entities.</summary>
internal sealed class DxfDocument(string file, string format)
{
    public string File { get; } = file;
    /// <summary>"ASCII" or "binary".</summary>
    public string Format { get; } = format;
    /// <summary>Header variables by name (with the $), each with its value pairs.</summary>
    public Dictionary<string, List<DxfPair>> Header { get; } = new(StringComparer.OrdinalIgnoreCase);
    /// <summary>Layer names from the LAYER table, in file order.</summary>
    public List<string> Layers { get; } = [];
    public Dictionary<string, DxfBlock> Blocks { get; } = new(StringComparer.OrdinalIgnoreCase);
    public List<DxfEntity> Entities { get; } = [];
    public List<string> Warnings { get; } = [];

    public string? HeaderString(string name) =>
        Header.TryGetValue(name, out var v) && v.Count > 0 ? v[0].Value : null;

    public int? HeaderInt(string name)
    {
        if (!Header.TryGetValue(name, out var v) || v.Count == 0) return null;
        return v[0].AsInt(File);
    }
}
