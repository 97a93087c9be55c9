using System.Globalization;
using System.Text.RegularExpressions;
using PadPlan.IO;
using PadPlan.Model;

namespace PadPlan.Import;

/// <summary>Reads a SPICE netlist: the elements that are parts, the sources that become wire landings, and the facts about nets that sources give.</summary>
public static partial class SpiceReader
{
    public static readonly string[] Extensions = [".cir", ".sp", ".net", ".spice", ".ckt"];

    public static Netlist Read(string[] physical, string file)
    {
        var (title, lines) = SpiceLines.Join(physical, file);
        var notes = new List<ImportNote>();
        if (ElementLike().IsMatch(title))
            notes.Add(new ImportNote(file, 1, $"the first line \"{NetlistText.Echo(title)}\" is read as the title, as SPICE does; if it is a part, put a title line above it."));
        var scan = SpiceScan.Of(lines, file, notes);
        var state = new SpiceElements(file, scan, notes);
        foreach (var line in scan.TopLevel) state.Element(line);
        return state.Finish(title, CommentDirective.Find(physical, file, CommentDirective.OpenEnd).Select(d => d.Node).ToList(),
            CommentDirective.Find(physical, file, CommentDirective.Rf).ToList());
    }

    [GeneratedRegex(@"^[RCLDQJMXKVI][A-Za-z_]*\d\w*\s+\S+\s+\S+", RegexOptions.IgnoreCase)]
    private static partial Regex ElementLike();

    internal static string Plural(int n, string word) => $"{n} {word}{(n == 1 ? "" : "s")}";

    internal static string Invariant(double v) => v.ToString("R", CultureInfo.InvariantCulture);
}
