using PadPlan.IO;

namespace PadPlan.Import;

/// <summary>A subcircuit definition: its port names, the line it starts on, the element letters in its body, and whether the body puts a node on global ground (0).</summary>
public sealed record SubcircuitDefinition(string Name, List<string> Ports, int Line, string BodyLetters, bool UsesGround = false)
{
    /// <summary>Only behavioural sources and passive parts inside (a thermal network, an ideal model): nothing to solder unless its ports reach real parts.</summary>
    public bool SimulationOnly => BodyLetters.Length > 0 && BodyLetters.All(c => "BEFGHRCLVIK".Contains(c));
}

/// <summary>
/// The first pass over a SPICE deck: subcircuit definitions, model types, parameters (evaluated in order), the lines
/// a simulation needs that are carried over to an exported deck, and the top-level element lines.
/// </summary>
public sealed partial record SpiceScan(
    Dictionary<string, SubcircuitDefinition> Subckts,
    Dictionary<string, string> Models,
    Dictionary<string, double> Parameters,
    List<string> DeckLines,
    List<SpiceLine> TopLevel)
{
    // Dot lines a simulation of the same circuit needs; analyses, outputs and .ic/.nodeset (which name nodes) are not carried.
    private static readonly HashSet<string> Carried = new(StringComparer.OrdinalIgnoreCase)
        { ".model", ".param", ".include", ".inc", ".lib", ".endl", ".func", ".global", ".options", ".option", ".temp" };

    public static SpiceScan Of(List<SpiceLine> lines, string file, List<ImportNote> notes)
    {
        var subckts = new Dictionary<string, SubcircuitDefinition>(StringComparer.OrdinalIgnoreCase);
        var models = new Dictionary<string, string>(StringComparer.OrdinalIgnoreCase);
        var parameters = new Dictionary<string, double>(StringComparer.OrdinalIgnoreCase);
        var deck = new List<string>();
        var top = new List<SpiceLine>();
        var open = new Stack<(string Name, int Line, System.Text.StringBuilder Letters, bool[] Ground)>();
        SpiceLine? control = null;
        foreach (var line in lines)
        {
            var words = SpiceWords.Of(line, file).Select(t => t.Text).ToList();
            if (words.Count == 0) continue; // only separators, e.g. a lone ")"
            var head = words[0].ToLowerInvariant();
            if (control is not null) { if (head == ".endc") control = null; continue; }
            if (head == ".control") { control = line; continue; }
            if (head == ".end") break;
            if (head == ".subckt")
            {
                if (words.Count < 2) throw new InputException(file, ".subckt needs a name and its pins.", line.Line);
                if (open.Count == 0)
                    subckts[words[1]] = new SubcircuitDefinition(words[1], words.Skip(2).TakeWhile(w => !w.Contains('=') && !w.Equals("params:", StringComparison.OrdinalIgnoreCase)).ToList(), line.Line, "");
                else open.Peek().Letters.Append('X'); // a nested definition: not simulation-only
                open.Push((words[1], line.Line, new System.Text.StringBuilder(), [false]));
                deck.Add(line.Text);
                continue;
            }
            if (head == ".ends")
            {
                if (open.Count == 0) throw new InputException(file, ".ends with no .subckt open. Remove it, or add the .subckt line it closes.", line.Line);
                var (name, _, letters, ground) = open.Pop();
                if (open.Count == 0 && subckts.TryGetValue(name, out var def)) subckts[name] = def with { BodyLetters = letters.ToString(), UsesGround = ground[0] };
                deck.Add(line.Text);
                continue;
            }
            if (open.Count > 0)
            {
                deck.Add(line.Text);
                if (!head.StartsWith('.'))
                {
                    open.Peek().Letters.Append(char.ToUpperInvariant(head[0]));
                    if (NodeWords(words).Any(NetNames.IsGround)) open.Peek().Ground[0] = true;
                }
                if (head == ".model" && words.Count >= 3) models.TryAdd(words[1], words[2].ToLowerInvariant());
                continue;
            }
            if (head == ".model" && words.Count >= 2) models[words[1]] = words.Count >= 3 ? words[2].ToLowerInvariant() : "";
            if (head == ".param") ReadParameters(SpiceWords.Normalised(line), parameters);
            if (Carried.Contains(head)) deck.Add(line.Text);
            if (head is ".include" or ".inc" or ".lib")
                notes.Add(new ImportNote(file, line.Line, $"{words[0]} {NetlistText.Echo(string.Join(" ", words.Skip(1)))}: not followed. Parts and subcircuits in that file are not imported; models named from it still work, and the exported deck keeps the line."));
            else if (!head.StartsWith('.')) top.Add(line);
        }
        if (open.Count > 0)
        {
            var (name, at, _, _) = open.Pop();
            throw new InputException(file, $".subckt {NetlistText.Echo(name)} is never closed: add .ends {NetlistText.Echo(name)} after its last line.", at);
        }
        if (control is not null)
            throw new InputException(file, ".control is never closed: add .endc after the last command of the block.", control.Line);
        return new SpiceScan(subckts, models, parameters, deck, top);
    }

    // The node words of an element line by its letter (ngspice manual, element syntax): a subcircuit call's are all its
    // positional words but the last (the subcircuit name).
    private static IEnumerable<string> NodeWords(List<string> words)
    {
        var positional = words.Skip(1).TakeWhile(w => !w.Contains('=') && !w.Equals("params:", StringComparison.OrdinalIgnoreCase)).ToList();
        var count = char.ToUpperInvariant(words[0][0]) switch
        {
            'K' => 0,
            'J' or 'Q' => 3,
            'M' or 'E' or 'G' or 'S' or 'T' => 4,
            'X' => positional.Count - 1,
            _ => 2,
        };
        return positional.Take(Math.Max(0, count));
    }

    // ".param a=1k b={a*2} c=-(3+2)*2": each in turn, so later ones may use earlier ones; one that cannot be evaluated is
    // left out. Read from the text, not the words, because parentheses split words.
    private static void ReadParameters(string text, Dictionary<string, double> parameters)
    {
        var names = Assignment().Matches(text);
        for (var i = 0; i < names.Count; i++)
        {
            var start = names[i].Index + names[i].Length;
            var end = i + 1 < names.Count ? names[i + 1].Index : text.Length;
            var expression = text[start..end].Trim();
            var name = names[i].Groups[1].Value;
            var value = SpiceValues.Number(expression, parameters) ?? SpiceExpression.Evaluate(expression, parameters);
            if (value is { } v) parameters[name] = v;
            else parameters.Remove(name);
        }
    }

    [System.Text.RegularExpressions.GeneratedRegex(@"(?<=\s)([A-Za-z_]\w*)=")]
    private static partial System.Text.RegularExpressions.Regex Assignment();
}
