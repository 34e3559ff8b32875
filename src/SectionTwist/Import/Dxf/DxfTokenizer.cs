using System.Globalization;
using System.Text;

namespace SectionTwist.Import.Dxf;

/// <summary>
/// Splits a DXF file into group-code/value pairs. ASCII files: two lines per pair, line ends LF, CRLF or CR.
/// Binary files (sentinel <c>AutoCAD Binary DXF\r\n\x1a\0</c>): 2-byte little-endian group codes from R13 on,
/// 1-byte codes (255 escapes a 2-byte code) before; the value type follows from the group code
/// (DXF reference, "Binary DXF Files" and "Group Code Value Types").
/// </summary>
internal static class DxfTokenizer
{
    /// <summary>Largest file read (bytes).</summary>
    public const long MaxBytes = Limits.InputLimits.MaxDxfBytes;

    private static readonly byte[] Sentinel = Encoding.ASCII.GetBytes("AutoCAD Binary DXF\r\n\x1a\0");

    /// <summary>Reads all pairs; <paramref name="format"/> receives "ASCII" or "binary". Strings are Latin-1 here.</summary>
    public static List<DxfPair> Tokenize(ReadOnlySpan<byte> data, string file, out string format, out bool utf8Bom, CancellationToken ct = default)
    {
        utf8Bom = false;
        if (data.Length >= Sentinel.Length && data[..Sentinel.Length].SequenceEqual(Sentinel))
        {
            format = "binary";
            return TokenizeBinary(data, file, ct);
        }
        format = "ASCII";
        if (data.Length >= 3 && data[0] == 0xEF && data[1] == 0xBB && data[2] == 0xBF) { utf8Bom = true; data = data[3..]; }
        if (data.IndexOf((byte)0) >= 0 && data.IndexOf((byte)0) < 4096)
            throw new SectionTwistException("not-dxf",
                $"{file}: holds binary bytes but not the binary DXF sentinel; it is not a DXF file (a DWG drawing must be saved as DXF first)");
        return TokenizeAscii(data, file, ct);
    }

    private static List<DxfPair> TokenizeAscii(ReadOnlySpan<byte> data, string file, CancellationToken ct)
    {
        var pairs = new List<DxfPair>();
        int pos = 0, line = 0;
        while (true)
        {
            if ((pairs.Count & 65535) == 65535) ct.ThrowIfCancellationRequested();
            int codeLine = line + 1;
            var codeText = NextLine(data, ref pos, ref line);
            if (codeText is null) break;
            var trimmed = codeText.Trim();
            if (trimmed.Length == 0 && pos >= data.Length) break; // trailing blank line
            if (!int.TryParse(trimmed, NumberStyles.Integer, CultureInfo.InvariantCulture, out int code))
                throw new SectionTwistException("bad-dxf-code",
                    $"{file}:{codeLine}: expected a group code (a whole number) but found '{DxfPair.Trunc(trimmed)}'; the file is damaged or not ASCII DXF");
            var value = NextLine(data, ref pos, ref line);
            if (value is null)
            {
                if (code == 0 && pairs.Count > 0) break;
                throw new SectionTwistException("truncated-dxf", $"{file}:{codeLine}: the file ends after group code {code} without its value; the file is truncated");
            }
            pairs.Add(new DxfPair(code, value.Trim(), codeLine));
        }
        return pairs;
    }

    private static string? NextLine(ReadOnlySpan<byte> data, ref int pos, ref int line)
    {
        if (pos >= data.Length) return null;
        int start = pos;
        var rest = data[pos..];
        int nl = rest.IndexOfAny((byte)'\r', (byte)'\n');
        if (nl < 0) { pos = data.Length; line++; return Encoding.Latin1.GetString(rest); }
        string s = Encoding.Latin1.GetString(rest[..nl]);
        pos = start + nl + 1;
        if (rest[nl] == '\r' && pos < data.Length && data[pos] == '\n') pos++;
        line++;
        return s;
    }

    private static List<DxfPair> TokenizeBinary(ReadOnlySpan<byte> data, string file, CancellationToken ct)
    {
        var pairs = new List<DxfPair>();
        int pos = Sentinel.Length;
        // R13+ writes 2-byte codes: the first pair (0, "SECTION") starts 00 00; R12 writes 00 'S'.
        bool twoByte = data.Length > pos + 1 && data[pos + 1] == 0;
        while (pos < data.Length)
        {
            if ((pairs.Count & 65535) == 65535) ct.ThrowIfCancellationRequested();
            int at = pos;
            int code;
            if (twoByte)
            {
                Need(data, pos, 2, file, at);
                code = BitConverter.ToInt16(data.Slice(pos, 2));
                pos += 2;
            }
            else
            {
                code = data[pos++];
                if (code == 255) { Need(data, pos, 2, file, at); code = BitConverter.ToInt16(data.Slice(pos, 2)); pos += 2; }
            }
            if (code < 0) throw new SectionTwistException("bad-dxf-code", $"{file}: byte {at}: negative group code {code}; the binary DXF file is damaged");
            switch (Kind(code))
            {
                case ValueKind.String:
                {
                    int end = data[pos..].IndexOf((byte)0);
                    if (end < 0) throw Truncated(file, at);
                    pairs.Add(new DxfPair(code, Encoding.Latin1.GetString(data.Slice(pos, end)), at));
                    pos += end + 1;
                    break;
                }
                case ValueKind.Double:
                    Need(data, pos, 8, file, at);
                    pairs.Add(Num(code, BitConverter.ToDouble(data.Slice(pos, 8)), at)); pos += 8; break;
                case ValueKind.Int16:
                    Need(data, pos, 2, file, at);
                    pairs.Add(Num(code, BitConverter.ToInt16(data.Slice(pos, 2)), at)); pos += 2; break;
                case ValueKind.Int32:
                    Need(data, pos, 4, file, at);
                    pairs.Add(Num(code, BitConverter.ToInt32(data.Slice(pos, 4)), at)); pos += 4; break;
                case ValueKind.Int64:
                    Need(data, pos, 8, file, at);
                    pairs.Add(Num(code, BitConverter.ToInt64(data.Slice(pos, 8)), at)); pos += 8; break;
                case ValueKind.Bool:
                    Need(data, pos, 1, file, at);
                    pairs.Add(Num(code, data[pos], at)); pos += 1; break;
                case ValueKind.Chunk:
                {
                    Need(data, pos, 1, file, at);
                    int len = data[pos];
                    Need(data, pos + 1, len, file, at);
                    pairs.Add(new DxfPair(code, Convert.ToHexString(data.Slice(pos + 1, len)), at));
                    pos += 1 + len;
                    break;
                }
                default:
                    throw new SectionTwistException("bad-dxf-code", $"{file}: byte {at}: unknown group code {code} in a binary DXF file; the file is damaged");
            }
            if (code == 0 && pairs[^1].Value == "EOF") break;
        }
        return pairs;
    }

    private static DxfPair Num(int code, double v, int at) =>
        new(code, v.ToString("R", CultureInfo.InvariantCulture), at, v, true);

    private static void Need(ReadOnlySpan<byte> data, int pos, int n, string file, int at)
    {
        if (pos + n > data.Length) throw Truncated(file, at);
    }

    private static SectionTwistException Truncated(string file, int at) =>
        new("truncated-dxf", $"{file}: byte {at}: the binary DXF file ends inside a value; the file is truncated");

    private enum ValueKind { String, Double, Int16, Int32, Int64, Bool, Chunk, Unknown }

    private static ValueKind Kind(int c) => c switch
    {
        >= 0 and <= 9 => ValueKind.String,
        >= 10 and <= 59 => ValueKind.Double,
        >= 60 and <= 79 => ValueKind.Int16,
        >= 90 and <= 99 => ValueKind.Int32,
        100 or 101 or 102 or 105 => ValueKind.String,
        >= 110 and <= 149 => ValueKind.Double,
        >= 160 and <= 169 => ValueKind.Int64,
        >= 170 and <= 179 => ValueKind.Int16,
        >= 210 and <= 239 => ValueKind.Double,
        >= 270 and <= 289 => ValueKind.Int16,
        >= 290 and <= 299 => ValueKind.Bool,
        >= 300 and <= 309 => ValueKind.String,
        >= 310 and <= 319 => ValueKind.Chunk,
        >= 320 and <= 369 => ValueKind.String,
        >= 370 and <= 389 => ValueKind.Int16,
        >= 390 and <= 399 => ValueKind.String,
        >= 400 and <= 409 => ValueKind.Int16,
        >= 410 and <= 419 => ValueKind.String,
        >= 420 and <= 429 => ValueKind.Int32,
        >= 430 and <= 439 => ValueKind.String,
        >= 440 and <= 459 => ValueKind.Int32,
        >= 460 and <= 469 => ValueKind.Double,
        >= 470 and <= 481 => ValueKind.String,
        999 => ValueKind.String,
        >= 1000 and <= 1009 => ValueKind.String,
        >= 1010 and <= 1059 => ValueKind.Double,
        >= 1060 and <= 1070 => ValueKind.Int16,
        1071 => ValueKind.Int32,
        _ => ValueKind.Unknown,
    };
}
