using System.Globalization;

namespace PadPlan.Materials;

/// <summary>Millimetre and area figures as the tables print them: invariant culture, no trailing zeros.</summary>
internal static class Mm
{
    public static string Of(double mm) => mm.ToString("0.##", CultureInfo.InvariantCulture);

    public static string Size(double width, double height) => $"{Of(width)} x {Of(height)}";

    public static string Area(double mm2) => string.Create(CultureInfo.InvariantCulture, $"{mm2:0} mm² ({mm2 / 100:0.#} cm²)");

    public static string Percent(double fraction) => (fraction * 100).ToString("0.0", CultureInfo.InvariantCulture) + " %";

    public static string List(IEnumerable<double> values) => string.Join(", ", values.Select(Of));
}
