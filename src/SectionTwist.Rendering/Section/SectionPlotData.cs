using SectionTwist.Geometry;
using SectionTwist.Torsion;
using SectionTwist.Units;

namespace SectionTwist.Rendering.Section;

/// <summary>
/// What a section picture shows: the solved field, the peak (value and place) and the display unit. Build it from a
/// <see cref="SectionResult"/> with <see cref="From"/>, or directly (tests, other sources of fields).
/// </summary>
/// <param name="Field">The solved stress function and shear per unit torque on the mesh (coordinates in m).</param>
/// <param name="PeakLocation">Where the peak shear is, m.</param>
/// <param name="PeakShearPerTorque">The peak shear per unit torque, 1/m^3 (Pa per N*m).</param>
/// <param name="Unit">Length unit for axes and the scale bar.</param>
/// <param name="Title">Heading drawn above the picture.</param>
public sealed record SectionPlotData(SectionField Field, Point2 PeakLocation, double PeakShearPerTorque, LengthUnit Unit, string Title)
{
    /// <summary>
    /// True when the section has a sharp re-entrant corner, so the theoretical peak is unbounded: the picture labels the
    /// peak "unbounded" and gives the mesh value only as such.
    /// </summary>
    public bool PeakShearUnbounded { get; init; }

    /// <summary>Centroid to mark, m (null: not marked).</summary>
    public Point2? Centroid { get; init; }

    /// <summary>Shear centre to mark, m (null: not marked; known when the warping function was solved).</summary>
    public Point2? ShearCentre { get; init; }

    /// <summary>The picture data of a solved section.</summary>
    public static SectionPlotData From(SectionResult result, string? title = null)
    {
        ArgumentNullException.ThrowIfNull(result);
        return new SectionPlotData(result.Field, result.MaxShearLocation, result.MaxShearPerTorque, result.LengthUnit,
            title ?? (result.Profile.Name is { Length: > 0 } name && name != "profile" ? $"{Path.GetFileName(name)}: shear stress magnitude" : "Shear stress magnitude"))
        {
            PeakShearUnbounded = double.IsPositiveInfinity(result.EstimatedRelativeError.MaxShear),
            Centroid = result.Properties.Centroid,
            ShearCentre = result.Warping?.ShearCentre,
        };
    }
}
