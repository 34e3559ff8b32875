using System.Globalization;
using SectionTwist.Limits;

namespace SectionTwist.Shaft;

/// <summary>
/// Keeps every shaft solve finite and trustworthy, for models from files and from code alike: sizes and magnitudes
/// are checked before the solve (<see cref="ShaftValueRange"/>, <see cref="InputLimits.MaxStations"/>), the spread of
/// stiffnesses before factorizing (beyond <see cref="InputLimits.MaxStiffnessRatio"/> the solve would lose all digits),
/// and the residual, the equilibrium of the reactions and the finiteness of every number after it. A model that fails
/// is refused with a <see cref="SectionTwistException"/>; a result is never returned with a non-finite value or with
/// contradictory torques and twists.
/// </summary>
internal static class ShaftModelGuard
{
    public static void CheckInput(ShaftModel model)
    {
        if (model.Stations is { Count: > InputLimits.MaxStations } st)
            throw new SectionTwistException("shaft-too-large", $"the shaft has {st.Count} stations, more than the {InputLimits.MaxStations} SectionTwist solves; merge stations (a prismatic stretch needs none between its ends)");
        foreach (var (list, what) in new (int Count, string What)[] { (model.Segments?.Count ?? 0, "segments"), (model.Loads?.Count ?? 0, "loads"), (model.Springs?.Count ?? 0, "springs") }.Select(x => (x.Count, x.What)))
            if (list > InputLimits.MaxShaftItems)
                throw new SectionTwistException("shaft-too-large", $"the shaft has {list} {what}, more than the {InputLimits.MaxShaftItems} SectionTwist solves; merge them or split the shaft");
        foreach (var s in model.Stations ?? [])
            Range(QuantityKind.Length, s.Position, $"station '{s.Name}': position");
        foreach (var seg in model.Segments ?? [])
        {
            if (seg.Material is { } m) Range(QuantityKind.Modulus, m.ShearModulus, $"segment {seg.Label}: material '{m.Name}': shear modulus G");
            if (seg.Section is { } sec)
            {
                Range(QuantityKind.AreaMoment, sec.TorsionConstant, $"segment {seg.Label}: torsion constant J");
                Range(QuantityKind.ShearPerTorque, sec.ShearPerTorque, $"segment {seg.Label}: peak shear per unit torque");
            }
            if (seg.Taper is { } t)
            {
                Range(QuantityKind.Length, t.StartDiameter, $"segment {seg.Label}: taper diameter");
                Range(QuantityKind.Length, t.EndDiameter, $"segment {seg.Label}: taper diameter");
            }
        }
        foreach (var load in model.Loads ?? [])
        {
            if (load is PointTorque p) Range(QuantityKind.Torque, p.Torque, $"torque at station '{p.Station}'");
            else if (load is DistributedTorque d) Range(QuantityKind.TorquePerLength, d.TorquePerLength, $"distributed torque on {d.From}-{d.To}");
        }
        foreach (var sp in model.Springs ?? []) Range(QuantityKind.RotationalStiffness, sp.Stiffness, $"spring {sp.Label}: stiffness");
        if (model.TwistRateLimit is { } lim) Range(QuantityKind.TwistRate, lim, "twist-rate limit");
    }

    private static void Range(QuantityKind kind, double v, string what)
    {
        if (ShaftValueRange.Check(kind, v) is { } problem) throw new SectionTwistException("shaft-out-of-range", $"{what} {problem}");
    }

    /// <summary>Refuses a stiffness spread that double precision cannot resolve, naming the stiffest and the softest member.</summary>
    public static void CheckStiffnessSpread(ShaftLayout layout)
    {
        var all = layout.Elements.Select((e, i) => (K: e.Stiffness, What: $"segment {layout.Segments[i].Label}"))
            .Concat(layout.Springs.Select(s => (K: s.Spring.Stiffness, What: $"spring {s.Spring.Label}"))).ToList();
        if (all.Count < 2) return;
        var stiff = all.MaxBy(x => x.K);
        var soft = all.MinBy(x => x.K);
        if (!double.IsFinite(stiff.K) || !(soft.K > 0) || stiff.K / soft.K > InputLimits.MaxStiffnessRatio)
            throw new SectionTwistException("ill-conditioned",
                $"{stiff.What} is {G(stiff.K / soft.K)} times stiffer than {soft.What} ({G(stiff.K)} against {G(soft.K)} N*m/rad); beyond {G(InputLimits.MaxStiffnessRatio)} the solve loses all digits - " +
                "check J, G and the lengths there (a member 1e6 times stiffer than its neighbours already acts as rigid)");
    }

    /// <summary>Checks K phi = f on the free rotations and the overall balance of applied torques and reactions.</summary>
    public static void CheckSolution(double[] k, double[] f, double[] phi, int n, bool[] isFixed, IReadOnlyList<SupportReaction>? reactions)
    {
        double worst = 0;
        for (int i = 0; i < n; i++)
        {
            if (isFixed[i]) continue;
            double r = -f[i], scale = Math.Abs(f[i]);
            for (int j = 0; j < n; j++) { double t = k[i * n + j] * phi[j]; r += t; scale += Math.Abs(t); }
            if (scale > 0) worst = Math.Max(worst, Math.Abs(r) / scale);
            else if (r != 0) worst = double.PositiveInfinity;
        }
        // a free shaft is balanced by CheckBalance to its own tolerance; a supported one must balance with its reactions
        double net = 0, size = 0;
        if (reactions is not null)
        {
            foreach (var v in f) { net += v; size += Math.Abs(v); }
            foreach (var r in reactions) { net += r.Torque; size += Math.Abs(r.Torque); }
        }
        double balance = size > 0 ? Math.Abs(net) / size : 0;
        if (!(worst <= 1e-8) || !(balance <= 1e-8))
            throw new SectionTwistException("ill-conditioned",
                $"the shaft solve is not accurate (equation residual {G(worst)}, torque balance {G(balance)}); the stiffnesses or loads differ by too many orders of magnitude - check J, G, lengths and torques for a wrong unit");
    }

    /// <summary>Refuses a result holding a non-finite number (the factor of safety of an unloaded segment is +infinity by design).</summary>
    public static void CheckFinite(ShaftResult r)
    {
        foreach (var s in r.Stations)
            if (!double.IsFinite(s.Rotation) || !double.IsFinite(s.AppliedTorque)) throw Overflow($"station '{s.Name}'");
        foreach (var s in r.Segments)
            if (!AllFinite(s.Length, s.Stiffness, s.TorqueAtFrom, s.TorqueAtTo, s.Twist, s.MaxShear, s.MaxTwistRate) || s.SafetyFactor is double.NaN)
                throw Overflow($"segment {s.Label}");
        foreach (var x in r.Reactions) if (!double.IsFinite(x.Torque)) throw Overflow($"the reaction at '{x.Station}'");
        foreach (var x in r.Springs) if (!double.IsFinite(x.Torque) || !double.IsFinite(x.Windup)) throw Overflow($"spring {x.Label}");
    }

    private static bool AllFinite(params ReadOnlySpan<double> values)
    {
        foreach (var v in values) if (!double.IsFinite(v)) return false;
        return true;
    }

    private static SectionTwistException Overflow(string where) =>
        new("shaft-overflow", $"the results of {where} overflow (not a finite number); the inputs combine to values beyond double precision - check J, G, lengths and torques for a wrong unit");

    private static string G(double v) => v.ToString("G3", CultureInfo.InvariantCulture);
}
