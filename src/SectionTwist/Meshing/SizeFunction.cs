using SectionTwist.Geometry;

namespace SectionTwist.Meshing;

/// <summary>
/// The wanted local edge length: the smallest of the global maximum, the user's size field and a graded feature
/// size h(p) = min_i (h_i + (g - 1) |p - x_i|) over point sources (x_i, h_i) placed at re-entrant corners, short
/// boundary chords and thin walls. A size that grows by the ratio g from one element layer to the next follows this
/// cone (h_{k+1} = g h_k over a distance h_k); it is the usual Lipschitz size-function construction
/// (e.g. Persson, "Mesh size functions for implicit geometries and PDE-based gradient limiting", 2006, section 2).
/// Sources are bucketed in a uniform grid and searched ring by ring, stopping when no farther ring can win.
/// </summary>
internal sealed class SizeFunction
{
    private readonly double _hmax;
    private readonly double _slope;
    private readonly Func<Point2, double>? _field;
    private readonly List<(double X, double Y, double H)> _sources = [];
    private Box2 _box;
    private double _cell;
    private int _nx, _ny;
    private int[] _start = [];
    private double[] _sx = [], _sy = [], _sh = [];
    private double _minH;

    public SizeFunction(double hmax, double growth, Func<Point2, double>? field, Box2 box)
    {
        _hmax = hmax; _slope = growth - 1; _field = field; _box = box;
    }

    public double MaxSize => _hmax;

    public void AddSource(double x, double y, double h)
    {
        if (h < _hmax && h > 0) _sources.Add((x, y, h));
    }

    /// <summary>Rebuilds the bucket grid after sources were added.</summary>
    public void Build()
    {
        int n = _sources.Count;
        if (n == 0) { _nx = 0; return; }
        var b = _box;
        foreach (var s in _sources) b = b.Include(new Point2(s.X, s.Y));
        _box = b;
        int cellsPerSide = Math.Clamp((int)Math.Sqrt(n), 1, 128);
        _cell = Math.Max(Math.Max(b.Width, b.Height) / cellsPerSide, 1e-300);
        _nx = (int)(b.Width / _cell) + 1; _ny = (int)(b.Height / _cell) + 1;
        var count = new int[_nx * _ny + 1];
        var cellOf = new int[n];
        _minH = double.PositiveInfinity;
        for (int i = 0; i < n; i++)
        {
            cellOf[i] = CellIndex(_sources[i].X, _sources[i].Y);
            count[cellOf[i] + 1]++;
            _minH = Math.Min(_minH, _sources[i].H);
        }
        for (int i = 0; i < _nx * _ny; i++) count[i + 1] += count[i];
        _start = (int[])count.Clone();
        _sx = new double[n]; _sy = new double[n]; _sh = new double[n];
        for (int i = 0; i < n; i++)
        {
            int k = count[cellOf[i]]++;
            (_sx[k], _sy[k], _sh[k]) = _sources[i];
        }
    }

    private int CellIndex(double x, double y)
    {
        int i = Math.Clamp((int)((x - _box.MinX) / _cell), 0, _nx - 1);
        int j = Math.Clamp((int)((y - _box.MinY) / _cell), 0, _ny - 1);
        return j * _nx + i;
    }

    /// <summary>Wanted edge length at (x, y).</summary>
    public double At(double x, double y)
    {
        double best = _hmax;
        if (_field != null)
        {
            double f = _field(new Point2(x, y));
            if (f > 0 && f < best) best = f;
        }
        if (_nx == 0) return best;
        int ci = Math.Clamp((int)((x - _box.MinX) / _cell), 0, _nx - 1);
        int cj = Math.Clamp((int)((y - _box.MinY) / _cell), 0, _ny - 1);
        // distance from the query to the grid box, so far-away queries start with the right lower bound
        double ox = Math.Max(0, Math.Max(_box.MinX - x, x - _box.MaxX)), oy = Math.Max(0, Math.Max(_box.MinY - y, y - _box.MaxY));
        double outside = Math.Sqrt(ox * ox + oy * oy);
        int rmax = Math.Max(_nx, _ny);
        for (int r = 0; r <= rmax; r++)
        {
            double lower = _minH + _slope * (outside + Math.Max(0, r - 1) * _cell);
            if (lower >= best) break;
            for (int j = cj - r; j <= cj + r; j++)
            {
                if (j < 0 || j >= _ny) continue;
                bool edgeRow = j == cj - r || j == cj + r;
                for (int i = ci - r; i <= ci + r; i += edgeRow ? 1 : 2 * r)
                {
                    if (i >= 0 && i < _nx)
                    {
                        int c = j * _nx + i;
                        for (int k = _start[c]; k < _start[c + 1]; k++)
                        {
                            double dx = x - _sx[k], dy = y - _sy[k];
                            double h = _sh[k] + _slope * Math.Sqrt(dx * dx + dy * dy);
                            if (h < best) best = h;
                        }
                    }
                    if (r == 0) break;
                }
            }
        }
        return best;
    }
}
