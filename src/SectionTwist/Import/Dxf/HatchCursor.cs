namespace SectionTwist.Import.Dxf;

/// <summary>Reads a HATCH entity's pairs in file order (its boundary data is order-dependent, unlike other entities).</summary>
internal sealed class HatchCursor(DxfEntity e, string file, string source)
{
    private int _i;

    /// <summary>The code of the next pair, or -1 at the end.</summary>
    public int PeekCode => _i < e.Pairs.Count ? e.Pairs[_i].Code : -1;

    /// <summary>The code of the pair after the next one, or -1.</summary>
    public int PeekAfter => _i + 1 < e.Pairs.Count ? e.Pairs[_i + 1].Code : -1;

    /// <summary>Moves to the first pair with <paramref name="code"/>; false when there is none.</summary>
    public bool Seek(int code)
    {
        while (_i < e.Pairs.Count && e.Pairs[_i].Code != code) _i++;
        return _i < e.Pairs.Count;
    }

    public void Skip() => _i++;

    /// <summary>The next pair, which must carry <paramref name="code"/>.</summary>
    private DxfPair Take(int code)
    {
        if (_i >= e.Pairs.Count) throw Bad($"the boundary data ends where group code {code} was expected");
        var p = e.Pairs[_i];
        if (p.Code != code) throw Bad($"group code {p.Code} at line {p.Line} where {code} was expected");
        _i++;
        return p;
    }

    public int Int(int code) => Take(code).AsInt(file);

    public double Dbl(int code) => Take(code).AsDouble(file);

    public SectionTwistException Bad(string what) =>
        new("bad-hatch", $"{file}: {source}: cannot read the hatch boundary ({what}); use the outline entities instead (leave out the hatch option)");
}
