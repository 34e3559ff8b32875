namespace SectionTwist.Shaft;

/// <summary>Torque from power and speed, T = P / omega (any machine design text, e.g. Budynas and Nisbett, Shigley's, ch. 3).</summary>
public static class ShaftPower
{
    /// <summary>
    /// One mechanical (imperial) horsepower in watts: 550 ft*lbf/s = 550 x 0.3048 m x 0.45359237 kg x 9.80665 m/s^2
    /// = 745.69987 W. This is the horsepower the shaft file's <c>hp</c> means (not metric, 735.49875 W, nor electrical, 746 W).
    /// </summary>
    public const double MechanicalHorsepower = 550 * 0.3048 * 0.45359237 * 9.80665;

    /// <summary>Converts revolutions per minute to rad/s.</summary>
    public static double RpmToRadiansPerSecond(double rpm) => rpm * 2 * Math.PI / 60;

    /// <summary>T = P / omega, N*m.</summary>
    /// <param name="power">Power, W (positive into the shaft, negative taken off).</param>
    /// <param name="angularSpeed">Speed, rad/s, non-zero.</param>
    public static double Torque(double power, double angularSpeed)
    {
        if (!double.IsFinite(power))
            throw new SectionTwistException("bad-load", $"power {power} W must be finite");
        if (angularSpeed == 0 || !double.IsFinite(angularSpeed))
            throw new SectionTwistException("bad-load", $"speed {angularSpeed} rad/s must be finite and non-zero to turn power into torque");
        return power / angularSpeed;
    }

    /// <summary>Torque from kilowatts at revolutions per minute, N*m.</summary>
    public static double TorqueFromKilowatts(double kilowatts, double rpm) => Torque(kilowatts * 1e3, RpmToRadiansPerSecond(rpm));

    /// <summary>Torque from mechanical horsepower (<see cref="MechanicalHorsepower"/>) at revolutions per minute, N*m.</summary>
    public static double TorqueFromHorsepower(double horsepower, double rpm) => Torque(horsepower * MechanicalHorsepower, RpmToRadiansPerSecond(rpm));
}
