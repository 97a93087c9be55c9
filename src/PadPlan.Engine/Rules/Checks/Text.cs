using PadPlan.Model;

namespace PadPlan.Rules.Checks;

/// <summary>Number formats for finding messages: millimetres to 0.01, invariant culture.</summary>
internal static class Text
{
    public static string Mm(double value) => FormattableString.Invariant($"{value:0.##} mm");

    public static string Num(double value, string format = "0.##") => value.ToString(format, System.Globalization.CultureInfo.InvariantCulture);

    public static string At(Point p) => FormattableString.Invariant($"({p.X:0.##}, {p.Y:0.##})");
}
