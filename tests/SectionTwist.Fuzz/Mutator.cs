using System.Globalization;
using System.Text;
using System.Text.RegularExpressions;

namespace SectionTwist.Fuzz;

/// <summary>
/// Deterministic mutations of a seed: byte flips; deleted, duplicated and swapped lines and DXF group-code pairs;
/// extreme numbers; truncation; splices with another seed; unicode; YAML anchors, aliases and "billion laughs"; deep
/// nesting; and target-specific injections (a stray ELLIPSE with an enormous or tiny axis, INSERT arrays, crowds of
/// points, stations and loads). Text is handled as Latin-1 so that every byte survives a round trip.
/// </summary>
public static partial class Mutator
{
    /// <summary>Largest mutated input, bytes.</summary>
    public const int MaxSize = 4 << 20;

    private static readonly string[] Extremes =
    [
        "1e308", "-1e308", "1.7976931348623157e308", "1e-300", "-1e-300", "4.9e-324", "0", "-0", "NaN", "Infinity", "-inf", "1e15", "-1e15",
        "123456789012345678901234567890", "2147483648", "-2147483649", "32767", "65536", "1e6", "1e-9", "0.000000001", "1e30", "9e99", "-1",
        "1e12", "1e-12", "3.4e38", ".", "-", "+", "1e", "0x10", "1,5", "١٢", "1e400",
    ];

    private static readonly string[] Unicode = ["é", "ß", "𝔘", "\uFEFF", "\u202E", "\u0301", "\u00A0", "Ω", "中", "\u2028", "\u0085", "\uFFFD", "\u0000", "\u001B", "\u007F", "\t", "\r", "\\", "\"", "'"];

    [GeneratedRegex(@"[-+]?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?")]
    private static partial Regex Number();

    /// <summary>Mutates <paramref name="seed"/> one to four times; <paramref name="other"/> is a second seed for splices.</summary>
    public static byte[] Mutate(Random rng, byte[] seed, byte[] other, string target)
    {
        var data = seed;
        int n = 1 + rng.Next(rng.Next(10) == 0 ? 8 : 3);
        for (int i = 0; i < n; i++)
        {
            data = Once(rng, data, other, target);
            if (data.Length > MaxSize) data = data[..MaxSize];
        }
        return data;
    }

    private static byte[] Once(Random rng, byte[] data, byte[] other, string target)
    {
        switch (rng.Next(13))
        {
            case 0: return BitFlip(rng, data);
            case 1: return Lines(rng, data, (l, r) => Delete(r, l, 1 + r.Next(3)));
            case 2: return Lines(rng, data, (l, r) => Duplicate(r, l));
            case 3: return Lines(rng, data, (l, r) => Swap(r, l, 1));
            case 4: return Lines(rng, data, (l, r) => PairOp(r, l));
            case 5: return ExtremeNumber(rng, data);
            case 6: return data.Length == 0 ? data : data[..rng.Next(data.Length)];
            case 7: return Splice(rng, data, other);
            case 8: return Insert(rng, data, Latin(Unicode[rng.Next(Unicode.Length)]));
            case 9: return target == "shaft" ? Yaml(rng, data) : Lines(rng, data, (l, r) => Swap(r, l, 2 + r.Next(4)));
            case 10: return Nesting(rng, data, target);
            case 11: return Inject(rng, data, target);
            default: return Repeat(rng, data);
        }
    }

    /// <summary>A string as Latin-1 chars of its UTF-8 bytes (so it survives the byte round trip).</summary>
    private static string Latin(string s) => Encoding.Latin1.GetString(Encoding.UTF8.GetBytes(s));

    private static byte[] BitFlip(Random rng, byte[] data)
    {
        if (data.Length == 0) return [(byte)rng.Next(256)];
        var b = (byte[])data.Clone();
        int flips = 1 + rng.Next(4);
        for (int k = 0; k < flips; k++) b[rng.Next(b.Length)] ^= (byte)(1 << rng.Next(8));
        return b;
    }

    private static byte[] Lines(Random rng, byte[] data, Func<List<string>, Random, List<string>> op)
    {
        var lines = Encoding.Latin1.GetString(data).Split('\n').ToList();
        return Encoding.Latin1.GetBytes(string.Join('\n', op(lines, rng)));
    }

    private static List<string> Delete(Random rng, List<string> l, int count)
    {
        if (l.Count == 0) return l;
        int at = rng.Next(l.Count);
        l.RemoveRange(at, Math.Min(count, l.Count - at));
        return l;
    }

    private static List<string> Duplicate(Random rng, List<string> l)
    {
        if (l.Count == 0) return l;
        int at = rng.Next(l.Count), len = Math.Min(1 + rng.Next(6), l.Count - at);
        var block = l.GetRange(at, len);
        int times = rng.Next(8) == 0 ? 1 + rng.Next(200) : 1;
        int to = rng.Next(l.Count + 1);
        for (int t = 0; t < times; t++) l.InsertRange(to, block);
        return l;
    }

    private static List<string> Swap(Random rng, List<string> l, int width)
    {
        if (l.Count < 2 * width) return l;
        int a = rng.Next(l.Count - width + 1), b = rng.Next(l.Count - width + 1);
        for (int k = 0; k < width; k++)
        {
            int i = a + k, j = b + k;
            if (i < l.Count && j < l.Count) (l[i], l[j]) = (l[j], l[i]);
        }
        return l;
    }

    /// <summary>DXF group-code pairs: delete, duplicate or swap whole (code, value) pairs.</summary>
    private static List<string> PairOp(Random rng, List<string> l)
    {
        int pairs = l.Count / 2;
        if (pairs < 2) return l;
        int a = rng.Next(pairs), b = rng.Next(pairs);
        switch (rng.Next(3))
        {
            case 0: l.RemoveRange(2 * a, 2); break;
            case 1: l.InsertRange(2 * b, l.GetRange(2 * a, 2)); break;
            default: (l[2 * a], l[2 * b], l[2 * a + 1], l[2 * b + 1]) = (l[2 * b], l[2 * a], l[2 * b + 1], l[2 * a + 1]); break;
        }
        return l;
    }

    private static byte[] ExtremeNumber(Random rng, byte[] data)
    {
        string s = Encoding.Latin1.GetString(data);
        var matches = Number().Matches(s);
        string value = Extremes[rng.Next(Extremes.Length)];
        if (matches.Count == 0) return Insert(rng, data, value);
        var m = matches[rng.Next(matches.Count)];
        return Encoding.Latin1.GetBytes(string.Concat(s.AsSpan(0, m.Index), Latin(value), s.AsSpan(m.Index + m.Length)));
    }

    private static byte[] Splice(Random rng, byte[] a, byte[] b)
    {
        int i = a.Length == 0 ? 0 : rng.Next(a.Length), j = b.Length == 0 ? 0 : rng.Next(b.Length);
        return [.. a.AsSpan(0, i), .. b.AsSpan(j)];
    }

    private static byte[] Insert(Random rng, byte[] data, string latin)
    {
        int at = data.Length == 0 ? 0 : rng.Next(data.Length + 1);
        return [.. data.AsSpan(0, at), .. Encoding.Latin1.GetBytes(latin), .. data.AsSpan(at)];
    }

    private static byte[] Repeat(Random rng, byte[] data)
    {
        if (data.Length == 0) return data;
        int at = rng.Next(data.Length), len = Math.Min(1 + rng.Next(200), data.Length - at);
        int times = 1 + rng.Next(rng.Next(4) == 0 ? 20000 : 50);
        var chunk = data.AsSpan(at, len).ToArray();
        var ms = new MemoryStream();
        ms.Write(data, 0, at);
        for (int t = 0; t < times && ms.Length < MaxSize; t++) ms.Write(chunk);
        ms.Write(data, at, data.Length - at);
        return ms.ToArray();
    }

    /// <summary>YAML anchors and aliases: an anchored value used again, a self-reference, or a "billion laughs" block.</summary>
    private static byte[] Yaml(Random rng, byte[] data)
    {
        var lines = Encoding.Latin1.GetString(data).Split('\n').ToList();
        switch (rng.Next(5))
        {
            case 0:
                {
                    // anchor a value, alias it elsewhere
                    int i = rng.Next(Math.Max(1, lines.Count));
                    if (lines.Count == 0) return data;
                    int colon = lines[i].IndexOf(": ", StringComparison.Ordinal);
                    if (colon < 0) return data;
                    lines[i] = lines[i].Insert(colon + 2, "&x ");
                    int j = rng.Next(lines.Count);
                    int cj = lines[j].IndexOf(": ", StringComparison.Ordinal);
                    if (cj >= 0) lines[j] = lines[j][..(cj + 2)] + "*x";
                    break;
                }
            case 1: lines.Insert(rng.Next(lines.Count + 1), "? &k [a, *k]\n: 1"); break;
            case 2:
                {
                    var b = new StringBuilder("laughs: &l0 [lol, lol, lol, lol, lol, lol, lol, lol, lol]\n");
                    int depth = 2 + rng.Next(10);
                    for (int d = 1; d < depth; d++)
                        b.Append(CultureInfo.InvariantCulture, $"l{d}: &l{d} [{string.Join(", ", Enumerable.Repeat($"*l{d - 1}", 9))}]\n");
                    if (rng.Next(2) == 0) b.Append(CultureInfo.InvariantCulture, $"? *l{depth - 1}\n: x\n");
                    lines.Insert(0, b.ToString());
                    break;
                }
            case 3: lines.Insert(rng.Next(lines.Count + 1), "? {a: 1, b: [2, 3]}\n: value"); break;
            default:
                {
                    string[] tags = ["!<tag:yaml.org,2002:str> x", "!<not a uri> x", "!!binary AAAA", "!local x", "!!python/object:os.system x", "!<!> x", "!!float .inf", "!!int 0x7FFFFFFFFFFFFFFFF"];
                    int i = rng.Next(Math.Max(1, lines.Count));
                    if (lines.Count == 0) return data;
                    int colon = lines[i].IndexOf(": ", StringComparison.Ordinal);
                    if (colon >= 0) lines[i] = lines[i][..(colon + 2)] + tags[rng.Next(tags.Length)];
                    break;
                }
        }
        return Encoding.Latin1.GetBytes(string.Join('\n', lines));
    }

    private static byte[] Nesting(Random rng, byte[] data, string target)
    {
        int depth = rng.Next(3) switch { 0 => 10 + rng.Next(40), 1 => 100 + rng.Next(1000), _ => 10_000 + rng.Next(60_000) };
        string open, close;
        switch (rng.Next(3))
        {
            case 0: open = "["; close = "]"; break;
            case 1: open = "{a: "; close = "}"; break;
            default: open = "- "; close = ""; break;
        }
        var b = new StringBuilder(target == "shaft" ? "title: " : "");
        if (open == "- ") for (int d = 0; d < Math.Min(depth, 5000); d++) b.Append('\n').Append(' ', d).Append("- ");
        else { for (int d = 0; d < depth; d++) b.Append(open); b.Append('x'); for (int d = 0; d < depth; d++) b.Append(close); }
        b.Append('\n');
        return Insert(rng, data, b.ToString());
    }

    /// <summary>Target-specific hostile pieces.</summary>
    private static byte[] Inject(Random rng, byte[] data, string target)
    {
        string s = Encoding.Latin1.GetString(data);
        int at = s.IndexOf("ENTITIES", StringComparison.Ordinal);
        string F(double v) => v.ToString("R", CultureInfo.InvariantCulture);
        switch (target)
        {
            case "dxf":
                {
                    if (at < 0) return data;
                    at = s.IndexOf('\n', at) + 1;
                    double axis = rng.Next(2) == 0 ? Math.Pow(10, 3 + rng.Next(300)) : Math.Pow(10, -3 - rng.Next(300));
                    string piece = rng.Next(3) switch
                    {
                        0 => $"0\nELLIPSE\n8\n0\n10\n{F(rng.NextDouble() * 50)}\n20\n0\n30\n0\n11\n{F(axis)}\n21\n0\n31\n0\n40\n{F(0.001 + rng.NextDouble())}\n",
                        1 => $"0\nCIRCLE\n8\nHOLES\n10\n{F(axis)}\n20\n0\n30\n0\n40\n{F(1 + rng.NextDouble())}\n",
                        _ => $"0\nINSERT\n8\n0\n2\n{BlockName(s, rng)}\n10\n0\n20\n0\n70\n{1 + rng.Next(400)}\n71\n{1 + rng.Next(400)}\n44\n{F(rng.NextDouble() * 100)}\n45\n{F(rng.NextDouble() * 100)}\n",
                    };
                    return Encoding.Latin1.GetBytes(s.Insert(at, piece));
                }
            case "points":
                {
                    var b = new StringBuilder();
                    int n = rng.Next(3) == 0 ? 1000 + rng.Next(20000) : 3 + rng.Next(20);
                    double scale = Math.Pow(10, rng.Next(-320, 320));
                    for (int i = 0; i < n; i++)
                    {
                        double a = 2 * Math.PI * i / n;
                        b.Append(CultureInfo.InvariantCulture, $"{F(scale * Math.Cos(a))}, {F(scale * Math.Sin(a) * (rng.Next(5) == 0 ? 1e-9 : 1))}\n");
                        if (rng.Next(200) == 0) b.Append('\n');
                    }
                    return Insert(rng, data, "\n" + b + "\n");
                }
            default:
                {
                    var b = new StringBuilder();
                    int n = rng.Next(4) == 0 ? 2000 + rng.Next(3000) : 2 + rng.Next(20);
                    string key = rng.Next(3) switch { 0 => "stations", 1 => "loads", _ => "segments" };
                    b.Append(key).Append(":\n");
                    for (int i = 0; i < n; i++)
                        b.Append(key switch
                        {
                            "stations" => $"  - {{name: Z{i}, at: {F(rng.NextDouble() * Math.Pow(10, rng.Next(-12, 12)))} m}}\n",
                            "loads" => $"  - {{at: Z{i % 7}, torque: {Extremes[rng.Next(Extremes.Length)]} N*m}}\n",
                            _ => $"  - {{from: Z{i}, to: Z{i + 1}, section: {{round: {F(rng.NextDouble() * 100)} mm}}, material: steel-1045-cd}}\n",
                        });
                    return Insert(rng, data, "\n" + b);
                }
        }
    }

    private static string BlockName(string s, Random rng)
    {
        int i = s.IndexOf("\nBLOCK\n", StringComparison.Ordinal);
        if (i < 0 || rng.Next(4) == 0) return "NOBLOCK";
        var m = Regex.Match(s[i..], @"\n\s*2\n([^\n]*)\n");
        return m.Success ? m.Groups[1].Value.Trim() : "NOBLOCK";
    }
}
