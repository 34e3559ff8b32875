using SectionTwist.Shaft;

namespace SectionTwist.WarpingTorsion;

/// <summary>
/// Solves a <see cref="WarpingMember"/> by the stiffness method with exact Vlasov elements (<see cref="VlasovElement"/>),
/// two freedoms per station (rotation phi and rate of twist phi'). Rotation supports and warping restraints remove
/// freedoms; warping springs add to the phi' diagonal; torsional springs (couplings) join two stations' rotations only;
/// round tapers, which do not warp, enter as the shaft solver's exact Saint-Venant element on the rotations; reactions
/// are recovered from the full system.
/// </summary>
public static class WarpingMemberSolver
{
    /// <summary>Samples per segment in the results (both ends included).</summary>
    public const int SamplesPerSegment = 41;

    /// <summary>Solves the member.</summary>
    public static WarpingMemberResult Solve(WarpingMember member)
    {
        ArgumentNullException.ThrowIfNull(member);
        var stations = member.Stations.OrderBy(s => s.Position).ToArray();
        var index = new Dictionary<string, int>();
        for (int i = 0; i < stations.Length; i++)
            if (!index.TryAdd(stations[i].Name, i)) throw new SectionTwistException("bad-member", $"station '{stations[i].Name}' is listed twice; give each station a unique name");
        int Station(string name, string what) => index.TryGetValue(name, out int i) ? i
            : throw new SectionTwistException("bad-member", $"{what} names station '{name}', which is not defined; add it to the stations or fix the name");
        int n = 2 * stations.Length;
        var k = new double[n * n];
        var f = new double[n];
        var elements = new List<MemberElement>();
        var warps = new bool[stations.Length]; // the station's phi' is a freedom: a segment that warps ends there
        foreach (var seg in member.Segments)
        {
            int a = Station(seg.From, $"segment {seg.Label}"), b = Station(seg.To, $"segment {seg.Label}");
            bool flip = a > b;
            if (flip) (a, b) = (b, a);
            double len = stations[b].Position - stations[a].Position;
            if (!(len > 0)) throw new SectionTwistException("bad-member", $"segment {seg.Label}: its stations are at the same position; give it a positive length");
            double m = member.Loads.OfType<DistributedTorque>()
                .Where(d => (Station(d.From, "a distributed torque"), Station(d.To, "a distributed torque")) is var (p, q) && Math.Min(p, q) == a && Math.Max(p, q) == b)
                .Sum(d => d.TorquePerLength);
            if (seg.Taper is not null || seg.Section.WarpingConstant == 0)
            {
                // a section that does not warp (a round taper, Iw = 0): Saint-Venant torsion on the rotations only, with the
                // shaft solver's exact element; it carries no bimoment
                var sv = SaintVenantElement(seg, a, b, len, flip, m);
                AddSpring(k, n, 2 * a, 2 * b, sv.Stiffness);
                f[2 * a] += sv.LoadA; f[2 * b] += sv.LoadB;
                elements.Add(new MemberElement(seg, a, b, null, sv));
                continue;
            }
            var (gj, eiw) = Rigidities(seg);
            var el = new VlasovElement(len, gj, eiw, m);
            int[] dof = [2 * a, 2 * a + 1, 2 * b, 2 * b + 1];
            for (int r = 0; r < 4; r++)
            {
                f[dof[r]] += el.Load[r];
                for (int c = 0; c < 4; c++) k[dof[r] * n + dof[c]] += el.Stiffness[r * 4 + c];
            }
            warps[a] = warps[b] = true;
            elements.Add(new MemberElement(seg, a, b, el, null));
        }
        foreach (var sp in member.Springs)
        {
            int a = Station(sp.StationA, $"spring {sp.Label}"), b = Station(sp.StationB, $"spring {sp.Label}");
            if (!(sp.Stiffness > 0) || !double.IsFinite(sp.Stiffness))
                throw new SectionTwistException("bad-member", $"spring {sp.Label}: stiffness {sp.Stiffness} N*m/rad must be positive");
            if (a != b) AddSpring(k, n, 2 * a, 2 * b, sp.Stiffness);
        }
        foreach (var p in member.Loads.OfType<PointTorque>()) f[2 * Station(p.Station, "a point torque")] += p.Torque;
        foreach (var load in member.Loads)
        {
            if (load is DistributedTorque dt)
            {
                int p = Station(dt.From, "a distributed torque"), q = Station(dt.To, "a distributed torque");
                if (!elements.Any(e => e.A == Math.Min(p, q) && e.B == Math.Max(p, q)))
                    throw new SectionTwistException("bad-member", $"a distributed torque runs from {dt.From} to {dt.To}, which is not one segment; spread it over single segments");
            }
            else if (load is not PointTorque)
                throw new SectionTwistException("bad-member", $"the warping analysis takes point and uniform torques only, not {load.GetType().Name}; remove that load or the warping restraints");
        }
        var fixedDof = new bool[n];
        if (member.FixedStations.Count == 0)
            throw new SectionTwistException("bad-member", "no station is held against rotation; fix at least one station (supports)");
        foreach (var s in member.FixedStations) fixedDof[2 * Station(s, "the supports")] = true;
        // a station where no warping segment ends (a coupling's own station, a taper's end) has no phi' freedom
        for (int i = 0; i < stations.Length; i++) if (!warps[i]) fixedDof[2 * i + 1] = true;
        foreach (var (name, end) in member.Warping)
        {
            int i = Station(name, "a warping condition");
            if (end.Kind == WarpingEndKind.Restrained) fixedDof[2 * i + 1] = true;
            else if (end.Kind == WarpingEndKind.Spring)
            {
                if (!(end.Stiffness >= 0) || !double.IsFinite(end.Stiffness))
                    throw new SectionTwistException("bad-member", $"station {name}: warping spring stiffness {end.Stiffness} N*m^3 must be zero or positive");
                k[(2 * i + 1) * n + 2 * i + 1] += end.Stiffness;
            }
        }
        var d = SolveReduced(k, f, fixedDof, n);
        return BuildResult(member, stations, elements, k, f, d, fixedDof, warps);
    }

    /// <summary>A segment's element: the Vlasov element of a warping segment, or the Saint-Venant element of a round taper.</summary>
    private sealed record MemberElement(WarpingSegment Seg, int A, int B, VlasovElement? Vlasov, SegmentElement? Taper);

    private static SegmentElement SaintVenantElement(WarpingSegment seg, int a, int b, double len, bool flip, double m)
    {
        double g = seg.Material.ShearModulus;
        if (seg.Taper is not { } taper)
        {
            if (!(seg.Section.TorsionConstant > 0) || !double.IsFinite(seg.Section.TorsionConstant))
                throw new SectionTwistException("bad-member", $"segment {seg.Label}: J must be positive (J = {seg.Section.TorsionConstant} m^4)");
            return new SegmentElement(a, b, len, g, new SectionStiffness(seg.Section.TorsionConstant, seg.Section.ShearPerTorque), 0, 0, m);
        }
        taper.Validate($"segment {seg.Label}");
        double dA = flip ? taper.EndDiameter : taper.StartDiameter, dB = flip ? taper.StartDiameter : taper.EndDiameter;
        return new SegmentElement(a, b, len, g, null, dA, dB, m);
    }

    private static void AddSpring(double[] k, int n, int i, int j, double ks)
    {
        k[i * n + i] += ks; k[j * n + j] += ks;
        k[i * n + j] -= ks; k[j * n + i] -= ks;
    }

    private static (double GJ, double EIw) Rigidities(WarpingSegment seg)
    {
        var s = seg.Section;
        double e = seg.Material.YoungsModulus ?? throw new SectionTwistException("bad-member",
            $"segment {seg.Label}: material {seg.Material.Name} has no Young's modulus E, which restrained warping needs (E Iw); give it E in its entry under 'materials:' (e.g. 'E: 210 GPa') or use a library material");
        if (!(s.TorsionConstant > 0) || !(s.WarpingConstant > 0) || !double.IsFinite(s.WarpingConstant))
            throw new SectionTwistException("bad-member", $"segment {seg.Label}: J must be positive and Iw positive or zero (J = {s.TorsionConstant} m^4, Iw = {s.WarpingConstant} m^6); give Iw = 0 for a section that does not warp");
        return (seg.Material.ShearModulus * s.TorsionConstant, e * s.WarpingConstant);
    }

    private static double[] SolveReduced(double[] k, double[] f, bool[] fixedDof, int n)
    {
        var free = Enumerable.Range(0, n).Where(i => !fixedDof[i]).ToArray();
        int m = free.Length;
        var a = new double[m * m];
        var b = new double[m];
        for (int r = 0; r < m; r++)
        {
            b[r] = f[free[r]];
            for (int c = 0; c < m; c++) a[r * m + c] = k[free[r] * n + free[c]];
        }
        if (m > 0 && DenseCholesky.Solve(a, m, b) >= 0)
            throw new SectionTwistException("unstable-member", "the member can rotate freely: a part of it is held neither against rotation nor connected to a support; add supports or segments");
        var d = new double[n];
        for (int r = 0; r < m; r++) d[free[r]] = b[r];
        return d;
    }

    private static WarpingMemberResult BuildResult(WarpingMember member, Station[] stations, List<MemberElement> elements,
        double[] k, double[] f, double[] d, bool[] fixedDof, bool[] warps)
    {
        int n = d.Length;
        var reaction = new double[n];
        for (int i = 0; i < n; i++)
        {
            var end = i % 2 == 1 && member.Warping.TryGetValue(stations[i / 2].Name, out var w) ? w : null;
            bool spring = end is { Kind: WarpingEndKind.Spring };
            if (!fixedDof[i] && !spring || i % 2 == 1 && !warps[i / 2]) continue;
            double s = -f[i];
            for (int j = 0; j < n; j++) s += k[i * n + j] * d[j];
            // k holds the warping spring on its diagonal, so k d - f vanishes at a spring's free phi': the bimoment the
            // spring applies to the member is -K phi', i.e. the members' own k d - f without the spring's term
            if (spring && !fixedDof[i]) s -= end!.Stiffness * d[i];
            reaction[i] = s;
        }
        var rate = new double[stations.Length];
        for (int i = 0; i < stations.Length; i++) rate[i] = d[2 * i + 1];
        var segs = new List<WarpingSegmentResult>();
        Span<double> ends = stackalloc double[4];
        Span<double> phi = stackalloc double[4];
        foreach (var e in elements.OrderBy(e => e.A))
        {
            var seg = e.Seg;
            int a = e.A, b = e.B;
            double x0 = stations[a].Position, len = stations[b].Position - x0;
            if (e.Taper is { } sv)
            {
                segs.Add(SaintVenantResult(seg, sv, x0, d[2 * a], d[2 * b], out double rateA, out double rateB));
                // a station without a phi' freedom reports this segment's rate of twist there
                if (!warps[a]) rate[a] = rateA;
                if (!warps[b]) rate[b] = rateB;
                continue;
            }
            var el = e.Vlasov!;
            var (gj, eiw) = Rigidities(seg);
            double modulus = eiw / seg.Section.WarpingConstant;
            ends[0] = d[2 * a]; ends[1] = d[2 * a + 1]; ends[2] = d[2 * b]; ends[3] = d[2 * b + 1];
            var pts = new WarpingPoint[SamplesPerSegment];
            for (int q = 0; q < pts.Length; q++)
            {
                double x = len * q / (pts.Length - 1);
                el.Field(ends, x, phi);
                double svShear = Math.Abs(gj * phi[1]) * seg.Section.ShearPerTorque, tw = modulus * seg.Section.WarpingShearFactor * Math.Abs(phi[3]);
                pts[q] = new WarpingPoint(x0 + x, phi[0], phi[1], gj * phi[1], -eiw * phi[3], -eiw * phi[2],
                    modulus * seg.Section.MaxSectorialCoordinate * Math.Abs(phi[2]), svShear, tw, svShear + tw);
            }
            segs.Add(new WarpingSegmentResult
            {
                Label = seg.Label,
                Points = Array.AsReadOnly(pts),
                MaxBimoment = pts.Max(p => Math.Abs(p.Bimoment)),
                MaxWarpingNormalStress = pts.Max(p => p.WarpingNormalStress),
                MaxSaintVenantShear = pts.Max(p => p.SaintVenantShear),
                MaxWarpingShear = pts.Max(p => p.WarpingShear),
                MaxCombinedShear = pts.Max(p => p.CombinedShear),
                ShearUnbounded = seg.Section.ShearUnbounded,
                MaxRotation = pts.Max(p => Math.Abs(p.Rotation)),
                WarpingLength = Math.Sqrt(eiw / gj),
            });
        }
        // reaction torques that are zero in exact arithmetic (a free shaft's reference station) are written as 0
        double torqueScale = 0;
        for (int i = 0; i < n; i += 2) torqueScale += Math.Abs(f[i]);
        // rates of twist and bimoments that are zero in exact arithmetic (mid-span of a symmetric member) are written as 0,
        // not as round-off whose sign depends on the order of the sums
        double rateScale = segs.SelectMany(x => x.Points).Select(p => Math.Abs(p.RateOfTwist)).DefaultIfEmpty(0).Max();
        double bimomentScale = segs.Select(x => x.MaxBimoment).DefaultIfEmpty(0).Max();
        var st = stations.Select((s, i) => new WarpingStationResult(s.Name, s.Position, d[2 * i], Units.NumberText.Clean(rate[i], rateScale),
            Units.NumberText.Clean(reaction[2 * i], torqueScale, 1e-10), Units.NumberText.Clean(reaction[2 * i + 1], bimomentScale))).ToArray();
        var springs = member.Springs.Select(sp =>
        {
            double windup = d[2 * Array.FindIndex(stations, x => x.Name == sp.StationB)] - d[2 * Array.FindIndex(stations, x => x.Name == sp.StationA)];
            return new SpringResult(sp.Label, sp.StationA, sp.StationB, sp.Stiffness * windup, windup);
        }).ToArray();
        var warnings = new List<string>();
        var idle = member.Warping.Where(w => w.Value.Kind != WarpingEndKind.Free && !warps[Array.FindIndex(stations, x => x.Name == w.Key)]).Select(w => w.Key).ToArray();
        if (idle.Length > 0)
            warnings.Add($"station{(idle.Length > 1 ? "s" : "")} {string.Join(", ", idle)}: the warping condition changes nothing: no segment of open section ends there (round, closed and tapered segments do not warp); give it where an open segment ends, or leave it out");
        if (!member.Warping.Values.Any(w => w.Kind != WarpingEndKind.Free))
            warnings.Add("warping is free at every station: the twist is T L / (G J) with no warping stresses; if any end or support restrains warping (end plates, continuity), state it, since twist and stresses change");
        foreach (var seg in elements.Where(x => x.Vlasov is not null).Select(x => x.Seg).Where(s => !(s.Section.WarpingShearFactor > 0)))
            warnings.Add($"segment {seg.Label}: the section gives no warping shear factor; the warping shear is left out of the shear values (analyse the section with its warping function)");
        foreach (var seg in elements.Select(x => x.Seg).Where(s => s.Section.ShearUnbounded))
            warnings.Add($"segment {seg.Label}: the section has a sharp re-entrant corner; its Saint-Venant and warping shear peaks are unbounded (the tables say so); model the real fillet radii");
        warnings.Add("the combined shear adds the Saint-Venant and warping peaks (a bound: they need not lie at the same point); lateral-torsional buckling, local buckling and connection design are not checked: follow the local steel design code and licensed engineering practice");
        return new WarpingMemberResult { Stations = st, Segments = segs.AsReadOnly(), Springs = Array.AsReadOnly(springs), Warnings = warnings.AsReadOnly() };
    }

    /// <summary>
    /// The samples of a segment in Saint-Venant torsion (a round taper, or a section with Iw = 0): internal torque
    /// T(s) = Ta - t s, rotation phi_a + Ta F0(s) - t F1(s) with F0, F1 the flexibility integrals over [0, s]
    /// (<see cref="SegmentElement"/>), shear |T| times the peak shear per unit torque at s; no warping values.
    /// </summary>
    private static WarpingSegmentResult SaintVenantResult(WarpingSegment seg, SegmentElement sv, double x0, double phiA, double phiB, out double rateA, out double rateB)
    {
        double ta = sv.TorqueA(phiA, phiB), t = sv.Distributed, len = sv.Length, g = sv.G;
        double Diameter(double s) => sv.DiameterA + (sv.DiameterB - sv.DiameterA) * s / len;
        double Rate(double s) => (ta - t * s) / (g * (sv.Section?.TorsionConstant ?? Math.PI * Math.Pow(Diameter(s), 4) / 32));
        double ShearPerTorque(double s) => sv.Section?.ShearPerTorque ?? 16 / (Math.PI * Math.Pow(Diameter(s), 3));
        double RotationAt(double s)
        {
            var part = new SegmentElement(0, 1, s, g, sv.Section, sv.DiameterA, sv.Section is null ? Diameter(s) : 0, t);
            return phiA + ta * part.F0 - t * part.F1;
        }
        var pts = new WarpingPoint[SamplesPerSegment];
        for (int q = 0; q < pts.Length; q++)
        {
            double s = len * q / (pts.Length - 1), torque = ta - t * s;
            double rot = q == 0 ? phiA : q == pts.Length - 1 ? phiB : RotationAt(s);
            double shear = Math.Abs(torque) * ShearPerTorque(s);
            pts[q] = new WarpingPoint(x0 + s, rot, Rate(s), torque, 0, 0, 0, shear, 0, shear);
        }
        rateA = Rate(0);
        rateB = Rate(len);
        double peak = Math.Max(sv.MaxShear(ta), pts.Max(p => p.SaintVenantShear));
        return new WarpingSegmentResult
        {
            Label = seg.Label,
            Points = Array.AsReadOnly(pts),
            MaxBimoment = 0,
            MaxWarpingNormalStress = 0,
            MaxSaintVenantShear = peak,
            MaxWarpingShear = 0,
            MaxCombinedShear = peak,
            ShearUnbounded = seg.Section.ShearUnbounded,
            MaxRotation = pts.Max(p => Math.Abs(p.Rotation)),
            WarpingLength = 0,
        };
    }
}
