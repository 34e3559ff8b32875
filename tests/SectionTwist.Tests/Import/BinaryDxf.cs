using System.Globalization;
using System.Text;

namespace SectionTwist.Tests.Import;

/// <summary>Converts ASCII DXF text to binary DXF (R13+ layout: 2-byte codes) for tests. Value types per the DXF reference.</summary>
internal static class BinaryDxf
{
    public static byte[] FromAscii(string ascii)
    {
        var lines = ascii.Split('\n');
        using var ms = new MemoryStream();
        ms.Write(Encoding.ASCII.GetBytes("AutoCAD Binary DXF\r\n\x1a\0"));
        using var w = new BinaryWriter(ms);
        for (int i = 0; i + 1 < lines.Length; i += 2)
        {
            short code = short.Parse(lines[i].Trim(), CultureInfo.InvariantCulture);
            string v = lines[i + 1].TrimEnd('\r');
            w.Write(code);
            if (code is >= 10 and <= 59 or >= 210 and <= 239) w.Write(double.Parse(v, CultureInfo.InvariantCulture));
            else if (code is >= 60 and <= 79) w.Write(short.Parse(v, CultureInfo.InvariantCulture));
            else if (code is >= 90 and <= 99) w.Write(int.Parse(v, CultureInfo.InvariantCulture));
            else { w.Write(Encoding.Latin1.GetBytes(v)); w.Write((byte)0); }
        }
        w.Flush();
        return ms.ToArray();
    }
}
