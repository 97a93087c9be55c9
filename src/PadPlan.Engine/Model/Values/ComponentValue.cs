using System.Globalization;

namespace PadPlan.Model.Values;

/// <summary>A part value as a number with an optional unit ("F", "H", "Ω", "V", "A", "Hz", "W"), parsed from the many ways builders and netlists write it.</summary>
public readonly record struct ComponentValue(double Number, string Unit)
{
    private static readonly (string Text, string Unit)[] Units =
    [
        ("ohms", "Ω"), ("ohm", "Ω"), ("Ω", "Ω"), ("Hz", "Hz"), ("F", "F"), ("H", "H"), ("V", "V"), ("A", "A"), ("W", "W"),
    ];

    // IEC 60062 letters used in place of the decimal sign, and their multipliers.
    private static readonly Dictionary<char, double> IecLetters = new()
    {
        ['p'] = 1e-12, ['n'] = 1e-9, ['u'] = 1e-6, ['µ'] = 1e-6, ['μ'] = 1e-6, ['m'] = 1e-3,
        ['R'] = 1, ['r'] = 1, ['k'] = 1e3, ['K'] = 1e3, ['M'] = 1e6, ['G'] = 1e9, ['T'] = 1e12,
    };

    /// <summary>Parses a value; throws <see cref="FormatException"/> with a plain message when it cannot.</summary>
    public static ComponentValue Parse(string text, ValueSyntax syntax = ValueSyntax.SI) =>
        TryParse(text, syntax, out var value, out var error) ? value : throw new FormatException(error);

    public static bool TryParse(string? text, ValueSyntax syntax, out ComponentValue value, out string error)
    {
        value = default;
        error = "";
        var s = (text ?? "").Trim().Replace(" ", "", StringComparison.Ordinal);
        if (s.Length == 0)
        {
            error = "the value is empty.";
            return false;
        }
        if (s.Contains('{'))
        {
            error = $"\"{text}\" is a parameter expression; PadPlan does not evaluate expressions. Give a plain value.";
            return false;
        }
        if (TryIecCode(s, out value)) return true;

        var i = NumberPrefix(s, out var number);
        if (i == 0)
        {
            error = $"\"{(s.Length <= 80 ? s : s[..77] + "...")}\" is not a value: expected a number such as 4.7k, 100n, 4k7 or 2.2uH.";
            return false;
        }
        var rest = s[i..];
        var (scale, afterScale) = ScaleOf(rest, syntax);
        var unit = UnitOf(afterScale, out var known);
        // SPICE reads past letters it does not know after the scale factor; PadPlan's own syntax is strict.
        if (!known && syntax == ValueSyntax.SI)
        {
            error = $"\"{text}\": \"{rest}\" is not a known multiplier or unit (use p n u m k M G, or F H Ω V A Hz W).";
            return false;
        }
        value = new ComponentValue(number * scale, unit);
        return true;
    }

    // The length of the number at the start of s (0 when there is none) and its value.
    private static int NumberPrefix(string s, out double number)
    {
        number = 0;
        var i = 0;
        while (i < s.Length && (char.IsAsciiDigit(s[i]) || s[i] is '.' or '+' or '-' or 'e' or 'E'))
        {
            // stop at an 'e' that does not start an exponent (e.g. "1meg" never reaches here; "5e" would)
            if (s[i] is 'e' or 'E' && !(i + 1 < s.Length && (char.IsAsciiDigit(s[i + 1]) || s[i + 1] is '+' or '-'))) break;
            i++;
        }
        return i > 0 && double.TryParse(s[..i], NumberStyles.Float, CultureInfo.InvariantCulture, out number) && double.IsFinite(number) ? i : 0;
    }

    /// <summary>
    /// How a SPICE simulator without IEC 60062 codes reads a value (SPICE3 and ngspice number syntax): the number, one
    /// scale factor (case-insensitive; "meg", "mil"), and every letter after it ignored, so "4k7" is 4000 and "2R2" is
    /// 2. Gives the number and the ignored letters; false when the text does not start with a number.
    /// </summary>
    public static bool TryReadAsSpice(string? text, out double number, out string ignored)
    {
        ignored = "";
        var s = (text ?? "").Trim();
        var i = NumberPrefix(s, out number);
        if (i == 0) return false;
        var (scale, after) = ScaleOf(s[i..], ValueSyntax.Spice);
        number *= scale;
        ignored = after;
        return true;
    }

    /// <summary>True for letters that name a unit (F, H, V, A, W, Hz, ohm, ohms, and R for ohms), case-insensitive as SPICE reads them: letters a reader may ignore without changing what was meant.</summary>
    public static bool IsUnitWord(string letters) =>
        letters.Equals("R", StringComparison.OrdinalIgnoreCase) || Units.Any(u => string.Equals(u.Text, letters, StringComparison.OrdinalIgnoreCase));

    /// <summary>True when the text is an IEC 60062 code with a letter in place of the decimal sign (4k7, 2R2, 1u5).</summary>
    public static bool IsIecCode(string? text) => TryIecCode((text ?? "").Trim().Replace(" ", "", StringComparison.Ordinal), out _);

    // 4k7, R47, 4R7, 2u2, 4p7, 47K3: digits, one IEC letter in place of the decimal sign, digits, then an optional unit.
    private static bool TryIecCode(string s, out ComponentValue value)
    {
        value = default;
        var letterAt = -1;
        for (var k = 0; k < s.Length; k++)
        {
            if (char.IsAsciiDigit(s[k])) continue;
            if (letterAt >= 0 || !IecLetters.ContainsKey(s[k])) { if (letterAt >= 0) break; return false; }
            letterAt = k;
        }
        if (letterAt < 0) return false;
        var end = letterAt + 1;
        while (end < s.Length && char.IsAsciiDigit(s[end])) end++;
        var before = s[..letterAt];
        var after = s[(letterAt + 1)..end];
        // A plain suffix ("100n", "10k") is SI notation, handled by the general path unless a letter R stands alone.
        if (after.Length == 0 && s[letterAt] is not ('R' or 'r')) return false;
        if (before.Length == 0 && after.Length == 0) return false;
        var unit = UnitOf(s[end..], out var known);
        if (!known) return false;
        var mantissa = double.Parse((before.Length == 0 ? "0" : before) + (after.Length == 0 ? "" : "." + after), CultureInfo.InvariantCulture);
        var letter = s[letterAt];
        if (letter is 'R' or 'r' && unit.Length == 0) unit = "Ω";
        value = new ComponentValue(mantissa * IecLetters[letter], unit);
        return true;
    }

    private static (double Scale, string Remainder) ScaleOf(string rest, ValueSyntax syntax)
    {
        if (rest.Length == 0) return (1, rest);
        if (rest.StartsWith("meg", StringComparison.OrdinalIgnoreCase)) return (1e6, rest[3..]);
        if (syntax == ValueSyntax.Spice && rest.StartsWith("mil", StringComparison.OrdinalIgnoreCase)) return (25.4e-6, rest[3..]);
        double? scale = syntax == ValueSyntax.Spice
            // SPICE scale factors are case-insensitive, so "M" is milli and "F" is femto.
            ? char.ToLowerInvariant(rest[0]) switch { 'f' => 1e-15, 'p' => 1e-12, 'n' => 1e-9, 'u' or 'µ' or 'μ' => 1e-6, 'm' => 1e-3, 'k' => 1e3, 'g' => 1e9, 't' => 1e12, _ => null }
            : IsUnitText(rest) ? null
            : rest[0] switch { 'f' => 1e-15, 'p' => 1e-12, 'n' => 1e-9, 'u' or 'µ' or 'μ' => 1e-6, 'm' => 1e-3, 'k' or 'K' => 1e3, 'M' => 1e6, 'G' => 1e9, 'T' => 1e12, _ => null };
        return scale is null ? (1, rest) : (scale.Value, rest[1..]);
    }

    private static bool IsUnitText(string rest) => UnitOf(rest, out var known) is { Length: > 0 } && known;

    private static string UnitOf(string rest, out bool known)
    {
        known = true;
        if (rest.Length == 0) return "";
        foreach (var (text, unit) in Units)
            if (text.Length > 1 ? string.Equals(rest, text, StringComparison.OrdinalIgnoreCase) : rest == text) return unit;
        known = false;
        return "";
    }

    /// <summary>Engineering text for a BOM: "4.7 kΩ", "100 nF", "2.2 µH", "0.47 Ω".</summary>
    public string ToDisplay()
    {
        if (Number == 0) return Unit.Length == 0 ? "0" : $"0 {Unit}";
        var (mantissa, prefix) = Engineering(Number);
        var unit = prefix + Unit;
        return unit.Length == 0 ? Format(mantissa) : $"{Format(mantissa)} {unit}";
    }

    /// <summary>IEC 60062 letter-and-digit code: 4k7, R47, 470R, 100n, 4p7, 2u2.</summary>
    public string ToIecCode()
    {
        if (Number <= 0) return ToDisplay();
        var (mantissa, prefix) = Engineering(Number);
        var letter = prefix switch { "" => Unit == "Ω" ? "R" : "", "µ" => "u", var p => p };
        // below 1 ohm the R stands for the decimal point (R47); a value too small for three decimals keeps its SI form
        if (Unit == "Ω" && Number < 1) return Format(Number) is { Length: > 2 } small ? "R" + small[2..] : ToDisplay();
        var text = Format(mantissa);
        if (letter.Length == 0) return text;
        var dot = text.IndexOf('.');
        return dot < 0 ? text + letter : text[..dot] + letter + text[(dot + 1)..];
    }

    private static (double Mantissa, string Prefix) Engineering(double number)
    {
        var prefixes = new (double Scale, string Prefix)[] { (1e12, "T"), (1e9, "G"), (1e6, "M"), (1e3, "k"), (1, ""), (1e-3, "m"), (1e-6, "µ"), (1e-9, "n"), (1e-12, "p"), (1e-15, "f") };
        var magnitude = Math.Abs(number);
        foreach (var (scale, prefix) in prefixes)
            if (magnitude >= scale * 0.9999999) return (Math.Round(number / scale, 9), prefix);
        return (number / 1e-15, "f");
    }

    private static string Format(double x) => x.ToString("0.###", CultureInfo.InvariantCulture);

    public override string ToString() => ToDisplay();
}
