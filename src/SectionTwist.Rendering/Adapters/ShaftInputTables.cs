using SectionTwist.Rendering.Report;
using SectionTwist.Shaft;
using SectionTwist.Units;

namespace SectionTwist.Rendering.Adapters;

/// <summary>
/// The input tables of a shaft report in the document's display units (<see cref="ShaftDocument.Units"/>: the file's own
/// units, or the system chosen with <c>--units</c>): stations, segments with their sections, materials, loads, supports
/// and springs.
/// </summary>
internal static class ShaftInputTables
{
    public static IReadOnlyList<ReportTable> Build(ShaftDocument doc, ShaftResult result)
    {
        var m = doc.Model;
        var u = doc.Units;
        var tables = new List<ReportTable>
        {
            Stations(m, result, u),
            Segments(m, result, u),
            Materials(m, u),
            Loads(m, result, u),
            Supports(m, result, u),
        };
        if (m.Springs.Count > 0)
            tables.Add(new ReportTable("Springs (couplings) between stations", ["spring", "between", $"stiffness, {u.RotationalStiffness.Symbol}"],
                m.Springs.Select(s => Row(s.Label, $"{s.StationA} – {s.StationB}", u.RotationalStiffness.Format(s.Stiffness))).ToList()));
        return tables;
    }

    /// <summary>A plain number in the house style (.NET-like format: <c>G4</c>, <c>F2</c>).</summary>
    internal static string F(double v, string format = "G5") => NumberText.Styled(v, format);

    internal static IReadOnlyList<string> Row(params string[] cells) => cells;

    private static ReportTable Stations(ShaftModel m, ShaftResult r, UnitSystem u)
    {
        var fixedSet = m.FixedStations.ToHashSet(StringComparer.Ordinal);
        return new ReportTable("Stations (in axis order)", ["station", $"position, {u.Length.Symbol}", "held", "note"],
            r.Stations.Select(s => Row(s.Name, u.Length.Format(s.Position), fixedSet.Contains(s.Name) ? "fixed" : "free",
                s.Name == r.ReferenceStation ? "reference: rotations are measured from here" : "")).ToList());
    }

    private static ReportTable Segments(ShaftModel m, ShaftResult r, UnitSystem u)
    {
        var rows = new List<IReadOnlyList<string>>();
        foreach (var s in r.Segments)
        {
            var seg = ShaftDiagramAdapter.ModelSegment(m, s);
            string j, k, outer;
            if (seg.Section is { } sec)
            {
                j = u.SecondMoment.Format(sec.TorsionConstant);
                k = sec.PeakShearUnbounded ? $"unbounded (sharp corner; {u.ShearPerTorque.Format(sec.ShearPerTorque)} on the mesh)" : u.ShearPerTorque.Format(sec.ShearPerTorque);
                outer = sec.OuterDiameter is { } d ? u.Length.Format(d) : "–";
            }
            else
            {
                var t = seg.Taper!;
                j = $"{u.SecondMoment.Format(Math.PI * Math.Pow(t.StartDiameter, 4) / 32)} … {u.SecondMoment.Format(Math.PI * Math.Pow(t.EndDiameter, 4) / 32)}";
                k = $"{u.ShearPerTorque.Format(16 / (Math.PI * Math.Pow(t.StartDiameter, 3)))} … {u.ShearPerTorque.Format(16 / (Math.PI * Math.Pow(t.EndDiameter, 3)))}";
                outer = $"{u.Length.Format(t.StartDiameter)} … {u.Length.Format(t.EndDiameter)}";
            }
            rows.Add(Row(s.Label, $"{s.From} – {s.To}", u.Length.Format(s.Length), s.Section, outer, j, k, s.Material.Name));
        }
        return new ReportTable("Segments and their sections", ["segment", "stations", $"length, {u.Length.Symbol}", "section", $"outer size, {u.Length.Symbol}",
            $"torsion constant J, {u.SecondMoment.Symbol}", $"peak shear per unit torque, {u.ShearPerTorque.Symbol}", "material"], rows);
    }

    private static ReportTable Materials(ShaftModel m, UnitSystem u)
    {
        var materials = m.Segments.Select(s => s.Material).Distinct().ToList();
        return new ReportTable("Materials", ["material", $"shear modulus G, {u.Modulus.Symbol}", $"allowable shear, {u.Stress.Symbol}",
                $"shear yield, {u.Stress.Symbol}", "checked against", "source of the values"],
            materials.Select(x => Row(x.Name, u.Modulus.Format(x.ShearModulus), x.AllowableShear is { } a ? u.Stress.Format(a) : "–",
                x.ShearYield is { } y ? u.Stress.Format(y) : "–", x.LimitBasis, x.Source)).ToList());
    }

    private static ReportTable Loads(ShaftModel m, ShaftResult r, UnitSystem u)
    {
        var position = r.Stations.ToDictionary(s => s.Name, s => s.Position, StringComparer.Ordinal);
        var rows = new List<IReadOnlyList<string>>();
        foreach (var load in m.Loads)
        {
            switch (load)
            {
                case PointTorque p:
                    rows.Add(Row(p.Description ?? "torque", $"at {p.Station}", u.Torque.Format(p.Torque), "–"));
                    break;
                case DistributedTorque d:
                    double len = Math.Abs(position[d.To] - position[d.From]);
                    rows.Add(Row(d.Description ?? "distributed torque", $"uniform over {d.From} – {d.To}", u.Torque.Format(d.TorquePerLength * len),
                        u.TorquePerLength.Format(d.TorquePerLength)));
                    break;
            }
        }
        return new ReportTable("Applied torques (right-hand rule about the axis; power into the shaft positive)",
            ["load", "where", $"torque, {u.Torque.Symbol}", $"per length, {u.TorquePerLength.Symbol}"], rows);
    }

    private static ReportTable Supports(ShaftModel m, ShaftResult r, UnitSystem u)
    {
        var rows = new List<IReadOnlyList<string>>();
        if (m.FixedStations.Count == 0)
            rows.Add(Row("supports", "free shaft: no station is held against rotation; the applied torques balance"));
        else rows.Add(Row("fixed stations", string.Join(", ", m.FixedStations)));
        rows.Add(Row("rotation reference", $"station '{r.ReferenceStation}'"));
        rows.Add(Row("twist-rate limit", m.TwistRateLimit is { } t ? u.TwistRate.Text(t, 4) : "none given"));
        rows.Add(Row("units of the tables", $"{u.Name}: {u.Length.Symbol}, {u.Torque.Symbol}, {u.Stress.Symbol}, {u.Modulus.Symbol}, {u.TwistRate.Symbol}"));
        return new ReportTable("Supports and limits", ["item", "value"], rows);
    }
}
