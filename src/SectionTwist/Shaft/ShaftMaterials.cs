namespace SectionTwist.Shaft;

/// <summary>
/// A small library of common shaft materials. Each entry names its source and says whether its strengths are a standard's
/// specified minimums or typical values (<see cref="Material.StrengthBasis"/>); values quoted from memory are marked so and
/// must be checked against the supplier's certificate. Shear moduli: Gere, Mechanics of Materials. Derived values: shear
/// yield S_sy = 0.577 S_y (distortion energy; Budynas and Nisbett, Shigley's Mechanical Engineering Design, ch. 5);
/// allowable shear = min(0.3 S_y, 0.18 S_u) (the ASME code for transmission shafting, from memory; reduce it by 25 % at
/// keyways yourself).
/// </summary>
public static class ShaftMaterials
{
    private const string GSteel = "G 79.3 GPa: Gere, Mechanics of Materials";
    private const string ESteel = "E 207 GPa: Shigley Table A-5; density 7850 kg/m^3 (from memory)";
    private const string EStructural = "E 210 GPa: EN 1993-1-1 3.2.6; density 7850 kg/m^3: EN 1991-1-1 Table A.4 (from memory)";
    private const string Rule = "S_sy = 0.577 S_y (Shigley); allowable = min(0.3 S_y, 0.18 S_u) (ASME shafting code, from memory)";

    /// <summary>All library materials by key (lower case, hyphenated), e.g. <c>steel-1045-cd</c>.</summary>
    public static IReadOnlyDictionary<string, Material> All { get; } = new Dictionary<string, Material>(StringComparer.OrdinalIgnoreCase)
    {
        ["steel-s235"] = Steel("structural steel S235 (EN 10025-2)", 79.3e9, 235e6, 360e6, 210e9, 7850, MaterialBasis.SpecifiedMinimum,
            $"{GSteel}; S_y 235 MPa, S_u 360 MPa: EN 10025-2 minimums, thickness up to 16 mm (from memory); {EStructural}; {Rule}"),
        ["steel-s355"] = Steel("structural steel S355 (EN 10025-2)", 79.3e9, 355e6, 470e6, 210e9, 7850, MaterialBasis.SpecifiedMinimum,
            $"{GSteel}; S_y 355 MPa, S_u 470 MPa: EN 10025-2 minimums, thickness up to 16 mm (from memory); {EStructural}; {Rule}"),
        ["steel-a36"] = Steel("structural steel ASTM A36", 79.3e9, 250e6, 400e6, 200e9, 7850, MaterialBasis.SpecifiedMinimum,
            $"{GSteel}; S_y 250 MPa, S_u 400 MPa: ASTM A36 minimums (from memory); E 200 GPa (from memory); density 7850 kg/m^3 (from memory); {Rule}"),
        ["steel-1018-cd"] = Steel("steel AISI 1018 cold drawn", 79.3e9, 370e6, 440e6, 207e9, 7850, MaterialBasis.SpecifiedMinimum,
            $"{GSteel}; S_y 370 MPa, S_u 440 MPa: Shigley Table A-20, listed as minimum values (from memory); {ESteel}; {Rule}"),
        ["steel-1045-cd"] = Steel("steel AISI 1045 / C45 cold drawn", 79.3e9, 530e6, 630e6, 207e9, 7850, MaterialBasis.SpecifiedMinimum,
            $"{GSteel}; S_y 530 MPa, S_u 630 MPa: Shigley Table A-20, listed as minimum values (from memory); {ESteel}; {Rule}"),
        ["steel-4140-qt"] = Steel("steel AISI 4140 / 42CrMo4 quenched and tempered", 79.3e9, 650e6, 900e6, 207e9, 7850, MaterialBasis.SpecifiedMinimum,
            $"{GSteel}; S_y 650 MPa, S_u 900 MPa: EN 10083-3 minimums, 40-100 mm bar (from memory); {ESteel}; {Rule}"),
        ["stainless-304"] = Steel("stainless steel 304 annealed", 77e9, 205e6, 515e6, 193e9, 8000, MaterialBasis.SpecifiedMinimum,
            $"G 77 GPa: Gere, Mechanics of Materials; S_y 205 MPa, S_u 515 MPa: ASTM A276 annealed minimums (from memory); E 193 GPa, density 8000 kg/m^3 (from memory); {Rule}"),
        ["aluminium-6061-t6"] = Steel("aluminium 6061-T6 extruded", 26e9, 240e6, 260e6, 69e9, 2700, MaterialBasis.SpecifiedMinimum,
            $"G 26 GPa: Gere, Mechanics of Materials; S_y 240 MPa, S_u 260 MPa: ASTM B221 minimums for extrusions (from memory); E 69 GPa, density 2700 kg/m^3 (from memory); {Rule}"),
        ["aluminium-7075-t6"] = Steel("aluminium 7075-T6 (typical values)", 26.9e9, 503e6, 572e6, 71.7e9, 2810, MaterialBasis.Typical,
            $"G 26.9 GPa: Gere, Mechanics of Materials; S_y 503 MPa, S_u 572 MPa: TYPICAL values, not specified minimums (from memory); E 71.7 GPa, density 2810 kg/m^3 (from memory); {Rule}"),
        ["brass"] = new Material("brass", 37e9, null, null, "G 37 GPa (range 37-41): Gere, Mechanics of Materials; E 100 GPa, density 8500 kg/m^3 (from memory); no strength values: give them in the file")
        {
            YoungsModulus = 100e9, Density = 8500, StrengthBasis = MaterialBasis.User,
        },
        ["titanium-ti6al4v"] = Steel("titanium Ti-6Al-4V annealed (ASTM B348 grade 5)", 44e9, 828e6, 895e6, 114e9, 4430, MaterialBasis.SpecifiedMinimum,
            $"G 44 GPa (range 41-44): Engineering ToolBox; S_y 828 MPa, S_u 895 MPa: ASTM B348 grade 5 minimums (from memory); E 114 GPa, density 4430 kg/m^3 (from memory); {Rule}"),
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
    /// (Shigley; ASME shafting code, from memory). Either strength may be null. The tensile strengths are kept on the
    /// material (<see cref="Material.YieldStrength"/>, <see cref="Material.UltimateStrength"/>).
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
        return new Material(name, shearModulus, allow, ssy, source) { YieldStrength = yieldStrength, UltimateStrength = ultimateStrength };
    }

    private static Material Steel(string name, double g, double sy, double su, double e, double density, MaterialBasis basis, string source) =>
        FromStrengths(name, g, sy, su, source) with { YoungsModulus = e, Density = density, StrengthBasis = basis };
}
