using SectionTwist.Shaft;

namespace SectionTwist.Dynamics;

/// <summary>What a stiffness part of the train is.</summary>
public enum TrainPartKind
{
    /// <summary>A shaft segment.</summary>
    Segment,
    /// <summary>A torsional spring (coupling).</summary>
    Spring,
    /// <summary>A gear or belt stage with a mesh stiffness.</summary>
    Mesh,
}

/// <summary>One segment as the dynamics sees it: ends ordered along the axis, stiffness and inertia data.</summary>
internal sealed record SegmentData(int Part, int A, int B, double Length, double G, double Density, double? J, double? Ip, double DiameterA, double DiameterB, double ShearPerTorque)
{
    public bool IsTaper => J is null;

    /// <summary>Torsional wave speed sqrt(G J / (rho Ip)); sqrt(G / rho) for a round taper (J = Ip).</summary>
    public double WaveSpeed => IsTaper ? Math.Sqrt(G / Density) : Math.Sqrt(G * J!.Value / (Density * Ip!.Value));
}

/// <summary>A stiffness part (segment, spring, mesh) between two stations, for results.</summary>
internal sealed record TrainPart(TrainPartKind Kind, string Label, string Shaft, int StationA, int StationB);

/// <summary>
/// The checked structure of a <see cref="DrivetrainModel"/>: stations of all shafts in one list, segments with their
/// inertia data, springs, stages, lumped inertias, fixed stations and the speed of every station relative to the reference
/// shaft (found by walking the segments, springs and stages; a loop of stages must agree).
/// </summary>
internal sealed class DrivetrainTopology
{
    public List<string> Stations { get; } = [];
    public List<string> StationShaft { get; } = [];
    public Dictionary<string, int> Index { get; } = new(StringComparer.Ordinal);
    public List<TrainPart> Parts { get; } = [];
    public List<SegmentData> Segments { get; } = [];
    /// <summary>Springs: part index, station a, station b, stiffness.</summary>
    public List<(int Part, int A, int B, double K)> Springs { get; } = [];
    /// <summary>Stages: the stage, driving and driven station, part index of its mesh (-1 when rigid).</summary>
    public List<(GearStage Stage, int A, int B, int Part)> Stages { get; } = [];
    public double[] Lumped { get; }
    public bool[] Fixed { get; }
    /// <summary>Signed speed of each station relative to the reference shaft.</summary>
    public double[] SpeedRatio { get; }
    /// <summary>False for stations not linked to the reference shaft.</summary>
    public bool[] LinkedToReference { get; }
    public string ReferenceShaft { get; }

    public DrivetrainTopology(DrivetrainModel model)
    {
        ArgumentNullException.ThrowIfNull(model);
        if (model.Shafts.Count == 0) throw new SectionTwistException("bad-drivetrain", "the drivetrain has no shaft; give at least one shaft with stations and segments");
        var shaftNames = new HashSet<string>(StringComparer.Ordinal);
        foreach (var sh in model.Shafts)
        {
            if (!shaftNames.Add(sh.Name)) throw new SectionTwistException("bad-drivetrain", $"shaft '{sh.Name}' is defined twice; give each shaft a unique name");
            foreach (var st in sh.Model.Stations)
            {
                if (Index.ContainsKey(st.Name))
                    throw new SectionTwistException("bad-drivetrain", $"station '{st.Name}' of shaft '{sh.Name}' has the name of a station of shaft '{StationShaft[Index[st.Name]]}'; station names must be unique over all shafts");
                Index[st.Name] = Stations.Count;
                Stations.Add(st.Name);
                StationShaft.Add(sh.Name);
            }
        }
        ReferenceShaft = model.ReferenceShaft ?? model.Shafts[0].Name;
        if (!shaftNames.Contains(ReferenceShaft)) throw new SectionTwistException("bad-drivetrain", $"reference shaft '{ReferenceShaft}' does not exist (shafts: {string.Join(", ", shaftNames)})");

        foreach (var sh in model.Shafts)
        {
            var pos = sh.Model.Stations.ToDictionary(s => s.Name, s => s.Position, StringComparer.Ordinal);
            foreach (var seg in sh.Model.Segments) AddSegment(sh.Name, seg, pos);
            foreach (var sp in sh.Model.Springs)
            {
                if (!(sp.Stiffness > 0) || !double.IsFinite(sp.Stiffness))
                    throw new SectionTwistException("bad-drivetrain", $"spring '{sp.Label}': stiffness {sp.Stiffness} N*m/rad must be positive");
                Springs.Add((Parts.Count, Station(sp.StationA, $"spring '{sp.Label}'"), Station(sp.StationB, $"spring '{sp.Label}'"), sp.Stiffness));
                Parts.Add(new TrainPart(TrainPartKind.Spring, sp.Label, sh.Name, Index[sp.StationA], Index[sp.StationB]));
            }
        }
        foreach (var g in model.Stages)
        {
            int a = Station(g.Driving, $"stage '{g.Label}'"), b = Station(g.Driven, $"stage '{g.Label}'");
            if (!(g.Ratio > 0) || !double.IsFinite(g.Ratio)) throw new SectionTwistException("bad-drivetrain", $"stage '{g.Label}': ratio {g.Ratio} must be positive");
            if (StationShaft[a] == StationShaft[b]) throw new SectionTwistException("bad-drivetrain", $"stage '{g.Label}': stations '{g.Driving}' and '{g.Driven}' are on the same shaft '{StationShaft[a]}'; a stage joins two shafts");
            int part = -1;
            if (g.MeshStiffness is { } km)
            {
                if (!(km > 0) || !double.IsFinite(km)) throw new SectionTwistException("bad-drivetrain", $"stage '{g.Label}': mesh stiffness {km} N*m/rad must be positive (leave it out for a rigid stage)");
                part = Parts.Count;
                Parts.Add(new TrainPart(TrainPartKind.Mesh, g.Label, StationShaft[a], a, b));
            }
            Stages.Add((g, a, b, part));
        }
        Lumped = new double[Stations.Count];
        foreach (var pi in model.Inertias)
        {
            int s = Station(pi.Station, $"inertia '{pi.Label}'");
            if (!(pi.Inertia > 0) || !double.IsFinite(pi.Inertia)) throw new SectionTwistException("bad-inertia", $"inertia '{pi.Label}': {pi.Inertia} kg*m^2 must be positive");
            Lumped[s] += pi.Inertia;
        }
        Fixed = new bool[Stations.Count];
        foreach (var f in model.FixedStations) Fixed[Station(f, "fixed stations")] = true;
        (SpeedRatio, LinkedToReference) = Speeds();
    }

    private int Station(string name, string what) => Index.TryGetValue(name, out int i) ? i
        : throw new SectionTwistException("bad-drivetrain", $"{what}: no station named '{name}' (stations: {string.Join(", ", Stations)}); fix the name");

    private void AddSegment(string shaft, ShaftSegment seg, Dictionary<string, double> pos)
    {
        double xa = pos[seg.From], xb = pos[seg.To];
        int a = Index[seg.From], b = Index[seg.To];
        double dA = seg.Taper?.StartDiameter ?? 0, dB = seg.Taper?.EndDiameter ?? 0;
        if (xa > xb) { (a, b) = (b, a); (dA, dB) = (dB, dA); }
        double rho = seg.Material.Density ?? throw new SectionTwistException("bad-drivetrain",
            $"segment '{seg.Label}' of shaft '{shaft}': material '{seg.Material.Name}' has no density, which the shaft's own inertia needs; give the material 'density: 7850 kg/m^3' (steel) or use a library material");
        double? ip = null;
        if (seg.Section is { } s)
        {
            ip = s.PolarMoment ?? throw new SectionTwistException("bad-drivetrain",
                $"segment '{seg.Label}' of shaft '{shaft}': section '{s.Description}' has no polar second moment of area (Ix + Iy, not J), which the shaft's own inertia needs; add 'polarMoment' to the section");
        }
        Segments.Add(new SegmentData(Parts.Count, a, b, Math.Abs(xb - xa), seg.Material.ShearModulus, rho, seg.Section?.TorsionConstant, ip, dA, dB,
            seg.Section?.ShearPerTorque ?? 16 / (Math.PI * Math.Pow(Math.Min(dA, dB), 3))));
        Parts.Add(new TrainPart(TrainPartKind.Segment, seg.Label, shaft, Index[seg.From], Index[seg.To]));
    }

    private (double[], bool[]) Speeds()
    {
        int n = Stations.Count;
        var adj = new List<(int To, double Factor, string Via)>[n];
        for (int i = 0; i < n; i++) adj[i] = [];
        void Link(int a, int b, double f, string via) { adj[a].Add((b, f, via)); adj[b].Add((a, 1 / f, via)); }
        foreach (var s in Segments) Link(s.A, s.B, 1, Parts[s.Part].Label);
        foreach (var s in Springs) Link(s.A, s.B, 1, Parts[s.Part].Label);
        foreach (var g in Stages) Link(g.A, g.B, g.Stage.Transmission, $"stage '{g.Stage.Label}'");
        var ratio = new double[n];
        var seen = new bool[n];
        var linked = new bool[n];
        int start = StationShaft.IndexOf(ReferenceShaft);
        var order = new List<int> { start };
        order.AddRange(Enumerable.Range(0, n).Where(i => i != start));
        foreach (int root in order)
        {
            if (seen[root]) continue;
            bool isRef = root == start;
            var queue = new Queue<int>();
            queue.Enqueue(root); seen[root] = true; ratio[root] = 1; linked[root] = isRef;
            while (queue.Count > 0)
            {
                int u = queue.Dequeue();
                foreach (var (v, f, via) in adj[u])
                {
                    double r = ratio[u] * f;
                    if (seen[v])
                    {
                        if (Math.Abs(ratio[v] - r) > 1e-9 * Math.Abs(r))
                            throw new SectionTwistException("bad-drivetrain",
                                $"the stages form a loop whose ratios disagree at station '{Stations[v]}' ({ratio[v]:G6} against {r:G6} via {via}); such a loop locks the train: check the ratios and kinds of the stages");
                        continue;
                    }
                    seen[v] = true; ratio[v] = r; linked[v] = isRef;
                    queue.Enqueue(v);
                }
            }
        }
        return (ratio, linked);
    }
}
