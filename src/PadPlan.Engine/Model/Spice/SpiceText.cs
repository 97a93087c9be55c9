using System.Globalization;

namespace PadPlan.Model.Spice;

/// <summary>
/// The text a SPICE deck that PadPlan writes may hold. A deck line is words separated by spaces; a word is printable
/// ASCII without the characters that start a comment or join lines (';', '\', '`'), so no word can hold a line break,
/// a control character or anything that would start a line of its own. Expressions have depth limits, so that no
/// reader (PadPlan's or the simulator's) recurses without bound.
/// </summary>
public static class SpiceText
{
    /// <summary>The deepest nesting of parentheses and braces in one line (docs/limits.md).</summary>
    public const int MaxExpressionDepth = 64;

    /// <summary>The longest run of sign characters (+ and -, spaces between them ignored) in one line: each is a nested unary operator.</summary>
    public const int MaxSignRun = 64;

    /// <summary>The deepest nesting of .subckt definitions (docs/limits.md).</summary>
    public const int MaxSubcircuitNesting = 16;

    /// <summary>The most elements one carried .subckt definition may expand to, counting the bodies of the subcircuits it calls (docs/limits.md).</summary>
    public const int MaxSubcircuitElements = 100_000;

    /// <summary>True for a character a deck word may hold.</summary>
    public static bool IsWordChar(char c) => c is > ' ' and < '\u007f' and not (';' or '\\' or '`');

    /// <summary>True for a non-empty word of allowed characters.</summary>
    public static bool IsWord(string? word) => !string.IsNullOrEmpty(word) && word.All(IsWordChar);

    /// <summary>True for a word that may begin an element line: an ASCII letter, then allowed characters.</summary>
    public static bool IsElementName(string? word) => IsWord(word) && char.IsAsciiLetter(word![0]);

    /// <summary>A plain SPICE number: digits, a point and an exponent only (4700, 1E-07), so every SPICE reads it the same.</summary>
    public static string Number(double value) => value.ToString("G15", CultureInfo.InvariantCulture);

    /// <summary>The problem with a piece of deck text (words separated by spaces or tabs), or null when it is fine. Never echoes the text.</summary>
    public static string? Problem(string text)
    {
        for (var i = 0; i < text.Length; i++)
        {
            var c = text[i];
            if (c is ' ' or '\t' || IsWordChar(c)) continue;
            return $"holds {Describe(c)} at character {i + 1}, which a SPICE deck line may not hold (deck text is printable ASCII without ';', '\\' or '`'). Remove it.";
        }
        return DepthProblem(text);
    }

    /// <summary>The problem with the nesting of a line's expressions, or null.</summary>
    public static string? DepthProblem(string text)
    {
        int depth = 0, signs = 0;
        for (var i = 0; i < text.Length; i++)
        {
            var c = text[i];
            if (c is '(' or '{')
            {
                if (++depth > MaxExpressionDepth)
                    return $"nests parentheses or braces more than {MaxExpressionDepth} deep (at character {i + 1}); PadPlan reads expressions up to that depth. Simplify the expression.";
            }
            else if (c is ')' or '}') depth = Math.Max(0, depth - 1);
            if (c is '+' or '-')
            {
                if (++signs > MaxSignRun)
                    return $"has more than {MaxSignRun} signs (+ or -) in a row (at character {i + 1}); each is an operator PadPlan would nest. Simplify the expression.";
            }
            else if (!char.IsWhiteSpace(c)) signs = 0;
        }
        return null;
    }

    /// <summary>The words of deck text; throws <see cref="ArgumentException"/> naming the problem when the text is not deck text.</summary>
    public static ValueList<string> Words(string? text, string what)
    {
        text ??= "";
        if (Problem(text) is { } problem) throw new ArgumentException($"{what} {problem}");
        return text.Split([' ', '\t'], StringSplitOptions.RemoveEmptyEntries).ToValueList();
    }

    /// <summary>Deck text with its words re-joined by single spaces; throws when it is not deck text.</summary>
    public static string Normalised(string? text, string what) => string.Join(' ', Words(text, what));

    /// <summary>A word; throws <see cref="ArgumentException"/> when it is not one.</summary>
    public static string Word(string? word, string what) =>
        IsWord(word) ? word! : throw new ArgumentException(string.IsNullOrEmpty(word) ? $"{what} must not be empty." : $"{what} {Problem(word) ?? "must be one word (no spaces)."}");

    /// <summary>Text for a comment line: anything that is not a printable character (line breaks, controls, line and paragraph separators) becomes a space.</summary>
    public static string Comment(string? text) =>
        new((text ?? "").Select(c => char.IsControl(c) || char.GetUnicodeCategory(c) is UnicodeCategory.LineSeparator or UnicodeCategory.ParagraphSeparator or UnicodeCategory.Format ? ' ' : c).ToArray());

    private static string Describe(char c) => c switch
    {
        '\n' or '\r' or '\u0085' or '\u2028' or '\u2029' => $"a line break (U+{(int)c:X4})",
        _ when char.IsControl(c) => $"a control character (U+{(int)c:X4})",
        'µ' or 'μ' => $"the character U+{(int)c:X4} (SPICE reads no micro sign: write u, as in 4.7u)",
        _ => $"the character U+{(int)c:X4}",
    };
}
