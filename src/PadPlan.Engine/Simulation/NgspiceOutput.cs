using System.Globalization;
using System.Text.RegularExpressions;

namespace PadPlan.Simulation;

/// <summary>
/// Reads what `ngspice -b` prints for an operating point without a control block: the "Node Voltage" table and the
/// "Source Current" table (ngspice manual, batch mode). Names come back in lower case.
/// </summary>
public static partial class NgspiceOutput
{
    public sealed record Values(Dictionary<string, double> Nodes, Dictionary<string, double> Branches);

    /// <summary>The node voltages and source branch currents, or a reason why there are none (non-convergence, a deck error).</summary>
    public static (Values? Values, string? Failure) Parse(string output)
    {
        var nodes = new Dictionary<string, double>(StringComparer.OrdinalIgnoreCase);
        var branches = new Dictionary<string, double>(StringComparer.OrdinalIgnoreCase);
        var section = "";
        foreach (var raw in output.ReplaceLineEndings("\n").Split('\n'))
        {
            var line = raw.Trim();
            if (line.StartsWith("Node", StringComparison.Ordinal) && line.Contains("Voltage", StringComparison.Ordinal)) { section = "node"; continue; }
            if (line.StartsWith("Source", StringComparison.Ordinal) && line.Contains("Current", StringComparison.Ordinal)) { section = "source"; continue; }
            if (section.Length == 0 || line.Length == 0 || line.StartsWith("----", StringComparison.Ordinal)) continue;
            var m = Row().Match(line);
            if (!m.Success) { section = ""; continue; }
            var value = double.Parse(m.Groups[2].Value, NumberStyles.Float, CultureInfo.InvariantCulture);
            var name = m.Groups[1].Value.ToLowerInvariant();
            if (section == "node") nodes[name] = value;
            else if (name.EndsWith("#branch", StringComparison.Ordinal)) branches[name[..^"#branch".Length]] = value;
        }
        // a singular matrix sends ngspice into gmin and source stepping, and what it prints then is no operating point
        if (nodes.Count > 0 && !output.Contains("singular matrix", StringComparison.OrdinalIgnoreCase)) return (new Values(nodes, branches), null);
        return (null, Failure(output));
    }

    // What ngspice says when it cannot find an operating point, in the words a builder can act on.
    private static string Failure(string output)
    {
        if (output.Contains("singular matrix", StringComparison.OrdinalIgnoreCase))
            return "ngspice found the circuit unsolvable at DC (singular matrix: a supply across a winding, a loop of windings, or a node with no path to ground)";
        if (output.Contains("no convergence", StringComparison.OrdinalIgnoreCase) || output.Contains("iteration limit", StringComparison.OrdinalIgnoreCase)
            || output.Contains("Timestep too small", StringComparison.OrdinalIgnoreCase))
            return "the operating point did not converge in ngspice (check the circuit for a supply shorted by a junction, a loop of sources or windings, or a part value far out of range)";
        var error = output.ReplaceLineEndings("\n").Split('\n').Select(l => l.Trim()).FirstOrDefault(l => l.StartsWith("Error", StringComparison.OrdinalIgnoreCase));
        return error is null ? "ngspice printed no operating point" : $"ngspice printed no operating point ({Short(error)})";
    }

    private static string Short(string text) => new(text.Take(160).Select(c => char.IsControl(c) ? ' ' : c).ToArray());

    [GeneratedRegex(@"^(\S+)\s+([-+]?[0-9.]+(?:[eE][-+]?[0-9]+)?)$")]
    private static partial Regex Row();
}
