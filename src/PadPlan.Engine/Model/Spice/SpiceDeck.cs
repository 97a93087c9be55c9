using System.Text;
namespace PadPlan.Model.Spice;

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
/// The one analysis PadPlan ever runs: the DC operating point (<c>.op</c>), with every node tied to ground through
/// <paramref name="Shunt"/> ohms (<c>.options rshunt</c>) so that a node only capacitors or an open lead reach still has a
/// solution. Written from the number alone.
/// </summary>
public sealed record DeckOperatingPoint(double Shunt) : DeckEntry
{
    public double Shunt { get; } = Shunt > 0 && double.IsFinite(Shunt) ? Shunt : throw new ArgumentOutOfRangeException(nameof(Shunt), "the shunt resistance must be a positive number of ohms.");
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
        DeckOperatingPoint op => $".options rshunt={ElementWords.Plain(op.Shunt)}\n.op",
        _ => throw new ArgumentOutOfRangeException(nameof(entry)),
    };
}
