using SectionTwist.Rendering.Shaft;
using SectionTwist.Shaft;
using SectionTwist.Units;

namespace SectionTwist.Rendering.Adapters;

/// <summary>
/// Turns a solved shaft (<see cref="ShaftResult"/> with its <see cref="ShaftModel"/>) into the data of a
/// <see cref="ShaftDiagram"/>. Signs are passed through unchanged: both sides use the right-hand rule about the axis from
/// the first station to the last, and the internal torque is positive when its vector points out of the cut face of the
/// part nearer the first station.
/// </summary>
public static class ShaftDiagramAdapter
{
    /// <summary>Builds the diagram data.</summary>
    /// <param name="result">The solved shaft.</param>
    /// <param name="unit">Length unit of the axis labels (millimetres when null).</param>
    /// <param name="sections">The sections analysed while reading the shaft file, for outer and bore sizes of sections that
    /// carry none; may be null.</param>
    /// <param name="title">Heading; the model's title when null.</param>
    /// <remarks>
    /// The outer size drawn for a segment is, in this order: the taper's two diameters; the section's
    /// <see cref="SectionStiffness.OuterDiameter"/> (set for rounds, tubes, templates and by <c>outerDiameter</c> in the file);
    /// the analysed profile's outer size; else the diameter of the solid round with the same J, (32 J / pi)^(1/4), as a
    /// stand-in. The bore is the analysed profile's largest hole or, for a section whose values satisfy the exact round-tube
    /// relation tau/T = D / (2 J) (Timoshenko and Goodier, Theory of Elasticity, ch. 10), the inner diameter that J implies.
    /// The peak shear at each end is |T| times the section's peak shear per unit torque at that end (16 / (pi d^3) for a taper).
    /// </remarks>
    public static ShaftDiagramData From(ShaftResult result, LengthUnit? unit = null, ShaftSectionCatalog? sections = null, string? title = null)
    {
        ArgumentNullException.ThrowIfNull(result);
        var model = result.Model;
        var position = result.Stations.ToDictionary(s => s.Name, s => s.Position, StringComparer.Ordinal);
        var reaction = result.Reactions.ToDictionary(r => r.Station, r => r.Torque, StringComparer.Ordinal);

        var stations = result.Stations.Select(s => new DiagramStation(s.Name, s.Position, s.Rotation * 180 / Math.PI, s.AppliedTorque,
            s.IsFixed ? SupportKind.Fixed : SupportKind.None, reaction.GetValueOrDefault(s.Name))).ToList();

        var segments = new List<DiagramSegment>(result.Segments.Count);
        foreach (var r in result.Segments)
        {
            var m = ModelSegment(model, r);
            bool reversed = m.From != r.From;
            double kFrom, kTo, outerFrom, outerTo, bore = 0;
            if (m.Taper is { } taper)
            {
                double dFrom = reversed ? taper.EndDiameter : taper.StartDiameter, dTo = reversed ? taper.StartDiameter : taper.EndDiameter;
                (outerFrom, outerTo) = (dFrom, dTo);
                kFrom = RoundShearPerTorque(dFrom);
                kTo = RoundShearPerTorque(dTo);
            }
            else
            {
                var s = m.Section!;
                var analysed = sections?.Find(s);
                double outer = s.OuterDiameter ?? analysed?.OuterSize ?? Math.Pow(32 * s.TorsionConstant / Math.PI, 0.25);
                bore = analysed?.BoreSize ?? ExactTubeBore(s);
                (outerFrom, outerTo) = (outer, outer);
                kFrom = kTo = s.ShearPerTorque;
            }
            segments.Add(new DiagramSegment
            {
                Label = r.Label,
                From = position[r.From],
                To = position[r.To],
                OuterStart = outerFrom,
                OuterEnd = outerTo,
                Inner = bore,
                TorqueStart = r.TorqueAtFrom,
                TorqueEnd = r.TorqueAtTo,
                ShearStart = Math.Abs(r.TorqueAtFrom) * kFrom,
                ShearEnd = Math.Abs(r.TorqueAtTo) * kTo,
                Allowable = r.ShearLimit,
                PeakShearUnbounded = r.PeakShearUnbounded,
            });
        }
        var spread = model.Loads.OfType<DistributedTorque>().Select(t => new DiagramDistributedTorque(position[t.From], position[t.To],
            t.TorquePerLength * Math.Abs(position[t.To] - position[t.From]), t.Description)).ToList();
        return new ShaftDiagramData
        {
            Title = title ?? model.Title ?? "shaft",
            Unit = unit ?? LengthUnit.Millimetre,
            Stations = stations,
            Segments = segments,
            DistributedTorques = spread,
        };
    }

    /// <summary>The model segment a result row came from (same label, same two stations in either order).</summary>
    internal static ShaftSegment ModelSegment(ShaftModel model, SegmentResult r) =>
        model.Segments.FirstOrDefault(s => s.Label == r.Label && ((s.From == r.From && s.To == r.To) || (s.From == r.To && s.To == r.From)))
        ?? throw new SectionTwistException("shaft-result", $"segment '{r.Label}' ({r.From}-{r.To}) of the result is not in the model; solve the model again");

    /// <summary>Solid round: tau / T = 16 / (pi d^3) (Timoshenko and Goodier, ch. 10).</summary>
    private static double RoundShearPerTorque(double d) => 16 / (Math.PI * d * d * d);

    /// <summary>The bore of an exact round tube, or 0 when the values are not those of a tube (or of a solid round).</summary>
    internal static double ExactTubeBore(SectionStiffness s)
    {
        if (s.OuterDiameter is not { } d || !(d > 0)) return 0;
        // round tube: J = pi (D^4 - d^4) / 32 and tau/T = D / (2 J), so tau/T * 2 J / D = 1 exactly
        if (Math.Abs(s.ShearPerTorque * 2 * s.TorsionConstant / d - 1) > 1e-9) return 0;
        double d4 = Math.Pow(d, 4) - 32 * s.TorsionConstant / Math.PI;
        return d4 > Math.Pow(1e-6 * d, 4) ? Math.Pow(d4, 0.25) : 0;
    }
}
