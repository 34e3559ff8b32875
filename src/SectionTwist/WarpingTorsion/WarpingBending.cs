using SectionTwist.Bending;

namespace SectionTwist.WarpingTorsion;

/// <summary>
/// Adds the warping normal stress to the bending normal stress of a shaft that has both a <c>bending:</c> block and
/// restrained warping. Both are axial normal stresses, so they add by superposition (linear elasticity; the
/// thin-walled member's normal stress is N/A + bending terms + B omega / Iw, Vlasov, Thin-Walled Elastic Beams, 2nd ed.,
/// ch. 1). The worst point differs in general: the bending check's worst point is chosen by von Mises over the
/// section's boundary, the warping stress is largest where |omega| is (flange tips of I and channel sections). The value
/// reported is the sum of the two magnitudes at the same axial position, an upper bound of the normal stress there; it
/// is exact where both peak at the same point (a flange tip under bending about the strong axis of an I-section).
/// </summary>
internal static class WarpingBending
{
    /// <summary>The member result with <see cref="WarpingSegmentResult.MaxCombinedNormalStress"/> set per segment.</summary>
    public static WarpingMemberResult Combine(WarpingMemberResult member, BendingResult bending)
    {
        var segments = member.Segments.Select(s =>
        {
            var samples = bending.Samples.Where(b => b.Segment == s.Label).OrderBy(b => b.Position).ToArray();
            if (samples.Length == 0) return s;
            double best = 0;
            foreach (var p in s.Points) best = Math.Max(best, NormalAt(samples, p.Position) + p.WarpingNormalStress);
            return s with { MaxCombinedNormalStress = best };
        }).ToArray();
        return member with { Segments = Array.AsReadOnly(segments) };
    }

    /// <summary>|bending + axial normal stress| at the worst point, linear between the samples (elements are short), the larger value at a jump.</summary>
    private static double NormalAt(BendingSample[] samples, double x)
    {
        double best = double.NaN;
        for (int i = 0; i + 1 < samples.Length; i++)
        {
            double a = samples[i].Position, b = samples[i + 1].Position;
            if (x < a - 1e-12 || x > b + 1e-12) continue;
            double va = Math.Abs(samples[i].Stress.Normal), vb = Math.Abs(samples[i + 1].Stress.Normal);
            double v = b - a > 1e-12 ? va + (vb - va) * Math.Clamp((x - a) / (b - a), 0, 1) : Math.Max(va, vb);
            best = double.IsNaN(best) ? v : Math.Max(best, v);
        }
        if (!double.IsNaN(best)) return best;
        // outside the sampled stretch (or a single sample): the nearest sample
        return Math.Abs(samples.MinBy(s => Math.Abs(s.Position - x))!.Stress.Normal);
    }
}
