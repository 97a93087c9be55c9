using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using PadPlan.Model;
using PadPlan.Model.Spice;
using PadPlan.Output.Spice;

namespace PadPlan.Tests.Lvs;

/// <summary>
/// Whatever text a project file holds, what the deck model accepts writes lines that ngspice reads as the line they
/// look like. ngspice splits a deck into lines at line feeds and carriage returns and runs commands only between
/// .control and .endc (ngspice manual, "Interactive Interpreter" and "Command line options", -b); ngspice itself is the
/// oracle in DeckSafetyTests. Here the property is over random text built from the pieces of known attacks: every
/// written line starts with the title prefix, "* ", an allowed dot-command or an element letter, and no character that
/// could end a line (or any other control or separator character) is written at all.
/// </summary>
public sealed class DeckTextPropertyTests
{
    private static readonly string[] Pieces =
        [".control", ".endc", "shell touch m", ".model", ".subckt", ".ends", ".param", ".include", ".lib", "R1", "X1", "*ng_script", "*",
         "\n", "\r", "\r\n", "\f", "\v", "\t", "\u0085", "\u2028", "\u2029", "\0", "\u001b", " ", "a", "1k", "{", "(", ")", "}", "-", "+",
         ";", "\\", "`", "µ", "=", "\"", "'", "x.lib", "/etc/x", "..", "CELL", "D(IS=1e-14)"];

    private static readonly string[] Heads = [".model", ".subckt", ".ends", ".param", ".include", ".inc", ".lib", ".control", ".endc", ".options", "R1", "X1", "shell", "*ng_script", ""];

    private static readonly string[] Words = ["a", "1k", "x.lib", "CELL", "D(IS=1e-14)", "{a*(2+3)}", "-(-1)", "rv=2k", "/etc/x", "../x", "\"m.lib\"", "µ", ";", "`", "\\"];

    private static readonly string[] Gaps = [" ", " ", " ", "\t", "\n", "\r", "\r\n", "\f", "\v", "\u0085", "\u2028", "\0"];

    // Half the texts are a head and words with gaps between them (often a well-formed line, sometimes with a line
    // break or control character for a gap); half are random runs of attack pieces.
    private static Arbitrary<string> Texts()
    {
        var structured = from head in Gen.Elements(Heads)
                         from words in Gen.ListOf(from g in Gen.Elements(Gaps) from w in Gen.Elements(Words) select g + w)
                         select head + string.Concat(words.Take(5));
        var raw = Gen.ListOf(Gen.Elements(Pieces)).Select(l => string.Concat(l.Take(12)));
        return Gen.OneOf(structured, raw).ToArbitrary();
    }

    private static readonly char[] Never = [.. Enumerable.Range(0, 0x20).Where(c => c != '\n').Select(c => (char)c), '\u007f', '\u0085', '\u2028', '\u2029'];

    private static readonly string[] Starts = [SpiceDeck.TitlePrefix, "* ", ".model ", ".subckt ", ".ends", ".param ", ".end"];

    private static string? Problem(string text)
    {
        var lines = text.Split('\n');
        if (text.IndexOfAny(Never) is var bad and >= 0) return $"character U+{(int)text[bad]:X4} written";
        if (!lines[0].StartsWith(SpiceDeck.TitlePrefix, StringComparison.Ordinal)) return "the first line is not the title";
        var wrong = lines.Skip(1).Where(l => l.Length > 0).FirstOrDefault(l => !Starts.Any(s => l.StartsWith(s, StringComparison.Ordinal)) && !char.IsAsciiLetter(l[0]));
        return wrong is null ? null : $"a line starts otherwise: {wrong}";
    }

    private static T? Accepted<T>(Func<T> make) where T : class
    {
        try { return make(); }
        catch (ArgumentException) { return null; }
    }

    [Property(MaxTest = 2000)]
    public Property Whatever_the_model_accepts_writes_only_safe_lines() =>
        Prop.ForAll(Texts(), Texts(), Texts(), (a, b, c) =>
        {
            var entries = new List<DeckEntry> { new DeckComment(a) };
            if (Accepted(() => CarriedLine.Parse(b)) is { } line && CarriedLine.Problem([line]) is null) entries.Add(new DeckCarried(line));
            if (Accepted(() => new SpiceElement(b, "R1", ValueList.Of(new SpiceNode("1", "n1")), c)) is { } element)
                entries.Add(new DeckElement(element.Name, ["n1", "0"], element.Tail.Split(' ', StringSplitOptions.RemoveEmptyEntries)));
            var text = new SpiceDeck(c, entries.ToValueList()).Text;
            var problem = Problem(text);
            return (problem is null).Label(problem ?? "");
        });

    [Property(MaxTest = 2000)]
    public Property A_carried_line_is_never_a_control_block_or_another_dot_command() =>
        Prop.ForAll(Texts(), t =>
        {
            var line = Accepted(() => CarriedLine.Parse(t));
            var head = line?.Words[0].ToLowerInvariant();
            return (line is null || head is ".model" or ".subckt" or ".ends" or ".param" or ".include" or ".lib" || char.IsAsciiLetter(head![0]))
                .Label($"accepted: {line?.Text}");
        });

    [Fact]
    public void The_generator_reaches_accepted_lines_too()
    {
        // a property that only ever sees refusals proves nothing: some generated lines and tails must be accepted
        var samples = Texts().Generator.Sample(size: 12, numberOfSamples: 3000);
        Assert.Contains(samples, t => Accepted(() => CarriedLine.Parse(t)) is { Kind: not CarriedKind.Element });
        Assert.Contains(samples, t => t.Length > 0 && Accepted(() => new SpiceElement("R1", "R1", ValueList<SpiceNode>.Empty, t)) is not null);
    }
}
