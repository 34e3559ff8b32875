namespace SectionTwist.Meshing;

/// <summary>
/// A mutable constrained triangulation on flat arrays (triangle-based, after Shewchuk's "Triangle" data structure,
/// "Triangle: Engineering a 2D Quality Mesh Generator and Delaunay Triangulator", 1996, section 3):
/// triangle t has vertices <c>V[3t..3t+2]</c> counter-clockwise; its edge i lies opposite vertex i;
/// <c>N[3t+i]</c> is the code 3u+j of the same edge seen from the neighbour u (or -1), and <c>Seg[3t+i]</c> the
/// constrained subsegment lying on the edge (or -1). Every input point lies inside a large enclosing triangle, so
/// every edge except those three has two sides. Vertex insertion is Lawson's (1977) flip algorithm with exact
/// predicates; constrained edges are never flipped, so the result is a constrained Delaunay triangulation.
/// </summary>
internal sealed class Triangulation
{
    public double[] X = new double[64];
    public double[] Y = new double[64];
    public int[] VTri = new int[64];
    public int VertexCount;

    public int[] V = new int[192];
    public int[] N = new int[192];
    public int[] Seg = new int[192];
    public int[] Reg = new int[64];
    public int TriangleCount;

    private int[] _stack = new int[64];
    private int _sp;
    private uint _rng = 2463534242;

    /// <summary>Creates a triangulation made of one triangle enclosing <paramref name="box"/> with a wide margin.</summary>
    public Triangulation(Geometry.Box2 box)
    {
        double cx = box.Center.X, cy = box.Center.Y;
        double r = Math.Max(box.Diagonal, 1e-300) * 20;
        int a = AddVertex(cx - 1.8 * r, cy - r), b = AddVertex(cx + 1.8 * r, cy - r), c = AddVertex(cx, cy + 2 * r);
        int t = NewTriangle();
        V[0] = a; V[1] = b; V[2] = c;
        N[0] = N[1] = N[2] = -1;
        Seg[0] = Seg[1] = Seg[2] = -1;
        Reg[t] = -1;
        VTri[a] = VTri[b] = VTri[c] = 0;
    }

    public int AddVertex(double x, double y)
    {
        if (VertexCount == X.Length)
        {
            Array.Resize(ref X, X.Length * 2);
            Array.Resize(ref Y, Y.Length * 2);
            Array.Resize(ref VTri, VTri.Length * 2);
        }
        X[VertexCount] = x; Y[VertexCount] = y; VTri[VertexCount] = -1;
        return VertexCount++;
    }

    private int NewTriangle()
    {
        if (3 * TriangleCount + 3 > V.Length)
        {
            int n = V.Length * 2;
            Array.Resize(ref V, n); Array.Resize(ref N, n); Array.Resize(ref Seg, n);
            Array.Resize(ref Reg, n / 3);
        }
        return TriangleCount++;
    }

    public Geometry.Point2 Node(int v) => new(X[v], Y[v]);

    public static int Next(int i) => i == 2 ? 0 : i + 1;
    public static int Prev(int i) => i == 0 ? 2 : i - 1;

    public double Orient(int a, int b, int c) => Predicates.Orient2D(X[a], Y[a], X[b], Y[b], X[c], Y[c]);
    public double Orient(int a, int b, double px, double py) => Predicates.Orient2D(X[a], Y[a], X[b], Y[b], px, py);

    private void Link(int code, int other)
    {
        N[code] = other;
        if (other >= 0) N[other] = code;
    }

    /// <summary>
    /// Finds the triangle containing (px, py) by a remembering stochastic visibility walk (Devillers, Pion, Teillaud,
    /// "Walking in a triangulation", 2002) from <paramref name="start"/>. Returns the triangle and the edge the point
    /// lies on (-1 when strictly inside) or the vertex it coincides with (-1 when none).
    /// </summary>
    public (int Tri, int Edge, int Vertex) Locate(double px, double py, int start)
    {
        // Crossing an edge puts the point on the near side of it, so the edge just crossed never needs a test.
        int t = start, prev = -1;
        for (int steps = 0; ; steps++)
        {
            int off = (int)(NextRandom() % 3);
            int moved = -1;
            for (int k = 0; k < 3; k++)
            {
                int i = (off + k) % 3;
                int code = 3 * t + i;
                if (N[code] < 0 || N[code] / 3 == prev) continue;
                if (Orient(V[3 * t + Next(i)], V[3 * t + Prev(i)], px, py) < 0) { moved = N[code] / 3; break; }
            }
            if (moved < 0) break;
            prev = t; t = moved;
            if (steps > 4 * TriangleCount + 100) throw new InvalidOperationException("point location did not terminate");
        }
        int edge = -1;
        for (int i = 0; i < 3; i++)
        {
            int a = V[3 * t + Next(i)], b = V[3 * t + Prev(i)];
            if (X[a] == px && Y[a] == py) return (t, -1, a);
            if (Orient(a, b, px, py) == 0) edge = i;
        }
        return (t, edge, -1);
    }

    private uint NextRandom()
    {
        _rng ^= _rng << 13; _rng ^= _rng >> 17; _rng ^= _rng << 5;
        return _rng;
    }

    /// <summary>Splits triangle t into three at new vertex p; the new triangles keep t's region.</summary>
    public void SplitTriangle(int t, int p)
    {
        int a = V[3 * t], b = V[3 * t + 1], c = V[3 * t + 2];
        int n0 = N[3 * t], n1 = N[3 * t + 1], n2 = N[3 * t + 2];
        int s0 = Seg[3 * t], s1 = Seg[3 * t + 1], s2 = Seg[3 * t + 2];
        int t1 = NewTriangle(), t2 = NewTriangle();
        Reg[t1] = Reg[t2] = Reg[t];
        Set(t, a, b, p); Set(t1, b, c, p); Set(t2, c, a, p);
        Link(3 * t, 3 * t1 + 1); Link(3 * t + 1, 3 * t2); Link(3 * t1, 3 * t2 + 1);
        Link(3 * t + 2, n2); Link(3 * t1 + 2, n0); Link(3 * t2 + 2, n1);
        Seg[3 * t] = Seg[3 * t + 1] = Seg[3 * t1] = Seg[3 * t1 + 1] = Seg[3 * t2] = Seg[3 * t2 + 1] = -1;
        Seg[3 * t + 2] = s2; Seg[3 * t1 + 2] = s0; Seg[3 * t2 + 2] = s1;
        VTri[p] = t; VTri[a] = t; VTri[b] = t1; VTri[c] = t2;
        Push(3 * t + 2); Push(3 * t1 + 2); Push(3 * t2 + 2);
    }

    /// <summary>
    /// Splits edge i of triangle t (and the neighbour across it) at new vertex p. The two halves get subsegment ids
    /// <paramref name="segNear"/> (half at the edge's first vertex, as seen from t) and <paramref name="segFar"/>.
    /// </summary>
    public void SplitEdge(int t, int i, int p, int segNear, int segFar)
    {
        int code = N[3 * t + i];
        int u = code / 3, j = code % 3;
        int a = V[3 * t + i], b = V[3 * t + Next(i)], c = V[3 * t + Prev(i)];
        int d = V[3 * u + j];
        int tAB = N[3 * t + Prev(i)], sAB = Seg[3 * t + Prev(i)];
        int tCA = N[3 * t + Next(i)], sCA = Seg[3 * t + Next(i)];
        int uDC = N[3 * u + Prev(j)], sDC = Seg[3 * u + Prev(j)];
        int uBD = N[3 * u + Next(j)], sBD = Seg[3 * u + Next(j)];
        int t1 = NewTriangle(), u1 = NewTriangle();
        Reg[t1] = Reg[t]; Reg[u1] = Reg[u];
        Set(t, a, b, p); Set(t1, a, p, c); Set(u, d, c, p); Set(u1, d, p, b);
        Link(3 * t, 3 * u1); Link(3 * t + 1, 3 * t1 + 2); Link(3 * t + 2, tAB);
        Link(3 * t1, 3 * u); Link(3 * t1 + 1, tCA);
        Link(3 * u + 1, 3 * u1 + 2); Link(3 * u + 2, uDC);
        Link(3 * u1 + 1, uBD);
        Seg[3 * t] = Seg[3 * u1] = segNear;
        Seg[3 * t1] = Seg[3 * u] = segFar;
        Seg[3 * t + 1] = Seg[3 * t1 + 2] = Seg[3 * u + 1] = Seg[3 * u1 + 2] = -1;
        Seg[3 * t + 2] = sAB; Seg[3 * t1 + 1] = sCA; Seg[3 * u + 2] = sDC; Seg[3 * u1 + 1] = sBD;
        VTri[p] = t; VTri[a] = t; VTri[b] = t; VTri[c] = t1; VTri[d] = u;
        Push(3 * t + 2); Push(3 * t1 + 1); Push(3 * u + 2); Push(3 * u1 + 1);
    }

    private void Set(int t, int a, int b, int c)
    {
        V[3 * t] = a; V[3 * t + 1] = b; V[3 * t + 2] = c;
    }

    /// <summary>Flips the edge with code 3t+i (must be unconstrained, with a convex quadrilateral around it).</summary>
    public void Flip(int t, int i)
    {
        int code = N[3 * t + i];
        int u = code / 3, j = code % 3;
        int a = V[3 * t + i], b = V[3 * t + Next(i)], c = V[3 * t + Prev(i)];
        int d = V[3 * u + j];
        int tAB = N[3 * t + Prev(i)], sAB = Seg[3 * t + Prev(i)];
        int tCA = N[3 * t + Next(i)], sCA = Seg[3 * t + Next(i)];
        int uBD = N[3 * u + Next(j)], sBD = Seg[3 * u + Next(j)];
        int uDC = N[3 * u + Prev(j)], sDC = Seg[3 * u + Prev(j)];
        // t' = (a, b, d), u' = (d, c, a)
        Set(t, a, b, d); Set(u, d, c, a);
        Link(3 * t, uBD); Link(3 * t + 1, 3 * u + 1); Link(3 * t + 2, tAB);
        Link(3 * u, tCA); Link(3 * u + 2, uDC);
        Seg[3 * t] = sBD; Seg[3 * t + 1] = -1; Seg[3 * t + 2] = sAB;
        Seg[3 * u] = sCA; Seg[3 * u + 1] = -1; Seg[3 * u + 2] = sDC;
        VTri[a] = t; VTri[b] = t; VTri[d] = t; VTri[c] = u;
    }

    public void Push(int code)
    {
        if (_sp == _stack.Length) Array.Resize(ref _stack, _stack.Length * 2);
        _stack[_sp++] = code;
    }

    /// <summary>
    /// Lawson's flip loop over the queued edges: flips each unconstrained edge that is not locally Delaunay.
    /// With <paramref name="allEdges"/> false only the edges opposite the new vertex are queued after a flip
    /// (vertex insertion); with true all four outer edges are (general repair after moving a vertex).
    /// </summary>
    public void Legalize(bool allEdges = false)
    {
        while (_sp > 0)
        {
            int code = _stack[--_sp];
            int t = code / 3, i = code % 3;
            int nb = N[code];
            if (nb < 0 || Seg[code] >= 0) continue;
            int u = nb / 3, j = nb % 3;
            int a = V[3 * t + i], b = V[3 * t + Next(i)], c = V[3 * t + Prev(i)], d = V[3 * u + j];
            if (Predicates.InCircle(X[a], Y[a], X[b], Y[b], X[c], Y[c], X[d], Y[d]) <= 0) continue;
            Flip(t, i);
            // t = (a, b, d), u = (d, c, a): edges opposite a are t:0 and u:2
            Push(3 * t); Push(3 * u + 2);
            if (allEdges) { Push(3 * t + 2); Push(3 * u); }
        }
    }

    /// <summary>Code 3t+i of the edge from a to b with t on its left, or -1 when a-b is not an edge.</summary>
    public int FindEdge(int a, int b)
    {
        int t0 = VTri[a];
        if (t0 < 0) return -1;
        int t = t0;
        do
        {
            int k = V[3 * t] == a ? 0 : V[3 * t + 1] == a ? 1 : 2;
            if (V[3 * t + Next(k)] == b) return 3 * t + Prev(k);
            // rotate clockwise around a: cross edge (a, next) which is opposite prev(k)
            int nb = N[3 * t + Prev(k)];
            if (nb < 0) break;
            t = nb / 3;
        } while (t != t0);
        return -1;
    }

    /// <summary>Collects the triangles around vertex v (its star) into <paramref name="star"/>.</summary>
    public void Star(int v, List<int> star)
    {
        star.Clear();
        int t0 = VTri[v], t = t0;
        do
        {
            star.Add(t);
            int k = V[3 * t] == v ? 0 : V[3 * t + 1] == v ? 1 : 2;
            int nb = N[3 * t + Prev(k)];
            if (nb < 0) break;
            t = nb / 3;
        } while (t != t0 && star.Count < 100000);
    }

    /// <summary>
    /// Moves vertex v to (px, py) when every triangle of its star stays positively oriented, then restores the
    /// constrained Delaunay property around it. Returns false (nothing changed) when the move would fold the star.
    /// </summary>
    public bool TryMove(int v, double px, double py, List<int> scratch)
    {
        Star(v, scratch);
        foreach (int t in scratch)
        {
            int k = V[3 * t] == v ? 0 : V[3 * t + 1] == v ? 1 : 2;
            if (Orient(V[3 * t + Next(k)], V[3 * t + Prev(k)], px, py) <= 0) return false;
        }
        X[v] = px; Y[v] = py;
        foreach (int t in scratch) { Push(3 * t); Push(3 * t + 1); Push(3 * t + 2); }
        Legalize(allEdges: true);
        return true;
    }

    public bool HasSuperVertex(int t) => V[3 * t] < 3 || V[3 * t + 1] < 3 || V[3 * t + 2] < 3;
}
