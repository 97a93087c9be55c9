using System.Text;

namespace PadPlan.Output;

/// <summary>
/// Text from users' files made safe to show in every output: control characters become their visible pictures
/// (U+2400 block, e.g. ESC as ␛), C1 controls become U+FFFD, and bidirectional overrides and isolates (which can make
/// text read in a different order than it is stored, Unicode TR #9 and CVE-2021-42574) are removed.
/// </summary>
public static class VisibleText
{
    /// <summary>The text with every control and bidi-formatting character dealt with; <paramref name="keepLineBreaks"/> keeps LF, CR and TAB as they are.</summary>
    public static string Of(string text, bool keepLineBreaks = false)
    {
        var first = 0;
        while (first < text.Length && !NeedsChange(text[first], keepLineBreaks)) first++;
        if (first == text.Length) return text;
        var sb = new StringBuilder(text.Length);
        sb.Append(text, 0, first);
        for (var i = first; i < text.Length; i++)
        {
            var c = text[i];
            if (!NeedsChange(c, keepLineBreaks)) sb.Append(c);
            else if (c < 0x20) sb.Append((char)(0x2400 + c));
            else if (c == 0x7F) sb.Append('\u2421');
            else if (c is >= '\u0080' and <= '\u009F') sb.Append('\uFFFD');
            // bidi formatting characters are dropped
        }
        return sb.ToString();
    }

    private static bool NeedsChange(char c, bool keepLineBreaks) => c switch
    {
        '\n' or '\r' or '\t' => !keepLineBreaks,
        < ' ' => true,
        >= '\u007F' and <= '\u009F' => true,
        _ => IsBidiControl(c),
    };

    /// <summary>Arabic letter mark, LRM/RLM, the embeddings and overrides LRE..RLO, and the isolates LRI..PDI (Unicode TR #9).</summary>
    public static bool IsBidiControl(char c) => c is '\u061C' or '\u200E' or '\u200F' or (>= '\u202A' and <= '\u202E') or (>= '\u2066' and <= '\u2069');
}
