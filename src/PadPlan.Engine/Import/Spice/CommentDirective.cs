using System.Text.RegularExpressions;
using PadPlan.IO;

namespace PadPlan.Import;

/// <summary>
/// PadPlan's own comment lines in a SPICE netlist, which every simulator reads as comments: "*padplan open-end NODE..."
/// (nodes meant to have one connection only: a test point, an antenna lead) and "*padplan rf NODE..." (nets that carry
/// radio frequency, so the RF checks apply to them).
/// </summary>
internal static partial class CommentDirective
{
    public const string OpenEnd = "open-end";
    public const string Rf = "rf";

    /// <summary>The nodes named by every line of one kind, with the line they are on (1-based).</summary>
    public static IEnumerable<(string Node, int Line)> Find(string[] physical, string file, string kind)
    {
        for (var i = 0; i < physical.Length; i++)
        {
            var m = Directive().Match(physical[i]);
            if (!m.Success || !string.Equals(m.Groups[1].Value, kind, StringComparison.OrdinalIgnoreCase)) continue;
            var nodes = m.Groups[2].Value.Split([' ', '\t', ','], StringSplitOptions.RemoveEmptyEntries);
            if (nodes.Length == 0) throw new InputException(file, $"*padplan {kind} names no node: write the nodes after it, e.g. *padplan {kind} {(kind == Rf ? "LO TANK" : "TP1 ANT")}.", i + 1);
            foreach (var node in nodes) yield return (node, i + 1);
        }
    }

    [GeneratedRegex(@"^\s*\*\s*padplan\s+(open-end|rf)(?:\s+(.*))?$", RegexOptions.IgnoreCase)]
    private static partial Regex Directive();
}
