namespace SectionTwist.Dynamics;

/// <summary>
/// The discretised train for one choice of elements per segment: every station and every inner node of a segment is a
/// rotation unknown; each segment element is the two-node linear element with its exact stiffness (G J / h, or the exact
/// flexibility of a round taper piece) and the consistent inertia matrix integral(rho Ip N_i N_j) (Gauss, 4 points: exact
/// for a round taper, whose Ip is of degree 4). See Bathe, Finite Element Procedures (2014), sec. 4.2.1 (consistent mass)
/// and Petyt, Introduction to Finite Element Vibration Analysis, 2nd ed., ch. 3 (axial/torsional rod element).
/// Rigid stages are kinematic constraints theta_driven = t theta_driving (t = +-1 / ratio); they are eliminated by the
/// transformation K_r = T^T K T, M_r = T^T M T, which is the usual referral of inertia and stiffness by the square of
/// the speed ratio (e.g. Rao, Mechanical Vibrations, sec. on geared systems). Fixed stations are removed.
/// </summary>
internal sealed class TrainMatrices
{
    private static readonly double[] GaussX = [-0.8611363115940526, -0.3399810435848563, 0.3399810435848563, 0.8611363115940526];
    private static readonly double[] GaussW = [0.3478548451374538, 0.6521451548625461, 0.6521451548625461, 0.3478548451374538];

    /// <summary>One two-node part: strain = Wa theta_a + Wb theta_b, energy k strain^2 / 2, inertia [maa mab; mab mbb].</summary>
    internal readonly record struct Element(int A, int B, double Wa, double Wb, double K, double Maa, double Mab, double Mbb, int Part);

    public TrainMatrices(DrivetrainTopology top, int[] elementsPerSegment)
    {
        Top = top;
        int dof = top.Stations.Count;
        var elements = new List<Element>();
        for (int s = 0; s < top.Segments.Count; s++)
        {
            var seg = top.Segments[s];
            int ne = elementsPerSegment[s];
            double h = seg.Length / ne;
            int prev = seg.A;
            for (int e = 0; e < ne; e++)
            {
                int next = e == ne - 1 ? seg.B : dof++;
                double s0 = e * h, s1 = (e + 1) * h;
                double k, maa = 0, mab = 0, mbb = 0;
                if (!seg.IsTaper) k = seg.G * seg.J!.Value / h;
                else
                {
                    double d0 = Diameter(seg, s0), d1 = Diameter(seg, s1);
                    k = 3 * Math.PI * seg.G * Math.Pow(d0 * d1, 3) / (32 * h * (d0 * d0 + d0 * d1 + d1 * d1));
                }
                for (int g = 0; g < 4; g++)
                {
                    double xi = GaussX[g], w = GaussW[g] * h / 2;
                    double n1 = (1 - xi) / 2, n2 = (1 + xi) / 2;
                    double ip = seg.IsTaper ? Math.PI * Math.Pow(Diameter(seg, s0 + n2 * h), 4) / 32 : seg.Ip!.Value;
                    double rhoIp = seg.Density * ip * w;
                    maa += rhoIp * n1 * n1; mab += rhoIp * n1 * n2; mbb += rhoIp * n2 * n2;
                }
                elements.Add(new Element(prev, next, -1, 1, k, maa, mab, mbb, seg.Part));
                prev = next;
            }
        }
        foreach (var (part, a, b, k) in top.Springs) elements.Add(new Element(a, b, -1, 1, k, 0, 0, 0, part));
        foreach (var (stage, a, b, part) in top.Stages)
            if (part >= 0) elements.Add(new Element(a, b, 1, -1 / stage.Transmission, stage.MeshStiffness!.Value, 0, 0, 0, part));
        Elements = elements;
        FullCount = dof;
        Reduce();
    }

    public DrivetrainTopology Top { get; }
    public IReadOnlyList<Element> Elements { get; }
    /// <summary>Stations plus inner nodes.</summary>
    public int FullCount { get; }
    /// <summary>Reduced unknown of each full unknown (-1: fixed) and its coefficient: theta_full = Coef theta_reduced.</summary>
    public int[] Map { get; private set; } = [];
    public double[] Coef { get; private set; } = [];
    /// <summary>Number of reduced unknowns.</summary>
    public int Count { get; private set; }
    /// <summary>Number of connected chains with no fixed station: the number of rigid-body modes.</summary>
    public int RigidBodyModes { get; private set; }

    private static double Diameter(SegmentData s, double at) => s.DiameterA + (s.DiameterB - s.DiameterA) * at / s.Length;

    private void Reduce()
    {
        int n = FullCount;
        var parent = new int[n];
        var toParent = new double[n];
        for (int i = 0; i < n; i++) { parent[i] = i; toParent[i] = 1; }
        (int, double) Find(int d)
        {
            double c = 1;
            int r = d;
            while (parent[r] != r) { c *= toParent[r]; r = parent[r]; }
            return (r, c);
        }
        foreach (var (stage, a, b, part) in Top.Stages)
        {
            if (part >= 0) continue;
            var (ma, ca) = Find(a);
            var (mb, cb) = Find(b);
            double t = stage.Transmission;
            if (ma == mb) continue; // a consistent loop (the topology checked the ratios)
            parent[mb] = ma; toParent[mb] = t * ca / cb;
        }
        var map = new int[n];
        var coef = new double[n];
        var rootIndex = new Dictionary<int, int>();
        var groundedRoots = new HashSet<int>();
        for (int i = 0; i < Top.Stations.Count; i++) if (Top.Fixed[i]) groundedRoots.Add(Find(i).Item1);
        for (int i = 0; i < n; i++)
        {
            var (r, c) = Find(i);
            if (groundedRoots.Contains(r)) { map[i] = -1; coef[i] = 0; continue; }
            if (!rootIndex.TryGetValue(r, out int idx)) rootIndex[r] = idx = rootIndex.Count;
            map[i] = idx; coef[i] = c;
        }
        Map = map; Coef = coef; Count = rootIndex.Count;

        // chains: union the reduced unknowns joined by a stiffness part; index Count is the ground
        var uf = Enumerable.Range(0, Count + 1).ToArray();
        int F(int x) { while (uf[x] != x) x = uf[x] = uf[uf[x]]; return x; }
        foreach (var e in Elements)
        {
            int ra = map[e.A] < 0 ? Count : map[e.A], rb = map[e.B] < 0 ? Count : map[e.B];
            uf[F(ra)] = F(rb);
        }
        int ground = F(Count), chains = 0;
        for (int i = 0; i < Count; i++) if (F(i) == i && i != ground) chains++;
        RigidBodyModes = chains;
    }

    /// <summary>Dense reduced stiffness and inertia matrices, row-major Count x Count.</summary>
    public (double[] K, double[] M) Assemble()
    {
        int n = Count;
        var k = new double[n * n];
        var m = new double[n * n];
        foreach (var e in Elements)
        {
            int ra = Map[e.A], rb = Map[e.B];
            double ca = Coef[e.A] * e.Wa, cb = Coef[e.B] * e.Wb;
            double ma = Coef[e.A], mb = Coef[e.B];
            if (ra >= 0) { k[ra * n + ra] += e.K * ca * ca; m[ra * n + ra] += e.Maa * ma * ma; }
            if (rb >= 0) { k[rb * n + rb] += e.K * cb * cb; m[rb * n + rb] += e.Mbb * mb * mb; }
            if (ra >= 0 && rb >= 0)
            {
                double kab = e.K * ca * cb, mab = e.Mab * ma * mb;
                k[ra * n + rb] += kab; k[rb * n + ra] += kab;
                m[ra * n + rb] += mab; m[rb * n + ra] += mab;
            }
        }
        for (int i = 0; i < Top.Stations.Count; i++)
            if (Map[i] >= 0) m[Map[i] * n + Map[i]] += Top.Lumped[i] * Coef[i] * Coef[i];
        return (k, m);
    }

    /// <summary>Expands a reduced vector to all stations and inner nodes.</summary>
    public double[] Expand(ReadOnlySpan<double> reduced)
    {
        var full = new double[FullCount];
        for (int i = 0; i < FullCount; i++) full[i] = Map[i] < 0 ? 0 : Coef[i] * reduced[Map[i]];
        return full;
    }
}
