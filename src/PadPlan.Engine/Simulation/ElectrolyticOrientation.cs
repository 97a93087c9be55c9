using System.Globalization;
using PadPlan.Model;

namespace PadPlan.Simulation;

/// <summary>
/// A SPICE capacitor has no polarity. When the import puts one on a polarised footprint (an electrolytic), its first node
/// becomes the + lead, which is the wrong way round about as often as not. At import, with the operating point found, such
/// a capacitor is turned so that + is on the higher of its two nets, and the import summary says so. Capacitors whose
/// polarity the netlist states (`+=` and `-=` in a PadPlan netlist) are never turned: the check reports those.
/// </summary>
public static class ElectrolyticOrientation
{
    /// <summary>A polarised capacitor reversed by more than this (V) is reversed. Common practice, no source: aluminium electrolytics take well under 1 V reverse (from memory).</summary>
    public const double ReverseVolts = 0.1;

    /// <summary>
    /// At import: the project with its deck's electrolytics turned (<see cref="Orient"/>) when there are any and ngspice, found
    /// as the simulation finds it, gives the operating point; otherwise as it is, and `check` reports any that sit reversed.
    /// </summary>
    public static Project AtImport(Project project, SimulationOptions? options = null)
    {
        if (project.Imported is not { Elements.Count: > 0 } || !project.Parts.Any(p => project.FindFootprint(p.Footprint)?.PolarisedLeads(p) is not null)) return project;
        return Simulator.Run(project, options).Point is { } op ? Orient(project, op) : project;
    }

    /// <summary>The project with every SPICE-imported polarised capacitor that sits reversed at the operating point turned round (its + and - nets traded, in the part and in the recorded deck line), and a summary line for each.</summary>
    public static Project Orient(Project project, OperatingPoint op)
    {
        if (project.Imported is not { } record) return project;
        var fromDeck = record.Elements.Where(e => e.Ref is not null).Select(e => e.Ref!).ToHashSet(StringComparer.Ordinal);
        var parts = project.Parts.ToList();
        var elements = record.Elements.ToList();
        var summary = record.Summary.ToList();
        for (var i = 0; i < parts.Count; i++)
        {
            var part = parts[i];
            if (!fromDeck.Contains(part.Ref) || project.FindFootprint(part.Footprint)?.PolarisedLeads(part) is not var (plus, minus)) continue;
            if (op.LeadVolts(part, plus) is not { } vp || op.LeadVolts(part, minus) is not { } vm || vp - vm >= -ReverseVolts) continue;
            string Other(string pin) => pin == plus ? minus : pin == minus ? plus : pin;
            parts[i] = part with { Pins = part.Pins.Select(p => new PinNet(Other(p.Pin), p.Net)).ToValueList() };
            var k = elements.FindIndex(e => e.Ref == part.Ref);
            elements[k] = elements[k] with { Nodes = elements[k].Nodes.Select(n => n with { Pin = n.Pin is { } pin ? Other(pin) : null }).ToValueList() };
            summary.Add(new ImportSummaryLine("polarity", part.Ref, string.Create(CultureInfo.InvariantCulture,
                $"+ on {part.NetOf(minus)} ({vm:0.00} V at the operating point), - on {part.NetOf(plus)} ({vp:0.00} V): turned round from the deck's node order, which gives a SPICE capacitor no polarity")));
        }
        return project with { Parts = parts.ToValueList(), Imported = record with { Elements = elements.ToValueList(), Summary = summary.ToValueList() } };
    }
}
