using SectionTwist.Shaft;

namespace SectionTwist.Tests.Shaft;

public class ShaftPowerTests
{
    // T = P / omega with omega = 2 pi n / 60. Independent handbook forms: T[N*m] = 9549.3 P[kW] / n[rpm] and
    // T[lbf*in] = 63025 P[hp] / n[rpm] (Budynas and Nisbett, Shigley's Mechanical Engineering Design, ch. 3; the
    // horsepower is the mechanical horsepower, 550 ft*lbf/s = 745.69987 W).
    [Fact]
    public void Kilowatts_at_rpm()
    {
        double t = ShaftPower.TorqueFromKilowatts(7.5, 1450);
        Tol.Rel(7500 / (1450 * 2 * Math.PI / 60), t, 1e-15, "T = P / omega");
        Tol.Rel(9549.3 * 7.5 / 1450, t, 1e-5, "T = 9549.3 P/n handbook form");
        Tol.Rel(49.39, t, 1e-4, "hand calculation 49.39 N*m");
    }

    [Fact]
    public void Horsepower_at_rpm_uses_mechanical_horsepower()
    {
        Tol.Rel(745.69987, ShaftPower.MechanicalHorsepower, 1e-8, "1 hp = 745.69987 W (550 ft*lbf/s)");
        double t = ShaftPower.TorqueFromHorsepower(10, 1450);
        double lbfIn = 4.4482216152605 * 0.0254;
        Tol.Rel(63025 * 10.0 / 1450 * lbfIn, t, 1e-5, "T[lbf*in] = 63025 P[hp] / n");
    }

    [Fact]
    public void Power_taken_off_is_a_negative_torque_and_zero_speed_is_an_error()
    {
        var p = PointTorque.FromPower("D", -5500, ShaftPower.RpmToRadiansPerSecond(120));
        Tol.Rel(-5500 / (120 * Math.PI / 30), p.Torque, 1e-15);
        var e = Assert.Throws<SectionTwistException>(() => ShaftPower.TorqueFromKilowatts(3, 0));
        Assert.Contains("non-zero", e.Message, StringComparison.Ordinal);
    }
}
