using SectionTwist.Geometry;
using SectionTwist.Meshing;
using SectionTwist.Torsion;

namespace SectionTwist.Plastic;

/// <summary>
/// The stateful analysis behind <see cref="PlasticAnalyzer"/>; <see cref="Compute"/> runs once and caches. One mesh of
/// the profile and its uniform refinement: the fully plastic torque (<see cref="FullyPlasticTorque"/>) and every
/// curve point (<see cref="ElasticPlasticProblem"/>) are computed on both; the finer value is reported and the whole
/// change between the two is the error estimate (for a convergence rate of 2, measured on the closed-form cases, this
/// is about three times the error of the finer value).
/// </summary>
internal sealed class PlasticAnalysis(SectionResult elastic, double yieldShear, PlasticOptions options, CancellationToken ct)
{
    private PlasticResult? _result;

    public PlasticResult Compute() => _result ??= Run();

    private PlasticResult Run()
    {
        var profile = elastic.Profile;
        int maxElements = PlasticLimits.Check(profile, yieldShear, options);
        var warnings = new List<AnalysisWarning>();
        if (elastic.Warnings.Any(w => w.Code == "sharp-reentrant-corner"))
            warnings.Add(new AnalysisWarning("first-yield-at-corner",
                "a sharp re-entrant corner yields at any torque in theory (the elastic peak shear is singular there): the first-yield torque and the shape factor depend on the mesh; model the real fillet radius"));
        double acc = Math.Clamp(options.Accuracy, 1e-5, 0.1);
        double h = Math.Min(0.5 * Math.Sqrt(profile.Properties.Area) * Math.Pow(acc, 0.25), profile.Bounds.Diagonal / 8);
        var loopArea = profile.Regions.SelectMany(r => r.Loops).Select(l => Math.Abs(l.SignedArea)).ToArray();
        Mesh coarse;
        try { coarse = Mesher.Generate(profile, new MeshOptions { MaxEdgeLength = h, MaxArcAngleDegrees = 10, MaxTriangles = maxElements }, ct); }
        catch (SectionTwistException e) when (e.Code == "mesh-too-large") { throw PlasticLimits.TooLarge(profile, acc, maxElements, options); }
        if (coarse.ElementCount > maxElements) throw PlasticLimits.TooLarge(profile, acc, maxElements, options);
        bool refine = 4L * coarse.ElementCount <= maxElements;
        if (!refine)
            warnings.Add(new AnalysisWarning("accuracy-not-reached", $"the element limit ({maxElements}, from the element limit and the memory budget) allowed one mesh only; the plastic results carry no error estimate"));
        var fine = refine ? MeshRefinement.Uniform(coarse) : coarse;

        var (tpCoarse, _) = FullyPlasticTorque.Compute(coarse, loopArea, ct);
        var (tpFine, _) = refine ? FullyPlasticTorque.Compute(fine, loopArea, ct) : (tpCoarse, Array.Empty<double>());
        double tpError = refine ? Math.Abs(tpFine - tpCoarse) / tpFine : double.NaN;

        double ty = yieldShear / elastic.MaxShearPerTorque;
        // G theta / tau_y at first yield: the unit-twist stress function has peak slope MaxShearPerTorque * J.
        double lambdaY = 1 / (elastic.MaxShearPerTorque * elastic.TorsionConstant);
        var ratios = options.TwistRatios.Distinct().Order().ToArray();
        var pc = new ElasticPlasticProblem(coarse, loopArea, ct);
        var pf = refine ? new ElasticPlasticProblem(fine, loopArea, ct) : pc;
        // tolerance of the hole-constant search, with room for the obstacle solve's own
        double holeFloor = pf.HoleConstants.Length > 0 ? 100 * ElasticPlasticProblem.HoleTolerance : 0;
        var curve = new List<TorqueTwistPoint>();
        var yielded = new List<IReadOnlyList<bool>>();
        double worstKkt = 0, fraction = 0;
        bool[]? union = null;
        foreach (double r in ratios)
        {
            ct.ThrowIfCancellationRequested();
            var sc = pc.Solve(r * lambdaY, ct);
            var sf = refine ? pf.Solve(r * lambdaY, ct) : sc;
            worstKkt = Math.Max(worstKkt, Math.Max(sc.Outcome.KktResidual, sf.Outcome.KktResidual));
            double t = yieldShear * sf.TorquePerYield;
            double est = refine ? Math.Abs(sf.TorquePerYield - sc.TorquePerYield) / sf.TorquePerYield + holeFloor : double.NaN;
            // the plastic zone only grows with the twist (docs/theory.md): the classification's noise at the border of an
            // element does not make it shrink from one level to the next
            // up to the first-yield twist the section is elastic: yield has begun at a point at most, an area of zero
            // (the 0.5 % band of the classification would otherwise count a thin ring of a round bar as yielded)
            bool elastic = r <= 1 + 1e-12;
            var now = elastic ? new bool[sf.Yielded.Length] : sf.Yielded;
            fraction = elastic ? fraction : Math.Max(fraction, sf.PlasticFraction);
            union = union is null ? (bool[])now.Clone() : union.Zip(now, (a, b) => a || b).ToArray();
            curve.Add(new TorqueTwistPoint(r, t, t / ty, fraction, est));
            yielded.Add(Array.AsReadOnly((bool[])union.Clone()));
        }
        if (worstKkt > 1e-8)
            warnings.Add(new AnalysisWarning("obstacle-not-converged",
                $"the elastic-plastic solve stopped with an optimality residual of {worstKkt:G2}; treat the curve as approximate"));
        return new PlasticResult
        {
            Elastic = elastic,
            YieldShear = yieldShear,
            FirstYieldTorque = ty,
            FullyPlasticTorque = yieldShear * tpFine,
            FullyPlasticTorqueError = tpError,
            Curve = curve.AsReadOnly(),
            Field = BuildField(fine, yielded),
            Warnings = warnings.AsReadOnly(),
        };
    }

    private static PlasticField BuildField(Mesh mesh, List<IReadOnlyList<bool>> yielded)
    {
        var tris = new int[mesh.ElementCount * 12];
        for (int e = 0; e < mesh.ElementCount; e++)
        {
            var el = mesh.Elements.AsSpan(6 * e, 6);
            int[] sub = [el[0], el[3], el[5], el[3], el[1], el[4], el[5], el[4], el[2], el[3], el[4], el[5]];
            sub.CopyTo(tris, 12 * e);
        }
        var boundaries = mesh.Loops.Select(l =>
            (IReadOnlyList<Point2>)l.Geometry.Flatten(1e-4 * Math.Max(l.Geometry.Bounds.Diagonal, 1e-300))).ToList();
        return new PlasticField((double[])mesh.X.Clone(), (double[])mesh.Y.Clone(), tris, boundaries, yielded.AsReadOnly(),
            mesh.NodeLoop.Select(l => l < 0).ToArray());
    }
}
