namespace SectionTwist.Plastic;

/// <summary>One point of the elastic-plastic torque-twist curve.</summary>
/// <param name="TwistRatio">Twist rate over the first-yield twist rate, theta / theta_y (at least 1).</param>
/// <param name="Torque">Torque carried, N*m.</param>
/// <param name="TorqueRatio">Torque over the first-yield torque, T / T_y.</param>
/// <param name="PlasticFraction">Fraction of the section area that has yielded (0 to 1; from the yielded mesh nodes, approximate; the largest over this and the lower load levels, since the plastic zone only grows with the twist).</param>
/// <param name="EstimatedRelativeError">Estimated relative error of <paramref name="Torque"/> (change between the mesh and its uniform refinement).</param>
public sealed record TorqueTwistPoint(double TwistRatio, double Torque, double TorqueRatio, double PlasticFraction, double EstimatedRelativeError);
