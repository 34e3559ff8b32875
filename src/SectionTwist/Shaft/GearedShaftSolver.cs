using SectionTwist.Dynamics;
using SectionTwist.Torsion;

namespace SectionTwist.Shaft;

/// <summary>
/// Static torsion of a train of shafts joined by gear or belt stages: every shaft is solved at its own speed by
/// <see cref="ShaftSolver"/>, the torque a stage passes referred through its ratio by the power balance of a lossless stage,
/// T_p omega_p + T_c omega_c = 0 (any machine-design text on gear trains, e.g. Shigley's Mechanical Engineering Design,
/// gear trains; common practice). The stages must form a tree rooted at the file's own shaft (the first of
/// <see cref="DrivetrainModel.Shafts"/>). A further shaft without supports is balanced by its stage: the stage takes the net
/// of its own loads (and of the unsupported shafts beyond it), which is referred to the nearer shaft as a load at the stage's
/// station there. A further shaft with supports receives the torque written as loads at the stage's station on the nearer
/// shaft, referred through the ratio, and its supports react it. Mesh stiffness does not change the static torques.
/// </summary>
public static class GearedShaftSolver
{
    private sealed record Link(GearStage Stage, string ParentStation, string ChildStation, ShaftBranch Child, double SpeedFactor);

    /// <summary>Solves every shaft of <paramref name="train"/>.</summary>
    /// <param name="train">The shafts (the first is the file's own), stages; inertias and fixed stations of the dynamics are not used.</param>
    /// <param name="cancellation">Observed between shafts.</param>
    /// <exception cref="SectionTwistException">A loop of stages, a shaft joined by no stage, or a shaft that cannot be solved (its message names the shaft and stage).</exception>
    public static GearedShaftResult Solve(DrivetrainModel train, CancellationToken cancellation = default)
    {
        ArgumentNullException.ThrowIfNull(train);
        if (train.Shafts.Count == 0) throw new SectionTwistException("bad-drivetrain", "the drivetrain has no shaft; give at least one shaft with stations and segments");
        var shaftOf = new Dictionary<string, ShaftBranch>(StringComparer.Ordinal);
        foreach (var sh in train.Shafts)
            foreach (var st in sh.Model.Stations) shaftOf[st.Name] = sh;
        var children = train.Shafts.ToDictionary(s => s.Name, _ => new List<Link>(), StringComparer.Ordinal);
        var reached = new HashSet<string>(StringComparer.Ordinal) { train.Shafts[0].Name };
        var queue = new Queue<ShaftBranch>([train.Shafts[0]]);
        var used = new HashSet<GearStage>(ReferenceEqualityComparer.Instance);
        while (queue.Count > 0)
        {
            cancellation.ThrowIfCancellationRequested();
            var parent = queue.Dequeue();
            foreach (var stage in train.Stages)
            {
                if (used.Contains(stage)) continue;
                var a = Owner(shaftOf, stage, stage.Driving);
                var b = Owner(shaftOf, stage, stage.Driven);
                if (a.Name != parent.Name && b.Name != parent.Name) continue;
                bool drives = a.Name == parent.Name;
                var child = drives ? b : a;
                if (!reached.Add(child.Name))
                    throw new SectionTwistException("stage-loop",
                        $"stage '{stage.Label}' joins shaft '{parent.Name}' to shaft '{child.Name}', which other stages already join; the static solve refers torques along a tree of stages: remove the stage that closes the loop, or solve the branches as separate files");
                used.Add(stage);
                double factor = drives ? stage.Transmission : 1 / stage.Transmission;   // omega_child / omega_parent
                children[parent.Name].Add(new Link(stage, drives ? stage.Driving : stage.Driven, drives ? stage.Driven : stage.Driving, child, factor));
                queue.Enqueue(child);
            }
        }
        if (train.Shafts.FirstOrDefault(s => !reached.Contains(s.Name)) is { } lost)
            throw new SectionTwistException("stage-missing",
                $"shaft '{lost.Name}' is joined to shaft '{train.Shafts[0].Name}' by no stage, so no torque reaches it; add the stage under 'dynamics: stages' or remove the shaft");

        var warnings = new List<AnalysisWarning>();
        var branches = new List<BranchStaticResult>();
        var mainResult = SolveShaft(train.Shafts[0], null, 0, children, train.Shafts[0].Model.TwistRateLimit, cancellation);
        void Walk(ShaftBranch parent, double parentSpeed)
        {
            foreach (var link in children[parent.Name])
            {
                double stageTorque;
                bool own = link.Child.Model.FixedStations.Count == 0;
                if (own) stageTorque = -NetOwnTorque(link.Child, children);
                else
                {
                    double written = parent.Model.Loads.OfType<PointTorque>().Where(p => p.Station == link.ParentStation).Sum(p => p.Torque);
                    stageTorque = -written / link.SpeedFactor;
                }
                if (stageTorque == 0) warnings.Add(NoTorque(parent, link, own));
                var r = SolveShaft(link.Child, link, stageTorque, children, train.Shafts[0].Model.TwistRateLimit, cancellation);
                double speed = parentSpeed * link.SpeedFactor;
                branches.Add(new BranchStaticResult
                {
                    Shaft = link.Child.Name, Stage = link.Stage.Label, Station = link.ChildStation, Parent = parent.Name,
                    SpeedRatio = speed, StageTorque = stageTorque, TorqueFromOwnLoads = own, Result = r,
                });
                Walk(link.Child, speed);
            }
        }
        Walk(train.Shafts[0], 1);
        return new GearedShaftResult { Main = mainResult, Branches = branches, Warnings = warnings };
    }

    private static ShaftBranch Owner(Dictionary<string, ShaftBranch> shaftOf, GearStage stage, string station) =>
        shaftOf.TryGetValue(station, out var s) ? s
            : throw new SectionTwistException("bad-drivetrain", $"stage '{stage.Label}': no station named '{station}' on any shaft; fix the station name of the stage");

    /// <summary>Net applied torque of a shaft's own loads plus what its unsupported further shafts refer to it, N*m.</summary>
    private static double NetOwnTorque(ShaftBranch shaft, Dictionary<string, List<Link>> children)
    {
        double net = 0;
        var position = shaft.Model.Stations.ToDictionary(s => s.Name, s => s.Position, StringComparer.Ordinal);
        foreach (var load in shaft.Model.Loads)
            net += load switch
            {
                PointTorque p => p.Torque,
                DistributedTorque d => d.TorquePerLength * Math.Abs(position[d.To] - position[d.From]),
                _ => 0,
            };
        foreach (var link in children[shaft.Name])
            if (link.Child.Model.FixedStations.Count == 0) net += Referred(link, children);
        return net;
    }

    /// <summary>The load an unsupported further shaft puts on its parent's stage station: T_p = -T_c omega_c / omega_p with T_c = -net.</summary>
    private static double Referred(Link link, Dictionary<string, List<Link>> children) => NetOwnTorque(link.Child, children) * link.SpeedFactor;

    private static ShaftResult SolveShaft(ShaftBranch shaft, Link? from, double stageTorque, Dictionary<string, List<Link>> children,
        double? twistLimit, CancellationToken cancellation)
    {
        cancellation.ThrowIfCancellationRequested();
        if (from is not null && shaft.Model.Segments.Count == 0)
            throw new SectionTwistException("stage-branch-springs-only",
                $"shaft '{shaft.Name}' (beyond stage '{from.Stage.Label}') has springs but no segments, which the static solve of every shaft needs; " +
                "give it its shaft segment(s) under 'dynamics: shafts', or run 'sectiontwist modes' for the dynamics alone");
        var loads = new List<ShaftLoad>(shaft.Model.Loads);
        if (from is not null && stageTorque != 0)
            loads.Add(new PointTorque(from.ChildStation, stageTorque) { Description = $"stage '{from.Stage.Label}'" });
        foreach (var link in children[shaft.Name])
            if (link.Child.Model.FixedStations.Count == 0 && Referred(link, children) is var t && t != 0)
                loads.Add(new PointTorque(link.ParentStation, t) { Description = $"stage '{link.Stage.Label}' (shaft '{link.Child.Name}')" });
        var model = shaft.Model with { Loads = loads, TwistRateLimit = shaft.Model.TwistRateLimit ?? twistLimit };
        try { return ShaftSolver.Solve(model, cancellation); }
        catch (SectionTwistException e) when (from is not null)
        {
            throw new SectionTwistException(e.Code,
                $"shaft '{shaft.Name}' (beyond stage '{from.Stage.Label}'): {e.Message} (a further shaft takes 'loads' and 'supports' in its entry under 'dynamics: shafts')", e);
        }
    }

    private static AnalysisWarning NoTorque(ShaftBranch parent, Link link, bool own) => new("stage-no-torque", own
        ? $"stage '{link.Stage.Label}' passes no torque: shaft '{link.Child.Name}' beyond it has no loads and no supports; give it its loads (e.g. the motor torque at its rotor), or 'supports' where its torque is reacted with the stage torque written as a load at '{link.ParentStation}' on shaft '{parent.Name}'"
        : $"stage '{link.Stage.Label}' passes no torque: no load is written at its station '{link.ParentStation}' on shaft '{parent.Name}'; write the torque the stage passes there as a load (shaft '{link.Child.Name}' has supports that react it)");
}
