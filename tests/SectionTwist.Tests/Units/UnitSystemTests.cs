using SectionTwist.Shaft;
using SectionTwist.Units;

namespace SectionTwist.Tests.Units;

/// <summary>
/// The display unit systems. Conversion factors are the exact definitions: inch = 0.0254 m and pound-force =
/// 4.4482216152605 N (international yard and pound, 1959; NIST SP 811, appendix B), psi = lbf / in^2, mechanical
/// horsepower = 550 ft*lbf/s = 745.69987 W.
/// </summary>
public sealed class UnitSystemTests
{
    private const double Inch = 0.0254, PoundForce = 4.4482216152605;

    [Fact]
    public void Us_units_follow_the_exact_definitions()
    {
        var u = UnitSystem.US;
        Tol.Rel(PoundForce * Inch, u.Torque.SiPerUnit, 1e-15, "lbf*in = 0.112984829 N*m");
        Tol.Rel(PoundForce / (Inch * Inch), u.Stress.SiPerUnit, 1e-15, "psi = 6894.757 Pa");
        Tol.Rel(Math.PI / 180 / 0.3048, u.TwistRate.SiPerUnit, 1e-15, "deg/ft");
        Tol.Rel(1 / Math.Pow(Inch, 3), u.ShearPerTorque.SiPerUnit, 1e-15, "psi per lbf*in = 1/in^3");
        Tol.Rel(550 * 0.3048 * PoundForce, u.Power.SiPerUnit, 1e-12, "hp = 550 ft*lbf/s");
        Assert.Equal(["in", "in⁴", "lbf·in", "psi", "deg/ft", "psi per lbf·in"],
            [u.Length.Symbol, u.SecondMoment.Symbol, u.Torque.Symbol, u.Stress.Symbol, u.TwistRate.Symbol, u.ShearPerTorque.Symbol]);
    }

    [Fact]
    public void Si_systems_use_one_spelling_per_quantity()
    {
        foreach (var u in new[] { UnitSystem.SiMillimetre, UnitSystem.SiMetre })
        {
            Assert.Equal("N·m", u.Torque.Symbol);
            Assert.Equal("MPa per kN·m", u.ShearPerTorque.Symbol);
            Assert.Equal(1e3, u.ShearPerTorque.SiPerUnit); // 1 MPa per kN*m = 1e6 Pa / 1e3 N*m
        }
        Assert.Equal("mm⁴", UnitSystem.SiMillimetre.SecondMoment.Symbol);
        Assert.Equal("m⁴", UnitSystem.SiMetre.SecondMoment.Symbol);
    }

    [Fact]
    public void The_input_unit_picks_the_system()
    {
        Assert.Equal("US", UnitSystem.For(LengthUnit.Inch).Name);
        Assert.Equal("SI-m", UnitSystem.For(LengthUnit.Metre).Name);
        Assert.Equal("SI-mm", UnitSystem.For(LengthUnit.Millimetre).Name);
        var cm = UnitSystem.For(LengthUnit.Centimetre);
        Assert.Equal(("cm", "cm⁴", "N·m"), (cm.Length.Symbol, cm.SecondMoment.Symbol, cm.Torque.Symbol));
        var ft = UnitSystem.For(LengthUnit.Foot);
        Assert.Equal(("ft", "lbf·in"), (ft.Length.Symbol, ft.Torque.Symbol));
    }

    [Fact]
    public void Changing_the_torque_unit_keeps_torque_per_length_and_stiffness_in_step()
    {
        var u = UnitSystem.SiMillimetre.With(Measure.Torque, new DisplayUnit("kN·m", 1e3));
        Assert.Equal(("kN·m/mm", "kN·m/rad"), (u.TorquePerLength.Symbol, u.RotationalStiffness.Symbol));
        Tol.Rel(1e6, u.TorquePerLength.SiPerUnit, 1e-15);
    }

    [Theory]
    [InlineData("SI-mm", "SI-mm")]
    [InlineData("si_mm", "SI-mm")]
    [InlineData("SI-m", "SI-m")]
    [InlineData("us", "US")]
    public void Names_parse_forgivingly(string text, string name) => Assert.Equal(name, UnitSystem.Parse(text).Name);

    [Fact]
    public void An_unknown_system_names_the_choices_and_the_nearest()
    {
        var e = Assert.Throws<SectionTwistException>(() => UnitSystem.Parse("SI-cm"));
        Assert.Equal("--units: unknown unit system 'SI-cm' (did you mean 'SI-mm'?); use one of SI-mm, SI-m, US", e.Message);
    }

    // Torque spellings people type (issue 11: "Nm" was refused while "N*mm" worked). Factors: the same exact definitions.
    [Theory]
    [InlineData("Nm", 1.0)]
    [InlineData("N-m", 1.0)]
    [InlineData("N.m", 1.0)]
    [InlineData("N*m", 1.0)]
    [InlineData("kNm", 1e3)]
    [InlineData("Nmm", 1e-3)]
    [InlineData("lb-in", PoundForce * Inch)]
    [InlineData("in-lb", PoundForce * Inch)]
    [InlineData("lbf*in", PoundForce * Inch)]
    [InlineData("ft-lb", PoundForce * 0.3048)]
    [InlineData("lbf-ft", PoundForce * 0.3048)]
    public void Common_torque_spellings_are_read(string unit, double newtonMetres)
    {
        Tol.Rel(newtonMetres, QuantityText.UnitFactor(unit, QuantityKind.Torque)!.Value, 1e-12, "NIST SP 811");
        Assert.Contains(DisplayUnit.Spell(unit), new[] { "N·m", "kN·m", "N·mm", "lbf·in", "lbf·ft" });
    }

    [Fact]
    public void Torque_spellings_work_in_compound_units_too()
    {
        Tol.Rel(1.0, QuantityText.UnitFactor("Nm/m", QuantityKind.TorquePerLength)!.Value, 1e-12);
        Tol.Rel(1e3, QuantityText.UnitFactor("kNm/rad", QuantityKind.RotationalStiffness)!.Value, 1e-12);
        Assert.Null(QuantityText.UnitFactor("mm", QuantityKind.Torque));
    }

    [Fact]
    public void Ascii_spelling_is_for_csv_columns() =>
        Assert.Equal(["N*m", "mm^4", "MPa per kN*m"], [UnitSystem.SiMillimetre.Torque.Ascii, UnitSystem.SiMillimetre.SecondMoment.Ascii, UnitSystem.SiMillimetre.ShearPerTorque.Ascii]);
}
