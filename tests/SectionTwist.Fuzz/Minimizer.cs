using System.Text;

namespace SectionTwist.Fuzz;

/// <summary>
/// Shrinks an offending input while it keeps its outcome: removes chunks of lines, halving the chunk size down to one
/// line (the "ddmin" idea of Zeller and Hildebrandt, "Simplifying and isolating failure-inducing input", IEEE TSE 28(2),
/// 2002, simplified to complement removal), with a bounded number of trials.
/// </summary>
public static class Minimizer
{
    /// <summary>The smallest input found that <paramref name="stillFails"/> accepts (the input itself when none).</summary>
    public static byte[] Minimize(byte[] input, Func<byte[], bool> stillFails, int maxTrials = 60)
    {
        var lines = Encoding.Latin1.GetString(input).Split('\n').ToList();
        int trials = 0;
        for (int chunk = Math.Max(1, lines.Count / 2); chunk >= 1 && trials < maxTrials; chunk /= 2)
        {
            for (int start = 0; start < lines.Count && trials < maxTrials;)
            {
                var candidate = lines.Take(start).Concat(lines.Skip(start + chunk)).ToList();
                trials++;
                if (candidate.Count > 0 && stillFails(Bytes(candidate))) lines = candidate;
                else start += chunk;
            }
            if (chunk == 1) break;
        }
        return Bytes(lines);
    }

    private static byte[] Bytes(List<string> lines) => Encoding.Latin1.GetBytes(string.Join('\n', lines));
}
