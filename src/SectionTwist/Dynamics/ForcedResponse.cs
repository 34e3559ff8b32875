using System.Numerics;

namespace SectionTwist.Dynamics;

/// <summary>
/// Steady response to a harmonic torque by modal superposition with a modal damping ratio zeta (Rao, Mechanical Vibrations,
/// sec. on modal analysis of forced vibration; Thomson, Theory of Vibration, normal-mode summation):
/// theta = sum_r phi_r (phi_r^T F) / (omega_r^2 - Omega^2 + 2 i zeta omega_r Omega) with M-normalised modes phi_r. All modes of
/// the discretised train are used (no truncation), on the subdivision chosen by the modal analysis. Rigid-body modes enter
/// with omega_r = 0 and no damping. Linear; backlash and motor electromechanical coupling are not modelled.
/// </summary>
public static class ForcedResponse
{
    /// <summary>Computes the steady alternating torque in every part.</summary>
    /// <param name="modes">A modal result of <see cref="ModalAnalysis.Solve"/> (its subdivision is reused).</param>
    /// <param name="load">The harmonic torque.</param>
    /// <param name="dampingRatio">Modal damping ratio, 0 &lt; zeta &lt; 1 (e.g. 0.02).</param>
    public static ForcedResponseResult Compute(ModalResult modes, HarmonicTorque load, double dampingRatio)
    {
        ArgumentNullException.ThrowIfNull(modes);
        ArgumentNullException.ThrowIfNull(load);
        var mats = modes.Matrices ?? throw new ArgumentException("the modal result carries no matrices", nameof(modes));
        var top = mats.Top;
        if (!(dampingRatio > 0 && dampingRatio < 1)) throw new SectionTwistException("bad-forcing", $"damping ratio {dampingRatio} must lie between 0 and 1 (e.g. 0.02 for 2 %)");
        if (!(load.Amplitude > 0) || !double.IsFinite(load.Amplitude)) throw new SectionTwistException("bad-forcing", $"harmonic torque at '{load.Station}': amplitude must be positive");
        if (!(load.AngularFrequency > 0) || !double.IsFinite(load.AngularFrequency)) throw new SectionTwistException("bad-forcing", $"harmonic torque at '{load.Station}': frequency must be positive");
        if (!top.Index.TryGetValue(load.Station, out int s)) throw new SectionTwistException("bad-forcing", $"harmonic torque: no station named '{load.Station}'");
        if (mats.Map[s] < 0) throw new SectionTwistException("bad-forcing", $"harmonic torque at '{load.Station}': the station is fixed; apply it at a free station");

        var (k, m) = mats.Assemble();
        int n = mats.Count, rs = mats.Map[s];
        if (!(m[rs * n + rs] > 0)) throw new SectionTwistException("bad-forcing", $"harmonic torque at '{load.Station}': the station has no inertia; apply it at a station with inertia or give it one");
        var (values, vectors) = SymmetricDefiniteEigen.Solve(k, m, n, n, _ => "a station");
        double f = load.Amplitude * mats.Coef[s], w = load.AngularFrequency;
        var theta = new Complex[n];
        for (int j = 0; j < vectors.Length; j++)
        {
            bool rigid = j < mats.RigidBodyModes;
            double lambda = rigid ? 0 : Math.Max(values[j], 0), wr = Math.Sqrt(lambda);
            var denom = new Complex(lambda - w * w, rigid ? 0 : 2 * dampingRatio * wr * w);
            Complex q = vectors[j][rs] * f / denom;
            for (int i = 0; i < n; i++) theta[i] += vectors[j][i] * q;
        }
        var full = new Complex[mats.FullCount];
        for (int i = 0; i < mats.FullCount; i++) full[i] = mats.Map[i] < 0 ? Complex.Zero : mats.Coef[i] * theta[mats.Map[i]];
        var torque = new double[top.Parts.Count];
        foreach (var e in mats.Elements)
            torque[e.Part] = Math.Max(torque[e.Part], Complex.Abs(e.K * (e.Wa * full[e.A] + e.Wb * full[e.B])));
        var shear = new double?[top.Parts.Count];
        foreach (var seg in top.Segments) shear[seg.Part] = torque[seg.Part] * seg.ShearPerTorque;
        return new ForcedResponseResult
        {
            Load = load,
            DampingRatio = dampingRatio,
            Parts = [.. top.Parts.Select((p, i) => new PartResponse(p.Kind, p.Label, p.Shaft, torque[i], shear[i]))],
            StationAmplitudes = [.. Enumerable.Range(0, top.Stations.Count).Select(i => Complex.Abs(full[i]))],
            ModesUsed = vectors.Length,
        };
    }
}
