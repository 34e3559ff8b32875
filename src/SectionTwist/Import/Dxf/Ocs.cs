namespace SectionTwist.Import.Dxf;

/// <summary>
/// The object coordinate system of a planar entity (DXF reference, "Arbitrary Axis Algorithm"): for extrusion N,
/// Ax = Wy x N when |Nx| &lt; 1/64 and |Ny| &lt; 1/64, else Wz x N; Ay = N x Ax. An extrusion of (0, 0, -1) mirrors x.
/// </summary>
internal static class Ocs
{
    /// <summary>
    /// The map from OCS (x, y) at OCS height <paramref name="elevation"/> to world (x, y). <paramref name="planar"/> is
    /// false when N is not along the world Z axis (the entity is then projected onto the XY plane).
    /// </summary>
    public static Affine2 ToWorld((double X, double Y, double Z) n, double elevation, out bool planar)
    {
        double len = Math.Sqrt(n.X * n.X + n.Y * n.Y + n.Z * n.Z);
        if (!(len > 0) || !double.IsFinite(len)) { planar = true; return Affine2.Identity; }
        double nx = n.X / len, ny = n.Y / len, nz = n.Z / len;
        planar = Math.Abs(nx) < 1e-12 && Math.Abs(ny) < 1e-12;
        if (planar) return nz > 0 ? Affine2.Identity : new Affine2(-1, 0, 0, 1, 0, 0);
        double ax, ay, az;
        if (Math.Abs(nx) < 1.0 / 64 && Math.Abs(ny) < 1.0 / 64) { ax = nz; ay = 0; az = -nx; }       // Wy x N = (Nz, 0, -Nx)
        else { ax = -ny; ay = nx; az = 0; }                                                         // Wz x N = (-Ny, Nx, 0)
        double al = Math.Sqrt(ax * ax + ay * ay + az * az);
        ax /= al; ay /= al; az /= al;
        double bx = ny * az - nz * ay, by = nz * ax - nx * az;                                      // Ay = N x Ax
        return new Affine2(ax, bx, ay, by, elevation * nx, elevation * ny);
    }
}
