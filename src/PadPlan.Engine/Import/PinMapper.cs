using PadPlan.IO;
using PadPlan.Model;

namespace PadPlan.Import;

/// <summary>Puts a netlist part's pins onto a footprint's pins: by name, by order, or through a parts-map pin mapping; picks the pin-order variant when none is given.</summary>
public static class PinMapper
{
    /// <summary>The mapped pins and the variant used; Guessed is true when several variants fitted and the first was taken.</summary>
    /// <param name="Leads">The footprint pin of each netlist pin, in the netlist part's pin order.</param>
    public sealed record Result(ValueList<PinNet> Pins, string? Variant, bool Guessed, ValueList<string> Leads);

    public static Result Map(NetlistPart part, Footprint footprint, string? variant, IReadOnlyDictionary<string, string>? rename, Func<string, InputException> bad)
    {
        if (variant is not null && footprint.Variants.Count > 0 && !footprint.Variants.Any(v => string.Equals(v.Name, variant, StringComparison.OrdinalIgnoreCase)))
            throw bad($"footprint {footprint.Name} has no pin order \"{variant}\"; use one of {string.Join(", ", footprint.Variants.Select(v => v.Name))}.");
        if (variant is not null && footprint.Variants.Count == 0)
            throw bad($"footprint {footprint.Name} has no pin orders, so \"{variant}\" cannot apply; leave it out.");
        var named = part.Pins.ToList();
        var positional = part.Positional;
        if (rename is { Count: > 0 })
        {
            var map = new Dictionary<string, string>(rename, StringComparer.OrdinalIgnoreCase);
            named = part.Pins.Select((p, i) =>
            {
                if (map.TryGetValue(p.Name, out var to) || map.TryGetValue((i + 1).ToString(System.Globalization.CultureInfo.InvariantCulture), out to)) return p with { Name = to };
                if (positional) throw bad($"the pin mapping gives no footprint pin for pin {p.Name} (call position {i + 1}); add \"{p.Name}\": \"LEAD\" to its \"pins\".");
                return p;
            }).ToList();
            positional = false;
        }

        var guessed = false;
        if (!positional && variant is null && footprint.Variants.Count > 0)
        {
            var fitting = footprint.Variants.Where(v => named.All(p => v.Pins.Contains(p.Name, StringComparer.OrdinalIgnoreCase))).ToList();
            if (fitting.Count == 0)
                throw bad($"pins {string.Join(", ", named.Select(p => p.Name))} do not match footprint {footprint.Name}, whose pin orders are {string.Join(", ", footprint.Variants.Select(v => $"{v.Name} ({string.Join(" ", v.Pins)})"))}.");
            variant = fitting[0].Name;
            guessed = fitting.Count > 1;
        }
        var leadPins = footprint.PinNames(variant);
        if (positional)
        {
            if (named.Count > leadPins.Count)
                throw bad($"has {named.Count} pins, but footprint {footprint.Name} has only {leadPins.Count}. Choose a footprint with more pins in a parts map.");
            named = named.Select((p, i) => p with { Name = leadPins[i] }).ToList();
        }

        var result = new List<PinNet>();
        foreach (var p in named)
        {
            var lead = leadPins.FirstOrDefault(n => string.Equals(n, p.Name, StringComparison.OrdinalIgnoreCase))
                ?? throw bad($"pin {p.Name} does not match footprint {footprint.Name}{(variant is null ? "" : $" (pin order {variant})")}, whose pins are {string.Join(", ", leadPins)}.");
            var taken = result.FirstOrDefault(r => r.Pin == lead);
            if (taken is not null)
                throw bad($"two pins land on footprint pin {lead} of {footprint.Name} (nets {taken.Net} and {p.Net}); check the pin mapping.");
            result.Add(new PinNet(lead, p.Net));
        }
        var inLeadOrder = result.OrderBy(r => leadPins.ToList().IndexOf(r.Pin)).ToValueList();
        return new Result(inLeadOrder, variant, guessed, result.Select(r => r.Pin).ToValueList());
    }
}
