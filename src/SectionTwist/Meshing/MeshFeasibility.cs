using System.Globalization;
using SectionTwist.Geometry;
using SectionTwist.Limits;

namespace SectionTwist.Meshing;

/// <summary>
/// What the mesher can resolve, checked before it starts: the section's size must lie within
/// [<see cref="InputLimits.MinSectionSize"/>, <see cref="InputLimits.MaxSectionSize"/>] metres (J grows with the fourth
/// power of the size: outside this range it under- or overflows double precision), and no part may be thinner than
/// 10^-<see cref="InputLimits.MaxFeatureSpanDecades"/> of the section size. The thickness of a region is its mean
/// width 2 A / P (area over perimeter, holes included): exact for a thin strip or ring, the radius for a disc. A stray
/// ELLIPSE with an enormous or tiny axis, or a profile scaled by a wrong unit, is refused here with a message instead of
/// an endless refinement.
/// </summary>
internal static class MeshFeasibility
{
    public static void Check(Profile profile)
    {
        var b = profile.Bounds;
        double w = b.Width, h = b.Height;
        double size = Math.Max(w, h);
        if (!double.IsFinite(size) || size > InputLimits.MaxSectionSize || size < InputLimits.MinSectionSize)
            throw new SectionTwistException("bad-scale",
                $"{profile.Name}: the section is {G(size)} m across; SectionTwist analyses sections from {G(InputLimits.MinSectionSize)} m to {G(InputLimits.MaxSectionSize)} m across - check the length unit (--unit) and stray entities far from the outline");
        double floor = size * Math.Pow(10, -InputLimits.MaxFeatureSpanDecades);
        foreach (var region in profile.Regions)
        {
            double area = Math.Abs(region.Outer.SignedArea) - region.Holes.Sum(l => Math.Abs(l.SignedArea));
            double perimeter = region.Loops.Sum(l => l.Perimeter);
            double thickness = perimeter > 0 ? 2 * Math.Max(area, 0) / perimeter : 0;
            if (!(thickness >= floor))
            {
                var at = region.Outer.Segments[0].Start;
                var u = profile.Unit;
                throw new SectionTwistException("feature-too-small",
                    $"{profile.Name}: the part near ({Units.LengthUnit.Inv(u.FromMetres(at.X))}, {Units.LengthUnit.Inv(u.FromMetres(at.Y))}) {u.Symbol} is about {G(u.FromMetres(thickness))} {u.Symbol} thick, " +
                    $"less than 1e-{InputLimits.MaxFeatureSpanDecades:0} of the section's {G(u.FromMetres(size))} {u.Symbol}; the mesh cannot resolve both - remove the stray entity or sliver, or pick the part you mean (--part N, --layer NAME)");
            }
        }
    }

    /// <summary>
    /// Elements a mesh of edge length <paramref name="h"/> needs, at least: the area term A / (h^2 sqrt(3) / 4) plus, for
    /// parts thinner than h, about two elements across the mean thickness along the whole perimeter (A / t^2 = P^2 / 4 A).
    /// </summary>
    public static double EstimateElements(Profile profile, double h)
    {
        double total = 0;
        foreach (var region in profile.Regions)
        {
            double area = Math.Abs(region.Outer.SignedArea) - region.Holes.Sum(l => Math.Abs(l.SignedArea));
            double perimeter = region.Loops.Sum(l => l.Perimeter);
            if (!(area > 0)) continue;
            // every boundary piece shorter than h grades the mesh around it: a few elements per piece at least
            int pieces = region.Loops.Sum(l => l.Segments.Count);
            total += area / (h * h * 0.433) + 2 * perimeter * perimeter / (4 * area) + 4 * perimeter / h + 4 * pieces;
        }
        return total;
    }

    private static string G(double v) => v.ToString("G3", CultureInfo.InvariantCulture);
}
