using System.Globalization;
using PadPlan.Model;
namespace PadPlan.Import;

/// <summary>The footprint a part gets when neither the netlist nor a parts map names one. The value bands are common practice, no source.</summary>
public static class DefaultFootprints
{
    /// <summary>The default footprint name, and whether it is only a guess the builder must confirm; null when no default fits.</summary>
    public static (string Name, bool Assumed)? For(NetlistPart part)
    {
        var value = part.Number?.Number;
        var model = part.Model ?? part.Value;
        return part.Kind switch
        {
            PartKind.Resistor => ("res-axial-250mw", false),
            PartKind.Capacitor => (Capacitor(value), value is null),
            PartKind.Inductor => (value is > 1e-3 ? "choke-radial" : "choke-axial", value is null),
            PartKind.Diode => TypePackages.Diode(model) is { } package ? (package, false) : PowerDiode(model) ? ("diode-plastic-do41", false) : ("diode-glass-do35", true),
            PartKind.Led => ("led-5mm", false),
            PartKind.Bjt or PartKind.Jfet or PartKind.Mosfet => TypePackages.Transistor(model) is { } package ? (package, false) : ("to92", true),
            PartKind.Crystal => ("hc49-u", false),
            PartKind.Trimmer => ("trimmer-pot", false),
            PartKind.TrimmerCap => ("trimmer-cap", false),
            PartKind.Transformer => part.Pins.Count is >= 2 and <= 6 ? ($"toroid-13mm-{part.Pins.Count}", true) : null,
            PartKind.Landing => part.Pins.Count <= 8 ? ($"landing-{part.Pins.Count}", false) : null,
            PartKind.Subcircuit when Crystal(model) && part.Pins.Count == 2 => ("hc49-u", false),
            // a two- or three-port part (a regulator, a reference, a sensor) on a generic single row, not a DIP
            PartKind.Subcircuit when part.Positional && part.Pins.Count is 2 or 3 => ($"sip-{part.Pins.Count}", true),
            PartKind.Subcircuit => GenericDip(PinsNeeded(part)) is { } dip ? (dip, true) : null,
            _ => null,
        };
    }

    /// <summary>Leads a part needs: its pin count, or its highest pin number when pins are named by lead number (own-format ICs).</summary>
    public static int PinsNeeded(NetlistPart part) =>
        part.Positional ? part.Pins.Count
        : Math.Max(part.Pins.Count, part.Pins.Select(p => int.TryParse(p.Name, NumberStyles.None, CultureInfo.InvariantCulture, out var n) ? n : 0).DefaultIfEmpty(0).Max());

    /// <summary>The smallest DIP in the library with at least this many pins, for an IC whose package is unknown.</summary>
    public static string? GenericDip(int pins) => pins <= 8 ? "dip-8" : pins <= 14 ? "dip-14" : pins <= 16 ? "dip-16" : null;

    // Ceramic discs up to 100 nF, film boxes up to 1 uF, electrolytics above, can size rising with capacitance (low-voltage cans).
    private static string Capacitor(double? farads) => farads switch
    {
        null => "cap-disc-5mm",
        <= 1e-9 * 1.0001 => "cap-disc-2.5mm",
        <= 100e-9 * 1.0001 => "cap-disc-5mm",
        <= 220e-9 * 1.0001 => "cap-film-5mm",
        <= 470e-9 * 1.0001 => "cap-film-7.5mm",
        < 1e-6 * 0.9999 => "cap-film-10mm",
        <= 4.7e-6 * 1.0001 => "cap-elec-5mm",
        <= 22e-6 * 1.0001 => "cap-elec-6.3mm",
        <= 100e-6 * 1.0001 => "cap-elec-8mm",
        <= 470e-6 * 1.0001 => "cap-elec-10mm",
        _ => "cap-elec-12.5mm",
    };

    private static bool PowerDiode(string model) =>
        model.Contains("rect", StringComparison.OrdinalIgnoreCase) || model.Contains("power", StringComparison.OrdinalIgnoreCase) || model.Contains("pwr", StringComparison.OrdinalIgnoreCase);

    /// <summary>A model or subcircuit name that says crystal (xtal, crystal, quartz).</summary>
    public static bool Crystal(string model) =>
        model.Contains("xtal", StringComparison.OrdinalIgnoreCase) || model.Contains("crystal", StringComparison.OrdinalIgnoreCase) || model.Contains("quartz", StringComparison.OrdinalIgnoreCase);
}
