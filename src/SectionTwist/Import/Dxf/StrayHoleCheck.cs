using SectionTwist.Geometry;
using SectionTwist.Units;

namespace SectionTwist.Import.Dxf;

/// <summary>
/// A hole drawn outside its outline must not silently become a second solid part: when a drawing falls apart into
/// several parts and no part was picked, a part whose outline lies on a layer that otherwise carries holes (or whose
/// layer is named for holes or bores) is refused with its layer and position, and the way to pick a part.
/// </summary>
internal static class StrayHoleCheck
{
    public static void Check(string file, IReadOnlyList<Region> regions, IReadOnlyList<Loop> loops, IReadOnlyList<string[]> loopLayers, LengthUnit unit)
    {
        if (regions.Count < 2) return;
        string[] LayersOf(Loop l)
        {
            for (int i = 0; i < loops.Count; i++)
                if (loops[i].Segments.Count == l.Segments.Count && loops[i].Bounds == l.Bounds) return loopLayers[i];
            return [];
        }
        var holeLayers = new HashSet<string>(regions.SelectMany(r => r.Holes).SelectMany(LayersOf), StringComparer.OrdinalIgnoreCase);
        var outerLayers = regions.Select(r => LayersOf(r.Outer)).ToList();
        for (int k = 1; k < regions.Count; k++)
        {
            var own = outerLayers[k];
            if (own.Length == 0) continue;
            bool carriesHoles = own.All(holeLayers.Contains);
            bool namedHole = own.All(l => l.Contains("HOLE", StringComparison.OrdinalIgnoreCase) || l.Contains("BORE", StringComparison.OrdinalIgnoreCase));
            bool sharesWithSolid = outerLayers.Where((_, i) => i != k).Any(o => o.Intersect(own, StringComparer.OrdinalIgnoreCase).Any());
            if (!(carriesHoles || namedHole) || (sharesWithSolid && !namedHole)) continue;
            var at = regions[k].Outer.Bounds;
            string where = $"({LengthUnit.Inv(0.5 * (at.MinX + at.MaxX))}, {LengthUnit.Inv(0.5 * (at.MinY + at.MaxY))})";
            throw new SectionTwistException("dxf-stray-hole",
                $"{file}: the loop on layer '{string.Join("', '", own)}' centred at {where} {unit.Symbol} lies outside every outline, so it would count as a separate solid part " +
                $"(part {k + 1} of {regions.Count}); move the hole inside its outline, or pick the part you mean with --part N (largest first; 'part:' in a shaft file)");
        }
    }
}
