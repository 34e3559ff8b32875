using System.Text;

namespace SectionTwist.Units;

/// <summary>
/// A unit for human-readable output: its symbol as printed (one spelling per unit everywhere, e.g. <c>N·m</c>, <c>mm⁴</c>)
/// and the SI size of one unit. Build tables with <see cref="Format(double, int)"/> or <see cref="Text"/>; use
/// <see cref="Ascii"/> where only ASCII fits (CSV column names).
/// </summary>
/// <param name="Symbol">Symbol as printed, e.g. <c>N·m</c>, <c>MPa</c>, <c>mm⁴</c>, <c>deg/m</c>.</param>
/// <param name="SiPerUnit">SI value of one unit (m, N·m, Pa, rad, ...).</param>
public sealed record DisplayUnit(string Symbol, double SiPerUnit)
{
    /// <summary>The symbol in plain ASCII (<c>*</c> for the dot, <c>^4</c> for a superscript), e.g. <c>N*m</c>, <c>mm^4</c>.</summary>
    public string Ascii => ToAscii(Symbol);

    /// <summary>Converts an SI value to this unit.</summary>
    public double FromSi(double si) => si / SiPerUnit;

    /// <summary>Converts a value in this unit to SI.</summary>
    public double ToSi(double value) => value * SiPerUnit;

    /// <summary>The SI value in this unit, <paramref name="digits"/> significant digits, in the house number style (<see cref="NumberText.Format"/>).</summary>
    public string Format(double si, int digits = 5) => NumberText.Format(FromSi(si), digits);

    /// <summary>
    /// The SI value in this unit with a .NET-style format: <c>G4</c> means 4 significant digits and <c>F2</c> two decimals,
    /// always in the house number style (no <c>E+006</c>, no <c>-0</c>).
    /// </summary>
    public string Format(double si, string format)
    {
        ArgumentNullException.ThrowIfNull(format);
        return NumberText.Styled(FromSi(si), format);
    }

    /// <summary>The SI value in this unit followed by the symbol, e.g. <c>437.68 N·m</c>.</summary>
    public string Text(double si, int digits = 5) => $"{Format(si, digits)} {Symbol}";

    /// <inheritdoc />
    public override string ToString() => Symbol;

    /// <summary>
    /// The printed spelling of a unit written in a file or on the command line: <c>*</c>, <c>.</c>, <c>-</c> or nothing
    /// between torque factors becomes the middle dot (<c>N*m</c>, <c>Nm</c>, <c>N.m</c> -> <c>N·m</c>), <c>^2 ^3 ^4</c> become
    /// superscripts. Unknown spellings are returned trimmed.
    /// </summary>
    public static string Spell(string unit)
    {
        ArgumentNullException.ThrowIfNull(unit);
        string u = unit.Trim();
        if (UnitAliases.Torque(u) is { } torque) u = torque;
        var b = new StringBuilder(u.Length);
        for (int i = 0; i < u.Length; i++)
        {
            char c = u[i];
            if (c == '*') { b.Append('·'); continue; }
            if (c == '^' && i + 1 < u.Length && Superscript(u[i + 1]) is { } s) { b.Append(s); i++; continue; }
            b.Append(c);
        }
        return b.ToString();
    }

    private static char? Superscript(char digit) => digit switch { '2' => '²', '3' => '³', '4' => '⁴', '6' => '⁶', _ => null };

    private static string ToAscii(string symbol)
    {
        var b = new StringBuilder(symbol.Length + 4);
        foreach (char c in symbol)
            b.Append(c switch { '·' => "*", '²' => "^2", '³' => "^3", '⁴' => "^4", '⁶' => "^6", 'τ' => "tau", '°' => "deg", _ => c.ToString() });
        return b.ToString();
    }
}
