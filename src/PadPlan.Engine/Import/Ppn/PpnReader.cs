using System.Globalization;
using System.Text.RegularExpressions;
using PadPlan.IO;
using PadPlan.Model;
using PadPlan.Model.Values;

namespace PadPlan.Import;

/// <summary>Reads PadPlan's own plain-text netlist (*.ppn), described in docs/netlist-format.md.</summary>
public static partial class PpnReader
{
    public const string Extension = ".ppn";

    public static Netlist Read(string[] lines, string file)
    {
        var parts = new List<NetlistPart>();
        var nets = new List<NetFacts>();
        var notes = new List<ImportNote>();
        var dirs = new List<string>();
        var title = "";
        (double, double)? board = null;
        for (var n = 0; n < lines.Length; n++)
        {
            var lineNo = n + 1;
            var text = StripComment(lines[n]);
            var tokens = LineTokenizer.Split(text, "", out var open);
            if (open is not null) throw new InputException(file, open, lineNo);
            if (tokens.Count == 0) continue;
            InputException Bad(string message, int? column = null) => new(file, message, lineNo, column ?? tokens[0].Column);
            var head = tokens[0].Text;
            switch (head.ToLowerInvariant())
            {
                case "title":
                    title = string.Join(" ", tokens.Skip(1).Select(t => t.Text));
                    break;
                case "board":
                    board = BoardSize(string.Concat(tokens.Skip(1).Select(t => t.Text)), out var boardError);
                    if (boardError is not null) throw Bad(boardError);
                    break;
                case "footprints":
                    if (tokens.Count != 2) throw Bad("write one folder after 'footprints', e.g. footprints ./my-footprints (quote it if it has spaces).");
                    dirs.Add(tokens[1].Text);
                    break;
                case "net":
                    nets.Add(NetLine(tokens, Bad));
                    break;
                default:
                    NetlistLimits.CheckParts(parts.Count + 1, file, lineNo);
                    parts.Add(PartLine(tokens, lineNo, Bad));
                    break;
            }
        }
        return new Netlist(file, title, parts.ToValueList(), nets.ToValueList(), ValueList<WindingCoupling>.Empty, notes.ToValueList(), board, dirs.ToValueList());
    }

    private static string StripComment(string line)
    {
        var inQuote = false;
        for (var i = 0; i < line.Length; i++)
        {
            if (line[i] == '"') inQuote = !inQuote;
            else if (line[i] == '#' && !inQuote) return line[..i];
        }
        return line;
    }

    /// <summary>"80x50", "80 x 50 mm", "auto"; null size for auto.</summary>
    public static (double, double)? BoardSize(string text, out string? error)
    {
        error = null;
        var s = text.Trim().ToLowerInvariant();
        if (s == "auto") return null;
        var m = BoardPattern().Match(s);
        if (m.Success
            && double.TryParse(m.Groups[1].Value, NumberStyles.Float, CultureInfo.InvariantCulture, out var w)
            && double.TryParse(m.Groups[2].Value, NumberStyles.Float, CultureInfo.InvariantCulture, out var h)
            && w > 0 && h > 0 && double.IsFinite(w) && double.IsFinite(h))
            return (w, h);
        error = $"board size \"{text}\" is not WIDTHxHEIGHT in mm (e.g. 80x50), or auto.";
        return null;
    }

    /// <summary>The net attribute that marks a net meant to have one connection only (a test point, an antenna lead).</summary>
    public const string OpenEndWord = "open-end";

    private static NetFacts NetLine(List<LineTokenizer.Token> tokens, Func<string, int?, InputException> bad)
    {
        if (tokens.Count < 2) throw bad("a net line names the net: net NAME [ground] [class] [9V] [0.5A] [lead=5mm] [input|output].", null);
        var name = tokens[1].Text;
        CheckNetName(name, tokens[1].Column, bad);
        var facts = new NetFacts(name, Ground: NetNames.IsGround(name) ? true : null);
        foreach (var t in tokens.Skip(2))
        {
            var word = t.Text;
            var lower = word.ToLowerInvariant();
            if (lower == "ground") facts = facts with { Ground = true };
            else if (lower == OpenEndWord) facts = facts with { OpenEnded = true };
            else if (lower is "input" or "output") facts = facts with { Role = lower == "input" ? SignalRole.Input : SignalRole.Output };
            else if (Enum.TryParse<NetClass>(word, ignoreCase: true, out var cls) && !int.TryParse(word, out _)) facts = facts with { Class = cls };
            else if (lower.StartsWith("lead=", StringComparison.Ordinal))
            {
                var mm = lower[5..].EndsWith("mm", StringComparison.Ordinal) ? lower[5..^2] : lower[5..];
                if (!double.TryParse(mm, NumberStyles.Float, CultureInfo.InvariantCulture, out var lead) || !(lead > 0) || !double.IsFinite(lead))
                    throw bad($"\"{word}\": the longest lead is a length in mm, e.g. lead=5mm.", t.Column);
                facts = facts with { MaxLead = lead };
            }
            else
            {
                var estimated = word.StartsWith('~');
                if (!ComponentValue.TryParse(estimated ? word[1..] : word, ValueSyntax.SI, out var v, out _) || v.Unit is not ("V" or "A"))
                    throw bad($"\"{word}\" is not a net attribute. Use ground, a class (general, rf, audio, power, hv), a voltage (9V, ~300V), a current (0.5A, 20mA), lead=5mm, input or output.", t.Column);
                if (v.Unit == "V") facts = facts with { Voltage = v.Number, VoltageEstimated = estimated };
                else if (v.Number < 0) throw bad($"\"{word}\": a net current is zero or more.", t.Column);
                else facts = facts with { Current = v.Number };
            }
        }
        return facts;
    }

    private static NetlistPart PartLine(List<LineTokenizer.Token> tokens, int lineNo, Func<string, int?, InputException> bad)
    {
        var reference = tokens[0].Text;
        if (!RefPattern().IsMatch(reference))
            throw bad($"\"{reference}\" is not a part reference or a keyword. A part line starts with a reference such as R1, C12 or U2A; other lines start with title, board, footprints or net.", null);
        if (tokens.Count < 2 || tokens[1].Text.Contains('=') && !tokens[1].Quoted)
            throw bad($"{reference}: the value comes after the reference, e.g. {reference} 4k7 1=IN 2=OUT (write - for none).", null);
        var valueText = tokens[1].Text;
        string? footprint = null, variant = null;
        var rest = tokens.Skip(2).ToList();
        if (rest.Count > 0 && !rest[0].Text.Contains('='))
        {
            var fp = rest[0].Text;
            var slash = fp.IndexOf('/');
            footprint = slash < 0 ? fp : fp[..slash];
            variant = slash < 0 ? null : fp[(slash + 1)..];
            if (footprint.Length == 0 || variant is { Length: 0 }) throw bad($"\"{fp}\" is not FOOTPRINT or FOOTPRINT/PINORDER (e.g. to92/CBE).", rest[0].Column);
            rest.RemoveAt(0);
        }
        var pins = new List<NetlistPin>();
        foreach (var t in rest)
        {
            var eq = t.Text.IndexOf('=');
            if (eq <= 0 || eq == t.Text.Length - 1 || t.Text.IndexOf('=', eq + 1) >= 0)
                throw bad($"{reference}: \"{t.Text}\" is not PIN=NET (e.g. 1=VCC, B=BASE). The footprint, if any, comes right after the value.", t.Column);
            var pin = t.Text[..eq];
            var net = t.Text[(eq + 1)..];
            CheckNetName(net, t.Column + eq + 1, bad);
            if (pins.Any(p => string.Equals(p.Name, pin, StringComparison.OrdinalIgnoreCase)))
                throw bad($"{reference}: pin {pin} is given twice.", t.Column);
            pins.Add(new NetlistPin(pin, net));
        }
        if (pins.Count == 0) throw bad($"{reference}: no pins. Give each pin and its net as PIN=NET, e.g. {reference} {valueText} 1=VCC 2=OUT.", null);
        var kind = KindOf(reference, footprint);
        if (kind is null && footprint is null)
            throw bad($"{reference}: PadPlan cannot tell what part this is from its reference; name its footprint after the value (see 'padplan footprints').", null);
        var resolved = kind ?? PartKind.Subcircuit;
        ComponentValue? number = null;
        var display = valueText == "-" ? "" : valueText;
        if (PartValues.HasNumber(resolved) && valueText != "-")
        {
            if (!PartValues.TryRead(resolved, valueText, ValueSyntax.SI, out var v, out display, out var error))
                throw bad($"{reference}: bad value. {error}", tokens[1].Column);
            number = v;
        }
        return new NetlistPart(reference, resolved, display, number, null, footprint, variant, pins.ToValueList(), Positional: false, lineNo);
    }

    private static void CheckNetName(string name, int column, Func<string, int?, InputException> bad)
    {
        if (name.Length == 0 || name.Any(c => char.IsWhiteSpace(c) || char.IsControl(c) || c is '=' or '"' or '#'))
            throw bad($"\"{name}\" is not a net name: use letters, digits and - _ . + / only.", column);
    }

    /// <summary>The kind a reference prefix names by common practice (R resistor, C capacitor, Q transistor...); null when it names none.</summary>
    public static PartKind? KindOf(string reference, string? footprint)
    {
        var prefix = new string(reference.TakeWhile(char.IsLetter).ToArray()).ToUpperInvariant();
        return prefix switch
        {
            "R" => PartKind.Resistor,
            "VR" or "RV" => PartKind.Trimmer,
            "C" => PartKind.Capacitor,
            "VC" or "CV" or "TC" => PartKind.TrimmerCap,
            "L" => PartKind.Inductor,
            "T" => PartKind.Transformer,
            "D" or "CR" => PartKind.Diode,
            "LED" => PartKind.Led,
            "Q" => PartKind.Bjt,
            "U" or "IC" => PartKind.Subcircuit,
            "Y" or "XTAL" => PartKind.Crystal,
            "J" or "W" or "P" or "CN" or "CON" => PartKind.Landing,
            _ => footprint is null ? null : PartKind.Subcircuit,
        };
    }

    [GeneratedRegex(@"^[A-Za-z][A-Za-z0-9_.\-]*$")]
    private static partial Regex RefPattern();

    [GeneratedRegex(@"^([0-9.]+)\s*[x×]\s*([0-9.]+)\s*(mm)?$")]
    private static partial Regex BoardPattern();
}
