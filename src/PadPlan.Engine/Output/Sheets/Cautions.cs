using System.Globalization;
using PadPlan.Model;

namespace PadPlan.Output.Sheets;

/// <summary>The usual safety cautions (DOMAIN §7) that a project calls for; they defer to local codes and licensed practice.</summary>
public static class Cautions
{
    /// <summary>Nets above this (V DC or peak AC) count as high voltage here; common practice for hobby builds (the IPC-2221 table also steps at 50 V).</summary>
    public const double HighVoltage = 50;

    public const string GlassFibre = "Cutting or sanding board raises glass-fibre dust: cut wet or with extraction, wear eye protection and a dust mask, and keep it away from food.";
    public const string Flux = "Solder flux fume can cause asthma: work with extraction or good ventilation and do not overheat the iron.";
    public const string Glue = "Cyanoacrylate glue bonds skin at once and gives off irritant vapour: use little, ventilate, keep a solvent for skin at hand.";
    public const string Defer = "These notes do not replace local codes, the part makers' data or licensed practice.";

    /// <summary>The short line printed on every template page.</summary>
    public static string TemplateLine(Project project) =>
        "Safety: " + GlassFibre + (HighVoltageNets(project).Count > 0 ? " This circuit carries high voltage: read the cautions on the report page." : "");

    /// <summary>Signal nets at or above the high-voltage limit, or marked as high voltage.</summary>
    public static IReadOnlyList<Net> HighVoltageNets(Project project) =>
        project.Nets.Where(n => !n.Ground && (n.Class == NetClass.Hv || (n.Voltage is { } v && Math.Abs(v) > HighVoltage))).ToList();

    /// <summary>All cautions for the report page, high voltage first when present.</summary>
    public static IReadOnlyList<string> For(Project project)
    {
        var list = new List<string>();
        var hv = HighVoltageNets(project);
        if (hv.Count > 0)
        {
            var names = string.Join(", ", hv.Select(n => n.Voltage is { } v
                ? string.Create(CultureInfo.InvariantCulture, $"{n.Name} ({v:0.#} V{(n.VoltageEstimated ? ", estimated" : "")})")
                : n.Name));
            list.Add($"HIGH VOLTAGE on {names}. Voltages above {HighVoltage:0} V can kill. Filter capacitors hold a lethal charge after switch-off: discharge them through a resistor and measure before touching. Work with one hand, the other away from the chassis. Mains wiring follows local codes and licensed practice.");
        }
        list.Add(GlassFibre);
        list.Add(Flux);
        list.Add(Glue);
        list.Add(Defer);
        return list;
    }
}
