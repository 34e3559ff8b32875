namespace SectionTwist.Profiles;

/// <summary>One parameter of a profile template.</summary>
/// <param name="Key">The key typed in a spec (case-sensitive: <c>D</c> and <c>d</c> differ).</param>
/// <param name="Kind">What the value measures (fixes the allowed units).</param>
/// <param name="Description">What the parameter is.</param>
/// <param name="Default">The default, as text (e.g. <c>1.5 t</c> or <c>0</c>); null when the parameter is required.</param>
/// <param name="Choices">The allowed words for a <see cref="ParameterKind.Choice"/> parameter, otherwise empty.</param>
public sealed record TemplateParameter(string Key, ParameterKind Kind, string Description, string? Default, IReadOnlyList<string> Choices)
{
    /// <summary>Creates a parameter without word choices.</summary>
    public TemplateParameter(string key, ParameterKind kind, string description, string? @default = null)
        : this(key, kind, description, @default, []) { }

    /// <summary>True when the spec must give a value.</summary>
    public bool IsRequired => Default is null;

    /// <summary>The unit hint shown in listings: <c>length</c>, <c>deg</c>, <c>count</c> ...</summary>
    public string UnitHint => Kind switch
    {
        ParameterKind.Length => "length",
        ParameterKind.Angle => "deg",
        ParameterKind.AngleList => "deg/deg/...",
        ParameterKind.Count => "count",
        ParameterKind.Number => "number",
        _ => string.Join("|", Choices),
    };
}
