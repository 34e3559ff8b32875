using SectionTwist.Geometry;
using SectionTwist.Units;

namespace SectionTwist.Import;

/// <summary>
/// Curves drawn as facets in a profile from a point list: named in a note, or replaced by arcs through the facet
/// corners when <see cref="ProfileSourceOptions.FitArcs"/> is given (see <see cref="FacetRuns"/> and <see cref="FacetArcs"/>).
/// </summary>
internal static class FacetFit
{
    public static Profile Apply(Profile profile, ProfileSourceOptions o)
    {
        double size = profile.Bounds.Diagonal;
        if (o.FitArcs is { } rel)
        {
            if (!(rel > 0 && rel <= 0.01))
                throw new SectionTwistException("bad-option", $"{(o.ShaftFileKeys ? "fitArcs" : "--fit-arcs")} {rel} must lie in (0, 0.01] (a fraction of the part size, e.g. 1e-4)");
            int replaced = 0, arcs = 0;
            var regions = profile.Regions.Select(r => new Region(Fit(r.Outer), r.Holes.Select(Fit))).ToList();
            if (replaced == 0) return profile;
            o.Notes?.Invoke($"fitted {arcs} arc(s) through {replaced} facets (within {rel} of the part size)");
            return new Profile(regions, profile.Unit, profile.Name) { CurveTolerance = profile.CurveTolerance };

            Loop Fit(Loop l)
            {
                var f = FacetArcs.Fit(l, rel * size, out int n, out int a);
                replaced += n; arcs += a;
                return f;
            }
        }
        if (o.Notes is null) return profile;
        var u = profile.Unit;
        foreach (var loop in profile.Loops)
            foreach (var run in FacetRuns.Find(loop))
                o.Notes($"curve drawn as {run.Count} facets near ({Show(u, run.Middle.X)}, {Show(u, run.Middle.Y)}) {u.Symbol}: the results depend on the facets; " +
                        $"give true arcs ('arc, xm, ym, xe, ye' lines) or use {(o.ShaftFileKeys ? "'fitArcs: 1e-4'" : "--fit-arcs 1e-4")}");
        return profile;
    }

    private static string Show(LengthUnit u, double metres) => LengthUnit.Inv(u.FromMetres(metres));
}
