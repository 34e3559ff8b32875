using SectionTwist.Torsion;

namespace SectionTwist.Shaft;

/// <summary>
/// One solve of a shaft model (the operation behind <see cref="ShaftSolver.Solve"/>): assemble the station stiffness
/// matrix and load vector, remove the fixed rotations, solve, recover reactions, internal torques, stresses and checks.
/// </summary>
internal sealed class ShaftAnalysis(ShaftModel model)
{
    /// <summary>Relative size of the net torque below which a free shaft counts as balanced.</summary>
    internal const double BalanceTolerance = 1e-6;

    public ShaftResult Compute()
    {
        ShaftModelGuard.CheckInput(model);
        var layout = new ShaftLayout(model);
        ShaftModelGuard.CheckStiffnessSpread(layout);
        int n = layout.Stations.Count;
        var k = new double[n * n];
        var f = new double[n];
        foreach (var (s, t, _) in layout.PointLoads) f[s] += t;
        foreach (var e in layout.Elements)
        {
            double ke = e.Stiffness;
            k[e.A * n + e.A] += ke; k[e.B * n + e.B] += ke;
            k[e.A * n + e.B] -= ke; k[e.B * n + e.A] -= ke;
            f[e.A] += e.LoadA; f[e.B] += e.LoadB;
        }
        foreach (var (a, b, sp) in layout.Springs)
        {
            double ks = sp.Stiffness;
            k[a * n + a] += ks; k[b * n + b] += ks;
            k[a * n + b] -= ks; k[b * n + a] -= ks;
        }

        bool free = layout.Fixed.Length == 0;
        if (free) CheckBalance(layout, f);
        var constrained = free ? [layout.Reference] : layout.Fixed;
        var phi = SolveReduced(layout, k, f, n, constrained);
        var isFixed = new bool[n];
        foreach (int c in constrained) isFixed[c] = true;

        double phiRef = phi[layout.Reference];
        // rotations and reactions that are zero in exact arithmetic print as zero, not as round-off (1e-16 of the largest)
        double phiScale = 0, scale = 0;
        foreach (var v in phi) phiScale = Math.Max(phiScale, Math.Abs(v - phiRef));
        foreach (var v in f) scale += Math.Abs(v);
        var stations = new StationResult[n];
        var applied = new double[n];
        foreach (var (s, t, _) in layout.PointLoads) applied[s] += t;
        for (int i = 0; i < n; i++)
        {
            var st = layout.Stations[i];
            stations[i] = new StationResult(st.Name, st.Position, Units.NumberText.Clean(phi[i] - phiRef, phiScale), applied[i], Array.IndexOf(layout.Fixed, i) >= 0);
        }

        var reactions = new List<SupportReaction>();
        foreach (int i in layout.Fixed)
        {
            double r = -f[i];
            for (int j = 0; j < n; j++) r += k[i * n + j] * phi[j];
            reactions.Add(new SupportReaction(layout.Stations[i].Name, Units.NumberText.Clean(r, scale, TorqueRoundOff)));
        }

        ShaftModelGuard.CheckSolution(k, f, phi, n, isFixed, free ? null : reactions);
        var segmentWarnings = new List<AnalysisWarning>();
        var segments = BuildSegments(layout, phi, scale, phiScale, segmentWarnings);
        var springs = layout.Springs.Select(s => new SpringResult(s.Spring.Label, layout.Stations[s.A].Name, layout.Stations[s.B].Name,
            Units.NumberText.Clean(s.Spring.Stiffness * (phi[s.B] - phi[s.A]), scale, TorqueRoundOff), Units.NumberText.Clean(phi[s.B] - phi[s.A], phiScale))).ToArray();

        // a loaded segment with an unbounded peak shear governs: no factor of safety can be given for it
        var governing = segments.FirstOrDefault(s => s.PeakShearUnbounded)
            ?? segments.Where(s => s.ShearLimit is not null && s.MaxShear > 0).OrderByDescending(s => s.MaxShear / s.ShearLimit!.Value).FirstOrDefault();
        var governingTwist = segments.Where(s => s.MaxTwistRate > 0).OrderByDescending(s => s.MaxTwistRate).FirstOrDefault();
        var result = new ShaftResult
        {
            Model = model,
            // Read-only views: a host cannot change a result through a cast back to the array or list.
            Stations = Array.AsReadOnly(stations),
            Segments = Array.AsReadOnly(segments),
            Reactions = reactions.AsReadOnly(),
            Springs = Array.AsReadOnly(springs),
            ReferenceStation = layout.Stations[layout.Reference].Name,
            GoverningSegment = governing,
            GoverningTwistSegment = governingTwist,
            Warnings = Warnings(layout, segmentWarnings).AsReadOnly(),
        };
        ShaftModelGuard.CheckFinite(result);
        return result;
    }

    /// <summary>Relative size (of the total applied torque) below which an internal torque, reaction or spring torque is round-off.</summary>
    private const double TorqueRoundOff = 1e-10;

    /// <summary>The sections' analysis warnings, once per section, then the warnings of the segments.</summary>
    private static List<AnalysisWarning> Warnings(ShaftLayout layout, List<AnalysisWarning> segmentWarnings)
    {
        var list = new List<AnalysisWarning>();
        var seen = new HashSet<string>(StringComparer.Ordinal);
        foreach (var seg in layout.Segments)
            foreach (var w in seg.Section?.Warnings ?? [])
                if (seen.Add(w.Message)) list.Add(w);
        list.AddRange(segmentWarnings);
        return list;
    }

    // No number with a unit in the message: warnings reach the text, report and CSV of every unit system and JSON alike.
    private static AnalysisWarning Unbounded(SegmentResult s, SectionStiffness section) => section.MaterialShears is { Count: > 0 }
        ? new("unbounded-peak-shear",
            $"segment '{s.Label}' ({s.From}-{s.To}): the peak shear of composite section '{section.Description}' does not converge at a " +
            "sharp corner of its outline or of an interface (its value on the analysis mesh changes with refinement), so no factor of " +
            "safety is given; round the corner in the drawing")
        : new("unbounded-peak-shear",
            $"segment '{s.Label}' ({s.From}-{s.To}): the peak shear is unbounded at a sharp re-entrant corner of its section " +
            $"'{section.Description}' (its value on the analysis mesh grows with refinement), so no factor of safety is given; " +
            "model the real fillet radius (r= on the keyseat and spline templates)");

    /// <summary>A shaft with no support must carry torques that sum to zero, else it would spin up (a loose shaft).</summary>
    private static void CheckBalance(ShaftLayout layout, double[] f)
    {
        double net = 0, scale = 0;
        foreach (var v in f) { net += v; scale += Math.Abs(v); }
        if (Math.Abs(net) <= BalanceTolerance * scale || scale == 0) return;
        var contributions = layout.PointLoads.Select(p => (What: $"{p.Load.Description ?? "torque"} at '{layout.Stations[p.Station].Name}'", T: p.Torque))
            .Concat(layout.Elements.Where(e => e.Distributed != 0)
                .Select(e => (What: $"distributed torque on {layout.Stations[e.A].Name}-{layout.Stations[e.B].Name}", T: e.Distributed * e.Length)))
            .ToArray();
        string list = string.Join(", ", contributions.Select(c => $"{c.What} {ShaftLayout.Num(c.T)} N·m"));
        throw new SectionTwistException("loose-shaft",
            $"loose shaft: there is no fixed support and the applied torques do not balance: net torque {ShaftLayout.Num(net)} N·m about the axis ({list}); " +
            $"add a fixed support where the torque is reacted (for example the drum, brake or motor station), or add the missing balancing torque of {ShaftLayout.Num(-net)} N·m");
    }

    private static double[] SolveReduced(ShaftLayout layout, double[] k, double[] f, int n, int[] constrained)
    {
        var isFixed = new bool[n];
        foreach (int c in constrained) isFixed[c] = true;
        var map = new int[n];
        int m = 0;
        for (int i = 0; i < n; i++) map[i] = isFixed[i] ? -1 : m++;
        var phi = new double[n];
        if (m == 0) return phi;
        var kr = new double[m * m];
        var fr = new double[m];
        for (int i = 0; i < n; i++)
        {
            if (map[i] < 0) continue;
            fr[map[i]] = f[i];
            for (int j = 0; j < n; j++) if (map[j] >= 0) kr[map[i] * m + map[j]] = k[i * n + j];
        }
        int bad = DenseCholesky.Solve(kr, m, fr);
        if (bad >= 0)
        {
            int station = Array.IndexOf(map, bad);
            throw new SectionTwistException("mechanism",
                $"mechanism: the rotation at station '{layout.Stations[station].Name}' is not restrained (the stiffness matrix is singular there); " +
                "check that every part of the shaft is joined to a fixed support by segments or springs of non-zero stiffness");
        }
        for (int i = 0; i < n; i++) if (map[i] >= 0) phi[i] = fr[map[i]];
        return phi;
    }

    /// <summary>Builds the segment results; internal torques below 1e-10 of the total applied torque are round-off and reported as 0.</summary>
    private static SegmentResult[] BuildSegments(ShaftLayout layout, double[] phi, double scale, double phiScale, List<AnalysisWarning> warnings)
    {
        double Clean(double t) => Units.NumberText.Clean(t, scale, TorqueRoundOff);
        double? limit = layout.Model.TwistRateLimit;
        var list = new List<(double Pos, SegmentResult R, SectionStiffness? Section)>();
        for (int i = 0; i < layout.Elements.Count; i++)
        {
            var e = layout.Elements[i];
            var seg = layout.Segments[i];
            double ta = Clean(e.TorqueA(phi[e.A], phi[e.B]));
            double tb = Clean(ta - e.Distributed * e.Length);
            double tau = e.MaxShear(ta);
            double rate = e.MaxTwistRate(ta);
            double? lim = seg.Material.LimitShear;
            // a sharp re-entrant corner: the mesh value is no bound on the stress, so there is no factor of safety to give
            bool unbounded = tau > 0 && seg.Section is { PeakShearUnbounded: true };
            double? sf = lim is null || unbounded ? null : tau > 0 ? lim.Value / tau : double.PositiveInfinity;
            bool exceeds = lim is not null && tau > lim.Value;
            // a composite section: each material against its own limit; the governing one gives the limit and the factor
            var checks = new List<MaterialShearCheck>();
            if (seg.Section is { MaterialShears: { } shears } sec && sec.ShearPerTorque > 0)
            {
                foreach (var ms in shears)
                {
                    double taum = tau * ms.ShearPerTorque / sec.ShearPerTorque;
                    double? lm = ms.Material.LimitShear;
                    checks.Add(new MaterialShearCheck(ms.Material, taum, lm is null || unbounded ? null : taum > 0 ? lm.Value / taum : double.PositiveInfinity));
                }
                var governing = checks.Where(c => c.SafetyFactor is not null).MinBy(c => c.SafetyFactor!.Value);
                lim = governing?.Material.LimitShear;
                sf = governing?.SafetyFactor;
                if (governing is not null) tau = governing.MaxShear; // the table compares the peak with the limit of the same material
                exceeds = checks.Any(c => c.Exceeds);
            }
            list.Add((layout.Stations[e.A].Position, new SegmentResult
            {
                Label = seg.Label,
                From = layout.Stations[e.A].Name,
                To = layout.Stations[e.B].Name,
                Length = e.Length,
                Section = e.Describe(),
                Material = seg.Material,
                Stiffness = e.Stiffness,
                TorqueAtFrom = ta,
                TorqueAtTo = tb,
                Twist = Units.NumberText.Clean(phi[e.B] - phi[e.A], phiScale),
                MaxShear = tau,
                ShearLimit = lim,
                SafetyFactor = sf,
                MaxTwistRate = rate,
                ExceedsShearLimit = exceeds,
                MaterialChecks = checks.AsReadOnly(),
                PeakShearUnbounded = unbounded,
                ExceedsTwistRateLimit = limit is not null && rate > limit.Value,
            }, seg.Section));
        }
        var sorted = list.OrderBy(p => p.Pos).ToList();
        foreach (var (_, r, section) in sorted) if (r.PeakShearUnbounded) warnings.Add(Unbounded(r, section!));
        return [.. sorted.Select(p => p.R)];
    }
}
