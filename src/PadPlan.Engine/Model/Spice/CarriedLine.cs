namespace PadPlan.Model.Spice;

/// <summary>What a carried-over deck line is.</summary>
public enum CarriedKind { Model, Subcircuit, Ends, Param, Include, Lib, Element }

/// <summary>
/// A line of the imported deck that an exported deck carries over so that it simulates, parsed into words: a
/// <c>.model</c>, a <c>.subckt</c> ... <c>.ends</c> block (its inner lines are elements, <c>.model</c> and
/// <c>.param</c>), a <c>.param</c>, an <c>.include</c> or a <c>.lib</c>. Nothing else is ever carried, and the line
/// is written back from its words, never copied: no other dot-command, no <c>.control</c> block, no line break.
/// </summary>
public sealed record CarriedLine
{
    private CarriedLine(CarriedKind kind, ValueList<string> words) => (Kind, Words) = (kind, words);

    public CarriedKind Kind { get; }

    /// <summary>The words, the first being the dot-command (lower case) or the element name.</summary>
    public ValueList<string> Words { get; }

    /// <summary>For .include and .lib: the file named.</summary>
    public string? Path => Kind is CarriedKind.Include or CarriedKind.Lib ? Words[1] : null;

    /// <summary>The line as a deck holds it.</summary>
    public string Text => string.Join(' ', Words);

    /// <summary>Parses one line; throws <see cref="ArgumentException"/> naming the problem (never echoing the text).</summary>
    public static CarriedLine Parse(string? text)
    {
        var words = SpiceText.Words(text, "the deck line");
        if (words.Count == 0) throw new ArgumentException("the deck line is empty; remove it.");
        var head = words[0].ToLowerInvariant();
        if (!head.StartsWith('.'))
        {
            if (!char.IsAsciiLetter(head[0]))
                throw new ArgumentException("the deck line starts with neither a dot-command nor an element name (a letter). Remove it.");
            return new CarriedLine(CarriedKind.Element, words);
        }
        var (kind, least, most) = head switch
        {
            ".model" => (CarriedKind.Model, 3, int.MaxValue),
            ".subckt" => (CarriedKind.Subcircuit, 2, int.MaxValue),
            ".ends" => (CarriedKind.Ends, 1, 2),
            ".param" => (CarriedKind.Param, 2, int.MaxValue),
            ".include" or ".inc" => (CarriedKind.Include, 2, 2),
            ".lib" => (CarriedKind.Lib, 3, 3),
            _ => throw new ArgumentException(
                $"the deck line is a dot-command that a carried deck may not hold ({Shown(head)}). Carried lines are .model, .subckt ... .ends, .param, .include and .lib; analyses, outputs and .control blocks are never carried. Remove the line."),
        };
        if (words.Count < least || words.Count > most)
            throw new ArgumentException(kind switch
            {
                CarriedKind.Include => ".include names exactly one file.",
                CarriedKind.Lib => ".lib names exactly one file and one section.",
                CarriedKind.Ends => ".ends takes at most the subcircuit's name.",
                _ => $"{head} needs {least - 1} or more words after it.",
            });
        var normal = words.Skip(1).Prepend(kind == CarriedKind.Include ? ".include" : head).ToList();
        if (kind is CarriedKind.Include or CarriedKind.Lib) normal[1] = IncludedPath(normal[1]);
        return new CarriedLine(kind, normal.ToValueList());
    }

    // The dot-commands themselves are short ASCII words: naming one is not echoing file content.
    private static string Shown(string head) => head.Length <= 12 && head.Skip(1).All(char.IsAsciiLetterOrDigit) ? head : "an unknown dot-command";

    /// <summary>
    /// A file that .include or .lib may name: a relative path of letters, digits, '_', '-', '.' and '/', with no ".."
    /// part, no leading '/' or '~', optionally in double quotes. It can only name a file in or under the deck's folder.
    /// </summary>
    public static string IncludedPath(string word)
    {
        var path = word.Length >= 2 && word[0] == '"' && word[^1] == '"' ? word[1..^1] : word;
        var ok = path.Length > 0 && path[0] is not ('/' or '~' or '-') && path.All(c => char.IsAsciiLetterOrDigit(c) || c is '_' or '-' or '.' or '/')
            && path.Split('/').All(part => part.Length > 0 && part != "." && part != "..");
        return ok ? path : throw new ArgumentException(
            "an .include or .lib file must be a relative path inside the deck's folder: letters, digits, '_', '-', '.' and '/', no \"..\", not starting with '/' or '~'. Copy the model file beside the deck and name it plainly.");
    }

    /// <summary>The path <see cref="IncludedPath"/> accepts, or null.</summary>
    public static string? TryIncludedPath(string word)
    {
        try { return IncludedPath(word); }
        catch (ArgumentException) { return null; }
    }

    /// <summary>The first problem with a list of carried lines as a whole (the index and what is wrong), or null: blocks closed, elements only inside a block, nesting within its limit.</summary>
    public static (int Index, string Message)? Problem(IReadOnlyList<CarriedLine> lines)
    {
        var depth = 0;
        var opened = -1;
        for (var i = 0; i < lines.Count; i++)
        {
            switch (lines[i].Kind)
            {
                case CarriedKind.Subcircuit:
                    if (depth == 0) opened = i;
                    if (++depth > SpiceText.MaxSubcircuitNesting)
                        return (i, $".subckt definitions nest more than {SpiceText.MaxSubcircuitNesting} deep; flatten them.");
                    break;
                case CarriedKind.Ends:
                    if (depth-- == 0) return (i, ".ends with no .subckt open; remove it.");
                    break;
                case CarriedKind.Element when depth == 0:
                    return (i, "an element line outside a .subckt block; the deck's own elements are kept as elements, not carried lines. Remove it.");
                case CarriedKind.Include or CarriedKind.Lib when depth > 0:
                    return (i, $"{lines[i].Words[0]} inside a .subckt block; put it before the block.");
            }
        }
        return depth > 0 ? (opened, ".subckt is never closed: add .ends after its last line.") : Calls(lines);
    }

    // The subcircuit calls (X lines) inside the carried definitions: none may call itself, directly or through others,
    // chains are at most MaxSubcircuitNesting deep, and no definition expands to more than MaxSubcircuitElements elements,
    // so that a simulator expanding them does bounded work. Calls to subcircuits not defined here are not followed.
    private static (int Index, string Message)? Calls(IReadOnlyList<CarriedLine> lines)
    {
        var bodies = new Dictionary<string, (int Line, List<string> Calls, int Elements)>(StringComparer.OrdinalIgnoreCase);
        var open = new Stack<string>();
        for (var i = 0; i < lines.Count; i++)
        {
            var line = lines[i];
            if (line.Kind == CarriedKind.Subcircuit)
            {
                open.Push(line.Words[1]);
                bodies.TryAdd(line.Words[1], (i, [], 0));
            }
            else if (line.Kind == CarriedKind.Ends) open.Pop();
            else if (line.Kind == CarriedKind.Element && open.Count > 0)
            {
                var body = bodies[open.Peek()];
                if (char.ToUpperInvariant(line.Words[0][0]) == 'X' && CalledName(line.Words) is { } called) body.Calls.Add(called);
                else bodies[open.Peek()] = body with { Elements = body.Elements + 1 };
            }
        }
        var size = new Dictionary<string, long>(StringComparer.OrdinalIgnoreCase);
        var visiting = new HashSet<string>(StringComparer.OrdinalIgnoreCase);
        (int, string)? problem = null;
        long Size(string name, int depth)
        {
            if (problem is not null || !bodies.TryGetValue(name, out var body)) return 1;
            if (size.TryGetValue(name, out var known)) return known;
            if (depth > SpiceText.MaxSubcircuitNesting)
            {
                problem = (body.Line, $"subcircuit calls nest more than {SpiceText.MaxSubcircuitNesting} deep; flatten them.");
                return 1;
            }
            if (!visiting.Add(name))
            {
                problem = (body.Line, "a subcircuit calls itself, directly or through others; SPICE cannot expand that. Remove the call.");
                return 1;
            }
            long total = body.Elements;
            foreach (var called in body.Calls) total = Math.Min(total + Size(called, depth + 1), long.MaxValue / 2);
            visiting.Remove(name);
            if (total > SpiceText.MaxSubcircuitElements && problem is null)
                problem = (body.Line, $"this subcircuit expands to more than {SpiceText.MaxSubcircuitElements:N0} elements through its calls; a deck PadPlan writes stays below that.");
            return size[name] = total;
        }
        foreach (var name in bodies.Keys.ToList())
        {
            Size(name, 1);
            if (problem is not null) return problem;
        }
        return null;
    }

    // An X line: nodes, then the subcircuit name, then optional "params:" and name=value words.
    private static string? CalledName(ValueList<string> words)
    {
        var positional = words.Skip(1).TakeWhile(w => !w.Contains('=') && !w.Equals("params:", StringComparison.OrdinalIgnoreCase)).ToList();
        return positional.Count > 0 ? positional[^1] : null;
    }
}
