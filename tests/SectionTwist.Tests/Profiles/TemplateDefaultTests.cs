using SectionTwist.Profiles;
using SectionTwist.Tests.Cli;
using SectionTwist.Torsion;

namespace SectionTwist.Tests.Profiles;

/// <summary>
/// Keyseat and spline templates default to a standard's fillet radius, so the common case has a bounded peak shear;
/// a default quoted from memory of a standard (the keyseat floor radii, the ISO 14 root fillets, the ISO 14 rows not
/// checked against the standard) travels with the profile as a warning that every analysis repeats.
/// </summary>
public class TemplateDefaultTests
{
    private static string[] Codes(string spec) => ProfileTemplates.Create(spec).Warnings.Select(w => w.Code).ToArray();

    // The radius rows are ISO 773 / DIN 6885-1 from memory (Published.KeyseatRadiusFromMemory): the smallest radius of
    // the row for the key width, and a width between two rows takes the row below.
    [Theory]
    [InlineData(7, 2, 0.08)]
    [InlineData(20, 6, 0.16)]
    [InlineData(40, 12, 0.25)]
    [InlineData(60, 18, 0.25)]
    [InlineData(100, 28, 0.40)]
    public void Keyseat_floor_radius_defaults_to_the_smallest_of_the_standard(double d, double b, double r)
    {
        Assert.Equal(r, ParallelKeyTable.FloorRadius(b)!.Value.RMin);
        string ds = d.ToString(System.Globalization.CultureInfo.InvariantCulture), rs = r.ToString(System.Globalization.CultureInfo.InvariantCulture);
        Tol.Rel(ProfileTemplates.Create($"keyed:d={ds},r={rs}").Properties.Area, ProfileTemplates.Create($"keyed:d={ds}").Properties.Area, 1e-14);
        Assert.Equal(0.16, ParallelKeyTable.FloorRadius(9)!.Value.RMin);
        Assert.Null(ParallelKeyTable.FloorRadius(60));
    }

    [Fact]
    public void A_default_from_memory_warns_and_an_explicit_value_does_not()
    {
        var w = Assert.Single(ProfileTemplates.Create("keyed:d=40").Warnings);
        Assert.Equal("default-from-memory", w.Code);
        Assert.StartsWith("keyed:d=40: r: default keyseat floor radius 0.25 mm", w.Message, StringComparison.Ordinal);
        Assert.Contains("give r= explicitly", w.Message, StringComparison.Ordinal);
        Assert.Empty(Codes("keyed:d=40,r=0.4"));
        Assert.Empty(Codes("keyed:d=40,r=0"));
        // ISO 14: a checked row with the default root fillet warns about the fillet only; a row from memory warns too.
        Assert.Contains("r: default root fillet 0.3 mm", Assert.Single(ProfileTemplates.Create("iso14:8x32x36").Warnings).Message, StringComparison.Ordinal);
        var memoryRow = ProfileTemplates.Create("spline:series=light,d=36,r=0.3").Warnings;
        Assert.Contains("default ISO 14 light row 8 x 36 x 40, B = 7 mm", Assert.Single(memoryRow).Message, StringComparison.Ordinal);
        Assert.Empty(Codes("spline:N=8,d=36,D=40,B=7,r=0.3"));
        Assert.Empty(Codes("iso14:8x32x36,r=0"));
        // Involute: the ISO 4156 diameters (from memory) and the 0.2 m fillet (common practice) warn when they supply defaults.
        Assert.Equal(["default-from-memory", "default-no-source"], Codes("involute:m=2,z=20"));
        Assert.Empty(Codes("involute:m=2,z=20,Da=42,Df=37,r=0.4"));
    }

    // The warning reaches the analysis result, the command's text and JSON; the default fillet removes the singular corner.
    [Fact]
    public void The_default_keyseat_is_not_singular_and_its_warning_reaches_every_output()
    {
        var r = SectionAnalyzer.Analyze(ProfileTemplates.Create("keyed:d=40"), new AnalysisOptions { Accuracy = 1e-3 });
        Assert.Equal("default-from-memory", Assert.Single(r.Warnings).Code);
        Assert.True(double.IsFinite(r.EstimatedRelativeError.MaxShear) && r.EstimatedRelativeError.MaxShear <= 5e-3);
        var (code, text, _) = CliRunner.Run("section", "keyed:d=40", "--accuracy", "1e-3");
        Assert.Equal(0, code);
        Assert.Contains("default-from-memory", text, StringComparison.Ordinal);
        Assert.DoesNotContain("sharp-reentrant-corner", text, StringComparison.Ordinal);
        var (jcode, json, _) = CliRunner.Run("section", "keyed:d=40", "--accuracy", "1e-3", "--json");
        Assert.Equal(0, jcode);
        using var doc = System.Text.Json.JsonDocument.Parse(json);
        Assert.Contains(doc.RootElement.GetProperty("warnings").EnumerateArray(), e => e.GetProperty("code").GetString() == "default-from-memory");
    }

    [Fact]
    public void A_default_radius_that_does_not_fit_asks_for_an_explicit_one()
    {
        var e = Assert.Throws<SectionTwistException>(() => ProfileTemplates.Create("keyed:d=200,b=60,t1=20"));
        Assert.Contains("r: DIN 6885-1 gives keyseat floor radii for widths 2 to 50 mm", e.Message, StringComparison.Ordinal);
        Assert.Contains("give r= (r=0 for sharp corners)", e.Message, StringComparison.Ordinal);
    }
}
