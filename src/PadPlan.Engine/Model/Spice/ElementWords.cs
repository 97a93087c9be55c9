using PadPlan.Model.Values;

namespace PadPlan.Model.Spice;

/// <summary>The words after an element's nodes, as every deck PadPlan writes them: grouped, with the project's current value as a plain SPICE number.</summary>
public static class ElementWords
{
    /// <summary>A resistor, capacitor or inductor that is its own two-lead part (not a winding of a merged transformer) carries the part's value.</summary>
    public static bool OwnValue(SpiceElement e, Part? part) =>
        char.ToUpperInvariant(e.Name[0]) is 'R' or 'C' or 'L' && part is { Pins.Count: 2 } && string.Equals(part.Ref, e.Name, StringComparison.OrdinalIgnoreCase);

    /// <summary>The tail's words, with an expression in braces or quotes kept as one group ("{a * 2}" is three words but one value).</summary>
    public static List<string> Words(string tail)
    {
        var groups = new List<string>();
        var (depth, quoted) = (0, false);
        foreach (var word in tail.Split(' ', StringSplitOptions.RemoveEmptyEntries))
        {
            if (depth > 0 || quoted) groups[^1] += " " + word;
            else groups.Add(word);
            foreach (var c in word)
            {
                if (c == '\'') quoted = !quoted;
                else if (!quoted && c == '{') depth++;
                else if (!quoted && c == '}') depth = Math.Max(0, depth - 1);
            }
        }
        return groups;
    }

    /// <summary>The element's words, with the part's current value in place of the imported one where the part owns it.</summary>
    public static List<string> Of(SpiceElement e, Part? part) => OwnValue(e, part) ? WithValue(Words(e.Tail), part!.Value) : Words(e.Tail);

    /// <summary>
    /// A resistor's, capacitor's or inductor's words with the project's current value in place of the imported one,
    /// written as a plain SPICE number (4700, not 4k7, which SPICE reads as 4k), so the deck, the sheets and the BOM
    /// agree. The value is the first positional word that is a number or an expression, or the r=/c=/l= word.
    /// </summary>
    public static List<string> WithValue(List<string> words, string value)
    {
        if (!ComponentValue.TryParse(value, ValueSyntax.SI, out var current, out _) || !(current.Number > 0)) return words;
        var number = Plain(current.Number);
        var result = new List<string>(words);
        for (var i = 0; i < result.Count; i++)
        {
            var w = result[i];
            var eq = w.IndexOf('=');
            if (eq < 0 && (LooksLikeNumber(w) || w.StartsWith('{') || w.StartsWith('\'')))
            {
                result[i] = number;
                return result;
            }
            if (eq > 0 && w[..eq].ToLowerInvariant() is "r" or "c" or "l" or "resistance" or "capacitance" or "inductance")
            {
                result[i] = w[..(eq + 1)] + number;
                return result;
            }
        }
        return words;
    }

    private static bool LooksLikeNumber(string w) => w.Length > 0 && (char.IsAsciiDigit(w[0]) || w[0] is '.' or '+' or '-' && w.Length > 1 && (char.IsAsciiDigit(w[1]) || w[1] == '.'));

    /// <summary>A plain SPICE number: digits, point and exponent only, so every SPICE reads it the same (<see cref="SpiceText.Number"/>).</summary>
    public static string Plain(double number) => SpiceText.Number(number);
}
