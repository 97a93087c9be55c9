using PadPlan.Model.Values;

namespace PadPlan.Import;

/// <summary>SPICE numbers (a digit, point or sign first, then scale factors) and parameter expressions, read to a number.</summary>
public static class SpiceValues
{
    /// <summary>A SPICE number starts with a digit, a point or a sign (SPICE2/SPICE3 element line syntax); "n2" is a name, not a number.</summary>
    public static bool LooksLikeNumber(string word) =>
        word.Length > 0 && (char.IsAsciiDigit(word[0]) || word[0] is '.' or '+' or '-' && word.Length > 1 && (char.IsAsciiDigit(word[1]) || word[1] == '.'));

    /// <summary>The number a word stands for: a plain SPICE number or an expression evaluated with the parameters; null when it is neither.</summary>
    public static double? Number(string word, IReadOnlyDictionary<string, double> parameters)
    {
        if (SpiceExpression.IsExpression(word)) return SpiceExpression.Evaluate(word, parameters);
        return LooksLikeNumber(word) && ComponentValue.TryParse(word, ValueSyntax.Spice, out var v, out _) ? v.Number : null;
    }
}
