using FsCheck;
using FsCheck.Xunit;

namespace SectionTwist.Tests.Units;

/// <summary>
/// Typo suggestions (issue 11: no suggestions, or the wrong one: steel-1054-cd suggested 1018). Distance: optimal string
/// alignment, i.e. Levenshtein with the swap of two neighbours as one edit (Damerau, Comm. ACM 7(3), 1964).
/// </summary>
public sealed class SuggestTests
{
    private static readonly string[] MaterialKeys =
        ["structural-steel", "steel-s355", "steel-1018-cd", "steel-1045-cd", "steel-4140-qt", "stainless-304", "aluminium-6061-t6", "aluminium-7075-t6", "brass", "titanium-ti6al4v"];

    [Theory]
    [InlineData("steel-1054-cd", "steel-1045-cd")]  // a swapped pair of digits: one edit, and the same digits
    [InlineData("steel-1045cd", "steel-1045-cd")]
    [InlineData("bras", "brass")]
    [InlineData("aluminum-6061-t6", "aluminium-6061-t6")]
    public void Materials(string typed, string expected) => Assert.Equal(expected, Suggest.Nearest(typed, MaterialKeys));

    [Theory]
    [InlineData("sectoin", new[] { "bench", "demo", "inspect", "section", "shaft", "sweep", "templates", "verify" }, "section")]
    [InlineData("keyd", new[] { "circle", "tube", "keyed", "flats", "spline", "rect" }, "keyed")]
    [InlineData("acuracy", new[] { "accuracy", "unit", "units", "layer", "part", "json", "plot", "torque" }, "accuracy")]
    [InlineData("unit", new[] { "unit", "units" }, "unit")]
    [InlineData("tl", new[] { "d", "n", "at", "b", "t1", "r" }, "t1")]
    [InlineData("D", new[] { "d", "n" }, "d")]                 // a difference of case only
    public void Commands_templates_options_and_keys(string typed, string[] candidates, string expected) =>
        Assert.Equal(expected, Suggest.Nearest(typed, candidates));

    [Theory]
    [InlineData("foo", new[] { "bench", "demo", "section", "shaft" })]
    [InlineData("x", new[] { "d", "n", "r" })]                 // one letter: only a case difference counts
    [InlineData("titanium", new[] { "steel-s355", "brass" })]
    public void Unrelated_words_get_no_suggestion(string typed, string[] candidates) => Assert.Null(Suggest.Nearest(typed, candidates));

    [Fact]
    public void A_swap_is_one_edit() => Assert.Equal((1, 1, 2), (Suggest.Distance("1054", "1045"), Suggest.Distance("ab", "ba"), Suggest.Distance("1054", "1018")));

    [Property(MaxTest = 300)]
    public bool Distance_is_symmetric_zero_only_for_equal_words_and_at_most_the_longer_length(NonNull<string> a, NonNull<string> b)
    {
        string x = a.Get, y = b.Get;
        int d = Suggest.Distance(x, y);
        return d == Suggest.Distance(y, x) && (d == 0) == (x == y) && d <= Math.Max(x.Length, y.Length) && d >= Math.Abs(x.Length - y.Length);
    }
}
