using SectionTwist.Shaft;
using SectionTwist.Torsion;

namespace SectionTwist.Plastic;

/// <summary>
/// Checks a solved shaft's overload cases (<see cref="ShaftModel.Overload"/>) against the fully plastic torque of every
/// segment: factor |T| &lt;= T_p, with T_p by the sand-heap analogy (Nadai, Theory of Flow and Fracture of Solids, vol. 1,
/// ch. 35; Hill, The Mathematical Theory of Plasticity, ch. IV): exact for rounds and tubes (T_p = 2 pi tau_y (r_o^3 - r_i^3) / 3),
/// on the analysed outline otherwise (<see cref="FullyPlasticTorque"/>), the smaller end of a taper. The first-yield torque
/// T_y = tau_y / (peak shear per unit torque) says whether the overload leaves a permanent twist. The shear yield stress
/// is the material's, else 0.577 times its tensile yield (distortion energy, Budynas and Nisbett, Shigley's Mechanical
/// Engineering Design, ch. 5). Ideal plasticity: no strain hardening, no residual stresses; limit-state design follows
/// the applicable code. A composite section (bonded parts of several materials) gets the lower bound of its T_p from the
/// static (lower-bound) theorem of limit analysis (Hill, ch. IV): the sand-heap field of its outline at the weakest
/// material's shear yield is admissible in every part; its T_y is that of the first material to reach its shear yield.
/// </summary>
public static class OverloadCheck
{
    /// <summary>Evaluates the overload cases of <paramref name="result"/>'s model; null when the model has none.</summary>
    /// <param name="result">The solved shaft.</param>
    /// <param name="accuracy">Target relative accuracy of T_p on analysed outlines (default 1e-3).</param>
    /// <param name="cancellation">Stops the T_p integrals.</param>
    public static OverloadResult? Evaluate(ShaftResult result, double accuracy = 1e-3, CancellationToken cancellation = default)
    {
        ArgumentNullException.ThrowIfNull(result);
        if (result.Model.Overload is not { } spec) return null;
        var warnings = new List<AnalysisWarning>();
        var cache = new Dictionary<Geometry.Profile, (double, double)>(ReferenceEqualityComparer.Instance);
        var segments = new List<SegmentPlasticCapacity>();
        foreach (var seg in result.Segments)
        {
            cancellation.ThrowIfCancellationRequested();
            var model = result.Model.Segments.First(m => (m.From == seg.From && m.To == seg.To) || (m.From == seg.To && m.To == seg.From));
            var composite = model.Section?.MaterialShears is { Count: > 0 } ms ? ms : null;
            double? tauY = composite is null ? YieldShear(seg.Material) : composite.Min(m => YieldShear(m.Material));
            var noYield = composite?.FirstOrDefault(m => YieldShear(m.Material) is null)?.Material ?? seg.Material;
            if (tauY is null)
                warnings.Add(new AnalysisWarning("no-yield-strength",
                    $"segment '{seg.Label}': material '{noYield.Name}' has no shear yield or tensile yield, so its overloads are not checked; give 'shearYield' or 'yield' in the material"));
            else if (composite is not null)
                warnings.Add(new AnalysisWarning("composite-plastic-lower-bound",
                    $"segment '{seg.Label}': section '{seg.Section}' is composite: T_p is a lower bound, the fully plastic torque of its outline with the weakest material's shear yield (tau_y) everywhere; T_y is that of the first material to yield"));
            double? perYield = null, error = null;
            bool unbounded = seg.PeakShearUnbounded;
            if (model.Taper is { } t)
            {
                double d = Math.Min(t.StartDiameter, t.EndDiameter);
                (perYield, error) = (Math.PI * d * d * d / 12, 0);
            }
            else if (model.Section is { } s)
            {
                if (s.PlasticTorquePerYield is { } exact) (perYield, error) = (exact, 0);
                else if (s.Profile is { } profile && tauY is not null)
                {
                    if (!cache.TryGetValue(profile, out var v)) cache[profile] = v = ProfilePlasticTorque.Compute(profile, accuracy, ct: cancellation);
                    (perYield, error) = (v.Item1, double.IsNaN(v.Item2) ? null : v.Item2);
                }
                else if (tauY is not null)
                    warnings.Add(new AnalysisWarning("no-plastic-torque",
                        $"segment '{seg.Label}': section '{seg.Section}' is given by its torsion values only, so its fully plastic torque is unknown and its overloads are not checked; describe it as a round, tube, template or drawing"));
            }
            double? tp = perYield * tauY;
            double? ty = composite is not null
                ? (tauY is null || unbounded ? null : composite.Min(m => YieldShear(m.Material)!.Value / m.ShearPerTorque))
                : tauY is { } ys && !unbounded ? ys / ShearPerTorque(model) : null;
            var checks = new List<OverloadCheckResult>();
            foreach (var c in spec.Cases)
            {
                if (c.Segments.Count > 0 && !c.Segments.Contains(seg.Label)) continue;
                double torque = c.Torque is { } tc ? Math.Abs(tc) : Math.Abs(seg.InternalTorque) * (c.Scale ?? 1);
                double? margin = tp is { } p && torque > 0 ? p / (spec.Factor * torque) - 1 : null;
                bool yields = torque > 0 && (unbounded || (ty is { } y && torque > y));
                string check = tp is null ? "not checked" : margin < 0 ? "over plastic capacity" : "ok";
                checks.Add(new OverloadCheckResult(c.Name, torque, margin, yields, check));
            }
            if (unbounded && tauY is not null)
                warnings.Add(new AnalysisWarning("first-yield-at-corner",
                    $"segment '{seg.Label}': a sharp re-entrant corner of section '{seg.Section}' yields at any torque in theory, so no first-yield torque or shape factor is given (T_p is not affected); model the real fillet radius"));
            segments.Add(new SegmentPlasticCapacity
            {
                Segment = seg.Label, Section = seg.Section, YieldShear = tauY, FirstYieldTorque = ty, FirstYieldUnbounded = unbounded,
                FullyPlasticTorque = tp, FullyPlasticTorqueError = tp is null ? null : error, Checks = checks,
                FullyPlasticTorqueIsLowerBound = composite is not null,
            });
        }
        return new OverloadResult { Factor = spec.Factor, Segments = segments, Warnings = warnings };
    }

    /// <summary>The shear yield stress of a material: its own, else 0.577 times its tensile yield; null without either.</summary>
    private static double? YieldShear(Material m) => m.ShearYield ?? m.YieldStrength * Material.DistortionEnergyShearRatio;

    /// <summary>Peak shear per unit torque of a segment: its section's, or that of the smaller end of a taper, 16 / (pi d^3).</summary>
    private static double ShearPerTorque(ShaftSegment model)
    {
        if (model.Section is { } s) return s.ShearPerTorque;
        double d = Math.Min(model.Taper!.StartDiameter, model.Taper.EndDiameter);
        return 16 / (Math.PI * d * d * d);
    }
}
