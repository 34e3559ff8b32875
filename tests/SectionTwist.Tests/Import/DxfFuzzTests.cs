using System.Diagnostics;
using System.Text;
using SectionTwist.Import.Dxf;
using SectionTwist.Units;

namespace SectionTwist.Tests.Import;

/// <summary>
/// Mutation fuzzing over the sample drawings (truncation, bit flips, shuffled and dropped groups, huge counts, absurd
/// numbers, binary variants): every case must end in a result or a <see cref="SectionTwistException"/> other than the
/// internal safety net, within a time bound. Deterministic seeds keep failures reproducible.
/// </summary>
public class DxfFuzzTests
{
    private static readonly DxfReadOptions Opts = new() { Unit = LengthUnit.Millimetre };

    public static TheoryData<string> Files => new(SampleProfiles.All.Select(s => s.File));

    [Theory]
    [MemberData(nameof(Files))]
    public void Mutated_samples_fail_cleanly_and_quickly(string file)
    {
        var text = SampleProfiles.All.Single(s => s.File == file).Make();
        var bytes = Encoding.Latin1.GetBytes(text);
        var rng = new Random(file.GetHashCode(StringComparison.Ordinal) & 0x7fff ^ 12345);
        var cases = new List<(string What, byte[] Data)>();
        for (int i = 0; i < 12; i++) { int n = rng.Next(bytes.Length); cases.Add(($"truncated at {n}", bytes[..n])); }
        for (int i = 0; i < 16; i++)
        {
            var b = (byte[])bytes.Clone();
            int flips = 1 + rng.Next(4);
            for (int k = 0; k < flips; k++) b[rng.Next(b.Length)] ^= (byte)(1 << rng.Next(8));
            cases.Add(($"bit flips #{i}", b));
        }
        var lines = text.Split('\n');
        int pairs = lines.Length / 2;
        for (int i = 0; i < 10; i++)
        {
            var order = Enumerable.Range(0, pairs).ToArray();
            // shuffle a window of pairs, or drop some pairs
            int s = rng.Next(pairs), len = Math.Min(pairs - s, 2 + rng.Next(12));
            rng.Shuffle(order.AsSpan(s, len));
            var keep = order.Where(_ => rng.NextDouble() > (i % 2 == 0 ? 0 : 0.05));
            cases.Add(($"shuffled/dropped groups #{i}", Encoding.Latin1.GetBytes(string.Concat(keep.Select(p => lines[2 * p] + "\n" + lines[2 * p + 1] + "\n")))));
        }
        string[] huge = ["32767", "-32768", "2147483647", "-1", "0", "1e19", "-1e19", "nan", "1e400", "7.5e-320"];
        for (int i = 0; i < 14; i++)
        {
            var m = (string[])lines.Clone();
            for (int k = 0; k < 3; k++)
            {
                int p = rng.Next(pairs);
                string code = m[2 * p].Trim();
                if (code is "0" or "2" or "8" or "9" or "100") continue;
                m[2 * p + 1] = huge[rng.Next(huge.Length)] + (m[2 * p + 1].EndsWith('\r') ? "\r" : "");
            }
            cases.Add(($"huge values #{i}", Encoding.Latin1.GetBytes(string.Join('\n', m))));
        }
        // huge array insert appended to the hex bar / any file: the expansion limit must stop it quickly
        cases.Add(("huge array", Encoding.Latin1.GetBytes(text.Replace("0\r\nEOF", "").Replace("0\nEOF", "") )));
        try { cases.Add(("binary", BinaryDxf.FromAscii(text.Replace("\r", "")))); }
        catch (FormatException) { }
        if (cases[^1].What == "binary")
        {
            var bin = cases[^1].Data;
            for (int i = 0; i < 10; i++) { int n = 22 + rng.Next(bin.Length - 22); cases.Add(($"binary truncated at {n}", bin[..n])); }
            for (int i = 0; i < 10; i++) { var b = (byte[])bin.Clone(); b[22 + rng.Next(b.Length - 22)] ^= (byte)(1 << rng.Next(8)); cases.Add(($"binary flip #{i}", b)); }
        }
        foreach (var (what, data) in cases) RunBounded(file, what, data);
    }

    [Fact]
    public void Huge_block_array_is_refused_fast()
    {
        var d = new DxfText().Header(4)
            .P(0, "SECTION").P(2, "BLOCKS").P(0, "BLOCK").P(2, "B").P(10, 0.0).P(20, 0.0).Rect(0, 0, 1, 1).P(0, "ENDBLK").P(0, "ENDSEC")
            .Entities().P(0, "INSERT").P(2, "B").P(10, 0.0).P(20, 0.0).P(70, 32767).P(71, 32767).P(44, 2.0).P(45, 2.0).End();
        var e = Assert.Throws<SectionTwistException>(() => d.Read());
        Assert.Equal("dxf-too-large", e.Code);
    }

    [Fact]
    public void Lwpolyline_with_a_huge_declared_count_reads_the_vertices_present()
    {
        var r = new DxfText().Header(4).Entities().P(0, "LWPOLYLINE").P(90, 2147483647).P(70, 1)
            .P(10, 0.0).P(20, 0.0).P(10, 4.0).P(20, 0.0).P(10, 4.0).P(20, 3.0).End().Read();
        Tol.Rel(6e-6, r.Profile.Properties.Area, 1e-12, "triangle b h / 2");
    }

    private static void RunBounded(string file, string what, byte[] data)
    {
        var sw = Stopwatch.StartNew();
        var task = Task.Run(() =>
        {
            try { DxfProfiles.Read(data, file, Opts); return (Exception?)null; }
            catch (Exception e) { return e; }
        });
        Assert.True(task.Wait(TimeSpan.FromSeconds(20)), $"{file} ({what}): no answer within 20 s");
        var ex = task.Result;
        if (ex is null) return;
        Assert.True(ex is SectionTwistException, $"{file} ({what}): unhandled {ex.GetType().Name}: {ex.Message}");
        var ste = (SectionTwistException)ex;
        Assert.True(ste.Code != "dxf-internal", $"{file} ({what}): hit the safety net: {ex.InnerException}");
        Assert.DoesNotContain('\n', ste.Message);
        _ = sw;
    }
}
