using SectionTwist.Geometry;

namespace SectionTwist.Torsion;

/// <summary>
/// Tells sharp re-entrant corners that are the facet corners of a curve drawn as a polygon (<see cref="FacetRuns"/>)
/// from real sharp corners: the remedy differs (fit arcs or export true arcs, rather than model a fillet radius).
/// </summary>
internal static class FacetWarnings
{
    /// <summary>
    /// Splits <paramref name="sharp"/> into real corners and one warning per concave facet run holding some of them.
    /// </summary>
    public static (List<CornerAnalysis.Corner> Real, List<AnalysisWarning> Facets) Split(Profile profile, List<CornerAnalysis.Corner> sharp, Func<Point2, string> show)
    {
        var facets = new List<AnalysisWarning>();
        if (sharp.Count == 0) return (sharp, facets);
        var inRun = new Dictionary<Point2, int>();
        var runs = new List<(FacetRun Run, int Sharp)>();
        foreach (var loop in profile.Loops)
        {
            var segs = loop.Segments;
            foreach (var run in FacetRuns.Find(loop))
            {
                if (!run.Concave) continue;
                int id = runs.Count;
                runs.Add((run, 0));
                for (int k = 1; k < run.Count || run.Cyclic && k <= run.Count; k++) inRun[segs[(run.First + k) % segs.Count].Start] = id;
            }
        }
        var real = new List<CornerAnalysis.Corner>();
        foreach (var c in sharp)
        {
            if (inRun.TryGetValue(c.Where, out int id)) runs[id] = (runs[id].Run, runs[id].Sharp + 1);
            else real.Add(c);
        }
        foreach (var (run, n) in runs)
            if (n > 0)
                facets.Add(new AnalysisWarning("faceted-curve",
                    $"curve drawn as {run.Count} facets near {show(run.Middle)}: its {n} facet corner(s) are re-entrant, so the peak shear depends on the facets " +
                    "and grows with refinement; export true arcs, or fit arcs through the facets (--fit-arcs on the command line, fitArcs in a shaft file)"));
        return (real, facets);
    }
}
