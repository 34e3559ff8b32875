using SectionTwist.Shaft;

namespace SectionTwist.WarpingTorsion;

/// <summary>
/// Solves a <see cref="WarpingMember"/> by the stiffness method with exact Vlasov elements (<see cref="VlasovElement"/>),
/// two freedoms per station (rotation phi and rate of twist phi'). Rotation supports and warping restraints remove
/// freedoms; warping springs add to the phi' diagonal; reactions are recovered from the full system.
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
        var elements = new List<(WarpingSegment Seg, int A, int B, VlasovElement El)>();
        foreach (var seg in member.Segments)
        {
            int a = Station(seg.From, $"segment {seg.Label}"), b = Station(seg.To, $"segment {seg.Label}");
            if (a > b) (a, b) = (b, a);
            double len = stations[b].Position - stations[a].Position;
            if (!(len > 0)) throw new SectionTwistException("bad-member", $"segment {seg.Label}: its stations are at the same position; give it a positive length");
            var (gj, eiw) = Rigidities(seg);
            double m = member.Loads.OfType<DistributedTorque>()
                .Where(d => (Station(d.From, "a distributed torque"), Station(d.To, "a distributed torque")) is var (p, q) && Math.Min(p, q) == a && Math.Max(p, q) == b)
                .Sum(d => d.TorquePerLength);
            var el = new VlasovElement(len, gj, eiw, m);
            int[] dof = [2 * a, 2 * a + 1, 2 * b, 2 * b + 1];
            for (int r = 0; r < 4; r++)
            {
                f[dof[r]] += el.Load[r];
                for (int c = 0; c < 4; c++) k[dof[r] * n + dof[c]] += el.Stiffness[r * 4 + c];
            }
            elements.Add((seg, a, b, el));
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
        return BuildResult(member, stations, elements, k, f, d, fixedDof);
    }

    private static (double GJ, double EIw) Rigidities(WarpingSegment seg)
    {
        var s = seg.Section;
        double e = seg.Material.YoungsModulus ?? throw new SectionTwistException("bad-member",
            $"segment {seg.Label}: material {seg.Material.Name} has no Young's modulus E; give E for warping torsion");
        if (!(s.TorsionConstant > 0) || !(s.WarpingConstant > 0) || !double.IsFinite(s.WarpingConstant))
            throw new SectionTwistException("bad-member", $"segment {seg.Label}: J and Iw must be positive (J = {s.TorsionConstant} m^4, Iw = {s.WarpingConstant} m^6); a section that does not warp needs no warping analysis");
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

    private static WarpingMemberResult BuildResult(WarpingMember member, Station[] stations, List<(WarpingSegment Seg, int A, int B, VlasovElement El)> elements,
        double[] k, double[] f, double[] d, bool[] fixedDof)
    {
        int n = d.Length;
        var reaction = new double[n];
        for (int i = 0; i < n; i++)
        {
            bool spring = i % 2 == 1 && member.Warping.TryGetValue(stations[i / 2].Name, out var w) && w.Kind == WarpingEndKind.Spring;
            if (!fixedDof[i] && !spring) continue;
            double s = -f[i];
            for (int j = 0; j < n; j++) s += k[i * n + j] * d[j];
            reaction[i] = s;
        }
        var st = stations.Select((s, i) => new WarpingStationResult(s.Name, s.Position, d[2 * i], d[2 * i + 1], reaction[2 * i], reaction[2 * i + 1])).ToArray();
        var segs = new List<WarpingSegmentResult>();
        Span<double> ends = stackalloc double[4];
        Span<double> phi = stackalloc double[4];
        foreach (var (seg, a, b, el) in elements.OrderBy(e => e.A))
        {
            var (gj, eiw) = Rigidities(seg);
            double e = eiw / seg.Section.WarpingConstant;
            double x0 = stations[a].Position, len = stations[b].Position - x0;
            ends[0] = d[2 * a]; ends[1] = d[2 * a + 1]; ends[2] = d[2 * b]; ends[3] = d[2 * b + 1];
            var pts = new WarpingPoint[SamplesPerSegment];
            for (int q = 0; q < pts.Length; q++)
            {
                double x = len * q / (pts.Length - 1);
                el.Field(ends, x, phi);
                double sv = Math.Abs(gj * phi[1]) * seg.Section.ShearPerTorque, tw = e * seg.Section.WarpingShearFactor * Math.Abs(phi[3]);
                pts[q] = new WarpingPoint(x0 + x, phi[0], phi[1], gj * phi[1], -eiw * phi[3], -eiw * phi[2],
                    e * seg.Section.MaxSectorialCoordinate * Math.Abs(phi[2]), sv, tw, sv + tw);
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
        var warnings = new List<string>();
        if (!member.Warping.Values.Any(w => w.Kind != WarpingEndKind.Free))
            warnings.Add("warping is free at every station: the twist is T L / (G J) with no warping stresses; if any end or support restrains warping (end plates, continuity), state it, since twist and stresses change");
        foreach (var seg in elements.Select(x => x.Seg).Where(s => !(s.Section.WarpingShearFactor > 0)))
            warnings.Add($"segment {seg.Label}: the section gives no warping shear factor; the warping shear is left out of the shear values (analyse the section with its warping function)");
        foreach (var seg in elements.Select(x => x.Seg).Where(s => s.Section.ShearUnbounded))
            warnings.Add($"segment {seg.Label}: the section has a sharp re-entrant corner; its Saint-Venant and warping shear peaks are unbounded (the tables say so); model the real fillet radii");
        warnings.Add("the combined shear adds the Saint-Venant and warping peaks (a bound: they need not lie at the same point); lateral-torsional buckling, local buckling and connection design are not checked: follow the local steel design code and licensed engineering practice");
        return new WarpingMemberResult { Stations = st, Segments = segs.AsReadOnly(), Warnings = warnings.AsReadOnly() };
    }
}
