using System.Text.RegularExpressions;
using PadPlan.IO;

namespace PadPlan.Import;

/// <summary>
/// PadPlan's own comment line in a SPICE netlist, "*padplan open-end NODE...": the named nodes are meant to have one connection only
/// (a test point, an antenna lead). Every simulator reads it as a comment.
/// </summary>
internal static partial class OpenEndDirective
{
    /// <summary>The nodes named by every such line, with the line they are on (1-based).</summary>
    public static IEnumerable<(string Node, int Line)> Find(string[] physical, string file)
    {
        for (var i = 0; i < physical.Length; i++)
        {
            var m = Directive().Match(physical[i]);
            if (!m.Success) continue;
            var nodes = m.Groups[1].Value.Split([' ', '\t', ','], StringSplitOptions.RemoveEmptyEntries);
            if (nodes.Length == 0) throw new InputException(file, "*padplan open-end names no node: write the nodes after it, e.g. *padplan open-end TP1 ANT.", i + 1);
            foreach (var node in nodes) yield return (node, i + 1);
        }
    }

    [GeneratedRegex(@"^\s*\*\s*padplan\s+open-end(?:\s+(.*))?$", RegexOptions.IgnoreCase)]
    private static partial Regex Directive();
}
