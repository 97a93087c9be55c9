namespace PadPlan.Model.Values;

/// <summary>The preferred-number series of IEC 60063, from the standard's table (not computed as 10^(k/n), which differs for several values).</summary>
public static class ESeries
{
    // IEC 60063, E12 and E24 tables.
    public static IReadOnlyList<double> E12 { get; } = [1.0, 1.2, 1.5, 1.8, 2.2, 2.7, 3.3, 3.9, 4.7, 5.6, 6.8, 8.2];
    public static IReadOnlyList<double> E24 { get; } = [1.0, 1.1, 1.2, 1.3, 1.5, 1.6, 1.8, 2.0, 2.2, 2.4, 2.7, 3.0, 3.3, 3.6, 3.9, 4.3, 4.7, 5.1, 5.6, 6.2, 6.8, 7.5, 8.2, 9.1];

    public static bool InE12(double value) => InSeries(value, E12);
    public static bool InE24(double value) => InSeries(value, E24);

    /// <summary>The smallest series a value belongs to: "E12", "E24", or "" when in neither.</summary>
    public static string SeriesOf(double value) => InE12(value) ? "E12" : InE24(value) ? "E24" : "";

    private static bool InSeries(double value, IReadOnlyList<double> series)
    {
        if (!(value > 0) || !double.IsFinite(value)) return false;
        var mantissa = value / Math.Pow(10, Math.Floor(Math.Log10(value)));
        if (mantissa >= 9.9999999) mantissa /= 10;
        return series.Any(s => Math.Abs(mantissa - s) < 1e-6 * s);
    }
}
