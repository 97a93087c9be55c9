using System.Globalization;
using PadPlan.Model.Values;

namespace PadPlan.Import;

/// <summary>
/// Evaluates SPICE parameter expressions ({R1*2}, 'VCC/2'): numbers with SPICE scale factors, + - * /, parentheses,
/// unary minus and other parameters. Anything else (functions, comparisons) is left unevaluated, never guessed.
/// </summary>
public static class SpiceExpression
{
    /// <summary>The value of an expression, or null when it holds something PadPlan does not evaluate.</summary>
    public static double? Evaluate(string text, IReadOnlyDictionary<string, double> parameters)
    {
        var body = Unwrap(text);
        var parser = new Parser(body, parameters);
        var value = parser.Sum();
        return value is { } v && parser.AtEnd && double.IsFinite(v) ? v : null;
    }

    /// <summary>True for a word written as an expression: in braces or single quotes.</summary>
    public static bool IsExpression(string word) => word.Length > 1 && (word[0] == '{' && word[^1] == '}' || word[0] == '\'' && word[^1] == '\'');

    /// <summary>The expression without its braces or quotes.</summary>
    public static string Unwrap(string text)
    {
        var t = text.Trim();
        return IsExpression(t) ? t[1..^1].Trim() : t;
    }

    private sealed class Parser(string text, IReadOnlyDictionary<string, double> parameters)
    {
        private int _at;
        private int _depth;

        // Lines are checked against SpiceText's depth limits before they are read; this bound keeps the parser's own
        // recursion finite whatever text it is given (a deeper expression is left unevaluated).
        private const int MaxDepth = 4 * PadPlan.Model.Spice.SpiceText.MaxExpressionDepth + PadPlan.Model.Spice.SpiceText.MaxSignRun;

        public bool AtEnd { get { Skip(); return _at >= text.Length; } }

        public double? Sum()
        {
            var left = Product();
            while (left is not null)
            {
                Skip();
                if (_at >= text.Length || text[_at] is not ('+' or '-')) break;
                var op = text[_at++];
                var right = Product();
                if (right is null) return null;
                left = op == '+' ? left + right : left - right;
            }
            return left;
        }

        private double? Product()
        {
            var left = Unary();
            while (left is not null)
            {
                Skip();
                // '**' is a power in some dialects: not evaluated here
                if (_at >= text.Length || text[_at] is not ('*' or '/') || _at + 1 < text.Length && text[_at + 1] == '*') break;
                var op = text[_at++];
                var right = Unary();
                if (right is null) return null;
                left = op == '*' ? left * right : left / right;
            }
            return left;
        }

        private double? Unary()
        {
            if (++_depth > MaxDepth) return null;
            try { return UnaryInner(); }
            finally { _depth--; }
        }

        private double? UnaryInner()
        {
            Skip();
            if (_at < text.Length && text[_at] is '-' or '+')
            {
                var minus = text[_at++] == '-';
                var inner = Unary();
                return minus ? -inner : inner;
            }
            return Atom();
        }

        private double? Atom()
        {
            Skip();
            if (_at >= text.Length) return null;
            var c = text[_at];
            if (c is '(' or '{')
            {
                _at++;
                var inner = Sum();
                Skip();
                if (inner is null || _at >= text.Length || text[_at] is not (')' or '}')) return null;
                _at++;
                return inner;
            }
            if (char.IsAsciiDigit(c) || c == '.')
            {
                var start = _at;
                while (_at < text.Length && (char.IsAsciiLetterOrDigit(text[_at]) || text[_at] == '.' ||
                       text[_at] is '+' or '-' && text[_at - 1] is 'e' or 'E' && IsExponent(start)))
                    _at++;
                return ComponentValue.TryParse(text[start.._at], ValueSyntax.Spice, out var v, out _) ? v.Number : null;
            }
            if (char.IsLetter(c) || c == '_')
            {
                var start = _at;
                while (_at < text.Length && (char.IsLetterOrDigit(text[_at]) || text[_at] is '_' or '.')) _at++;
                var name = text[start.._at];
                Skip();
                if (_at < text.Length && text[_at] == '(') return null; // a function call
                return parameters.TryGetValue(name, out var p) ? p : null;
            }
            return null;
        }

        // "1e-3": the sign belongs to the number only when everything before the 'e' is a plain mantissa.
        private bool IsExponent(int start) =>
            double.TryParse(text.AsSpan(start, _at - 1 - start), NumberStyles.Float, CultureInfo.InvariantCulture, out _);

        private void Skip()
        {
            while (_at < text.Length && char.IsWhiteSpace(text[_at])) _at++;
        }
    }
}
