namespace SectionTwist.Units;

/// <summary>
/// The common spellings of torque units that people type (<c>Nm</c>, <c>N-m</c>, <c>lb-in</c>, <c>in-lb</c>, <c>ft-lb</c>),
/// mapped to one spelling each. Shared by the shaft-file reader (<c>QuantityText</c>) and <see cref="DisplayUnit.Spell"/>,
/// so what is accepted and what is printed agree.
/// </summary>
internal static class UnitAliases
{
    private static readonly (string Canonical, string[] Spellings)[] TorqueTable =
    [
        ("N·m", ["N*m", "N·m", "Nm", "N.m", "N-m", "N m", "newton-metre", "newton-meter", "newton metre", "newton meter"]),
        ("kN·m", ["kN*m", "kN·m", "kNm", "kN.m", "kN-m", "kN m"]),
        ("N·mm", ["N*mm", "N·mm", "Nmm", "N.mm", "N-mm", "N mm"]),
        ("lbf·in", ["lbf*in", "lbf·in", "lbf-in", "lbf.in", "lbfin", "lbf in", "lb*in", "lb·in", "lb-in", "lb.in", "lb in", "in*lbf", "in·lbf", "in-lbf", "in.lbf", "in*lb", "in·lb", "in-lb", "in.lb", "in lb"]),
        ("lbf·ft", ["lbf*ft", "lbf·ft", "lbf-ft", "lbf.ft", "lbf ft", "lb*ft", "lb·ft", "lb-ft", "lb.ft", "lb ft", "ft*lbf", "ft·lbf", "ft-lbf", "ft.lbf", "ft*lb", "ft·lb", "ft-lb", "ft.lb", "ft lb"]),
    ];

    private static readonly Dictionary<string, string> ByTorqueSpelling = TorqueTable
        .SelectMany(t => t.Spellings.Select(s => (s, t.Canonical)))
        .ToDictionary(p => p.s, p => p.Canonical, StringComparer.Ordinal);

    /// <summary>The one spelling of a torque unit (<c>N·m</c>, <c>kN·m</c>, <c>N·mm</c>, <c>lbf·in</c>, <c>lbf·ft</c>), or null when the text is none of them.</summary>
    public static string? Torque(string unit) => ByTorqueSpelling.GetValueOrDefault(unit.Trim());

    /// <summary>The accepted torque spellings for messages and the docs: each unit with its other spellings.</summary>
    public static string TorqueSpellings =>
        string.Join("; ", TorqueTable.Select(t => $"{t.Canonical} ({string.Join(", ", t.Spellings.Where(s => s != t.Canonical && !s.Contains(' ', StringComparison.Ordinal)).Take(6))})"));
}
