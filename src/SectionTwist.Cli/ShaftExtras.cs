using SectionTwist.Dynamics;
using SectionTwist.Rendering.Report;
using SectionTwist.Shaft;

namespace SectionTwist.Cli;

/// <summary>
/// What the shaft report shows beside the shaft itself: the further shafts of a geared file and, with a <c>dynamics</c> block,
/// the modal analysis, interference check and forced response (the same as <c>sectiontwist modes</c>).
/// </summary>
internal static class ShaftExtras
{
    /// <summary>Solves the dynamics block of <paramref name="doc"/> when it has one; errors name the file and the block.</summary>
    public static ShaftReportExtras Compute(ShaftDocument doc, GearedShaftResult? geared, string path, CancellationToken ct)
    {
        var extras = new ShaftReportExtras { Geared = geared };
        if (doc.Dynamics is not { } dyn) return extras;
        try
        {
            var modes = ModalAnalysis.Solve(dyn.Drivetrain, dyn.Options, ct);
            return extras with
            {
                Modes = modes,
                Resonance = dyn.Excitation is { } ex ? ResonanceCheck.Evaluate(modes, ex) : null,
                Forced = dyn.Forcing is { } f ? ForcedResponse.Compute(modes, f, dyn.DampingRatio) : null,
            };
        }
        catch (SectionTwistException e) { throw new SectionTwistException(e.Code, $"{Path.GetFileName(path)}: dynamics: {e.Message}", e); }
    }
}
