using System.Text;
using PadPlan.Model;
using PadPlan.Model.Spice;

namespace PadPlan.Output.Spice;

/// <summary>One line of a deck that PadPlan writes: a comment, an element, or a line carried over from the imported deck.</summary>
public abstract record DeckEntry;

/// <summary>A comment line; anything that is not printable (line breaks, control characters) becomes a space, so it stays one comment line.</summary>
public sealed record DeckComment : DeckEntry
{
    public DeckComment(string text) => Text = SpiceText.Comment(text);

    public string Text { get; }
}

/// <summary>An element line: its name, its nodes, then its other words (value, model, options), each a checked SPICE word.</summary>
public sealed record DeckElement : DeckEntry
{
    public DeckElement(string name, IEnumerable<string> nodes, IEnumerable<string> words)
    {
        Name = SpiceText.IsElementName(name) ? name : throw new ArgumentException("an element name must be one SPICE word that starts with a letter.", nameof(name));
        Nodes = nodes.Select(n => SpiceText.Word(n, "a node")).ToValueList();
        Words = words.Select(w => SpiceText.Word(w, "an element word")).ToValueList();
    }

    public string Name { get; }
    public ValueList<string> Nodes { get; }
    public ValueList<string> Words { get; }

    public string Text => string.Join(' ', Nodes.Concat(Words).Prepend(Name));
}

/// <summary>A .model, .subckt ... .ends, .param, .include or .lib line of the imported deck, parsed (<see cref="CarriedLine"/>).</summary>
public sealed record DeckCarried(CarriedLine Line) : DeckEntry;

/// <summary>
/// A command that PadPlan itself adds to a deck it runs (never text from an input file): the operating point, or an
/// option from a fixed list with a number. Nothing else, and never a .control block.
/// </summary>
public sealed record DeckCommand : DeckEntry
{
    /// <summary>Options a simulation may set (ngspice manual, "Simulator Variables" and ".options"): convergence and the shunt resistance that makes floating nodes solvable.</summary>
    public static readonly IReadOnlySet<string> Options = new HashSet<string>(StringComparer.Ordinal) { "rshunt", "gmin", "reltol", "abstol", "vntol", "itl1", "itl2", "temp", "tnom" };

    private DeckCommand(string text) => Text = text;

    public string Text { get; }

    /// <summary>.op: the DC operating point.</summary>
    public static DeckCommand OperatingPoint { get; } = new(".op");

    /// <summary>.options NAME=NUMBER, for a name in <see cref="Options"/> and a finite number.</summary>
    public static DeckCommand Option(string name, double value) =>
        Options.Contains(name) && double.IsFinite(value) ? new($".options {name}={SpiceText.Number(value)}")
            : throw new ArgumentException($"a deck option must be one of {string.Join(", ", Options)} with a finite number.", nameof(name));
}

/// <summary>
/// A SPICE deck as PadPlan writes it, built from the parsed model only: a title, then entries, then <c>.end</c>. No
/// entry can hold a line break, a control character or a dot-command other than the carried ones, and the text never
/// holds a <c>.control</c> block. <c>.include</c> and <c>.lib</c> lines are written as comments: PadPlan does not read
/// the files they name, so it cannot vouch for them (docs/netlist-format.md, "Exported decks").
/// </summary>
public sealed record SpiceDeck(string Title, ValueList<DeckEntry> Entries)
{
    /// <summary>What the first line starts with. SPICE reads the first line as the title; a fixed start keeps any title from being read as something else (ngspice treats a first line of "*ng_script" as a command script).</summary>
    public const string TitlePrefix = "padplan deck: ";

    /// <summary>The same deck with more entries at its end (before .end): e.g. <see cref="DeckCommand.OperatingPoint"/> for a simulation.</summary>
    public SpiceDeck With(params DeckEntry[] more) => this with { Entries = Entries.Concat(more).ToValueList() };

    /// <summary>The deck as text, one entry a line, "\n" line ends.</summary>
    public string Text
    {
        get
        {
            var text = new StringBuilder();
            text.Append(TitlePrefix).Append(SpiceText.Comment(Title)).Append('\n');
            foreach (var entry in Entries) text.Append(Line(entry)).Append('\n');
            return text.Append(".end\n").ToString();
        }
    }

    private static string Line(DeckEntry entry) => entry switch
    {
        DeckComment c => "* " + c.Text,
        DeckElement e => e.Text,
        DeckCarried { Line.Kind: CarriedKind.Include or CarriedKind.Lib } c =>
            $"* not followed (PadPlan does not read this file; look it over, then remove the \"* \" to use it): {c.Line.Text}",
        DeckCarried c => c.Line.Text,
        DeckCommand c => c.Text,
        _ => throw new ArgumentOutOfRangeException(nameof(entry)),
    };
}
