namespace SectionTwist;

/// <summary>
/// "Did you mean ...?" for every name a user types: commands, options, template names and keys, shaft-file keys,
/// materials, stations, sections, units. One ranking everywhere: the optimal-string-alignment distance (Levenshtein
/// edits plus the transposition of two neighbouring letters as one edit; F. J. Damerau, "A technique for computer
/// detection and correction of spelling errors", Comm. ACM 7(3), 1964), case-insensitive; ties go to the candidate with
/// the same first letter, the longer common prefix, the same digits (<c>1054</c> is nearer <c>1045</c> than <c>1018</c>),
/// then the closer length.
/// </summary>
internal static class Suggest
{
    /// <summary>The candidate nearest to <paramref name="word"/>, or null when none is close enough to be a typo.</summary>
    public static string? Nearest(string word, IEnumerable<string> candidates) => Ranked(word, candidates, 1).FirstOrDefault();

    /// <summary>Up to <paramref name="max"/> close candidates, best first.</summary>
    public static IReadOnlyList<string> Ranked(string word, IEnumerable<string> candidates, int max = 3)
    {
        ArgumentNullException.ThrowIfNull(word);
        ArgumentNullException.ThrowIfNull(candidates);
        string w = word.Trim().ToLowerInvariant();
        if (w.Length == 0) return [];
        int limit = Limit(w.Length);
        var scored = new List<(string Candidate, int Distance, int FirstDiffers, int Prefix, int DigitsDiffer, int LengthDiff)>();
        foreach (var c in candidates.Distinct(StringComparer.Ordinal))
        {
            string lc = c.ToLowerInvariant();
            if (lc == w) { scored.Add((c, 0, 0, -lc.Length, 0, 0)); continue; }
            int d = Distance(w, lc);
            if (w.Length < 2) continue; // one letter: only a difference of case is a typo
            // a prefix of a long name ('--acc' for '--accuracy') counts as close
            bool prefix = w.Length >= 3 && lc.StartsWith(w, StringComparison.Ordinal);
            if (d > limit && !prefix) continue;
            if (d > Math.Max(w.Length, lc.Length) / 2 + (prefix ? lc.Length : 0)) continue; // mostly different letters
            scored.Add((c, prefix ? Math.Min(d, limit) : d, lc[0] == w[0] ? 0 : 1, -CommonPrefix(w, lc), SameDigits(w, lc) ? 0 : 1, Math.Abs(lc.Length - w.Length)));
        }
        return scored.OrderBy(s => s.Distance).ThenBy(s => s.FirstDiffers).ThenBy(s => s.Prefix).ThenBy(s => s.DigitsDiffer)
            .ThenBy(s => s.LengthDiff).ThenBy(s => s.Candidate, StringComparer.Ordinal).Take(max).Select(s => s.Candidate).ToList();
    }

    /// <summary><c> (did you mean 'X'?)</c> for the nearest candidate, or an empty string when none is close.</summary>
    public static string DidYouMean(string word, IEnumerable<string> candidates, string prefix = " (did you mean ", string suffix = "?)") =>
        Nearest(word, candidates) is { } n ? $"{prefix}'{n}'{suffix}" : "";

    /// <summary>Edits allowed for a word of this length: 1 up to 4 letters, 2 up to 8, then 3.</summary>
    internal static int Limit(int length) => length <= 4 ? 1 : length <= 8 ? 2 : 3;

    /// <summary>Optimal-string-alignment distance (insert, delete, substitute, swap two neighbours; each costs 1).</summary>
    internal static int Distance(string a, string b)
    {
        int n = a.Length, m = b.Length;
        if (n == 0) return m;
        if (m == 0) return n;
        var d = new int[n + 1, m + 1];
        for (int i = 0; i <= n; i++) d[i, 0] = i;
        for (int j = 0; j <= m; j++) d[0, j] = j;
        for (int i = 1; i <= n; i++)
        {
            for (int j = 1; j <= m; j++)
            {
                int cost = a[i - 1] == b[j - 1] ? 0 : 1;
                int v = Math.Min(Math.Min(d[i - 1, j] + 1, d[i, j - 1] + 1), d[i - 1, j - 1] + cost);
                if (i > 1 && j > 1 && a[i - 1] == b[j - 2] && a[i - 2] == b[j - 1]) v = Math.Min(v, d[i - 2, j - 2] + 1);
                d[i, j] = v;
            }
        }
        return d[n, m];
    }

    private static int CommonPrefix(string a, string b)
    {
        int k = 0;
        while (k < a.Length && k < b.Length && a[k] == b[k]) k++;
        return k;
    }

    /// <summary>True when both words hold the same digits (in any order) or neither holds any.</summary>
    private static bool SameDigits(string a, string b) =>
        string.Concat(a.Where(char.IsAsciiDigit).Order()) == string.Concat(b.Where(char.IsAsciiDigit).Order());
}
