using PadPlan.IO;
using PadPlan.Model.Spice;

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
    List<CarriedLine> DeckLines,
    List<SpiceLine> TopLevel)
{
    // Dot lines a simulation of the same circuit needs, and the only ones an exported deck carries (parsed, never
    // copied: Model/Spice/CarriedLine). Analyses, outputs, .ic/.nodeset (which name nodes) and .control blocks are not carried.
    private static readonly HashSet<string> Carried = new(StringComparer.OrdinalIgnoreCase) { ".model", ".param", ".include", ".inc", ".lib" };

    // Dot lines that change a simulation but are not carried: the import says so.
    private static readonly HashSet<string> NotCarried = new(StringComparer.OrdinalIgnoreCase) { ".func", ".global", ".options", ".option", ".temp", ".csparam", ".if", ".endl" };

    public static SpiceScan Of(List<SpiceLine> lines, string file, List<ImportNote> notes)
    {
        var subckts = new Dictionary<string, SubcircuitDefinition>(StringComparer.OrdinalIgnoreCase);
        var models = new Dictionary<string, string>(StringComparer.OrdinalIgnoreCase);
        var parameters = new Dictionary<string, double>(StringComparer.OrdinalIgnoreCase);
        var deck = new List<CarriedLine>();
        var deckLineNumbers = new List<int>();
        var top = new List<SpiceLine>();
        var open = new Stack<(string Name, int Line, System.Text.StringBuilder Letters, bool[] Ground)>();
        SpiceLine? control = null;
        void Carry(SpiceLine line)
        {
            if (SpiceText.Problem(line.Text) is { } problem) throw new InputException(file, $"this line {problem}", line.Line);
            try { deck.Add(CarriedLine.Parse(line.Text)); deckLineNumbers.Add(line.Line); }
            catch (ArgumentException e) { throw new InputException(file, e.Message, line.Line); }
        }
        void Skipped(SpiceLine line, string head, string where) =>
            notes.Add(new ImportNote(file, line.Line, $"{head}{where}: not carried to an exported deck (PadPlan carries .model, .subckt ... .ends, .param, .include and .lib only), so a simulation of the export runs without it."));
        foreach (var line in lines)
        {
            if (SpiceText.DepthProblem(line.Text) is { } deep) throw new InputException(file, $"this line {deep}", line.Line);
            var words = SpiceWords.Of(line, file).Select(t => t.Text).ToList();
            if (words.Count == 0) continue; // only separators, e.g. a lone ")"
            var head = words[0].ToLowerInvariant();
            if (control is not null) { if (head == ".endc") control = null; continue; }
            if (head == ".control")
            {
                control = line;
                notes.Add(new ImportNote(file, line.Line, ".control block: not read and never carried to an exported deck; PadPlan writes no .control block."));
                continue;
            }
            if (head == ".end") break;
            if (head == ".subckt")
            {
                if (words.Count < 2) throw new InputException(file, ".subckt needs a name and its pins.", line.Line);
                if (open.Count >= SpiceText.MaxSubcircuitNesting)
                    throw new InputException(file, $".subckt definitions nest more than {SpiceText.MaxSubcircuitNesting} deep (docs/limits.md); flatten them.", line.Line);
                if (open.Count == 0)
                    subckts[words[1]] = new SubcircuitDefinition(words[1], words.Skip(2).TakeWhile(w => !w.Contains('=') && !w.Equals("params:", StringComparison.OrdinalIgnoreCase)).ToList(), line.Line, "");
                else open.Peek().Letters.Append('X'); // a nested definition: not simulation-only
                open.Push((words[1], line.Line, new System.Text.StringBuilder(), [false]));
                Carry(line);
                continue;
            }
            if (head == ".ends")
            {
                if (open.Count == 0) throw new InputException(file, ".ends with no .subckt open. Remove it, or add the .subckt line it closes.", line.Line);
                var (name, _, letters, ground) = open.Pop();
                if (open.Count == 0 && subckts.TryGetValue(name, out var def)) subckts[name] = def with { BodyLetters = letters.ToString(), UsesGround = ground[0] };
                Carry(line);
                continue;
            }
            if (open.Count > 0)
            {
                if (head is ".model" or ".param" || !head.StartsWith('.')) Carry(line);
                else Skipped(line, words[0], $" inside .subckt {NetlistText.Echo(open.Peek().Name)}");
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
            if (head == ".lib" && words.Count != 3) Skipped(line, words[0], " (a library section, not a call naming a file and a section)");
            else if (head is ".include" or ".inc" or ".lib" && (words.Count < 2 || CarriedLine.TryIncludedPath(words[1]) is null))
                Skipped(line, words[0], " (the file must be named by a relative path inside the deck's folder, without \"..\")");
            else if (Carried.Contains(head)) Carry(line);
            else if (NotCarried.Contains(head)) Skipped(line, words[0], "");
            if (head is ".include" or ".inc" or ".lib" && words.Count >= 2)
                notes.Add(new ImportNote(file, line.Line, $"{words[0]} {NetlistText.Echo(string.Join(" ", words.Skip(1)))}: not followed. Parts and subcircuits in that file are not imported; the exported deck names it in a comment only (docs/netlist-format.md, \"Exported decks are built from the parsed model\")."));
            else if (!head.StartsWith('.')) top.Add(line);
        }
        if (open.Count > 0)
        {
            var (name, at, _, _) = open.Pop();
            throw new InputException(file, $".subckt {NetlistText.Echo(name)} is never closed: add .ends {NetlistText.Echo(name)} after its last line.", at);
        }
        if (control is not null)
            throw new InputException(file, ".control is never closed: add .endc after the last command of the block.", control.Line);
        if (CarriedLine.Problem(deck) is { } problem) throw new InputException(file, problem.Message, deckLineNumbers[problem.Index]);
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
