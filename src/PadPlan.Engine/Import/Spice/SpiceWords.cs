using System.Text.RegularExpressions;
using PadPlan.IO;

namespace PadPlan.Import;

/// <summary>Splits a logical SPICE line into words at spaces, commas and parentheses, keeping {expressions} whole and "name = value" as one word.</summary>
public static partial class SpiceWords
{
    private const string Separators = ",()";

    /// <summary>The line with spaces around '=' removed, which the words' columns refer to.</summary>
    public static string Normalised(SpiceLine line) => EqualsSpaces().Replace(line.Text, "=");

    public static List<LineTokenizer.Token> Of(SpiceLine line, string file)
    {
        var tokens = LineTokenizer.Split(Normalised(line), Separators, out var open);
        if (open is not null) throw new InputException(file, open, line.Line);
        return tokens;
    }

    [GeneratedRegex(@"\s*=\s*")]
    private static partial Regex EqualsSpaces();
}
