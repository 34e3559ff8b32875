using SectionTwist.Geometry;

namespace SectionTwist.Import.Dxf;

/// <summary>A uniform grid of buckets over loop bounding boxes, for "which loops may hold this point" queries.</summary>
internal sealed class LoopGrid
{
    private readonly Box2 _all;
    private readonly int _nx, _ny;
    private readonly double _cw, _ch;
    private readonly List<int>?[] _cells;

    public LoopGrid(Box2[] boxes)
    {
        _all = Box2.Empty;
        foreach (var b in boxes) _all = _all.Union(b);
        int side = Math.Clamp((int)Math.Sqrt(boxes.Length), 1, 256);
        _nx = _ny = side;
        _cw = Math.Max(_all.Width, 1e-300) / _nx;
        _ch = Math.Max(_all.Height, 1e-300) / _ny;
        _cells = new List<int>?[_nx * _ny];
        if (boxes.Length == 0) return;
        for (int i = 0; i < boxes.Length; i++)
        {
            var b = boxes[i];
            for (int ix = Cx(b.MinX); ix <= Cx(b.MaxX); ix++)
                for (int iy = Cy(b.MinY); iy <= Cy(b.MaxY); iy++)
                    (_cells[ix * _ny + iy] ??= []).Add(i);
        }
    }

    private int Cx(double x) => Math.Clamp((int)((x - _all.MinX) / _cw), 0, _nx - 1);
    private int Cy(double y) => Math.Clamp((int)((y - _all.MinY) / _ch), 0, _ny - 1);

    /// <summary>Loops whose box may hold <paramref name="p"/>.</summary>
    public IReadOnlyList<int> Candidates(Point2 p)
    {
        if (_all.IsEmpty || p.X < _all.MinX || p.X > _all.MaxX || p.Y < _all.MinY || p.Y > _all.MaxY) return [];
        return _cells[Cx(p.X) * _ny + Cy(p.Y)] ?? (IReadOnlyList<int>)[];
    }
}
