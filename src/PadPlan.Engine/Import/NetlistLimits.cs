using PadPlan.IO;
using PadPlan.ProjectFiles.Limits;

namespace PadPlan.Import;

/// <summary>
/// The project's limits applied to a netlist as it is read, cheapest first, so a deck far over them (20,000 parts) is
/// refused after one pass over its lines, before any element is parsed (docs/limits.md).
/// </summary>
public static class NetlistLimits
{
    /// <summary>Element lines a deck may hold: every one becomes a line of the project's import record.</summary>
    public const int MaxElementLines = InputLimits.MaxImportLines;

    /// <summary>Refuses a line longer than <see cref="InputLimits.MaxNetlistLineLength"/>, or more element lines than <see cref="MaxElementLines"/>.</summary>
    public static void CheckLines(string[] lines, string file)
    {
        var elements = 0;
        for (var i = 0; i < lines.Length; i++)
        {
            var line = lines[i];
            if (line.Length > InputLimits.MaxNetlistLineLength)
                throw new InputException(file, $"this line has {line.Length} characters; a netlist line may have at most {InputLimits.MaxNetlistLineLength} (docs/limits.md). Split it with '+' continuation lines, or shorten it.", i + 1);
            var text = line.TrimStart();
            if (i > 0 && text.Length > 0 && char.IsLetter(text[0]) && ++elements > MaxElementLines)
                throw new InputException(file, $"the netlist has more than {MaxElementLines} element lines; a project holds at most {InputLimits.MaxParts} parts (docs/limits.md). Split the circuit into boards of at most {InputLimits.MaxParts} parts.", i + 1);
        }
    }

    /// <summary>Refuses a logical line (continuations joined) longer than <see cref="InputLimits.MaxNetlistLineLength"/>.</summary>
    public static void CheckJoined(int length, string file, int line)
    {
        if (length > InputLimits.MaxNetlistLineLength)
            throw new InputException(file, $"this line, with its '+' continuation lines, has {length} characters; at most {InputLimits.MaxNetlistLineLength} are allowed (docs/limits.md).", line);
    }

    /// <summary>Refuses the part that would be one too many; <paramref name="count"/> is the number of parts before it.</summary>
    public static void CheckParts(int count, string file, int? line = null, int max = InputLimits.MaxParts)
    {
        if (count > max)
            throw new InputException(file, $"the netlist has more than {max} parts; a project holds at most {InputLimits.MaxParts} (docs/limits.md). Split the circuit into boards of at most {InputLimits.MaxParts} parts.", line);
    }
}
