using SectionTwist.Geometry;
using SectionTwist.Torsion;
using SectionTwist.Units;

namespace SectionTwist.Verification;

/// <summary>
/// The built-in verification cases that qualify an installation: exact elasticity solutions (Timoshenko and Goodier,
/// Theory of Elasticity, 3rd ed., ch. 10) and the rectangle series (same book, sec. 109; Roark's Formulas for Stress and
/// Strain, 7th ed., Table 10.1), each with the tolerance the default accuracy promises; the ellipse's exact warping
/// constant (same book, sec. 105), the closed form of a cantilever in non-uniform torsion (<see cref="WarpingCases"/>)
/// and the exact compound circular bar of two bonded materials (<see cref="CompositeCases"/>).
/// </summary>
public static class VerificationSuite
{
    private const string Tg = "Timoshenko & Goodier, Theory of Elasticity, ch. 10 (exact)";
    private const string Series = "Timoshenko & Goodier sec. 109 series (Roark 7th ed. Table 10.1)";

    /// <summary>All cases, sized as a 40 mm class shaft.</summary>
    public static IReadOnlyList<VerificationCase> Cases { get; } = BuildCases();

    private static List<VerificationCase> BuildCases()
    {
        var mm = LengthUnit.Millimetre;
        var list = new List<VerificationCase>();
        void Add(string name, Func<Profile> build, double j, double tauPerT, double tolJ = 1e-4, double tolT = 5e-3, string src = Tg)
        {
            list.Add(new VerificationCase(name + " J", VerifiedQuantity.TorsionConstant, j, tolJ, src, build));
            list.Add(new VerificationCase(name + " peak shear", VerifiedQuantity.MaxShear, tauPerT, tolT, src, build));
        }
        double d = 0.040;
        Add("solid circle d=40mm", () => Make(mm, LoopBuilder.Circle(default, d / 2)), Math.PI * Math.Pow(d, 4) / 32, 16 / (Math.PI * d * d * d));
        double D = 0.050, di = 0.036;
        Add("hollow circle 50/36mm", () => Make(mm, LoopBuilder.Circle(default, D / 2), LoopBuilder.Circle(default, di / 2)),
            Math.PI * (Math.Pow(D, 4) - Math.Pow(di, 4)) / 32, 16 * D / (Math.PI * (Math.Pow(D, 4) - Math.Pow(di, 4))));
        foreach (double ratio in new[] { 2.0, 4.0 })
        {
            double a = 0.020, b = a / ratio;
            Add($"ellipse {ratio}:1 a=20mm", () => Make(mm, new Loop([EllipticalArcSegment.Full(default, a, b)])),
                Math.PI * Math.Pow(a, 3) * Math.Pow(b, 3) / (a * a + b * b), 2 / (Math.PI * a * b * b));
        }
        double s = 0.030;
        double hgt = s * Math.Sqrt(3) / 2;
        Add("equilateral triangle a=30mm", () => Make(mm, LoopBuilder.Polygon([new(-s / 2, 0), new(s / 2, 0), new(0, hgt)])),
            Math.Sqrt(3) * Math.Pow(s, 4) / 80, 20 / (s * s * s));
        foreach (double ratio in new[] { 1.0, 2.0, 4.0, 10.0 })
        {
            double bb = 0.010, aa = ratio * bb;
            var (beta, alpha) = RectangleSeries(aa, bb);
            Add($"rectangle {ratio}:1 b=10mm", () => Make(mm, LoopBuilder.Polygon([new(0, 0), new(aa, 0), new(aa, bb), new(0, bb)])),
                beta * aa * bb * bb * bb, 1 / (alpha * aa * bb * bb), src: Series);
        }
        list.AddRange(WarpingCases.Build());
        list.AddRange(CompositeCases.Build());
        return list;
    }

    private static Profile Make(LengthUnit unit, Loop outer, params Loop[] holes) => new([new Region(outer, holes)], unit, "verification");

    /// <summary>
    /// Rectangle a x b series (Timoshenko and Goodier, sec. 109): J = beta a b^3, tau_max = T / (alpha a b^2).
    /// </summary>
    public static (double Beta, double Alpha) RectangleSeries(double a, double b)
    {
        if (a < b) (a, b) = (b, a);
        double sumT = 0, sumK = 0;
        for (int n = 1; n < 2001; n += 2)
        {
            double arg = n * Math.PI * a / (2 * b);
            sumT += Math.Tanh(arg) / Math.Pow(n, 5);
            if (arg < 700) sumK += 1 / (n * (double)n * Math.Cosh(arg));
        }
        double beta = (1.0 / 3) * (1 - 192 / Math.Pow(Math.PI, 5) * (b / a) * sumT);
        double k = 1 - 8 / (Math.PI * Math.PI) * sumK;
        return (beta, beta / k);
    }

    /// <summary>
    /// Runs every case at the given accuracy (default 1e-4); cases sharing a profile share one analysis. At an accuracy
    /// finer than 1e-4 the tolerances tighten: J to the accuracy itself, the peak shear to 1e-3.
    /// </summary>
    public static IReadOnlyList<VerificationOutcome> Run(AnalysisOptions? options = null, CancellationToken cancellationToken = default) =>
        RunReporting(options, null, cancellationToken);

    /// <summary>As <see cref="Run"/>, reporting before each case and at the end the fraction of the cases done (0 to 1).</summary>
    public static IReadOnlyList<VerificationOutcome> RunReporting(AnalysisOptions? options, IProgress<double>? progress, CancellationToken cancellationToken = default)
    {
        var results = new Dictionary<Func<Profile>, SectionResult>();
        var composites = new Dictionary<Func<Composite.CompositeSection>, Composite.CompositeResult>();
        var outcomes = new List<VerificationOutcome>();
        foreach (var c in Cases)
        {
            progress?.Report((double)outcomes.Count / Cases.Count);
            double acc = (options ?? AnalysisOptions.Default).Accuracy;
            if (c.Evaluate is { } evaluate)
            {
                cancellationToken.ThrowIfCancellationRequested();
                double m = evaluate();
                outcomes.Add(new VerificationOutcome(c, m, Math.Abs(m - c.Reference) / Math.Abs(c.Reference), 0, c.Tolerance));
                continue;
            }
            double v, est;
            if (c.BuildComposite is { } composite)
            {
                if (!composites.TryGetValue(composite, out var cr))
                    composites[composite] = cr = Composite.CompositeAnalyzer.Analyze(composite(), null, options ?? AnalysisOptions.Default, cancellationToken);
                var m = cr.Materials[c.MaterialIndex ?? 0];
                (v, est) = c.Quantity == VerifiedQuantity.TorsionConstant
                    ? (cr.EquivalentTorsionConstant, cr.EstimatedRelativeError) : (m.MaxShearPerTorque, m.EstimatedRelativeError);
            }
            else
            {
                if (!results.TryGetValue(c.Build, out var r))
                {
                    var o = options ?? AnalysisOptions.Default;
                    results[c.Build] = r = SectionAnalyzer.Analyze(c.Build(), c.Quantity == VerifiedQuantity.WarpingConstant ? o with { Warping = true } : o, cancellationToken);
                }
                (v, est) = c.Quantity switch
                {
                    VerifiedQuantity.TorsionConstant => (r.TorsionConstant, r.EstimatedRelativeError.TorsionConstant),
                    VerifiedQuantity.WarpingConstant => (r.Warping!.WarpingConstant, r.Warping.EstimatedError.WarpingConstant / r.Warping.WarpingConstant),
                    _ => (r.MaxShearPerTorque, r.EstimatedRelativeError.MaxShear),
                };
            }
            double tol = acc >= 1e-4 || c.Quantity == VerifiedQuantity.WarpingConstant ? c.Tolerance
                : c.Quantity == VerifiedQuantity.TorsionConstant ? Math.Max(acc, 1e-10) : Math.Min(c.Tolerance, 1e-3);
            outcomes.Add(new VerificationOutcome(c, v, Math.Abs(v - c.Reference) / Math.Abs(c.Reference), est, tol));
        }
        progress?.Report(1);
        return outcomes;
    }
}
