using System.Globalization;

namespace SectionTwist.Shaft;

/// <summary>A unit for tables: its symbol as written in the file and the SI size of one unit.</summary>
/// <param name="Symbol">Symbol, e.g. <c>mm</c> or <c>N*m</c>.</param>
/// <param name="SiPerUnit">SI value of one unit (m, N*m, Pa).</param>
public sealed record DisplayUnit(string Symbol, double SiPerUnit)
{
    /// <summary>Converts an SI value to this unit.</summary>
    public double FromSi(double si) => si / SiPerUnit;

    /// <summary>Formats an SI value in this unit with <paramref name="format"/> (invariant culture).</summary>
    public string Format(double si, string format = "G5") => FromSi(si).ToString(format, CultureInfo.InvariantCulture);
}

/// <summary>The units a shaft file asks its results to be shown in (defaults mm, N*m, MPa, GPa).</summary>
/// <param name="Length">Lengths and positions.</param>
/// <param name="Torque">Torques.</param>
/// <param name="Stress">Shear stresses.</param>
/// <param name="Modulus">Moduli.</param>
public sealed record ShaftDisplayUnits(DisplayUnit Length, DisplayUnit Torque, DisplayUnit Stress, DisplayUnit Modulus)
{
    /// <summary>mm, N*m, MPa, GPa.</summary>
    public static ShaftDisplayUnits Default { get; } = new(new("mm", 1e-3), new("N*m", 1), new("MPa", 1e6), new("GPa", 1e9));
}

/// <summary>A shaft file read into a model, with the units its results are shown in.</summary>
/// <param name="Path">The file, as given.</param>
/// <param name="Model">The shaft model (SI).</param>
/// <param name="Units">Display units from the file's <c>units</c> block.</param>
public sealed record ShaftDocument(string Path, ShaftModel Model, ShaftDisplayUnits Units)
{
    /// <summary>The file's <c>dynamics</c> block (inertias, further shafts, stages, excitations), or null when it has none.</summary>
    public Dynamics.DynamicsInput? Dynamics { get; init; }
}
