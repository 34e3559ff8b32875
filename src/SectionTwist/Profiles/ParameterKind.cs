namespace SectionTwist.Profiles;

/// <summary>What a template parameter measures, which fixes the units its value may carry.</summary>
public enum ParameterKind
{
    /// <summary>A length: a number with an optional unit (<c>40</c>, <c>40mm</c>, <c>1.5in</c>); a bare number takes the default unit.</summary>
    Length,
    /// <summary>An angle in degrees, or with <c>deg</c> / <c>rad</c>.</summary>
    Angle,
    /// <summary>A list of angles separated by <c>/</c>, e.g. <c>0/90/180</c> (degrees unless marked).</summary>
    AngleList,
    /// <summary>A whole number (a count of teeth, keyseats, flats).</summary>
    Count,
    /// <summary>A plain number without unit (a ratio or a slope in percent).</summary>
    Number,
    /// <summary>One word from a fixed list.</summary>
    Choice,
}
