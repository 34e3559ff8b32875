using SectionTwist.Fatigue;
using SectionTwist.Keys;
using SectionTwist.Shaft;

namespace SectionTwist.Bending;

/// <summary>Loads, recovery along the shaft and the strength checks of <see cref="BendingAnalysis"/>.</summary>
internal sealed partial class BendingAnalysis
{
    private (double[] Fy, double[] Fz, double[] Fx, double[] Cy, double[] Cz, List<ResolvedLoad> Resolved) ResolveLoads(int nn)
    {
        double[] fy = new double[nn], fz = new double[nn], fx = new double[nn], cy = new double[nn], cz = new double[nn];
        var resolved = new List<ResolvedLoad>();
        var applied = torsion.Stations.ToDictionary(s => s.Name, s => s.AppliedTorque, StringComparer.Ordinal);
        foreach (var load in _b.Loads)
        {
            int n = Node(load.Station, "load");
            double py, pz, px = 0, my = 0, mz = 0;
            string kind, text;
            switch (load)
            {
                case PointForce f:
                    py = f.ForceY; pz = f.ForceZ; px = f.AxialForce; kind = "force"; text = f.Description ?? "force";
                    break;
                case GearMesh g:
                    {
                        double t = applied[g.Station], r = g.PitchDiameter / 2;
                        if (!(r > 0)) throw new SectionTwistException("bad-gear", $"gear at '{g.Station}': the pitch diameter must be positive");
                        if (t == 0) _warnings.Add($"gear at '{g.Station}': no torque is applied there in the torsion model, so its mesh force is zero; apply the gear's torque at that station");
                        double wt = t / r;
                        double wr = Math.Abs(wt) * Math.Tan(g.PressureAngle) / Math.Cos(g.HelixAngle);
                        var (c, s) = PlaneDirection.Of(g.MeshAngle);
                        py = -wt * s - wr * c; pz = wt * c - wr * s;
                        px = wt * Math.Tan(g.HelixAngle);
                        // axial force at the pitch point (0, r c, r s): moment r x F = (0, r s Fx, -r c Fx)
                        my = r * s * px; mz = -r * c * px;
                        kind = "gear";
                        // no numbers with units here: the core does not know the display units; the forces are in the Fy, Fz, axial columns
                        text = g.Description ?? $"gear mesh: tangential force from the torque at the pitch radius, radial by the pressure angle{(g.HelixAngle != 0 ? ", axial by the helix angle" : "")}";
                        break;
                    }
                case BeltPull b:
                    {
                        double t = applied[b.Station], r = b.Diameter / 2;
                        if (!(r > 0) || !(b.Factor >= 1)) throw new SectionTwistException("bad-pull", $"pull at '{b.Station}': the diameter must be positive and the factor at least 1");
                        if (t == 0) _warnings.Add($"pull at '{b.Station}': no torque is applied there in the torsion model, so the pull is zero");
                        double f = b.Factor * Math.Abs(t) / r;
                        var (c, s) = PlaneDirection.Of(b.Direction);
                        py = f * c; pz = f * s;
                        kind = "pull"; text = b.Description ?? $"pull: {Units.NumberText.Format(b.Factor, 3)} x torque / pulley radius";
                        break;
                    }
                default:
                    throw new SectionTwistException("bad-load", $"unsupported transverse load {load.GetType().Name}");
            }
            // round-off of cos(90 deg) and the like: components below 1e-12 of the load's size are zero
            double size = Math.Max(Math.Max(Math.Abs(py), Math.Abs(pz)), Math.Abs(px));
            py = Clean(py, size); pz = Clean(pz, size); px = Clean(px, size); my = Clean(my, Math.Abs(my) + Math.Abs(mz)); mz = Clean(mz, Math.Abs(my) + Math.Abs(mz));
            if (!double.IsFinite(py + pz + px + my + mz)) throw new SectionTwistException("bad-load", $"load at '{load.Station}' is not finite");
            fy[n] += py; fz[n] += pz; fx[n] += px;
            // in-plane moments in the sense of a positive slope: plane Y (x toward Y) is about +Z, plane Z (x toward Z) about -Y
            cy[n] += mz; cz[n] -= my;
            resolved.Add(new ResolvedLoad(load.Station, kind, py, pz, px, my, mz, text));
        }
        return (fy, fz, fx, cy, cz, resolved);
    }

    private static double Clean(double v, double size) => Math.Abs(v) <= 1e-12 * size ? 0 : v + 0.0;

    private (int Node, double Reaction) _thrust;

    /// <summary>Internal axial force of each element (tension positive), the thrust bearing taking the net axial load.</summary>
    private double[] AxialForces(double[] fx)
    {
        double net = fx.Sum();
        var thrust = _b.Bearings.Where(b => b.TakesThrust).ToList();
        if (thrust.Count > 1) throw new SectionTwistException("bending-thrust", $"bending: {thrust.Count} bearings take the thrust; mark exactly one with 'thrust: true'");
        int tn = thrust.Count == 1 ? Node(thrust[0].Station, "thrust bearing") : -1;
        if (fx.Any(v => v != 0) && tn < 0)
            throw new SectionTwistException("bending-thrust", "bending: axial loads act (helical gear or axial force) but no bearing takes the thrust; mark one bearing with 'thrust: true'");
        _thrust = (tn, -net);
        var n = new double[_pieces.Count];
        double sum = 0;
        for (int e = 0; e < _pieces.Count; e++)
        {
            sum += fx[e] + (e == tn ? -net : 0);
            n[e] = 0.0 - sum; // no negative zero without axial loads (a CSV cell of '-0')
        }
        return n;
    }

    private List<BendingSample> Samples(List<Seg> segs, BeamPlaneSolution y, BeamPlaneSolution z, double[] axial)
    {
        var list = new List<BendingSample>(2 * _pieces.Count);
        for (int e = 0; e < _pieces.Count; e++)
        {
            var p = _pieces[e];
            var sg = segs[p.Segment];
            for (int end = 0; end < 2; end++)
            {
                double x = end == 0 ? p.X0 : p.X1;
                int node = e + end;
                double my2 = end == 0 ? y.MomentStart[e] : y.MomentEnd[e], mz2 = end == 0 ? z.MomentStart[e] : z.MomentEnd[e];
                double frac = (x - sg.X0) / (sg.X1 - sg.X0);
                double t = sg.Result.TorqueAtFrom + (sg.Result.TorqueAtTo - sg.Result.TorqueAtFrom) * frac;
                var section = p.SectionAt(x);
                // section frame: Mx (about profile x = Y) = My vector = -M_planeZ; My (about profile y = Z) = Mz vector = M_planeY
                var stress = CombinedStress.Worst(section, axial[e], -mz2, my2, t, _b.Rotating);
                var mat = sg.Model.Material;
                double? fos = mat.YieldStrength is { } sy ? (stress.VonMises > 0 ? sy / stress.VonMises : double.PositiveInfinity) : null;
                double? nf = null;
                if (_b.Fatigue is { } fs && _b.Rotating && mat.UltimateStrength is { } sut)
                {
                    var se = EnduranceLimit.Compute(fs, sut, section.OuterDiameter).Value;
                    nf = FatigueEvaluator.Evaluate(section, axial[e], Math.Sqrt(my2 * my2 + mz2 * mz2), t, 1, 1, se, sut, mat.YieldStrength, fs.Criterion).N;
                }
                list.Add(new BendingSample
                {
                    Position = x, Segment = sg.Result.Label,
                    ShearY = end == 0 ? y.ShearStart[e] : y.ShearEnd[e], ShearZ = end == 0 ? z.ShearStart[e] : z.ShearEnd[e],
                    MomentY = my2, MomentZ = mz2,
                    DeflectionY = y.Deflection[node], DeflectionZ = z.Deflection[node], SlopeY = y.Slope[node], SlopeZ = z.Slope[node],
                    AxialForce = axial[e], Torque = t, Stress = stress, StaticSafetyFactor = fos, FatigueSafetyFactor = nf,
                });
            }
        }
        if (_b.Fatigue is not null && !_b.Rotating)
            _warnings.Add("fatigue: the method is for rotating shafts (fully reversed bending); with 'rotating: false' the bending is steady and no fatigue factor is given");
        return list;
    }

    private List<BearingResult> BearingResults(BeamPlaneSolution y, BeamPlaneSolution z, (int Node, bool Clamp)[] supports, double[] fx)
    {
        var list = new List<BearingResult>();
        var used = new HashSet<int>();
        foreach (var b in _b.Bearings.OrderBy(b => _x[_stationNode[b.Station]]))
        {
            int node = _stationNode[b.Station];
            int si = Array.FindIndex(supports, s => s.Node == node);
            bool first = used.Add(node);
            double sy = y.Slope[node], sz = z.Slope[node];
            bool clamp = supports[si].Clamp;
            list.Add(new BearingResult
            {
                Label = b.Label, Station = b.Station, Position = _x[node],
                ForceY = first ? y.Reactions[si].Force : 0, ForceZ = first ? z.Reactions[si].Force : 0,
                AxialForce = b.TakesThrust ? _thrust.Reaction + 0.0 : 0,
                MomentY = first && clamp ? y.Reactions[si].Moment : 0, MomentZ = first && clamp ? z.Reactions[si].Moment : 0,
                Slope = clamp ? 0 : Math.Sqrt(sy * sy + sz * sz),
                SlopeLimit = b.SlopeLimit ?? _b.SlopeLimit,
            });
        }
        _ = fx;
        return list;
    }

    private List<SegmentStress> SegmentResults(List<Seg> segs, List<BendingSample> samples)
    {
        var list = new List<SegmentStress>();
        foreach (var s in segs)
        {
            var mine = samples.Where(p => p.Segment == s.Result.Label && p.Position >= s.X0 && p.Position <= s.X1).ToList();
            var worst = mine.MaxBy(p => p.Stress.VonMises)!;
            var mat = s.Model.Material;
            if (mat.StrengthBasis == MaterialBasis.Typical)
                _warnings.Add($"segment '{s.Result.Label}': the yield strength of '{mat.Name}' is a typical value, not a specified minimum: the static factor of safety is not a design value");
            if (s.Model.Section?.Bending is { HasSingularCorner: true })
                _warnings.Add($"segment '{s.Result.Label}': its section has a sharp re-entrant corner, where the torsional shear (and so the combined stress) is singular and grows with refinement; model the real fillet radius");
            if (mat.YieldStrength is null)
                _warnings.Add($"segment '{s.Result.Label}': material '{mat.Name}' has no yield strength; give 'yield' for the static check");
            list.Add(new SegmentStress
            {
                Label = s.Result.Label, Section = s.Result.Section, Material = mat.Name,
                MaxMoment = mine.Max(p => p.Moment), Position = worst.Position, Stress = worst.Stress,
                YieldStrength = mat.YieldStrength,
                StrengthBasis = mat.StrengthBasis switch { MaterialBasis.SpecifiedMinimum => "specified-minimum", MaterialBasis.Typical => "typical", _ => "user" },
                FatigueSafetyFactor = mine.Any(p => p.FatigueSafetyFactor is not null) ? mine.Min(p => p.FatigueSafetyFactor ?? double.PositiveInfinity) : null,
            });
        }
        return list;
    }

    private List<ConnectionResult> ConnectionChecks(List<Seg> segs)
    {
        var list = new List<ConnectionResult>();
        foreach (var c in _b.Connections)
        {
            var s = segs.FirstOrDefault(g => g.Result.Label == c.Segment)
                ?? throw new SectionTwistException("bad-connection", $"key or spline: no segment '{c.Segment}' (segments: {string.Join(", ", segs.Select(g => g.Result.Label))})");
            double t = Math.Max(Math.Abs(s.Result.TorqueAtFrom), Math.Abs(s.Result.TorqueAtTo));
            double d = s.Model.Section?.Bending?.OuterDiameter ?? s.Model.Section?.OuterDiameter ?? Math.Min(s.Model.Taper!.StartDiameter, s.Model.Taper.EndDiameter);
            list.Add(ConnectionCalculator.Evaluate(c, t, d));
        }
        return list;
    }
}
