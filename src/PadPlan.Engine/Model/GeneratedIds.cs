using System.Globalization;

namespace PadPlan.Model;

/// <summary>
/// The ids PadPlan makes up for things a netlist does not name: pads (P1, P2...) and jumpers between pads of one net (ST1, ST2...).
/// Import refuses a part reference of the same form, so a build step never names two things with one id.
/// </summary>
public static class GeneratedIds
{
    public const string PadPrefix = "P";
    /// <summary>Jumpers: no SPICE element that becomes a part starts with S, and the PadPlan netlist gives ST no meaning.</summary>
    public const string JumperPrefix = "ST";

    public static string Pad(int number) => PadPrefix + number.ToString(CultureInfo.InvariantCulture);

    public static string Jumper(int number) => JumperPrefix + number.ToString(CultureInfo.InvariantCulture);

    /// <summary>The prefix of the generated ids a reference has the form of (prefix and a number, any case); null when it has none.</summary>
    public static string? ClashOf(string reference)
    {
        foreach (var prefix in new[] { JumperPrefix, PadPrefix })
            if (reference.Length > prefix.Length && reference.StartsWith(prefix, StringComparison.OrdinalIgnoreCase) && reference[prefix.Length..].All(char.IsAsciiDigit))
                return prefix;
        return null;
    }
}
