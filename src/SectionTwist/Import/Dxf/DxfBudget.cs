using SectionTwist.Limits;

namespace SectionTwist.Import.Dxf;

/// <summary>
/// Counts, before any geometry is built, how many outline pieces the model space expands to: a polyline counts its
/// vertices, an INSERT its columns x rows x the pieces of its block (recursively, each block counted once, saturating),
/// so huge arrays, deep nesting and many copies of a many-vertex block are refused at once with the INSERT named,
/// instead of after minutes of expansion (<see cref="InputLimits.MaxDxfPieces"/>, <see cref="InputLimits.MaxDxfBlockDepth"/>).
/// </summary>
internal static class DxfBudget
{
    private const long Saturated = long.MaxValue / 4;

    public static void Check(DxfDocument doc, CancellationToken ct)
    {
        int entities = doc.Entities.Count + doc.Blocks.Values.Sum(b => b.Entities.Count);
        if (entities > InputLimits.MaxDxfEntities)
            throw new SectionTwistException("dxf-too-large",
                $"{doc.File}: {entities} entities, more than the {InputLimits.MaxDxfEntities} SectionTwist reads; export only the section outline");
        var memo = new Dictionary<string, long>(StringComparer.OrdinalIgnoreCase);
        var open = new HashSet<string>(StringComparer.OrdinalIgnoreCase);
        long total = 0;
        DxfEntity? biggest = null;
        long biggestCount = 0;
        foreach (var e in doc.Entities)
        {
            if (e.PaperSpace) continue;
            long n = Pieces(doc, e, memo, open, 0, ct);
            if (n > biggestCount) { biggestCount = n; biggest = e; }
            total = Add(total, n);
            if (total > InputLimits.MaxDxfPieces) break;
        }
        if (total > InputLimits.MaxDxfPieces)
            throw new SectionTwistException("dxf-too-large",
                $"{doc.File}: the drawing expands to {(total >= Saturated ? "an astronomical number of" : $"{total}")} outline pieces, more than the {InputLimits.MaxDxfPieces} SectionTwist reads " +
                $"(largest: {biggest?.Describe() ?? "?"}{(biggest?.Type == "INSERT" ? $" of block '{biggest.Str(2)}'" : "")} with {(biggestCount >= Saturated ? "too many" : biggestCount.ToString(System.Globalization.CultureInfo.InvariantCulture))}); " +
                "explode or delete the block arrays in CAD, or export only the section outline");
    }

    private static long Pieces(DxfDocument doc, DxfEntity e, Dictionary<string, long> memo, HashSet<string> open, int depth, CancellationToken ct)
    {
        switch (e.Type)
        {
            case "LWPOLYLINE": return Math.Max(1, e.Pairs.Count(p => p.Code == 10));
            case "POLYLINE": return Math.Max(1, e.Vertices.Count);
            case "INSERT":
                {
                    string name = e.Str(2) ?? "";
                    if (!doc.Blocks.TryGetValue(name, out var block)) return 0;
                    if (depth >= InputLimits.MaxDxfBlockDepth)
                        throw new SectionTwistException("dxf-block-depth", $"{doc.File}: blocks nest deeper than {InputLimits.MaxDxfBlockDepth} levels at {e.Describe()}; explode the blocks in CAD");
                    long per;
                    if (memo.TryGetValue(name, out long known)) per = known;
                    else
                    {
                        // a cycle is reported with its path by the geometry builder; count it as nothing here
                        if (!open.Add(name)) return 0;
                        ct.ThrowIfCancellationRequested();
                        per = 0;
                        foreach (var be in block.Entities)
                        {
                            per = Add(per, Pieces(doc, be, memo, open, depth + 1, ct));
                            if (per >= Saturated) break;
                        }
                        open.Remove(name);
                        memo[name] = per;
                    }
                    long copies = (long)Math.Max(1, e.Int(70, 1)) * Math.Max(1, e.Int(71, 1));
                    return Mul(copies, Math.Max(1, per));
                }
            default: return 1;
        }
    }

    private static long Add(long a, long b) => a >= Saturated - b ? Saturated : a + b;

    private static long Mul(long a, long b) => a == 0 || b == 0 ? 0 : a > Saturated / b ? Saturated : a * b;
}
