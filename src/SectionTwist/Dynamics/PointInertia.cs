namespace SectionTwist.Dynamics;

/// <summary>
/// A rotating body lumped at a station (motor rotor, coupling half, brake disc, gear, drum): its mass moment of inertia
/// about the shaft axis, kg*m^2, in the station's own rotation (not referred to another shaft).
/// </summary>
/// <param name="Station">The station it sits at.</param>
/// <param name="Inertia">Mass moment of inertia, kg*m^2, positive.</param>
public sealed record PointInertia(string Station, double Inertia)
{
    /// <summary>Standard gravity, m/s^2 (ISO 80000-3), used by <see cref="FromGD2Newton"/>.</summary>
    public const double StandardGravity = 9.80665;

    /// <summary>Optional display name, e.g. <c>motor rotor</c>.</summary>
    public string? Name { get; init; }

    /// <summary>The display name.</summary>
    public string Label => Name ?? $"inertia at {Station}";

    /// <summary>
    /// A solid or hollow cylinder (disc, drum, hub) turning about its own axis:
    /// J = rho pi L (D^4 - d^4) / 32 (exact; e.g. Meriam and Kraige, Engineering Mechanics: Dynamics, Table D/4).
    /// </summary>
    /// <param name="station">The station it sits at.</param>
    /// <param name="outerDiameter">D, m.</param>
    /// <param name="innerDiameter">d, m (0 for a solid disc), 0 &lt;= d &lt; D.</param>
    /// <param name="length">Axial length (width of a disc), m.</param>
    /// <param name="density">Density, kg/m^3.</param>
    public static PointInertia Cylinder(string station, double outerDiameter, double innerDiameter, double length, double density)
    {
        if (!(outerDiameter > 0) || !(innerDiameter >= 0) || !(innerDiameter < outerDiameter) || !(length > 0) || !(density > 0)
            || !double.IsFinite(outerDiameter) || !double.IsFinite(length) || !double.IsFinite(density))
            throw new SectionTwistException("bad-inertia",
                $"body at station '{station}': needs outer diameter > inner diameter >= 0, length > 0 and density > 0 (got D={outerDiameter} m, d={innerDiameter} m, L={length} m, rho={density} kg/m^3)");
        double j = density * Math.PI * length * (Math.Pow(outerDiameter, 4) - Math.Pow(innerDiameter, 4)) / 32;
        return new PointInertia(station, j);
    }

    /// <summary>
    /// From the flywheel effect GD^2 given in kgf*m^2 (weight in kgf times the square of the diameter of gyration in m, as
    /// motor catalogues print it): J = GD^2 / 4 kg*m^2, because J = m (D/2)^2 and a weight of 1 kgf belongs to a mass of 1 kg.
    /// </summary>
    public static PointInertia FromGD2(string station, double gd2KgfSquareMetres) => new(station, gd2KgfSquareMetres / 4);

    /// <summary>From GD^2 given with the weight in newtons (N*m^2): J = GD^2 / (4 g), g = 9.80665 m/s^2.</summary>
    public static PointInertia FromGD2Newton(string station, double gd2NewtonSquareMetres) => new(station, gd2NewtonSquareMetres / (4 * StandardGravity));
}
