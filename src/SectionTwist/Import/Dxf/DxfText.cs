using System.Globalization;
using System.Text;

namespace SectionTwist.Import.Dxf;

/// <summary>
/// Text decoding of DXF values. Values are first read byte-for-byte (Latin-1), then re-decoded once the header is
/// known: UTF-8 from AC1021 (R2007) on, before that the <c>$DWGCODEPAGE</c> code page (default ANSI_1252), and
/// <c>\U+nnnn</c> escapes are replaced by their character (DXF reference, "Group codes in numerical order" and the
/// HEADER variables $ACADVER and $DWGCODEPAGE).
/// </summary>
internal static class DxfText
{
    /// <summary>The encoding that files of this version and code page use for text.</summary>
    public static Encoding EncodingFor(string? acadVer, string? codePage, bool utf8Bom)
    {
        if (utf8Bom || IsUtf8Version(acadVer)) return new UTF8Encoding(false, false);
        int cp = 1252;
        if (codePage is not null)
        {
            string c = codePage.Trim().ToUpperInvariant();
            int us = c.LastIndexOf('_');
            string digits = us >= 0 ? c[(us + 1)..] : c;
            if (c is "DOS" or "ASCII") cp = 1252;
            else if (c.StartsWith("UTF", StringComparison.Ordinal)) return new UTF8Encoding(false, false);
            else if (int.TryParse(digits, NumberStyles.Integer, CultureInfo.InvariantCulture, out int n) && n > 0) cp = n;
        }
        try { return CodePagesEncodingProvider.Instance.GetEncoding(cp) ?? Encoding.GetEncoding(cp); }
        catch (ArgumentException) { return CodePagesEncodingProvider.Instance.GetEncoding(1252)!; }
        catch (NotSupportedException) { return CodePagesEncodingProvider.Instance.GetEncoding(1252)!; }
    }

    /// <summary>True for AC1021 (R2007) and later, whose text is UTF-8.</summary>
    public static bool IsUtf8Version(string? acadVer) =>
        acadVer is { Length: >= 6 } v && v.StartsWith("AC", StringComparison.OrdinalIgnoreCase)
        && int.TryParse(v.AsSpan(2, 4), NumberStyles.Integer, CultureInfo.InvariantCulture, out int n) && n >= 1021;

    /// <summary>Re-decodes a value read as Latin-1 with <paramref name="enc"/> and resolves <c>\U+nnnn</c> escapes.</summary>
    public static string Decode(string latin1, Encoding enc)
    {
        string s = latin1;
        bool high = false;
        foreach (char ch in s) if (ch > 0x7f) { high = true; break; }
        if (high && enc.CodePage != 28591) s = enc.GetString(Encoding.Latin1.GetBytes(s));
        return s.Contains("\\U+", StringComparison.OrdinalIgnoreCase) ? Unescape(s) : s;
    }

    /// <summary>Replaces <c>\U+nnnn</c> (four hex digits) by the character.</summary>
    public static string Unescape(string s)
    {
        var sb = new StringBuilder(s.Length);
        for (int i = 0; i < s.Length; i++)
        {
            if (s[i] == '\\' && i + 6 < s.Length && (s[i + 1] == 'U' || s[i + 1] == 'u') && s[i + 2] == '+' &&
                int.TryParse(s.AsSpan(i + 3, 4), NumberStyles.HexNumber, CultureInfo.InvariantCulture, out int cpt))
            {
                sb.Append((char)cpt);
                i += 6;
            }
            else sb.Append(s[i]);
        }
        return sb.ToString();
    }
}
