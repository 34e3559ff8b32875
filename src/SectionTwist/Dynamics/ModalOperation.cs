namespace SectionTwist.Dynamics;

/// <summary>
/// One modal analysis. Element subdivision: a linear element with consistent inertia over-estimates omega^2 of a uniform
/// shaft by the factor 1 + (k h)^2 / 12, k = omega / c the wave number, c the torsional wave speed, h the element length
/// (the dispersion relation of the element, e.g. Cook, Malkus, Plesha and Witt, Concepts and Applications of Finite Element
/// Analysis, 4th ed., sec. 11.5); the frequency error is (k h)^2 / 24. Each segment gets the fewest equal elements with
/// (omega_top h / c)^2 / 24 &lt;= tolerance, omega_top the highest listed frequency of the previous pass (an upper bound: a
/// consistent-mass solution is a Rayleigh-Ritz one); passes repeat until the subdivision no longer grows. The reported error
/// of each mode is the element errors weighted by the element's share of the mode's energy,
/// sum_e (omega h_e / c_e)^2 / 24 (U_e + T_e) / (2 U), which is the uniform-shaft error when the shaft is all there is and
/// goes to zero for inertia lumped at stations (which the elements represent exactly). When the train has fewer unknowns
/// than the modes asked for, every segment first gets elements enough for them (the shafts' own inertia has modes beyond
/// those of the lumped inertias).
/// </summary>
internal sealed class ModalOperation
{
    private readonly DrivetrainModel _model;
    private readonly ModalOptions _options;
    private readonly CancellationToken _ct;
    private ModalResult? _result;

    public ModalOperation(DrivetrainModel model, ModalOptions options, CancellationToken ct = default)
    {
        _ct = ct;
        _model = model ?? throw new ArgumentNullException(nameof(model));
        _options = options ?? throw new ArgumentNullException(nameof(options));
        if (options.ModeCount < 1) throw new SectionTwistException("bad-options", $"mode count {options.ModeCount} must be at least 1");
        if (!(options.Tolerance > 0 && options.Tolerance < 0.1)) throw new SectionTwistException("bad-options", $"tolerance {options.Tolerance} must lie between 0 and 0.1 (e.g. 0.001 for 0.1 %)");
        if (options.ElementsPerSegment is < 1) throw new SectionTwistException("bad-options", "elements per segment must be at least 1");
    }

    public ModalResult Compute() => _result ??= Run();

    private ModalResult Run()
    {
        var top = new DrivetrainTopology(_model);
        int segs = top.Segments.Count;
        var ne = Enumerable.Repeat(_options.ElementsPerSegment ?? 1, segs).ToArray();
        var warnings = new List<string>();
        TrainMatrices mats;
        double[] values;
        double[][] vectors;
        int pass = 0;
        while (true)
        {
            _ct.ThrowIfCancellationRequested();
            mats = new TrainMatrices(top, ne);
            var (k, m) = mats.Assemble();
            int wanted = mats.RigidBodyModes + _options.ModeCount;
            (values, vectors) = SymmetricDefiniteEigen.Solve(k, m, mats.Count, wanted, i => Describe(top, mats, i), _ct);
            if (_options.ElementsPerSegment is not null || vectors.Length <= mats.RigidBodyModes || ++pass > 8) break;
            double omegaTop = Math.Sqrt(Math.Max(values[vectors.Length - 1], 0)) * 1.02;
            bool grew = false;
            if (vectors.Length < wanted)
            {
                // fewer unknowns than modes asked for: the shafts' own inertia has further modes, so give every segment
                // the elements they need to appear; the passes below then refine them to the tolerance
                int more = wanted - vectors.Length;
                for (int s = 0; s < segs; s++)
                {
                    int n = Math.Min(_options.MaxElementsPerSegment, ne[s] + more);
                    if (n > ne[s]) { ne[s] = n; grew = true; }
                }
                if (grew) continue;
            }
            for (int s = 0; s < segs; s++)
            {
                var seg = top.Segments[s];
                double need = Math.Ceiling(seg.Length * omegaTop / (seg.WaveSpeed * Math.Sqrt(24 * _options.Tolerance)));
                int n = (int)Math.Min(_options.MaxElementsPerSegment, Math.Max(1, need));
                if (n > ne[s]) { ne[s] = n; grew = true; }
            }
            if (!grew) break;
        }
        if (ne.Any(n => n >= _options.MaxElementsPerSegment) && _options.ElementsPerSegment is null)
            warnings.Add($"some segments reached the limit of {_options.MaxElementsPerSegment} elements; the higher modes may not meet the tolerance");

        var partSegment = new SegmentData?[top.Parts.Count];
        foreach (var sd in top.Segments) partSegment[sd.Part] = sd;
        var partElements = new int[top.Parts.Count];
        foreach (var e in mats.Elements) partElements[e.Part]++;
        var modes = new List<TorsionalMode>();
        for (int q = 0; q < vectors.Length; q++)
            modes.Add(BuildMode(top, mats, partSegment, partElements, q + 1, q < mats.RigidBodyModes, values[q], mats.Expand(vectors[q])));
        if (mats.RigidBodyModes > 0 && vectors.Length > mats.RigidBodyModes)
        {
            double lastRigid = Math.Abs(values[mats.RigidBodyModes - 1]), firstElastic = values[mats.RigidBodyModes];
            if (!(lastRigid <= 1e-6 * firstElastic))
                warnings.Add($"the rigid-body eigenvalue {lastRigid:G3} is not small against the lowest elastic one {firstElastic:G3}; check for very soft parts");
        }
        var unlinked = top.Stations.Where((_, i) => !top.LinkedToReference[i]).ToList();
        if (unlinked.Count > 0)
            warnings.Add($"stations {string.Join(", ", unlinked)} are not linked to the reference shaft '{top.ReferenceShaft}'; their speed ratios are relative to their own chain");
        double err = modes.Where(m => !m.IsRigidBody).Select(m => m.EstimatedError).DefaultIfEmpty(0).Max();
        if (err > _options.Tolerance) warnings.Add($"estimated discretisation error {err:P2} exceeds the tolerance {_options.Tolerance:P2}");

        // total inertia referred to the reference shaft: theta^T M theta with every unknown turning at its speed ratio
        var ratio = new double[mats.FullCount];
        for (int i = 0; i < top.Stations.Count; i++) ratio[i] = top.SpeedRatio[i];
        foreach (var e in mats.Elements) if (e.B >= top.Stations.Count) ratio[e.B] = ratio[e.A];
        double referred = KineticForm(mats, top, ratio);

        return new ModalResult
        {
            Title = _model.Title,
            ReferenceShaft = top.ReferenceShaft,
            Modes = modes,
            Stations = [.. top.Stations.Select((s, i) => new TrainStation(s, top.StationShaft[i], top.SpeedRatio[i], top.Lumped[i], top.Fixed[i]))],
            Meshes = [.. top.Segments.Select((s, i) => new SegmentMesh(top.Parts[s.Part].Label, top.Parts[s.Part].Shaft, ne[i], s.WaveSpeed))],
            Tolerance = _options.Tolerance,
            EstimatedError = err,
            RigidBodyModes = mats.RigidBodyModes,
            Unknowns = mats.Count,
            ReferredInertia = referred,
            Warnings = warnings,
            Matrices = mats,
        };
    }

    /// <summary>theta^T M theta over the full unknowns (fixed ones included).</summary>
    private static double KineticForm(TrainMatrices mats, DrivetrainTopology top, double[] theta)
    {
        double t = 0;
        foreach (var e in mats.Elements)
            t += e.Maa * theta[e.A] * theta[e.A] + 2 * e.Mab * theta[e.A] * theta[e.B] + e.Mbb * theta[e.B] * theta[e.B];
        for (int i = 0; i < top.Stations.Count; i++) t += top.Lumped[i] * theta[i] * theta[i];
        return t;
    }

    private static TorsionalMode BuildMode(DrivetrainTopology top, TrainMatrices mats, SegmentData?[] partSegment, int[] partElements, int number, bool rigid, double lambda, double[] full)
    {
        int ns = top.Stations.Count;
        double big = 0;
        int at = 0;
        for (int i = 0; i < ns; i++)
        {
            double r = Math.Abs(full[i] / top.SpeedRatio[i]);
            if (r > big) { big = r; at = i; }
        }
        double scale = big > 0 ? 1 / (full[at] / top.SpeedRatio[at]) : 1;
        var shape = full.Select(v => v * scale).ToArray();

        double omega2 = Math.Max(lambda, 0);
        var partEnergy = new double[top.Parts.Count];
        double u = 0, error = 0;
        var elementEnergy = new double[mats.Elements.Count];
        for (int q = 0; q < mats.Elements.Count; q++)
        {
            var e = mats.Elements[q];
            double strain = e.Wa * shape[e.A] + e.Wb * shape[e.B];
            double ue = 0.5 * e.K * strain * strain;
            partEnergy[e.Part] += ue;
            elementEnergy[q] = ue;
            u += ue;
        }
        if (!rigid && u > 0)
        {
            for (int q = 0; q < mats.Elements.Count; q++)
            {
                var e = mats.Elements[q];
                if (partSegment[e.Part] is not { } seg) continue;
                double te = 0.5 * omega2 * (e.Maa * shape[e.A] * shape[e.A] + 2 * e.Mab * shape[e.A] * shape[e.B] + e.Mbb * shape[e.B] * shape[e.B]);
                double h = seg.Length / partElements[e.Part];
                double kh = Math.Sqrt(omega2) * h / seg.WaveSpeed;
                error += kh * kh / 24 * (elementEnergy[q] + te) / (2 * u);
            }
        }
        var stations = new List<ModeStation>(ns);
        for (int i = 0; i < ns; i++) stations.Add(new ModeStation(top.Stations[i], top.StationShaft[i], shape[i], shape[i] / top.SpeedRatio[i]));
        var parts = new List<ModePart>(top.Parts.Count);
        for (int p = 0; p < top.Parts.Count; p++)
        {
            var part = top.Parts[p];
            double twist = part.Kind == TrainPartKind.Mesh
                ? shape[part.StationA] - shape[part.StationB] / top.Stages.First(s => s.Part == p).Stage.Transmission
                : shape[part.StationB] - shape[part.StationA];
            parts.Add(new ModePart(part.Kind, part.Label, part.Shaft, twist, u > 0 && !rigid ? partEnergy[p] / u : 0));
        }
        double mNorm = KineticForm(mats, top, shape);
        return new TorsionalMode
        {
            Number = number,
            IsRigidBody = rigid,
            Eigenvalue = lambda,
            EstimatedError = error,
            Stations = stations,
            Parts = parts,
            Shape = [.. shape.Select(v => v / Math.Sqrt(mNorm))],
        };
    }

    private static string Describe(DrivetrainTopology top, TrainMatrices mats, int reduced)
    {
        for (int i = 0; i < mats.FullCount; i++)
            if (mats.Map[i] == reduced) return i < top.Stations.Count ? $"station '{top.Stations[i]}'" : "an inner node of a segment";
        return "an unknown";
    }
}
