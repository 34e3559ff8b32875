using SectionTwist.Fatigue;

namespace SectionTwist.Bending;

/// <summary>The fatigue checks at the notched locations of <see cref="BendingAnalysis"/>.</summary>
internal sealed partial class BendingAnalysis
{
    private List<NotchFatigueResult> NotchChecks(List<Seg> segs, List<BendingSample> samples)
    {
        var list = new List<NotchFatigueResult>();
        if (_b.Fatigue is not { } fs || !_b.Rotating) return list;
        foreach (var loc in fs.Locations)
        {
            string where = $"fatigue location at '{loc.Station}'";
            int node = Node(loc.Station, where);
            double x = _x[node];
            var touching = segs.Where(s => s.X0 == x || s.X1 == x).ToList();
            Seg seg;
            if (loc.Segment is { } name)
                seg = touching.FirstOrDefault(s => s.Result.Label == name)
                      ?? throw new SectionTwistException("bad-fatigue", $"{where}: segment '{name}' does not end at station '{loc.Station}' (there: {string.Join(", ", touching.Select(s => s.Result.Label))})");
            else seg = touching.MinBy(s => SectionAt(s, x).OuterDiameter)!;
            var sample = samples.Where(p => p.Segment == seg.Result.Label && p.Position == x).MaxBy(p => p.Moment)!;
            var section = SectionAt(seg, x);
            var mat = seg.Model.Material;
            double sut = mat.UltimateStrength
                ?? throw new SectionTwistException("bad-fatigue", $"{where}: material '{mat.Name}' has no ultimate strength; give 'ultimate' for the fatigue check");
            var est = NotchFactors.Estimate(loc.Feature);
            double kt = loc.Kt ?? est?.Kt ?? throw new SectionTwistException("bad-fatigue", $"{where}: give 'Kt' and 'Kts', or a 'feature' (shoulder-sharp, shoulder-rounded, keyseat-end-mill, ring-groove)");
            double kts = loc.Kts ?? est?.Kts ?? throw new SectionTwistException("bad-fatigue", $"{where}: give 'Kts' (torsion) beside 'Kt'");
            if (kt < 1 || kts < 1) throw new SectionTwistException("bad-fatigue", $"{where}: stress-concentration factors are at least 1");
            string ktSource = loc.Kt is not null ? "given" : $"{NotchFactors.Name(loc.Feature)} estimate (Shigley 10th ed., Table 7-1, from memory)";
            string ktsSource = loc.Kts is not null ? "given" : ktSource;
            double d = section.OuterDiameter;
            double? r = loc.NotchRadius ?? (est is { RadiusRatio: var rd } && double.IsFinite(rd) ? rd * d : null);
            var (q, qSrc) = Sensitivity(loc.Q, sut, r, false);
            var (qs, qsSrc) = Sensitivity(loc.Qs, sut, r, true);
            double kf = 1 + q * (kt - 1), kfs = 1 + qs * (kts - 1);
            var endurance = EnduranceLimit.Compute(fs, sut, d);
            var (n, ny, sa, sm, p) = FatigueEvaluator.Evaluate(section, sample.AxialForce, sample.Moment, sample.Torque, kf, kfs, endurance.Value, sut, mat.YieldStrength, fs.Criterion);
            double? fieldKts = section.ShearSource == "field" ? section.PointSpan.ToArray().Max(b => b.ShearPerTorque) / (16 / (Math.PI * d * d * d)) : null;
            if (fieldKts is not null && kts > 1)
                _warnings.Add($"{where}: the section analysis already resolves the cross-section's notch (computed torsional concentration {fieldKts:F2}); the K_ts you give multiplies it: give K_ts only for what the 2D section cannot show (keyseat end, shoulder, groove)");
            list.Add(new NotchFatigueResult
            {
                Label = loc.Name ?? $"{loc.Station} ({seg.Result.Label})",
                Station = loc.Station, Segment = seg.Result.Label, Position = x,
                Moment = sample.Moment, Torque = sample.Torque,
                NotchFactors = new[]
                {
                    new FatigueFactor("Kt", "bending stress concentration", kt, ktSource),
                    new FatigueFactor("Kts", "torsion stress concentration", kts, ktsSource),
                    new FatigueFactor("q", "notch sensitivity, bending", q, qSrc),
                    new FatigueFactor("qs", "notch sensitivity, torsion", qs, qsSrc),
                    new FatigueFactor("Kf", "fatigue concentration, bending", kf, "1 + q (Kt - 1) (Shigley 10th ed., eq. 6-32)"),
                    new FatigueFactor("Kfs", "fatigue concentration, torsion", kfs, "1 + qs (Kts - 1) (Shigley 10th ed., eq. 6-32)"),
                }.AsReadOnly(),
                Endurance = endurance,
                SectionTorsionConcentration = fieldKts,
                AlternatingStress = sa, MeanStress = sm, SafetyFactor = n, YieldSafetyFactor = ny, Criterion = fs.Criterion,
                Point = (p.X, p.Y),
            });
        }
        if (list.Count > 0 || fs.Locations.Count == 0)
            _warnings.Add("fatigue factors are estimates (Marin factors, stress concentrations, notch sensitivity); keyseat ends, press fits and fretting need the applicable code and testing");
        return list;
    }

    private static BendingSection SectionAt(Seg s, double x) =>
        s.Model.Taper is { } t
            ? BendingSection.Round(s.Model.From == s.Result.From
                ? t.StartDiameter + (t.EndDiameter - t.StartDiameter) * (x - s.X0) / (s.X1 - s.X0)
                : t.EndDiameter + (t.StartDiameter - t.EndDiameter) * (x - s.X0) / (s.X1 - s.X0))
            : s.Model.Section!.Bending!;

    private static (double Q, string Source) Sensitivity(double? given, double sut, double? radius, bool torsion)
    {
        if (given is { } g)
        {
            if (!(g >= 0 && g <= 1)) throw new SectionTwistException("bad-fatigue", $"notch sensitivity {g} must lie between 0 and 1");
            return (g, "given");
        }
        if (radius is { } r && NotchFactors.Sensitivity(sut, r, torsion) is { } q)
            return (q, $"Neuber, r = {r * 1e3:G3} mm (Shigley 10th ed., eq. 6-34/6-35, from memory)");
        return (1, radius is null ? "no notch radius: q = 1 (conservative)" : "S_ut outside the fit: q = 1 (conservative)");
    }
}
