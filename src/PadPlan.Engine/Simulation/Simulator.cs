using PadPlan.Model;

namespace PadPlan.Simulation;

/// <summary>
/// The one entry point of the simulation: the project's circuit to its DC operating point by ngspice, or the reason there
/// is none (no ngspice, a part without a model, no convergence, over the time limit). Run it once per command and hand
/// the result to the checker, the materials and the sheets.
/// </summary>
public static class Simulator
{
    public static SimulationResult Run(Project project, SimulationOptions? options = null)
    {
        options ??= SimulationOptions.Default;
        if (options.Off) return SimulationResult.Without(SimulationResult.SwitchedOff);
        var program = NgspiceProgram.Find(options);
        if (program is null) return SimulationResult.NotFound;
        CircuitDeck deck;
        try { deck = CircuitDeck.Of(project); }
        catch (ArgumentException e) { return SimulationResult.Without($"the circuit could not be written as a deck ({e.Message})"); }
        if (deck.Unmodelled.Count > 0)
            return SimulationResult.Without($"no SPICE model for {string.Join(", ", deck.Unmodelled.Take(6))}{(deck.Unmodelled.Count > 6 ? $" and {deck.Unmodelled.Count - 6} more" : "")} (give the part a SPICE line in the netlist)");
        var (output, failure) = NgspiceProgram.Run(program, deck.Text, options.Limit);
        if (output is null) return SimulationResult.Without(failure!);
        var (values, why) = NgspiceOutput.Parse(output);
        return values is null ? SimulationResult.Without(why!) : SimulationResult.Of(Point(project, deck, values));
    }

    /// <summary>The operating point in the project's own names, from what ngspice printed for the deck.</summary>
    public static OperatingPoint Point(Project project, CircuitDeck deck, NgspiceOutput.Values values)
    {
        double NodeVolts(string node) => node == "0" ? 0 : values.Nodes.GetValueOrDefault(node, double.NaN);
        var nets = new Dictionary<string, double>(StringComparer.Ordinal);
        foreach (var (net, node) in deck.Nodes)
            if (!double.IsNaN(NodeVolts(node))) nets[net] = NodeVolts(node);
        var parts = new Dictionary<string, PartFigures>(StringComparer.Ordinal);
        foreach (var group in deck.Senses.GroupBy(s => s.Ref, StringComparer.Ordinal))
        {
            var part = project.FindPart(group.Key)!;
            var leads = group.GroupBy(s => s.Pin, StringComparer.OrdinalIgnoreCase)
                .Select(g => new LeadCurrent(g.Key, g.Sum(s => values.Branches.GetValueOrDefault(s.Source.ToLowerInvariant())))).ToValueList();
            var power = leads.Sum(l => l.Amps * nets.GetValueOrDefault(part.NetOf(l.Pin) ?? "", 0));
            parts[group.Key] = new PartFigures(group.Key, leads, power);
        }
        var supplies = deck.Supplies.Select(s => new SupplyFigure(s.Label, s.Plus,
            nets.GetValueOrDefault(s.Plus) - nets.GetValueOrDefault(s.Minus), -values.Branches.GetValueOrDefault(s.Source)))
            .Where(s => Math.Abs(s.Volts) > 1e-9).ToValueList(); // a 0 V source is a signal input at rest, not a supply
        return new OperatingPoint(nets, supplies, parts);
    }
}
