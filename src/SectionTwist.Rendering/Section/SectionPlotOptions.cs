namespace SectionTwist.Rendering.Section;

/// <summary>How to draw a section picture.</summary>
public sealed record SectionPlotOptions
{
    /// <summary>Picture width, px.</summary>
    public int Width { get; init; } = 900;
    /// <summary>Picture height, px.</summary>
    public int Height { get; init; } = 680;
    /// <summary>
    /// Torque in N*m (SI): stresses are shown for this torque in the stress unit of <see cref="Units"/>. Null shows the
    /// stress per unit torque (e.g. MPa per kN·m).
    /// </summary>
    public double? Torque { get; init; }
    /// <summary>Display units (stress, torque, lengths of the axes); null: the standard system of the section's length unit.</summary>
    public Units.UnitSystem? Units { get; init; }
    /// <summary>Draw the element edges.</summary>
    public bool ShowMesh { get; init; }
    /// <summary>Number of filled colour bands between zero and the peak (2 to 24).</summary>
    public int Bands { get; init; } = 10;
    /// <summary>Number of stress-function contour lines (0 for none).</summary>
    public int PhiLines { get; init; } = 8;
}
