namespace SectionTwist.Rendering.Section;

/// <summary>How to draw a section picture.</summary>
public sealed record SectionPlotOptions
{
    /// <summary>Picture width, px.</summary>
    public int Width { get; init; } = 900;
    /// <summary>Picture height, px.</summary>
    public int Height { get; init; } = 680;
    /// <summary>
    /// Torque in N*m: stresses are shown in MPa for this torque. Null shows stress per unit torque in MPa per kN*m.
    /// </summary>
    public double? Torque { get; init; }
    /// <summary>Draw the element edges.</summary>
    public bool ShowMesh { get; init; }
    /// <summary>Number of filled colour bands between zero and the peak (2 to 24).</summary>
    public int Bands { get; init; } = 10;
    /// <summary>Number of stress-function contour lines (0 for none).</summary>
    public int PhiLines { get; init; } = 8;
}
