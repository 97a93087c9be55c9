using PadPlan.Import;
using PadPlan.Model;
using PadPlan.Output.Spice;
using PadPlan.Rules.Extraction;

namespace PadPlan.Tests.Lvs;

/// <summary>
/// Layout versus circuit by simulation: the user's deck and the deck extracted from the placed layout are both run to
/// their operating point in ngspice; nodes are matched through the leads (the net a lead has in the deck against the
/// node its landing gives in the layout), and every node voltage and source current must agree.
/// </summary>
public static class LayoutVersusCircuit
{
    // The issue's tolerance: 1e-6 relative, or 1 µV (1 µA for currents) absolute.
    public const double Relative = 1e-6;
    public const double Absolute = 1e-6;

    /// <summary>Every disagreement between the two operating points; empty when the layout is the circuit.</summary>
    public static List<string> Compare(string originalDeck, Project placed)
    {
        var extracted = ExtractedDeck.Write(placed);
        var original = Ngspice.OperatingPoint(originalDeck);
        var layout = Ngspice.OperatingPoint(extracted);
        var nets = LayoutNets.Of(placed);
        var problems = new List<string>();
        double? Volts(Dictionary<string, double> op, string node) =>
            NetNames.IsGround(node) ? 0 : op.TryGetValue(node, out var v) ? v : null;
        foreach (var element in placed.Imported!.Elements.Where(e => e.Ref is not null))
        {
            foreach (var node in element.Nodes.Where(n => n.Pin is not null))
            {
                var there = nets.NodeOf(element.Ref!, node.Pin!);
                var (a, b) = (Volts(original, node.Net.ToLowerInvariant()), Volts(layout, there.ToLowerInvariant()));
                if (a is null || b is null || !Agree(a.Value, b.Value))
                    problems.Add($"{element.Name} lead {node.Pin}: deck node {node.Net} = {a?.ToString("G9") ?? "none"} V, layout node {there} = {b?.ToString("G9") ?? "none"} V");
            }
            if (char.ToUpperInvariant(element.Name[0]) == 'V')
            {
                var key = element.Name.ToLowerInvariant() + "#branch";
                var (a, b) = (original.GetValueOrDefault(key, double.NaN), layout.GetValueOrDefault(key, double.NaN));
                if (!Agree(a, b)) problems.Add($"{element.Name} current: deck {a:G9} A, layout {b:G9} A");
            }
        }
        return problems;
    }

    private static bool Agree(double a, double b) =>
        double.IsFinite(a) && double.IsFinite(b) && Math.Abs(a - b) <= Math.Max(Absolute, Relative * Math.Max(Math.Abs(a), Math.Abs(b)));
}
