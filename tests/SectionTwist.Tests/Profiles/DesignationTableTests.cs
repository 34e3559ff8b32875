using SectionTwist.Profiles;
using SectionTwist.Torsion;

namespace SectionTwist.Tests.Profiles;

/// <summary>
/// The designation families added for issue 14: parallel-flange channels (upe, EN 10365), unequal angles (lun,
/// EN 10056-1) and hot-finished hollow sections (hfshs, hfrhs, hfchs, EN 10210-2). Every row is from memory, so these
/// tests check the template geometry (with the family's radii) against the same table's printed area and It, and the
/// exact torsion constant against the table's own formula where the printed It is not in our memory. The area of every
/// row, to its printed digits, is checked by <see cref="SteelSectionTableTests"/>.
/// </summary>
public class DesignationTableTests
{
    private static readonly AnalysisOptions Options = new() { Accuracy = 1e-3 };

    private static readonly string[] Added = ["upe", "lun", "hfshs", "hfrhs", "hfchs"];

    private static TheoryData<string, string> Where(Func<SteelSectionTable.Row, bool> keep)
    {
        var d = new TheoryData<string, string>();
        foreach (var r in SteelSectionTable.Rows.Where(r => Added.Contains(r.Family) && keep(r))) d.Add(r.Family, r.Size);
        return d;
    }

    public static TheoryData<string, string> PrintedIt() => Where(r => !double.IsNaN(r.It));

    public static TheoryData<string, string> OpenWithoutIt() => Where(r => double.IsNaN(r.It) && r.Family is "upe" or "lun");

    public static TheoryData<string, string> RectangularHollow() => Where(r => r.Family is "hfshs" or "hfrhs");

    private static (SteelSectionTable.Row Row, double Area, double J) Solve(string family, string size)
    {
        var row = SteelSectionTable.Find(family, size)!.Value;
        var r = SectionAnalyzer.Analyze(ProfileTemplates.Create($"{family}:{size}"), Options);
        return (row, r.Properties.Area * 1e4, r.TorsionConstant * 1e8);
    }

    // Printed It. CHS: the tables print It = 2 I of the exact annulus, so the exact J must round to the digits the row
    // carries (half a unit of its last digit, plus 1e-6 for the solve). UPE 80-200: the tables'
    // It is a thin-wall formula with a fillet term; the exact J of the outline with root radii lies within 0.6 % of the
    // printed values remembered; tolerance 2 %.
    [Theory]
    [MemberData(nameof(PrintedIt))]
    public void It_matches_the_printed_value(string family, string size)
    {
        var (row, _, j) = Solve(family, size);
        string source = $"{family.ToUpperInvariant()} {size} printed It ({(family == "upe" ? "EN 10365" : "EN 10210-2")}, from memory)";
        if (family == "hfchs") Tol.Abs(row.It, j, HalfUnit(row.It) + 1e-6 * j, source);
        else if (family == "upe") Tol.Rel(row.It, j, 0.02, source);
        else
        {
            // SHS: the printed value is the EN 10210-2 formula's (to its digits); the exact J lies 0 to 4 % above it
            Tol.Abs(row.It, Formula(row), HalfUnit(row.It), source + ", against the formula");
            Assert.True(j / row.It is >= 1 and <= 1.04, $"{family} {size}: exact J {j:G5} cm^4 is {j / row.It:F4} x the printed It {row.It} ({source}); expected 1 to 1.04");
        }
    }

    // The CHS rows' printed area and It against the exact annulus formulas computed here (pi (D - t) t and
    // pi (D^4 - d^4) / 32), to the printed digits: a wrong remembered digit shows here even before any solve.
    [Theory]
    [MemberData(nameof(PrintedIt))]
    public void Chs_rows_match_the_annulus_formulas(string family, string size)
    {
        if (family != "hfchs") return;
        var row = SteelSectionTable.Find(family, size)!.Value;
        double d = row.H, t = row.Tw, di = d - 2 * t;
        Tol.Abs(row.Area, Math.PI * (d - t) * t / 100, HalfUnit(row.Area), $"CHS {size} area, EN 10210-2 (from memory)");
        Tol.Abs(row.It, Math.PI / 32 * (Math.Pow(d, 4) - Math.Pow(di, 4)) / 1e4, HalfUnit(row.It), $"CHS {size} It = 2 I, EN 10210-2 (from memory)");
    }

    // SHS / RHS: the tables compute It with the EN 10210-2 formula (Bredt's thin-wall formula on the mid-line with the
    // corner radii, plus t^3 h / 3): Rc = (ro + ri) / 2, h = 2 [(B - t) + (H - t)] - 2 Rc (4 - pi),
    // Ah = (B - t)(H - t) - Rc^2 (4 - pi), It = t^3 h / 3 + 4 Ah^2 t / h. The thin-wall formula leaves out the wall's
    // own thickness (for a round tube the exact value is 2 pi rm^3 t (1 + t^2 / 4 rm^2)), so the exact J lies above it:
    // 1.4 to 3.3 % for these rows. Band: 0 to 4 % above.
    [Theory]
    [MemberData(nameof(RectangularHollow))]
    public void Rectangular_hollow_It_lies_just_above_the_table_formula(string family, string size)
    {
        var (row, _, j) = Solve(family, size);
        double formula = Formula(row), ratio = j / formula;
        Assert.True(ratio is >= 1 and <= 1.04, $"{family} {size}: exact J {j:G5} cm^4 is {ratio:F4} x the EN 10210-2 formula value {formula:G5} cm^4; expected 1 to 1.04");
    }

    // Rows without a printed It in our memory (unequal angles, UPE 220 and up): a sanity band around the tables'
    // thin-wall sum without the fillet term (angle: (h + b - t) t^3 / 3; channel: 2 b tf^3 / 3 + (h - 2 tf) tw^3 / 3).
    // The root fillet adds and the free ends take away; the exact J lies 3.3 to 8.4 % above the sum here. Band: 0 to 10 %.
    /// <summary>The EN 10210-2 torsion constant of a rectangular hollow row, cm^4 (formula in the comment above).</summary>
    private static double Formula(SteelSectionTable.Row row)
    {
        double t = row.Tw, rc = (row.R + row.R2) / 2, k = 4 - Math.PI;
        double h = 2 * ((row.B - t) + (row.H - t)) - 2 * rc * k, ah = (row.B - t) * (row.H - t) - rc * rc * k;
        return (t * t * t * h / 3 + 4 * ah * ah * t / h) / 1e4;
    }

    [Theory]
    [MemberData(nameof(OpenWithoutIt))]
    public void Open_section_It_lies_in_the_thin_wall_band(string family, string size)
    {
        var (row, _, j) = Solve(family, size);
        double sum = family == "lun"
            ? (row.H + row.B - row.Tw) * Math.Pow(row.Tw, 3) / 3 / 1e4
            : (2 * row.B * Math.Pow(row.Tf, 3) + (row.H - 2 * row.Tf) * Math.Pow(row.Tw, 3)) / 3 / 1e4;
        double ratio = j / sum;
        Assert.True(ratio is >= 1 and <= 1.10, $"{family} {size}: exact J {j:G5} cm^4 is {ratio:F4} x the thin-wall sum {sum:G5} cm^4; expected 1 to 1.10");
    }

    [Theory]
    [InlineData("hfshs:100x100x5.0", "hfshs:100x100x5")]
    [InlineData("hfchs:48.30x3.2", "hfchs:48.3x3.2")]
    [InlineData("LUN:100X50X8", "lun:100x50x8")]
    public void Sizes_match_by_their_numbers(string written, string row)
    {
        Assert.Equal(ProfileTemplates.Create(row).Properties.Area, ProfileTemplates.Create(written).Properties.Area);
    }

    [Theory]
    [InlineData("upe:210", "220")]
    [InlineData("lun:100x50x7", "100x50x8")]
    [InlineData("hfrhs:200x100x9", "200x100x8")]
    [InlineData("hfchs:48.3", "48.3x3.2")]
    public void An_unknown_size_names_the_sizes(string spec, string listed)
    {
        var ex = Assert.Throws<SectionTwistException>(() => ProfileTemplates.Create(spec));
        Assert.Contains(listed, ex.Message, StringComparison.Ordinal);
        Assert.DoesNotContain("   at ", ex.Message, StringComparison.Ordinal);
    }

    /// <summary>Half a unit of the last digit <paramref name="value"/> is written with (1.36: 0.005; 1712: 0.5).</summary>
    private static double HalfUnit(double value)
    {
        string s = value.ToString("R", System.Globalization.CultureInfo.InvariantCulture);
        int dot = s.IndexOf('.', StringComparison.Ordinal);
        return 0.5 * (dot >= 0 ? Math.Pow(10, -(s.Length - dot - 1)) : Math.Pow(10, s.Length - s.TrimEnd('0').Length));
    }
}
