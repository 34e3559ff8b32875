namespace SectionTwist.Shaft;

/// <summary>
/// A solid round segment whose diameter varies linearly from the segment's first end to its second end.
/// </summary>
/// <param name="StartDiameter">Diameter at the segment's <c>From</c> station, m.</param>
/// <param name="EndDiameter">Diameter at the segment's <c>To</c> station, m.</param>
public sealed record RoundTaper(double StartDiameter, double EndDiameter)
{
    internal void Validate(string where)
    {
        if (!(StartDiameter > 0) || !double.IsFinite(StartDiameter) || !(EndDiameter > 0) || !double.IsFinite(EndDiameter))
            throw new SectionTwistException("bad-section",
                $"{where}: taper diameters {StartDiameter} m and {EndDiameter} m must both be positive");
    }
}
