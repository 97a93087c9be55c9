using PadPlan.IO;

namespace PadPlan.Import;

/// <summary>Joins SPICE physical lines into logical ones: the first line is the title, '*' lines are comments, ';' starts an inline comment, '+' continues the line before.</summary>
public static class SpiceLines
{
    public static (string Title, List<SpiceLine> Lines) Join(string[] physical, string file)
    {
        var title = physical.Length > 0 ? physical[0].Trim() : "";
        var lines = new List<SpiceLine>();
        for (var i = 1; i < physical.Length; i++)
        {
            var text = StripInlineComment(physical[i]).Trim();
            if (text.Length == 0 || text[0] == '*') continue;
            if (text[0] == '+')
            {
                if (lines.Count == 0)
                    throw new InputException(file, "a continuation line (+) with nothing before it to continue. Join it to an element line or remove the '+'.", i + 1, 1);
                NetlistLimits.CheckJoined(lines[^1].Text.Length + text.Length, file, lines[^1].Line);
                lines[^1] = lines[^1] with { Text = lines[^1].Text + " " + text[1..] };
                continue;
            }
            lines.Add(new SpiceLine(text, i + 1));
        }
        return (title, lines);
    }

    private static string StripInlineComment(string line)
    {
        var depth = 0;
        for (var i = 0; i < line.Length; i++)
        {
            if (line[i] == '{') depth++;
            else if (line[i] == '}' && depth > 0) depth--;
            else if (line[i] == ';' && depth == 0) return line[..i];
        }
        return line;
    }
}
