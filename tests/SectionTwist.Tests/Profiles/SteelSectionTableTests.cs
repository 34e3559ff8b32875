using System.Globalization;
using SectionTwist.Profiles;
using SectionTwist.Torsion;

namespace SectionTwist.Tests.Profiles;

/// <summary>
/// Designated rolled sections (ipe:200, ...) against the same table's area and torsion constant. The rows are from
/// memory of the European section tables (EN 10365, EN 10056-1), so these checks test the template geometry against
/// the table's own printed values, not the table against the mill.
/// </summary>
public class SteelSectionTableTests
{
    public static TheoryData<string, string> Rows()
    {
        var d = new TheoryData<string, string>();
        foreach (var r in SteelSectionTable.Rows) d.Add(r.Family, r.Size);
        return d;
    }

    // Area to the printed digits: the table prints 3 significant figures in cm^2, so the exact area of the outline
    // (with root and toe radii and taper) must round to the printed value (half a unit of the last digit).
    [Theory]
    [MemberData(nameof(Rows))]
    public void Area_matches_the_table_to_its_printed_digits(string family, string size)
    {
        var row = SteelSectionTable.Find(family, size)!.Value;
        double area = ProfileTemplates.Create($"{family}:{size}").Properties.Area * 1e4; // cm^2
        double halfUnit = 0.5 * Math.Pow(10, Math.Floor(Math.Log10(row.Area)) - 2);
        Tol.Abs(row.Area, area, halfUnit + 1e-9, $"{family.ToUpperInvariant()} {size} table area (EN 10365 / EN 10056-1, from memory)");
    }

    // It: the tables compute It with a thin-wall formula plus a fillet term (EN 10365 practice); the exact Saint-Venant
    // J of the rounded outline (FE, accuracy 1e-3) lies 1.5 to 3 % below it for I and H sections. Tolerance 4 %.
    [Theory]
    [InlineData("ipe", "100")]
    [InlineData("ipe", "200")]
    [InlineData("ipe", "300")]
    [InlineData("hea", "200")]
    [InlineData("heb", "100")]
    [InlineData("heb", "200")]
    public void It_matches_the_table_formula_value(string family, string size)
    {
        var row = SteelSectionTable.Find(family, size)!.Value;
        var r = SectionAnalyzer.Analyze(ProfileTemplates.Create($"{family}:{size}"), new AnalysisOptions { Accuracy = 1e-3 });
        Tol.Rel(row.It, r.TorsionConstant * 1e8, 0.04, $"{family.ToUpperInvariant()} {size} table It (from memory; formula value)");
    }

    [Fact]
    public void Unknown_designation_names_the_sizes()
    {
        var ex = Assert.Throws<SectionTwistException>(() => ProfileTemplates.Create("ipe:210"));
        Assert.Contains("200", ex.Message, StringComparison.Ordinal);
        Assert.Equal("28.5", (SteelSectionTable.Find("ipe", "200")!.Value.Area).ToString(CultureInfo.InvariantCulture));
    }
}
