using System.Globalization;
using PadPlan.Model;
using PadPlan.Model.Standards;

namespace PadPlan.Output;

/// <summary>The usual safety cautions (DOMAIN §7) that a project calls for, in one place for every sheet, table and command; they defer to local codes and licensed practice.</summary>
public static class Cautions
{
    public const string GlassFibre = "Cutting, punching or sanding board raises glass-fibre dust: cut wet or with extraction, wear eye protection and a dust mask, and keep it away from food.";
    public const string Flux = "Solder flux fume is a known cause of occupational asthma: use extraction or good ventilation and do not overheat the iron.";
    public const string Glue = "Cyanoacrylate glue bonds skin at once and gives off irritant vapour: use little, ventilate, keep a solvent for skin at hand.";
    /// <summary>The cautions for working on a powered board (DOMAIN §8, common practice).</summary>
    public const string PoweredBoard = "Power up the first time from a bench supply with its current limit set as in the power-up table, never straight from a battery or mains unit; watch the current before measuring voltages. A reversed electrolytic can heat, vent or burst: switch off at once if the supply sits at its limit or a part gets hot. Measure with one probe clipped to the plane and one hand free.";
    public const string Defer = "These notes do not replace local codes, the part makers' data or licensed practice.";

    /// <summary>Signal nets above the high-voltage threshold, or marked as high voltage.</summary>
    public static IReadOnlyList<Net> HighVoltageNets(Project project) => project.Nets.Where(HighVoltage.Applies).ToList();

    /// <summary>The high-voltage warning for a project, or null when it has no high-voltage net.</summary>
    public static string? HighVoltageWarning(Project project)
    {
        var hv = HighVoltageNets(project);
        if (hv.Count == 0) return null;
        var names = string.Join(", ", hv.Select(n => n.Voltage is { } v
            ? string.Create(CultureInfo.InvariantCulture, $"{n.Name} ({(n.VoltageEstimated ? "up to " : "")}{v:0.#} V{(n.VoltageEstimated ? ", upper bound from DC paths" : "")})")
            : n.Name));
        return $"HIGH VOLTAGE on {names}. Voltages above {HighVoltage.Threshold:0} V can kill. Filter capacitors hold a lethal charge after switch-off: discharge them through a resistor and measure before touching. Work with one hand, the other away from the chassis. Mains wiring follows local codes and licensed practice.";
    }

    /// <summary>The short line printed on every template page.</summary>
    public static string TemplateLine(Project project) =>
        "Safety: " + GlassFibre + (HighVoltageNets(project).Count > 0 ? " This circuit carries high voltage: read the cautions on the report page." : "");

    /// <summary>All cautions for the report page, high voltage first when present.</summary>
    public static IReadOnlyList<string> For(Project project)
    {
        var list = new List<string>();
        if (HighVoltageWarning(project) is { } hv) list.Add(hv);
        list.AddRange([GlassFibre, Flux, Glue, Defer]);
        return list;
    }
}
