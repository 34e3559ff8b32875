namespace SectionTwist.Profiles;

/// <summary>Description of a profile template for listings and help.</summary>
/// <param name="Name">The template name used in a spec, e.g. <c>keyed</c>.</param>
/// <param name="Summary">One line saying what the profile is.</param>
/// <param name="Parameters">The parameters in listing order.</param>
/// <param name="OuterSize">What "outer size" D means for this template when J is compared with a plain round of diameter D.</param>
/// <param name="Example">A valid example spec.</param>
/// <param name="Aliases">Other names that select the same template.</param>
public sealed record TemplateInfo(string Name, string Summary, IReadOnlyList<TemplateParameter> Parameters, string OuterSize, string Example, IReadOnlyList<string> Aliases)
{
    /// <summary>The parameter with key <paramref name="key"/>, or null.</summary>
    public TemplateParameter? Find(string key) => Parameters.FirstOrDefault(p => p.Key == key);
}
