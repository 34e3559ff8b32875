using SectionTwist.Import.Dxf;
using SectionTwist.Rendering.Section;
using SectionTwist.Torsion;

namespace SectionTwist.Cli;

/// <summary><c>section --dxf</c>: the outline plus stress-function contours (and optionally the mesh) back to CAD.</summary>
internal static class SectionDxfExport
{
    public static void Write(SectionResult result, string path, bool mesh)
    {
        var lines = ContourLines.StressFunction(result.Field, 10)
            .Select(s => new DxfPolyline("PHI", [s.A, s.B], false)).ToList();
        if (mesh) lines.AddRange(ContourLines.MeshEdges(result.Field).Select(s => new DxfPolyline("MESH", [s.A, s.B], false)));
        DxfProfiles.Write(result.Profile, path, new DxfWriteOptions { Version = DxfVersion.R2000, Polylines = lines });
    }
}
