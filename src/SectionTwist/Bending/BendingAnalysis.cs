using SectionTwist.Fatigue;
using SectionTwist.Shaft;

namespace SectionTwist.Bending;

/// <summary>
/// The transverse solve of a shaft (behind <see cref="ShaftBending.Solve"/>): the shaft is cut into beam elements (8 per
/// prismatic segment, 16 per taper), loads are resolved at the stations (gear and pull forces from the torque applied there
/// in the torsion solution), each plane is solved by the stiffness method, and at both ends of every element the combined
/// stress is scanned around the real section. Loads and checks in <c>BendingAnalysis.Checks.cs</c>.
/// </summary>
internal sealed partial class BendingAnalysis(ShaftModel model, ShaftResult torsion)
{
    private readonly BendingModel _b = model.Bending ?? throw new SectionTwistException("no-bending", "the shaft model has no bending data (bearings and loads)");
    private readonly List<string> _warnings = [];
    private readonly List<double> _x = [];
    private readonly List<Piece> _pieces = [];
    private readonly Dictionary<string, int> _stationNode = new(StringComparer.Ordinal);
    private BendingResult? _result;

    /// <summary>One beam element with its segment.</summary>
    private sealed record Piece(int Segment, double X0, double X1, Func<double, BendingSection> SectionAt, double E, double G, double? Density);

    public BendingResult Compute() => _result ??= Run();

    private BendingResult Run()
    {
        var segs = OrderedSegments();
        BuildNodes(segs);
        int nn = _x.Count;
        var (fy, fz, fx, cy, cz, resolved) = ResolveLoads(nn);
        var pY = new BeamPiece[_pieces.Count];
        var pZ = new BeamPiece[_pieces.Count];
        var (cosG, sinG) = PlaneDirection.Of(_b.GravityDirection);
        for (int e = 0; e < _pieces.Count; e++)
        {
            var p = _pieces[e];
            double x0 = p.X0;
            double q = 0;
            if (_b.SelfWeight)
            {
                if (p.Density is not { } rho)
                    throw new SectionTwistException("bending-density", $"segment '{segs[p.Segment].Result.Label}': self-weight needs the material's density; give 'density' (e.g. 7850 kg/m^3) or turn 'selfWeight' off");
                q = rho * _b.Gravity * p.SectionAt(0.5 * (p.X0 + p.X1)).Area;
            }
            double nu = Math.Clamp(p.E / (2 * p.G) - 1, 0, 0.5);
            // Cowper's shear coefficient of a solid circle, k = 6 (1 + nu) / (7 + 6 nu) (J. Appl. Mech. 33, 1966), used for all sections
            double k = 6 * (1 + nu) / (7 + 6 * nu);
            Func<double, double>? kga = _b.ShearDeformation ? s => k * p.G * p.SectionAt(x0 + s).Area : null;
            // plane Y deflects along Y = profile x: EI = E integral(x^2 dA) = E Iyy; plane Z: E Ixx
            pY[e] = new BeamPiece(s => p.E * p.SectionAt(x0 + s).Iyy, kga, q * cosG);
            pZ[e] = new BeamPiece(s => p.E * p.SectionAt(x0 + s).Ixx, kga, q * sinG);
        }
        var supports = Supports();
        var x = _x.ToArray();
        var solY = BeamPlaneSolver.Solve(x, pY, fy, cy, supports);
        var solZ = BeamPlaneSolver.Solve(x, pZ, fz, cz, supports);
        var axial = AxialForces(fx);
        if (_pieces.Select(p => p.SectionAt(0.5 * (p.X0 + p.X1))).Any(s => Math.Abs(s.Ixy) > 0.01 * Math.Sqrt(s.Ixx * s.Iyy)))
            _warnings.Add("a section has a product of inertia (no symmetry axis along Y or Z): the deflections leave out the coupling of the two planes; the stresses use the general formula with Ixy");

        var samples = Samples(segs, solY, solZ, axial);
        var bearings = BearingResults(solY, solZ, supports, fx);
        var segResults = SegmentResults(segs, samples);
        var governing = segResults.Where(s => s.Stress.VonMises > 0)
            .OrderBy(s => s.SafetyFactor ?? double.PositiveInfinity).ThenByDescending(s => s.Stress.VonMises).FirstOrDefault();
        var fatigue = NotchChecks(segs, samples);
        var connections = ConnectionChecks(segs);
        return new BendingResult
        {
            Samples = samples.AsReadOnly(),
            Bearings = bearings.AsReadOnly(),
            Loads = resolved.AsReadOnly(),
            Segments = segResults.AsReadOnly(),
            Governing = governing,
            FatigueSettings = _b.Fatigue,
            Fatigue = fatigue.AsReadOnly(),
            Connections = connections.AsReadOnly(),
            Warnings = _warnings.Distinct().ToList().AsReadOnly(),
        };
    }

    /// <summary>A torsion segment result with its model segment.</summary>
    private sealed record Seg(SegmentResult Result, ShaftSegment Model, double X0, double X1);

    private List<Seg> OrderedSegments()
    {
        var pos = torsion.Stations.ToDictionary(s => s.Name, s => s.Position, StringComparer.Ordinal);
        var list = new List<Seg>();
        var pool = model.Segments.ToList();
        foreach (var r in torsion.Segments)
        {
            var m = pool.First(s => s.Label == r.Label && ((s.From == r.From && s.To == r.To) || (s.From == r.To && s.To == r.From)));
            pool.Remove(m);
            list.Add(new Seg(r, m, pos[r.From], pos[r.To]));
        }
        list.Sort((a, b) => a.X0.CompareTo(b.X0));
        for (int i = 1; i < list.Count; i++)
            if (Math.Abs(list[i].X0 - list[i - 1].X1) > 1e-12 * Math.Max(1, Math.Abs(list[i].X0)))
                throw new SectionTwistException("bending-gap",
                    $"bending needs one continuous shaft: segments '{list[i - 1].Result.Label}' and '{list[i].Result.Label}' do not meet ({list[i - 1].Result.To} / {list[i].Result.From}); add the missing segment or leave 'bending' out");
        foreach (var s in list)
        {
            var e = s.Model.Material.YoungsModulus
                ?? throw new SectionTwistException("bending-modulus", $"segment '{s.Result.Label}': material '{s.Model.Material.Name}' has no Young's modulus; give 'E' (e.g. 207 GPa) for the bending solution");
            if (s.Model.Section is { Bending: null, MaterialShears: { Count: > 0 } } comp)
                throw new SectionTwistException("bending-section",
                    $"segment '{s.Result.Label}': section '{comp.Description}' is composite (parts of several materials), which the bending check does not treat yet; leave 'bending' out for this shaft, or check bending by hand with the transformed section of the materials");
            if (s.Model.Section is { Bending: null } sec)
                throw new SectionTwistException("bending-section",
                    $"segment '{s.Result.Label}': section '{sec.Description}' is known only by J and its shear factor; the bending check needs its shape: use 'round', 'tube', 'template' or 'dxf'");
            _ = e;
        }
        return list;
    }

    private void BuildNodes(List<Seg> segs)
    {
        for (int i = 0; i < segs.Count; i++)
        {
            var s = segs[i];
            if (i == 0) { _stationNode[s.Result.From] = 0; _x.Add(s.X0); }
            bool taper = s.Model.Taper is not null;
            int n = taper ? 16 : 8;
            Func<double, BendingSection> at;
            if (s.Model.Taper is { } t)
            {
                // diameters belong to the model's From/To; orient them along the axis
                bool flipped = s.Model.From != s.Result.From;
                double d0 = flipped ? t.EndDiameter : t.StartDiameter, d1 = flipped ? t.StartDiameter : t.EndDiameter;
                double x0 = s.X0, len = s.X1 - s.X0;
                at = x => BendingSection.Round(d0 + (d1 - d0) * Math.Clamp((x - x0) / len, 0, 1));
            }
            else
            {
                var bs = s.Model.Section!.Bending!;
                at = _ => bs;
            }
            for (int k = 1; k <= n; k++)
            {
                double xa = _x[^1], xb = k == n ? s.X1 : s.X0 + (s.X1 - s.X0) * k / n;
                _pieces.Add(new Piece(i, xa, xb, at, s.Model.Material.YoungsModulus!.Value, s.Model.Material.ShearModulus, s.Model.Material.Density));
                _x.Add(xb);
            }
            _stationNode[s.Result.To] = _x.Count - 1;
        }
        // stations that lie inside a segment are not possible (segments join stations), so every station with a load is a node
    }

    private int Node(string station, string what) =>
        _stationNode.TryGetValue(station, out int n) ? n
            : throw new SectionTwistException("bending-station", $"{what}: station '{station}' is not on the shaft's segments; put it at a segment end");

    private (int Node, bool Clamp)[] Supports()
    {
        if (_b.Bearings.Count == 0)
            throw new SectionTwistException("bending-mechanism", "bending: no bearings; give at least two bearings, e.g. 'bearings: [{at: A}, {at: D}]'");
        var map = new SortedDictionary<int, bool>();
        foreach (var b in _b.Bearings)
        {
            int n = Node(b.Station, $"bearing '{b.Label}'");
            map[n] = (map.TryGetValue(n, out bool c) && c) || b.Clamped;
        }
        return [.. map.Select(kv => (kv.Key, kv.Value))];
    }
}
