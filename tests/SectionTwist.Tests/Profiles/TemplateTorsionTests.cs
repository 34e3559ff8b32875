using SectionTwist.Profiles;
using SectionTwist.Tests.References;
using SectionTwist.Torsion;

namespace SectionTwist.Tests.Profiles;

/// <summary>
/// Torsion constants of templates against published values. Coarse meshes (Accuracy = 1e-3) since the references
/// themselves are good to 2-3 % (curve fits, the EN 10210-2 formula) or are evaluated here to full precision (series).
/// </summary>
public class TemplateTorsionTests
{
    private static readonly AnalysisOptions Coarse = new() { Accuracy = 1e-3 };

    private static double J(string spec) => SectionAnalyzer.Analyze(ProfileTemplates.Create(spec), Coarse).TorsionConstant;

    private const string Roark = Published.Roark + " (fits within 2 %)";

    // Two opposite flats, x = h/r: C = 0.7854 - 0.4053x - 3.5810x^2 + 5.2708x^3 - 2.0772x^4 (0 <= x <= 0.8); K = 2 C r^4.
    [Theory]
    [InlineData(0.2)]
    [InlineData(0.5)]
    public void Two_flats_match_Roark(double x)
    {
        string h = (x * 20).ToString(System.Globalization.CultureInfo.InvariantCulture);
        Tol.Rel(Published.TwoFlatsJ(0.020, x * 0.020), J($"flats:D=40,h={h},n=2"), 0.02, Roark);
    }

    // Four flats, x = h/r <= 0.293: C = 0.7854 - 0.7x - 7.7982x^2 + 14.578x^3.
    [Fact]
    public void Four_flats_match_Roark() => Tol.Rel(Published.FourFlatsJ(0.020, 0.004), J("flats:D=40,h=4,n=4"), 0.02, Roark);

    // Keyways: half-width a, depth b from the outer radius, s = a/b, x = b/r; C = 0.7854 + C2 x + C3 x^2 + C4 x^3.
    // The fit is for sharp keyways (r=0): the peak shear is singular there, so only J is compared.
    [Theory]
    [InlineData(2, 12.0, 6.0)]  // s = 1, x = 0.3
    [InlineData(2, 10.0, 8.0)]  // s = 0.625, x = 0.4
    [InlineData(4, 12.0, 6.0)]  // s = 1, x = 0.3
    [InlineData(4, 8.0, 5.0)]   // s = 0.8, x = 0.25
    public void Keyways_match_Roark(int n, double width, double depth)
    {
        string spec = string.Create(System.Globalization.CultureInfo.InvariantCulture, $"keyed:d=40,n={n},b={width},t1={depth},r=0");
        Tol.Rel(Published.KeywaysJ(n, 0.020, width * 1e-3, depth * 1e-3), J(spec), 0.02, Roark);
    }

    /// <summary>EN 10210-2 / EN 10219-2 torsion constant formula for a rectangular hollow section (EN 10210-2 / EN 10219-2, the standards' It formula).</summary>
    private static double En10210It(double b, double h, double t, double ro, double ri)
    {
        double rc = (ro + ri) / 2;
        double p = 2 * ((b - t) + (h - t)) - 2 * rc * (4 - Math.PI);
        double ah = (b - t) * (h - t) - rc * rc * (4 - Math.PI);
        double k = 2 * ah * t / p;
        return t * t * t * p / 3 + 2 * k * ah;
    }

    // EN 10210-2 tabulated It (cm^4): 40x2.6: 14.0; 60x4: 72.5; 80x5: 217 (EN 10210-2 tables). The formula reproduces
    // them (rounding of the table: 1 %); the exact Saint-Venant J of the rounded section is 2-3 % above the formula,
    // so the FE value is compared with the formula within 3 % (the standard's formula is itself approximate).
    [Theory]
    [InlineData(40, 2.6, 14.0)]
    [InlineData(60, 4.0, 72.5)]
    [InlineData(80, 5.0, 217)]
    public void Square_hollow_sections_match_EN_10210_2(double b, double t, double tabulatedCm4)
    {
        double bm = b * 1e-3, tm = t * 1e-3;
        double formula = En10210It(bm, bm, tm, 1.5 * tm, tm);
        Tol.Rel(tabulatedCm4 * 1e-8, formula, 0.01, "EN 10210-2 table vs its own formula");
        string spec = string.Create(System.Globalization.CultureInfo.InvariantCulture, $"shs:B={b},t={t}");
        double j = J(spec);
        Tol.Rel(formula, j, 0.03, "EN 10210-2 formula (approximate; exact J is 2-3 % above)");
        Assert.True(j >= formula * 0.995, $"exact J {j:G5} should not fall below the thin-wall formula {formula:G5}");
    }

    [Theory]
    [InlineData("rect:b=60,h=20", 0.060, 0.020)]
    [InlineData("rect:b=20,h=20", 0.020, 0.020)]
    [InlineData("flat:b=50,t=5", 0.050, 0.005)]
    [InlineData("flat:b=80,t=4", 0.080, 0.004)]
    public void Rectangle_and_flat_bar_match_the_series(string spec, double a, double b)
    {
        Tol.Rel(Published.RectangleJ(a, b), J(spec), 3e-3, Published.RectangleSource);
    }
}
