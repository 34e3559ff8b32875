namespace SectionTwist.Plastic;

/// <summary>One overload case on one segment.</summary>
/// <param name="Case">The case's name.</param>
/// <param name="Torque">The overload torque magnitude in the segment, N*m.</param>
/// <param name="Margin">T_p / (factor |T|) - 1: negative when the check fails; null when T_p is unknown or the torque is 0.</param>
/// <param name="Yields">True when |T| exceeds the first-yield torque (or the peak is unbounded): the section yields locally and keeps a permanent twist after the overload.</param>
/// <param name="Check"><c>ok</c>, <c>over plastic capacity</c> (factor |T| &gt; T_p) or <c>not checked</c> (T_p unknown).</param>
public sealed record OverloadCheckResult(string Case, double Torque, double? Margin, bool Yields, string Check);
