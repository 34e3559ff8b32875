using SectionTwist.Profiles;
using SectionTwist.Torsion;

namespace SectionTwist.Tests.Profiles;

/// <summary>
/// Hollow-section corner radii: the defaults (EN 10210-2 hot-finished ro = 1.5 t, ri = t; EN 10219-2 cold-formed by
/// thickness) are quoted from memory, so a profile built with them carries a <c>default-from-memory</c> warning into
/// every output, as the keyseat templates do; given radii carry none.
/// </summary>
public class HollowDefaultRadiusTests
{
    [Theory]
    [InlineData("shs:B=80,t=5", true)]
    [InlineData("rhs:H=100,B=50,t=4,form=cold", true)]
    [InlineData("shs:B=80,t=5,ro=7.5", true)]
    [InlineData("shs:B=80,t=5,ro=7.5,ri=5", false)]
    public void Default_radii_are_flagged_as_from_memory(string spec, bool warned)
    {
        var p = ProfileTemplates.Create(spec);
        Assert.Equal(warned, p.Warnings.Any(w => w.Code == "default-from-memory"));
        if (warned) Assert.Contains("EN 1021", p.Warnings.First(w => w.Code == "default-from-memory").Message, StringComparison.Ordinal);
        // the same radii (hot-finished 1.5 t and t, EN 10210-2 from memory) give the same outline whether defaulted or given
        if (spec == "shs:B=80,t=5")
            Tol.Rel(ProfileTemplates.Create("shs:B=80,t=5,ro=7.5,ri=5").Properties.Area, p.Properties.Area, 1e-14, "EN 10210-2 radii, from memory");
    }

    [Fact]
    public void The_warning_reaches_the_section_result()
    {
        var r = SectionAnalyzer.Analyze(ProfileTemplates.Create("shs:B=80,t=5"), new AnalysisOptions { Accuracy = 1e-3 });
        Assert.Contains(r.Warnings, w => w.Code == "default-from-memory" && w.Message.Contains("ro", StringComparison.Ordinal));
    }
}
