namespace PadPlan.Import;

/// <summary>Splits a netlist line into words at spaces and tabs, keeping "quoted text" and {brace expressions} whole.</summary>
public static class LineTokenizer
{
    /// <summary>A word and its 1-based column.</summary>
    public readonly record struct Token(string Text, int Column, bool Quoted);

    /// <param name="separators">Characters that split words besides white space (SPICE: commas and parentheses).</param>
    /// <param name="error">Set when a quote or brace is left open.</param>
    public static List<Token> Split(string line, string separators, out string? error)
    {
        var tokens = new List<Token>();
        error = null;
        var i = 0;
        while (i < line.Length)
        {
            var c = line[i];
            if (char.IsWhiteSpace(c) || separators.Contains(c)) { i++; continue; }
            var start = i;
            if (c == '"')
            {
                var close = line.IndexOf('"', i + 1);
                if (close < 0) { error = $"column {i + 1}: a quote is opened and not closed."; close = line.Length; }
                tokens.Add(new Token(line[(i + 1)..Math.Min(close, line.Length)], start + 1, true));
                i = close + 1;
                continue;
            }
            var depth = 0;
            while (i < line.Length && (depth > 0 || !(char.IsWhiteSpace(line[i]) || separators.Contains(line[i]))))
            {
                if (line[i] == '{') depth++;
                else if (line[i] == '}' && depth > 0) depth--;
                i++;
            }
            if (depth > 0) error = $"column {start + 1}: a brace {{ is opened and not closed.";
            tokens.Add(new Token(line[start..i], start + 1, false));
        }
        return tokens;
    }
}
