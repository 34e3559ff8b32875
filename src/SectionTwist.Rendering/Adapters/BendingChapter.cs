using SectionTwist.Bending;
using SectionTwist.Fatigue;
using SectionTwist.Rendering.Bending;
using SectionTwist.Rendering.Drawing;
using SectionTwist.Rendering.Report;
using SectionTwist.Shaft;
using SectionTwist.Units;

namespace SectionTwist.Rendering.Adapters;

/// <summary>The report chapter of a shaft's bending with torsion: loads, bearings, combined stress, fatigue, keys, diagram.</summary>
public static class BendingChapter
{
    /// <summary>The caution note of a report with bending.</summary>
    public const string Caution =
        "Caution: these results are for linear elastic beam bending with Saint-Venant torsion on the modelled sections. Fatigue factors " +
        "(Marin factors, stress concentrations, notch sensitivity) are estimates; keyseat ends, press fits and fretting are not resolved by a " +
        "2D section and need the applicable code (national shaft-strength standards) and testing; dynamic loads are not included. " +
        "Verify the design against the applicable local codes and standards and have it checked under licensed engineering practice before use.";

    private static string F(double v, string f = "G4") => NumberText.Styled(v, f);
    private static string Sf(double? v) => v is { } x ? double.IsFinite(x) ? F(x, "F2") : "∞" : "–";

    /// <summary>The governing location's section with the combined stress on its boundary (prismatic segments only).</summary>
    private static ReportFigure? WorstPicture(ShaftDocument doc, ShaftResult result, BendingResult b)
    {
        if (b.Governing is not { } g) return null;
        var seg = doc.Model.Segments.FirstOrDefault(s => s.Label == g.Label);
        if (seg?.Section?.Bending is not { } section) return null;
        var sample = b.Samples.Where(p => p.Segment == g.Label && p.Position == g.Position).MaxBy(p => p.Stress.VonMises);
        if (sample is null) return null;
        bool rotating = doc.Model.Bending?.Rotating ?? true;
        var stresses = CombinedStress.AtBoundary(section, sample.AxialForce, -sample.MomentZ, sample.MomentY, sample.Torque, rotating);
        string at = $"{doc.Units.Length.Format(g.Position)} {doc.Units.Length.Symbol}";
        byte[] png = CombinedStressPicture.Render(section, stresses, $"{g.Label} at {at}: combined stress on the boundary", ImageFormat.Png, units: doc.Units);
        _ = result;
        return new ReportFigure($"The governing location ({g.Label}, {at}): von Mises stress at each boundary point of the real section" +
                                (rotating ? ", each at its worst angle to the bending moment (rotating shaft)" : "") + " (axes through the centroid); ringed: the worst point",
            ImageFormat.Png, png, "bending-worst-section.png");
    }

    /// <summary>Builds the chapter with its diagram (PNG, file name <c>bending.png</c>).</summary>
    public static ReportChapter Build(ShaftDocument doc, ShaftResult result, LengthUnit unit)
    {
        ArgumentNullException.ThrowIfNull(doc);
        ArgumentNullException.ThrowIfNull(result);
        var b = result.Bending ?? throw new ArgumentException("the result has no bending part", nameof(result));
        var u = doc.Units;
        string L = u.Length.Symbol, S = u.Stress.Symbol, T = u.Torque.Symbol, N = u.Force.Symbol;
        string Force(double si) => u.Force.Format(si, "G4");
        double? sy = result.Segments.Select(s => s.Material.YieldStrength).Where(v => v is not null).DefaultIfEmpty(null).Min();
        byte[] png = BendingDiagram.Render(b, sy, $"{doc.Model.Title ?? "shaft"}: bending with torsion", unit, ImageFormat.Png, units: u);
        var figure = new ReportFigure("Bending moment in both planes and resultant, deflection, combined von Mises stress (dashed: lowest yield strength) " +
                                      "and the unnotched fatigue factor of safety along the shaft; bearings dotted", ImageFormat.Png, png, "bending.png");
        var figures = new List<ReportFigure> { figure };
        if (WorstPicture(doc, result, b) is { } worstFigure) figures.Add(worstFigure);
        var tables = new List<ReportTable>
        {
            new("Loads on the shaft (gear and pull forces from the torque at their station)", ["station", "kind", $"Fy [{N}]", $"Fz [{N}]", $"axial [{N}]", "what"],
                b.Loads.Select(l => (IReadOnlyList<string>)[l.Station, l.Kind, Force(l.ForceY), Force(l.ForceZ), Force(l.AxialForce), l.Description]).ToList()),
            new ReportTable("Bearings: force on the shaft and slope", ["bearing", $"at [{L}]", $"Fy [{N}]", $"Fz [{N}]", $"radial [{N}]", $"axial [{N}]", "slope [mrad]", "limit [mrad]"],
                b.Bearings.Select(x => (IReadOnlyList<string>)[x.Label, u.Length.Format(x.Position), Force(x.ForceY), Force(x.ForceZ), Force(x.Force), Force(x.AxialForce),
                    F(x.Slope * 1e3, "F3"), x.SlopeLimit is { } l ? F(l * 1e3, "F3") : "–"]).ToList())
            { AlertRows = [.. b.Bearings.Select((x, i) => (x, i)).Where(p => p.x.ExceedsSlopeLimit).Select(p => p.i)] },
            new ReportTable("Combined stress at the worst boundary point of each segment and the static check against yield",
                ["segment", $"max M [{T}]", $"at [{L}]", $"point x, y [{L}]", $"von Mises [{S}]", $"Tresca [{S}]", "dominant", $"S_y [{S}]", "FoS yield", "FoS fatigue (unnotched)"],
                b.Segments.Select(s => (IReadOnlyList<string>)[s.Label, u.Torque.Format(s.MaxMoment, "G4"), u.Length.Format(s.Position),
                    $"{u.Length.Format(s.Stress.X, "G3")}, {u.Length.Format(s.Stress.Y, "G3")}", u.Stress.Format(s.Stress.VonMises, "G4"), u.Stress.Format(s.Stress.Tresca, "G4"),
                    s.Stress.Dominant, s.YieldStrength is { } y ? u.Stress.Format(y, "G4") + (s.StrengthBasis == "typical" ? " (typical)" : "") : "–", Sf(s.SafetyFactor), Sf(s.FatigueSafetyFactor)]).ToList())
            { AlertRows = [.. b.Segments.Select((x, i) => (x, i)).Where(p => p.x.ExceedsYield || p.x.FatigueSafetyFactor < 1).Select(p => p.i)] },
        };
        foreach (var f in b.Fatigue)
        {
            var rows = f.NotchFactors.Concat(f.Endurance.Factors).Select(k => (IReadOnlyList<string>)[k.Symbol, k.Meaning, F(k.Value, "F3"), k.Source]).ToList();
            rows.Add(["S'e", "unmodified endurance limit", u.Stress.Format(f.Endurance.Unmodified, "G4") + " " + S, f.Endurance.UnmodifiedSource]);
            rows.Add(["Se", "endurance limit", u.Stress.Format(f.Endurance.Value, "G4") + " " + S, "Marin equation"]);
            if (f.SectionTorsionConcentration is { } kc)
                rows.Add(["Kts (section)", "torsional concentration the section analysis resolves", F(kc, "F2"), "peak shear of the real section over 16 T/(π d³); the keyseat end is not in a 2D section"]);
            rows.Add(["n", $"fatigue factor of safety ({(f.Criterion == FatigueCriterion.Goodman ? "DE-Goodman" : "DE-ASME elliptic")})", Sf(f.SafetyFactor),
                $"σa' {u.Stress.Format(f.AlternatingStress, "G4")} {S}, σm' {u.Stress.Format(f.MeanStress, "G4")} {S} (Shigley 10th ed., sec. 7-4)"]);
            rows.Add(["n_y", "first-cycle yield", Sf(f.YieldSafetyFactor), "Shigley 10th ed., eq. 7-15"]);
            tables.Add(new ReportTable($"Fatigue at {f.Label}, {u.Length.Format(f.Position)} {L}: M {u.Torque.Format(f.Moment)} {T} reversed, T {u.Torque.Format(f.Torque)} {T} steady",
                ["factor", "meaning", "value", "source"], rows) { AlertRows = f.SafetyFactor < 1 || f.YieldSafetyFactor < 1 ? [rows.Count - 2] : [] });
        }
        if (b.Connections.Count > 0)
            tables.Add(new ReportTable("Keys and splines", ["connection", "kind", $"torque [{T}]", $"shear [{S}]", $"pressure [{S}]", $"shaft side [{S}]", $"allowable p [{S}]", "FoS", "method"],
                b.Connections.Select(c => (IReadOnlyList<string>)[c.Label, c.Kind, u.Torque.Format(c.Torque), c.Shear is { } sh ? u.Stress.Format(sh, "G4") : "–",
                    u.Stress.Format(c.Pressure, "G4"), c.ShaftPressure is { } sp ? u.Stress.Format(sp, "G4") : "–", c.AllowablePressure is { } ap ? u.Stress.Format(ap, "G4") : "–",
                    Sf(c.SafetyFactor), c.Method]).ToList())
            { AlertRows = [.. b.Connections.Select((x, i) => (x, i)).Where(p => p.x.Exceeds).Select(p => p.i)] });
        var rotating = doc.Model.Bending?.Rotating ?? true;
        return new ReportChapter("Bending with torsion")
        {
            Paragraphs =
            [
                "Axes: x along the shaft; looking back toward the first station Y points right and Z up (section x = Y, section y = Z). " +
                "Each plane is solved as a continuous beam on the bearings by the stiffness method; the combined stress is scanned point by point " +
                "around each real section: bending about both axes by the general formula with Ixx, Iyy, Ixy, the axial stress, and the torsional " +
                "shear of the section's Prandtl solution; von Mises and Tresca." +
                (rotating ? " The shaft rotates, so every boundary point is taken at its worst angle to the bending moment (fully reversed bending)." : " The sections stand as drawn (non-rotating)."),
                $"Largest deflection {u.Length.Format(b.MaxDeflection, "G4")} {L}." +
                (b.Governing is { } g ? $" Governing (static): {g.Label} at {u.Length.Format(g.Position)} {L}, von Mises {u.Stress.Format(g.Stress.VonMises, "G4")} {S}, {g.Stress.Dominant} dominates, factor of safety on yield {Sf(g.SafetyFactor)}." : ""),
                "Fatigue factors are estimates; every factor is listed with its source (\"from memory\" where quoted from memory).",
            ],
            Tables = tables,
            Figures = figures,
        };
    }
}
