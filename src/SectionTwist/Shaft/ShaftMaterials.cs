namespace SectionTwist.Shaft;

/// <summary>
/// A small library of common shaft materials. Shear moduli are from Gere, Mechanics of Materials (and shared/REFERENCES.md);
/// tensile yield S_y and ultimate S_u are typical minimum values quoted from memory (marked so in each source) and must be
/// checked against the supplier's certificate. Derived values: shear yield S_sy = 0.577 S_y (distortion energy; Budynas and
/// Nisbett, Shigley's Mechanical Engineering Design, ch. 5); allowable shear = min(0.3 S_y, 0.18 S_u) (the ASME code for
/// transmission shafting, from memory; reduce it by 25 % at keyways yourself).
/// </summary>
public static class ShaftMaterials
{
    private const string GSteel = "G 79.3 GPa: Gere, Mechanics of Materials";
    private const string Rule = "S_sy = 0.577 S_y (Shigley); allowable = min(0.3 S_y, 0.18 S_u) (ASME shafting code, from memory)";

    /// <summary>All library materials by key (lower case, hyphenated), e.g. <c>steel-1045-cd</c>.</summary>
    public static IReadOnlyDictionary<string, Material> All { get; } = new Dictionary<string, Material>(StringComparer.OrdinalIgnoreCase)
    {
        ["structural-steel"] = FromStrengths("structural steel (A36 / S235 class)", 79.3e9, 250e6, 400e6,
            $"{GSteel}; S_y 250 MPa, S_u 400 MPa: ASTM A36 minimums (from memory); {Rule}"),
        ["steel-s355"] = FromStrengths("steel S355", 79.3e9, 355e6, 470e6,
            $"{GSteel}; S_y 355 MPa, S_u 470 MPa: EN 10025-2 minimums for thin sections (from memory); {Rule}"),
        ["steel-1018-cd"] = FromStrengths("steel AISI 1018 cold drawn", 79.3e9, 370e6, 440e6,
            $"{GSteel}; S_y 370 MPa, S_u 440 MPa: Shigley Table A-20 (from memory); {Rule}"),
        ["steel-1045-cd"] = FromStrengths("steel AISI 1045 / C45 cold drawn", 79.3e9, 530e6, 625e6,
            $"{GSteel}; S_y 530 MPa, S_u 625 MPa: Shigley Table A-20 (from memory); {Rule}"),
        ["steel-4140-qt"] = FromStrengths("steel AISI 4140 / 42CrMo4 quenched and tempered", 79.3e9, 650e6, 900e6,
            $"{GSteel}; S_y 650 MPa, S_u 900 MPa: EN 10083-3, 40-100 mm bar (from memory); {Rule}"),
        ["stainless-304"] = FromStrengths("stainless steel 304 annealed", 77e9, 205e6, 515e6,
            $"G 77 GPa: Gere / Engineering ToolBox; S_y 205 MPa, S_u 515 MPa: ASTM A276 annealed (from memory); {Rule}"),
        ["aluminium-6061-t6"] = FromStrengths("aluminium 6061-T6", 26e9, 276e6, 310e6,
            $"G 26 GPa: Gere, Mechanics of Materials; S_y 276 MPa, S_u 310 MPa (from memory); {Rule}"),
        ["aluminium-7075-t6"] = FromStrengths("aluminium 7075-T6", 26.9e9, 503e6, 572e6,
            $"G 26.9 GPa: Gere, Mechanics of Materials; S_y 503 MPa, S_u 572 MPa (from memory); {Rule}"),
        ["brass"] = new Material("brass", 37e9, null, null, "G 37 GPa (range 37-41): Gere, Mechanics of Materials; no strength values: give them in the file"),
        ["titanium-ti6al4v"] = FromStrengths("titanium Ti-6Al-4V annealed", 44e9, 880e6, 950e6,
            $"G 44 GPa (range 41-44): Engineering ToolBox; S_y 880 MPa, S_u 950 MPa (from memory); {Rule}"),
    };

    /// <summary>Finds a library material by key (case-insensitive).</summary>
    public static bool TryGet(string key, out Material material)
    {
        if (All.TryGetValue(key, out var m)) { material = m; return true; }
        material = null!;
        return false;
    }

    /// <summary>
    /// A material from tensile yield and ultimate strength: S_sy = 0.577 S_y, allowable = min(0.3 S_y, 0.18 S_u)
    /// (Shigley; ASME shafting code, from memory). Either strength may be null.
    /// </summary>
    public static Material FromStrengths(string name, double shearModulus, double? yieldStrength, double? ultimateStrength, string source)
    {
        double? ssy = yieldStrength * Material.DistortionEnergyShearRatio;
        double? allow = (yieldStrength, ultimateStrength) switch
        {
            ({ } y, { } u) => Math.Min(0.3 * y, 0.18 * u),
            ({ } y, null) => 0.3 * y,
            (null, { } u) => 0.18 * u,
            _ => null,
        };
        return new Material(name, shearModulus, allow, ssy, source);
    }
}
