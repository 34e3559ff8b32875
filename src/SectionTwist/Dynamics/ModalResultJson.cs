using System.Text.Json.Nodes;
using static SectionTwist.JsonTree;

namespace SectionTwist.Dynamics;

/// <summary>
/// The JSON form of a modal analysis (<c>sectiontwist modes --json</c>, schema docs/schemas/modes.schema.json), SI units
/// (Hz, rad/s, kg*m^2, N*m, Pa, rad), camelCase keys.
/// </summary>
internal static class ModalResultJson
{
    internal const string Caution =
        "caution: linear torsional model, undamped unless a damping ratio is stated; gear backlash, motor electromechanical coupling and " +
        "stress concentrations are not modelled; the separation bands are common practice, not a code value; defer to the drive " +
        "supplier's torsional analysis, the applicable code and licensed engineering practice.";

    public static string Write(ModalResult r, ResonanceResult? resonance, ForcedResponseResult? forced, string? file = null) =>
        JsonTree.Write(ToDto(r, resonance, forced, file));

    internal static string Kind(TrainPartKind k) => k switch { TrainPartKind.Segment => "segment", TrainPartKind.Spring => "spring", _ => "mesh" };

    internal static string Status(CrossingStatus s) => s switch
    {
        CrossingStatus.Resonance => "resonance",
        CrossingStatus.Avoid => "avoid",
        CrossingStatus.Check => "check",
        _ => "clear",
    };

    private static JsonObject ToDto(ModalResult r, ResonanceResult? res, ForcedResponseResult? forced, string? file) => new JsonObject
    {
        ["units"] = new JsonObject { ["frequency"] = "Hz", ["angularFrequency"] = "rad/s", ["speed"] = "rad/s", ["inertia"] = "kg*m^2", ["torque"] = "N*m", ["stress"] = "Pa", ["angle"] = "rad" },
        ["title"] = r.Title,
        ["file"] = file,
        ["referenceShaft"] = r.ReferenceShaft,
        ["tolerance"] = r.Tolerance,
        ["estimatedError"] = r.EstimatedError,
        ["rigidBodyModes"] = r.RigidBodyModes,
        ["unknowns"] = r.Unknowns,
        ["referredInertia"] = r.ReferredInertia,
        ["stations"] = Arr(r.Stations, s => new JsonObject { ["name"] = s.Name, ["shaft"] = s.Shaft, ["speedRatio"] = s.SpeedRatio, ["inertia"] = s.Inertia, ["isFixed"] = s.IsFixed }),
        ["meshes"] = Arr(r.Meshes, m => new JsonObject { ["segment"] = m.Segment, ["shaft"] = m.Shaft, ["elements"] = m.Elements, ["waveSpeed"] = m.WaveSpeed }),
        ["modes"] = Arr(r.Modes, m => new JsonObject
        {
            ["number"] = m.Number,
            ["isRigidBody"] = m.IsRigidBody,
            ["eigenvalue"] = m.Eigenvalue,
            ["angularFrequency"] = m.AngularFrequency,
            ["frequency"] = m.Frequency,
            ["cyclesPerMinute"] = m.CyclesPerMinute,
            ["estimatedError"] = m.EstimatedError,
            ["stations"] = Arr(m.Stations, s => new JsonObject { ["station"] = s.Station, ["rotation"] = s.Rotation, ["referredRotation"] = s.ReferredRotation }),
            ["parts"] = Arr(m.Parts, p => new JsonObject { ["kind"] = Kind(p.Kind), ["name"] = p.Name, ["shaft"] = p.Shaft, ["twist"] = p.Twist, ["energyShare"] = p.EnergyShare }),
        }),
        ["resonance"] = res is null ? null : new JsonObject
        {
            ["shaft"] = res.Spec.Range.Shaft,
            ["minimumSpeed"] = res.Spec.Range.Minimum,
            ["maximumSpeed"] = res.Spec.Range.Maximum,
            ["innerBand"] = res.Spec.InnerBand,
            ["outerBand"] = res.Spec.OuterBand,
            ["bandsBasis"] = "common practice, not a code value",
            ["anyConcern"] = res.AnyConcern,
            ["crossings"] = Arr(res.Crossings, c => new JsonObject
            {
                ["mode"] = c.Mode,
                ["frequency"] = c.Frequency,
                ["excitation"] = c.Excitation,
                ["order"] = c.Order,
                ["orderShaft"] = c.OrderShaft,
                ["crossingSpeed"] = c.CrossingSpeed,
                ["margin"] = c.Margin,
                ["status"] = Status(c.Status),
            }),
        },
        ["forcedResponse"] = forced is null ? null : new JsonObject
        {
            ["station"] = forced.Load.Station,
            ["amplitude"] = forced.Load.Amplitude,
            ["angularFrequency"] = forced.Load.AngularFrequency,
            ["dampingRatio"] = forced.DampingRatio,
            ["modesUsed"] = forced.ModesUsed,
            ["parts"] = Arr(forced.Parts, p => new JsonObject { ["kind"] = Kind(p.Kind), ["name"] = p.Name, ["shaft"] = p.Shaft, ["torqueAmplitude"] = p.TorqueAmplitude, ["shearAmplitude"] = p.ShearAmplitude }),
            ["stationAmplitudes"] = Arr(Enumerable.Range(0, forced.StationAmplitudes.Count), i => new JsonObject { ["station"] = r.Stations[i].Name, ["rotation"] = forced.StationAmplitudes[i] }),
        },
        ["warnings"] = Arr(r.Warnings),
        ["caution"] = Caution,
    };
}
