using SectionTwist.Geometry;
using SectionTwist.Meshing;

namespace SectionTwist.Torsion;

/// <summary>
/// The stateful analysis behind <see cref="SectionAnalyzer"/>; <see cref="Compute"/> runs once and caches.
/// Each pass meshes the profile, solves, splits every element into four and solves again; Richardson extrapolation
/// with the convergence order of each part of the section (<see cref="RichardsonEstimate"/>) gives J and its error,
/// which is reported times the safety factor <see cref="SafetyFactor"/>. Passes repeat with a smaller element size
/// until the estimate meets the requested accuracy.
/// </summary>
internal sealed class SectionAnalysis(Profile profile, AnalysisOptions options, CancellationToken ct, IProgress<AnalysisProgress>? progress)
{
    /// <summary>Assumed convergence order of the boundary peak shear (conservative; observed 2 to 4).</summary>
    private const double ShearOrder = 2;

    /// <summary>Resolution floor of the smoothed boundary peak (relative), measured on the verification cases.</summary>
    private const double ShearFloor = 1e-5;
    private const int MaxPasses = 6;

    /// <summary>Finest accuracy whose uniform first mesh is used on sections with a singular corner (see <see cref="Run"/>).</summary>
    private const double SingularStartAccuracy = 1e-6;

    /// <summary>
    /// Finest accuracy promised on a section with a singular corner, measured within the default 4 GB budget: a sharp
    /// keyseat (keyed:d=40,b=12,t1=5,r=0) reaches 1.4e-8 at 1e-7 and 1.6e-8 at 2e-8 but not 1e-8; a sharp 8-spline
    /// (iso14:8x36x42,r=0) reaches 7.9e-8 at 1e-7 and stops at 7.3e-8 when 2e-8 is asked.
    /// </summary>
    internal const double FinestSingularAccuracy = 1e-7;

    /// <summary>
    /// First-pass element size h = FirstMeshFactor(acc) sqrt(A) acc^(1/4) (the J error of 6-node elements falls as h^4 on
    /// smooth solutions). The factor is <see cref="DefaultMeshFactor"/> (0.6) down to the default accuracy 1e-4 and grows
    /// as (1e-4 / acc)^0.2 below it, up to <see cref="FineMeshFactor"/> (1.5) at 1e-6. Measured (docs/performance.md):
    /// at 1e-6 a factor of 0.6 met the accuracy 10 to 1000 times over on the first pass, 1.5 still meets it on the first
    /// pass for most sections with 4 to 9 times fewer elements and the estimates stay above the true errors; at the
    /// default accuracy a coarser first mesh (1.2 or 1.5) let the peak-shear estimate of the 2:1 ellipse fall below its
    /// true error and coarsened the shear away from the peak and the shear centre, so 0.6 is kept there.
    /// </summary>
    internal static double FirstMeshFactor(double accuracy) =>
        accuracy >= 1e-4 ? DefaultMeshFactor : Math.Min(FineMeshFactor, DefaultMeshFactor * Math.Pow(1e-4 / accuracy, 0.2));

    /// <summary>First-mesh factor at the default accuracy and coarser.</summary>
    internal const double DefaultMeshFactor = 0.6;

    /// <summary>Largest first-mesh factor (reached at 1e-6); settable only so the benchmarks can time the former value side by side.</summary>
    internal static double FineMeshFactor { get; set; } = 1.5;

    /// <summary>
    /// Factor on the Richardson error of J: the value Roache recommends for a grid-convergence estimate whose order is
    /// confirmed by three grids (Roache, "Perspective: a method for uniform reporting of grid refinement studies",
    /// J. Fluids Eng. 116, 1994; Verification and Validation, 1998, sec. 5.6); the orders used here are confirmed by
    /// three-mesh sequences (docs/verification.md).
    /// </summary>
    internal const double SafetyFactor = 1.25;

    private SectionResult? _result;

    public SectionResult Compute() => _result ??= Run();

    private SectionResult Run()
    {
        if (!(options.Accuracy >= AnalysisOptions.FinestAccuracy))
            throw new SectionTwistException("accuracy-out-of-range", string.Create(System.Globalization.CultureInfo.InvariantCulture,
                $"{profile.Name}: accuracy {options.Accuracy:G3} is finer than the finest available, {AnalysisOptions.FinestAccuracy:0E0} (double precision and the element limit); ask for {AnalysisOptions.FinestAccuracy:0E0} or coarser"));
        double acc = Math.Min(options.Accuracy, 0.1);
        double shearTarget = Math.Clamp(50 * acc, 1e-3, 5e-3);
        var props = profile.Properties;
        var warnings = profile.Warnings.Select(w => new AnalysisWarning(w.Code, w.Message)).ToList();
        var corners = CornerAnalysis.Corners(profile);
        double p = CornerAnalysis.LowestOrder(corners);
        RichardsonEstimate.Result? last = null;
        double warnAngle = options.ReentrantWarningAngleDeg * Math.PI / 180;
        var (sharp, facetWarnings) = FacetWarnings.Split(profile, corners.Where(c => c.InteriorAngle > warnAngle).ToList(), Show);
        warnings.AddRange(facetWarnings);
        foreach (var c in sharp.Take(5))
            warnings.Add(new AnalysisWarning("sharp-reentrant-corner",
                $"sharp re-entrant corner at {Show(c.Where)} (interior angle {c.InteriorAngle * 180 / Math.PI:F0} deg): the peak shear there is singular and grows with refinement; model the real fillet radius"));
        if (sharp.Count > 5)
            warnings.Add(new AnalysisWarning("sharp-reentrant-corner", $"{sharp.Count - 5} more sharp re-entrant corners; model the real fillet radii"));
        bool singular = sharp.Count > 0 || facetWarnings.Count > 0;
        if (singular && options.Accuracy < FinestSingularAccuracy)
            throw new SectionTwistException("accuracy-out-of-range", string.Create(System.Globalization.CultureInfo.InvariantCulture,
                $"{profile.Name}: accuracy {Units.NumberText.Exponent(options.Accuracy, 2)} is finer than the finest available on a section with a sharp re-entrant corner or a faceted curve, " +
                $"{Units.NumberText.Exponent(FinestSingularAccuracy, 1)} (the stress function is singular there and the graded meshes it needs outgrow the memory budget); " +
                $"ask for {Units.NumberText.Exponent(FinestSingularAccuracy, 1)} or coarser, or model the real fillet radius (r= on the keyseat and spline templates)"));

        var holeArea = profile.Regions.SelectMany(r => r.Loops).Select(l => Math.Abs(l.SignedArea)).ToArray();
        double size = Math.Sqrt(props.Area);
        // A singular corner caps the order of uniform refinement (J converges as h^(2 pi / w), 4/3 at 270 deg: Strang and
        // Fix, An Analysis of the Finite Element Method, ch. 8), so a first mesh sized for order 4 spends the budget on
        // elements far from the corner; below 1e-6 such sections start at the 1e-6 mesh and the graded passes do the rest.
        double hAccuracy = singular ? Math.Max(acc, SingularStartAccuracy) : acc;
        double h = Math.Min(FirstMeshFactor(hAccuracy) * size * Math.Pow(hAccuracy, 0.25), profile.Bounds.Diagonal / 8);
        MeshFeasibility.Check(profile);
        var budget = AnalysisBudget.For(profile, options, acc, h);
        TorsionSolution? coarse = null, fine = null;
        Mesh? coarseMesh = null;
        Func<Point2, double>? sizeField = null;
        double estJ = double.NaN, estT = double.NaN;
        // The warping solve shares each mesh's matrix and order: keep them when it will run (an open-looking section's
        // J is below half its polar moment already on the first mesh).
        bool share = options.Warping;
        Report("mesh", 0);
        for (int pass = 0; pass < MaxPasses; pass++)
        {
            ct.ThrowIfCancellationRequested();
            double f0 = (double)pass / MaxPasses, span = 1.0 / MaxPasses;
            // A refinement pass must leave room for its uniform refinement (4 times the elements): a size field that asks
            // for more is coarsened by the factor that fits (elements grow as 1/h^2) and the pass is meshed again, up to
            // three times, instead of ending refinement at the previous pair of meshes.
            int cap = options.EstimateError && pass > 0 ? budget.MaxElements / 4 : budget.MaxElements;
            Mesh? mesh = null;
            bool capped = false;
            for (int attempt = 0; mesh is null; attempt++)
            {
                ct.ThrowIfCancellationRequested();
                int? tooMany = null;
                try
                {
                    var m = Mesher.Generate(profile, new MeshOptions { MaxEdgeLength = h, MaxTriangles = cap, SizeField = sizeField, MaxArcAngleDegrees = ArcAngle(acc) }, ct);
                    if (m.ElementCount > cap) tooMany = m.ElementCount; else mesh = m;
                }
                catch (SectionTwistException e) when (e.Code == "mesh-too-large") { tooMany = -1; }
                if (mesh is not null) break;
                // the estimate before meshing is a lower bound; the mesh itself is the measure
                if (pass == 0) throw tooMany > 0 ? budget.Refusal(tooMany) : budget.Refusal();
                if (attempt == 3 || sizeField is null) break;
                double k = tooMany > 0 ? 1.05 * Math.Sqrt((double)tooMany.Value / cap) : 1.6;
                var asked = sizeField;
                sizeField = x => k * asked(x);
                capped = true;
            }
            if (mesh is null)
            {
                warnings.Add(new AnalysisWarning("accuracy-not-reached", $"{budget.Describe()} stopped refinement; results carry the error estimate of the last pass"));
                break;
            }
            if (pass == 0 && options.EstimateError && 4L * mesh.ElementCount > budget.MaxElements)
                // The first mesh cannot be refined within the budget: no error estimate is possible, so the accuracy
                // asked for cannot be promised; refuse it (naming the finest that fits) before any solve.
                throw budget.Refusal(mesh.ElementCount);
            coarseMesh = mesh;
            Report("solve", f0 + 0.2 * span);
            coarse = TorsionSolver.Solve(coarseMesh, holeArea, ct, SolverTolerance(acc), share, keepFactor: options.EstimateError);
            share |= options.WarpingIfOpen && coarse.J < 0.5 * props.PolarMoment;
            if (!options.EstimateError) { fine = coarse; break; }
            Report("refine", f0 + 0.4 * span);
            ct.ThrowIfCancellationRequested();
            var fineMesh = MeshRefinement.Uniform(coarseMesh);
            ct.ThrowIfCancellationRequested();
            fine = TorsionSolver.Solve(fineMesh, holeArea, ct, SolverTolerance(acc), share, parent: coarse);
            coarse.Factor = null;
            last = RichardsonEstimate.Compute(coarse, fine, corners, ct);
            p = last.EffectiveOrder;
            estJ = SafetyFactor * last.FineError / fine.J;
            double tc = coarse.MaxGradient / coarse.J, tf = fine.MaxGradient / fine.J;
            // The whole coarse-to-fine change (not divided by 2^q - 1, as if the order q were 1: the peak's order is
            // erratic between 1.5 and 5 on corners and kinks) times the safety factor, plus the resolution floor of the
            // boundary recovery: the smoothed peak carries a bias of order 1e-5 that does not show between two meshes.
            estT = SafetyFactor * Math.Abs(tf - tc) / tf + ShearFloor;
            // The estimate holds only once the peak is resolved on the coarse mesh (fillet edges of at most 15 deg).
            bool shearOk = singular || (estT <= shearTarget && AdaptiveSizing.PeakResolved(coarse));
            if (estJ <= acc && shearOk) break;
            if (capped && estJ > acc)
            {
                warnings.Add(new AnalysisWarning("accuracy-not-reached",
                    $"{budget.Describe()} limited the last refinement; J reached an estimated {Units.NumberText.Exponent(estJ, 2)} against the {Units.NumberText.Exponent(acc, 2)} asked"));
                break;
            }
            if (pass == MaxPasses - 1)
            {
                warnings.Add(new AnalysisWarning("accuracy-not-reached",
                    $"requested accuracy {acc:G2} not reached after {MaxPasses} passes (estimated {estJ:G2} for J); results carry the stated estimate"));
                break;
            }
            // Next pass: a size field from the Zienkiewicz-Zhu indicators of the coarse solution, aimed so that the next
            // coarse mesh has a J error of about 2^p times the target (the refined solve then meets the target).
            ct.ThrowIfCancellationRequested();
            var coarseField = FieldRecovery.Build(coarse);
            var eta2 = AdaptiveSizing.Indicators(coarse, coarseField);
            ct.ThrowIfCancellationRequested();
            // Richardson gives the coarse error E_r = |Jf - Jc| 2^p / (2^p - 1); the indicators give E_zz. Ask the
            // indicators for the reduction that Richardson says is needed (this calibrates them at singular corners).
            double coarseErr = Math.Abs(fine.J - coarse.J) * Math.Pow(2, p) / (Math.Pow(2, p) - 1) / fine.J;
            double wanted = estJ > acc ? 0.5 * acc / SafetyFactor * (Math.Pow(2, p) - 1) : coarseErr;
            double zz = eta2.Sum() / coarse.J;
            double coarseTarget = coarseErr > 0 && zz > 0 ? zz * Math.Min(1, wanted / coarseErr) : acc;
            // Peak shear not resolved yet: smaller boundary elements wherever the boundary shear is within 3 % of the peak.
            var peaks = shearOk ? [] : AdaptiveSizing.PeakSources(coarse, Math.Clamp(0.8 * Math.Pow(shearTarget / estT, 1 / ShearOrder), 0.25, 0.7));
            sizeField = AdaptiveSizing.SizeField(coarseMesh, eta2, coarse.J, coarseTarget, h, peaks);
            Report("mesh", f0 + span);
        }
        ct.ThrowIfCancellationRequested();
        var useC = coarse!;
        var useF = fine!;
        double j = useF.J;
        var regionJ = (double[])useF.RegionJ.Clone();
        if (!ReferenceEquals(useC, useF) && last is not null)
        {
            j = useF.J + last.Correction;
            for (int r = 0; r < regionJ.Length; r++) regionJ[r] = useF.RegionJ[r] + last.RegionCorrection[r];
        }
        if (singular) estT = double.PositiveInfinity;
        else if (last is not null && !AdaptiveSizing.PeakResolved(useC))
        {
            // The limits stopped refinement before the peak was resolved: its two-mesh change is no bound.
            estT = double.NaN;
            warnings.Add(new AnalysisWarning("peak-shear-unresolved",
                $"the peak shear at {Show(useF.MaxGradientLocation)} lies on a curve the mesh did not resolve within the limits; its error is not estimated; rerun with a finer accuracy (the first mesh is then finer at the peak)"));
        }
        Warping.WarpingResult? warping = null;
        if (options.Warping || (options.WarpingIfOpen && j < 0.5 * props.PolarMoment))
        {
            Report("warping", 0.97);
            warping = Warping.WarpingProperties.Compute(useC, useF, props, j, singular, ct);
            if (warping is null)
                warnings.Add(new AnalysisWarning("warping-not-computed",
                    $"the profile has {profile.Regions.Count} separate parts: they warp independently and have no common shear centre; analyse each part alone for its warping properties"));
            else estJ = Bracket(j, useF.J, warping.TorsionConstantUpperBound, estJ);
        }
        estJ += CurveTerm(useF);
        var field = FieldRecovery.Build(useF);
        Report("done", 1);
        return new SectionResult
        {
            Profile = profile,
            Properties = props,
            TorsionConstant = j,
            MaxShearPerTorque = useF.MaxGradient / useF.J,
            MaxShearLocation = useF.MaxGradientLocation,
            EstimatedRelativeError = new ErrorEstimate(estJ, estT),
            Mesh = new MeshSummary(useF.Mesh.NodeCount, useF.Mesh.ElementCount, MeshQuality.MinAngleDegrees(coarseMesh!)),
            Warnings = warnings.AsReadOnly(),
            Field = field,
            RegionTorsionConstants = Array.AsReadOnly(regionJ),
            Warping = warping,
        };
    }

    /// <summary>
    /// Relative residual asked of an iterative linear solve. The algebraic error changes J by r^T A^-1 r, at most
    /// kappa (||r|| / ||b||)^2 relative, so 1e-4 of the accuracy (between 1e-12 and 1e-9) keeps it far below the
    /// accuracy even at condition numbers near 1e10; below the attainable floor the solver stops at the floor.
    /// </summary>
    internal static double SolverTolerance(double accuracy) => Math.Clamp(1e-4 * accuracy, 1e-12, 1e-9);

    /// <summary>
    /// The effect on J of drawn curves replaced within <see cref="Profile.CurveTolerance"/> h: by the shape derivative of
    /// the torsion constant, dJ = integral over the boundary of |grad phi|^2 times the normal displacement (Hadamard's
    /// formula for the Dirichlet problem; Sokolowski and Zolesio, Introduction to Shape Optimization, Springer 1992,
    /// ch. 3; for the torsional rigidity see Polya and Szego, Isoperimetric Inequalities in Mathematical Physics, 1951),
    /// so |dJ| / J &lt;= h (max |grad phi|)^2 (perimeter) / J, a bound.
    /// </summary>
    private double CurveTerm(TorsionSolution s)
    {
        double h = profile.CurveTolerance;
        if (!(h > 0)) return 0;
        double perimeter = profile.Loops.Sum(l => l.Perimeter);
        return h * s.MaxGradient * s.MaxGradient * perimeter / s.J;
    }

    /// <summary>
    /// On the same mesh the stress-function J is a lower bound (complementary energy) and the warping-function J an upper
    /// bound (potential energy) of the exact J of the mesh's domain, so for a polygonal profile (the mesh domain is the
    /// exact one) the extrapolated J lies within max(J - lower, upper - J) of the truth. The estimate becomes the smaller
    /// of that guaranteed bracket and the Richardson estimate; curved outlines keep the Richardson estimate.
    /// </summary>
    private double Bracket(double j, double lower, double upper, double estimate)
    {
        bool polygonal = profile.Loops.All(l => l.Segments.All(s => s is LineSegment));
        if (!polygonal || !(lower <= j && j <= upper)) return estimate;
        double bound = Math.Max(j - lower, upper - j) / j;
        return double.IsNaN(estimate) ? bound : Math.Min(estimate, bound);
    }

    /// <summary>Largest arc angle per boundary edge: coarse curved edges suffice at modest accuracy.</summary>
    private static double ArcAngle(double accuracy) => Math.Clamp(30 * Math.Pow(accuracy / 1e-4, 0.125), 10, AdaptiveSizing.PeakEdgeTurn * 180 / Math.PI);

    private void Report(string stage, double fraction) => progress?.Report(new AnalysisProgress(stage, Math.Clamp(fraction, 0, 1)));

    private string Show(Point2 p)
    {
        var u = profile.Unit;
        return $"({Units.LengthUnit.Inv(u.FromMetres(p.X))}, {Units.LengthUnit.Inv(u.FromMetres(p.Y))}) {u.Symbol}";
    }
}
