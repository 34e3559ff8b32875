using System.Globalization;

namespace SectionTwist.Shaft;

/// <summary>
/// Checks a <see cref="ShaftModel"/> and indexes it along the axis: stations sorted by position, segments oriented
/// from the end nearer the first station, loads and springs resolved to station indices, connectivity checked
/// (a part connected to no support is a mechanism).
/// </summary>
internal sealed class ShaftLayout
{
    private readonly Dictionary<string, int> _index = new(StringComparer.Ordinal);

    public ShaftLayout(ShaftModel model)
    {
        Model = model;
        if (model.Stations is null || model.Stations.Count == 0)
            throw new SectionTwistException("no-stations", "the shaft has no stations; add at least two stations and a segment between them");
        foreach (var s in model.Stations)
        {
            if (string.IsNullOrWhiteSpace(s.Name)) throw new SectionTwistException("bad-station", "a station has an empty name; give every station a unique name");
            if (!double.IsFinite(s.Position)) throw new SectionTwistException("bad-station", $"station '{s.Name}': position {s.Position} is not a finite number");
        }
        Stations = model.Stations.Select((s, i) => (s, i)).OrderBy(p => p.s.Position).ThenBy(p => p.i).Select(p => p.s).ToArray();
        for (int i = 0; i < Stations.Count; i++)
            if (!_index.TryAdd(Stations[i].Name, i))
                throw new SectionTwistException("duplicate-station", $"station '{Stations[i].Name}' is defined twice; give each station a unique name");
        if (model.Segments is null || model.Segments.Count == 0)
            throw new SectionTwistException("no-segments", "the shaft has no segments; add segments between the stations");

        var fixedSet = new SortedSet<int>();
        foreach (var f in model.FixedStations) fixedSet.Add(Index(f, "fixed support"));
        Fixed = [.. fixedSet];

        var dist = new Dictionary<(int, int), double>();
        foreach (var load in model.Loads)
        {
            switch (load)
            {
                case PointTorque p:
                    if (!double.IsFinite(p.Torque)) throw new SectionTwistException("bad-load", $"torque at station '{p.Station}' is not a finite number");
                    PointLoads.Add((Index(p.Station, "torque"), p.Torque, p));
                    break;
                case DistributedTorque d:
                    if (!double.IsFinite(d.TorquePerLength)) throw new SectionTwistException("bad-load", $"distributed torque on {d.From}-{d.To} is not a finite number");
                    int a = Index(d.From, "distributed torque"), b = Index(d.To, "distributed torque");
                    var key = (Math.Min(a, b), Math.Max(a, b));
                    dist[key] = dist.GetValueOrDefault(key) + d.TorquePerLength;
                    DistributedLoads.Add((key.Item1, key.Item2, d));
                    break;
                default:
                    throw new SectionTwistException("bad-load", $"unsupported load type {load.GetType().Name}");
            }
        }

        var seen = new HashSet<(int, int)>();
        foreach (var seg in model.Segments)
        {
            string where = $"segment {seg.Label}";
            int i = Index(seg.From, where), j = Index(seg.To, where);
            if (i == j) throw new SectionTwistException("bad-segment", $"{where}: both ends are station '{seg.From}'; a segment joins two different stations");
            if (seg.Material is null) throw new SectionTwistException("bad-segment", $"{where}: no material; give the segment a material");
            seg.Material.Validate();
            double length = Math.Abs(Stations[j].Position - Stations[i].Position);
            if (!(length > 0))
                throw new SectionTwistException("zero-length", $"{where}: stations '{seg.From}' and '{seg.To}' are at the same position; a segment needs a positive length (use a spring to join coincident stations)");
            bool flip = i > j;
            int a = flip ? j : i, b = flip ? i : j;
            if (!seen.Add((a, b))) throw new SectionTwistException("duplicate-segment", $"{where}: two segments join the same stations; merge them into one segment");
            double t = dist.GetValueOrDefault((a, b));
            SegmentElement e;
            if (seg.Section is not null && seg.Taper is null)
            {
                seg.Section.Validate(where);
                e = new SegmentElement(a, b, length, seg.Material.ShearModulus, seg.Section, 0, 0, t);
            }
            else if (seg.Taper is not null && seg.Section is null)
            {
                seg.Taper.Validate(where);
                double dA = flip ? seg.Taper.EndDiameter : seg.Taper.StartDiameter, dB = flip ? seg.Taper.StartDiameter : seg.Taper.EndDiameter;
                e = new SegmentElement(a, b, length, seg.Material.ShearModulus, null, dA, dB, t);
            }
            else throw new SectionTwistException("bad-segment", $"{where}: give either a section or a taper, not {(seg.Section is null ? "neither" : "both")}");
            Elements.Add(e);
            Segments.Add(seg);
        }
        foreach (var (a, b, d) in DistributedLoads)
            if (!seen.Contains((a, b)))
                throw new SectionTwistException("bad-load", $"distributed torque on {d.From}-{d.To}: no segment joins these two stations; put it on an existing segment");

        var order = Enumerable.Range(0, Elements.Count).OrderBy(k => Stations[Elements[k].A].Position).ToArray();
        for (int k = 1; k < order.Length; k++)
        {
            var prev = Elements[order[k - 1]]; var cur = Elements[order[k]];
            if (Stations[cur.A].Position < Stations[prev.B].Position - 1e-12 * Math.Max(1, Math.Abs(Stations[prev.B].Position)))
                throw new SectionTwistException("overlapping-segments",
                    $"segments {Segments[order[k - 1]].Label} and {Segments[order[k]].Label} overlap along the axis; each length of shaft belongs to one segment (split them at a shared station)");
        }

        foreach (var sp in model.Springs)
        {
            string where = $"spring {sp.Label}";
            int a = Index(sp.StationA, where), b = Index(sp.StationB, where);
            if (a == b) throw new SectionTwistException("bad-spring", $"{where}: both ends are station '{sp.StationA}'; a spring joins two different stations");
            if (!(sp.Stiffness > 0) || !double.IsFinite(sp.Stiffness))
                throw new SectionTwistException("bad-spring", $"{where}: stiffness {sp.Stiffness} N·m/rad must be positive");
            Springs.Add((a, b, sp));
        }

        Reference = model.ReferenceStation is { } r ? Index(r, "reference station") : Fixed.Length > 0 ? Fixed[0] : 0;
        CheckConnectivity();
    }

    public ShaftModel Model { get; }
    public IReadOnlyList<Station> Stations { get; }
    public int[] Fixed { get; }
    public int Reference { get; }
    public List<SegmentElement> Elements { get; } = [];
    public List<ShaftSegment> Segments { get; } = [];
    public List<(int A, int B, TorsionalSpring Spring)> Springs { get; } = [];
    public List<(int Station, double Torque, PointTorque Load)> PointLoads { get; } = [];
    public List<(int A, int B, DistributedTorque Load)> DistributedLoads { get; } = [];

    private int Index(string name, string what)
    {
        if (name is not null && _index.TryGetValue(name, out int i)) return i;
        throw new SectionTwistException("unknown-station",
            $"{what}: no station named '{name}'; known stations: {string.Join(", ", Stations.Select(s => s.Name))}");
    }

    /// <summary>Every connected part needs a fixed support; with no support at all the shaft must be one part (then the loads must balance).</summary>
    private void CheckConnectivity()
    {
        int n = Stations.Count;
        var parent = Enumerable.Range(0, n).ToArray();
        int Find(int x) { while (parent[x] != x) x = parent[x] = parent[parent[x]]; return x; }
        foreach (var e in Elements) parent[Find(e.A)] = Find(e.B);
        foreach (var (a, b, _) in Springs) parent[Find(a)] = Find(b);
        var parts = Enumerable.Range(0, n).GroupBy(Find).Select(g => g.ToArray()).ToArray();
        if (parts.Length == 1) return;
        foreach (var part in parts)
        {
            if (Fixed.Length > 0 && part.Any(i => Fixed.Contains(i))) continue;
            string names = string.Join(", ", part.Select(i => $"'{Stations[i].Name}'"));
            string msg = part.Length == 1
                ? $"mechanism: station {names} is joined to no segment or spring, so its rotation is undetermined; connect it with a segment or spring, or remove it"
                : Fixed.Length > 0
                    ? $"mechanism: stations {names} form a part joined to no fixed support, so it can spin freely; connect it to the rest of the shaft with a segment or spring, or fix one of its stations"
                    : $"mechanism: the shaft falls apart into {parts.Length} unconnected parts (one is {names}); join them with segments or springs";
            throw new SectionTwistException("mechanism", msg);
        }
    }

    internal static string Num(double v) => v.ToString("G6", CultureInfo.InvariantCulture);
}
