namespace SectionTwist.Import.Dxf;

/// <summary>
/// Groups the pairs of a DXF file into sections: HEADER variables (<c>9 $NAME</c> then value codes), the LAYER
/// table, BLOCK ... ENDBLK definitions and ENTITIES. An entity runs from its <c>0 TYPE</c> pair to the next code 0;
/// POLYLINE collects its VERTEX entities up to SEQEND. Group-code order inside an entity is not relied on.
/// Files holding only an ENTITIES section (allowed for R12) and unknown sections are accepted.
/// </summary>
internal static class DxfParser
{
    public static DxfDocument Parse(List<DxfPair> pairs, string file, string format)
    {
        var doc = new DxfDocument(file, format);
        int i = 0;
        bool sawEof = false;
        while (i < pairs.Count)
        {
            var p = pairs[i];
            if (p.Code == 0 && p.Value == "EOF") { sawEof = true; break; }
            if (p.Code == 0 && p.Value == "SECTION")
            {
                string name = i + 1 < pairs.Count && pairs[i + 1].Code == 2 ? pairs[i + 1].Value.ToUpperInvariant() : "";
                i += name.Length > 0 ? 2 : 1;
                switch (name)
                {
                    case "HEADER": i = ReadHeader(pairs, i, doc); break;
                    case "TABLES": i = ReadTables(pairs, i, doc); break;
                    case "BLOCKS": i = ReadBlocks(pairs, i, doc); break;
                    case "ENTITIES": i = ReadEntities(pairs, i, doc.Entities, file, "ENDSEC"); break;
                    default: i = SkipSection(pairs, i); break;
                }
                continue;
            }
            i++;
        }
        if (!sawEof) doc.Warnings.Add("the file has no EOF marker; it may be truncated");
        return doc;
    }

    private static int SkipSection(List<DxfPair> pairs, int i)
    {
        while (i < pairs.Count && !(pairs[i].Code == 0 && pairs[i].Value is "ENDSEC" or "EOF")) i++;
        return i < pairs.Count && pairs[i].Value == "ENDSEC" ? i + 1 : i;
    }

    private static int ReadHeader(List<DxfPair> pairs, int i, DxfDocument doc)
    {
        while (i < pairs.Count && pairs[i].Code != 0)
        {
            if (pairs[i].Code == 9)
            {
                string name = pairs[i].Value;
                var values = new List<DxfPair>();
                i++;
                while (i < pairs.Count && pairs[i].Code != 9 && pairs[i].Code != 0) values.Add(pairs[i++]);
                doc.Header[name] = values;
            }
            else i++;
        }
        return SkipSection(pairs, i);
    }

    private static int ReadTables(List<DxfPair> pairs, int i, DxfDocument doc)
    {
        while (i < pairs.Count && !(pairs[i].Code == 0 && pairs[i].Value is "ENDSEC" or "EOF"))
        {
            if (pairs[i].Code == 0 && pairs[i].Value == "LAYER")
            {
                int j = i + 1;
                string? name = null;
                while (j < pairs.Count && pairs[j].Code != 0)
                {
                    if (pairs[j].Code == 2 && name is null) name = pairs[j].Value;
                    j++;
                }
                if (name is not null && !doc.Layers.Contains(name, StringComparer.OrdinalIgnoreCase)) doc.Layers.Add(name);
                i = j;
            }
            else i++;
        }
        return i < pairs.Count && pairs[i].Value == "ENDSEC" ? i + 1 : i;
    }

    private static int ReadBlocks(List<DxfPair> pairs, int i, DxfDocument doc)
    {
        while (i < pairs.Count && !(pairs[i].Code == 0 && pairs[i].Value is "ENDSEC" or "EOF"))
        {
            if (pairs[i].Code == 0 && pairs[i].Value == "BLOCK")
            {
                int line = pairs[i].Line;
                var head = new List<DxfPair>();
                int j = i + 1;
                while (j < pairs.Count && pairs[j].Code != 0) head.Add(pairs[j++]);
                var e = new DxfEntity("BLOCK", line, head, doc.File);
                string name = e.Str(2) ?? e.Str(3) ?? "";
                var block = new DxfBlock(name, e.Pt(10), line);
                j = ReadEntities(pairs, j, block.Entities, doc.File, "ENDBLK");
                // skip the ENDBLK entity's own pairs
                while (j < pairs.Count && pairs[j].Code != 0) j++;
                if (name.Length > 0) doc.Blocks[name] = block;
                i = j;
            }
            else i++;
        }
        return i < pairs.Count && pairs[i].Value == "ENDSEC" ? i + 1 : i;
    }

    /// <summary>Reads entities up to <c>0 stop</c> (consumed) or ENDSEC/EOF (not consumed).</summary>
    private static int ReadEntities(List<DxfPair> pairs, int i, List<DxfEntity> into, string file, string stop)
    {
        DxfEntity? polyline = null;
        while (i < pairs.Count)
        {
            var p = pairs[i];
            if (p.Code != 0) { i++; continue; }
            if (p.Value == stop) return i + 1;
            if (p.Value is "ENDSEC" or "EOF" or "ENDBLK" or "BLOCK") return stop == "ENDSEC" && p.Value == "ENDSEC" ? i + 1 : i;
            int j = i + 1;
            var list = new List<DxfPair>();
            while (j < pairs.Count && pairs[j].Code != 0) list.Add(pairs[j++]);
            var e = new DxfEntity(p.Value.ToUpperInvariant(), p.Line, list, file);
            i = j;
            switch (e.Type)
            {
                case "VERTEX" when polyline is not null: polyline.Vertices.Add(e); break;
                case "SEQEND": polyline = null; break;
                case "VERTEX" or "ATTRIB": break; // stray vertex, or attribute of an INSERT
                default:
                    polyline = e.Type == "POLYLINE" ? e : null;
                    into.Add(e);
                    break;
            }
        }
        return i;
    }
}
