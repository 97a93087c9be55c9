namespace PadPlan.Model;

/// <summary>Constructor checks that reject bad values at once with a message naming the value.</summary>
internal static class Guard
{
    public static double Positive(double value, string name) =>
        double.IsFinite(value) && value > 0 ? value : throw new ArgumentOutOfRangeException(name, value, $"{name} must be a positive number of millimetres (got {value}).");

    public static double NonNegative(double value, string name) =>
        double.IsFinite(value) && value >= 0 ? value : throw new ArgumentOutOfRangeException(name, value, $"{name} must be zero or more (got {value}).");

    public static double? PositiveOrNull(double? value, string name) =>
        value is null ? null : Positive(value.Value, name);

    public static double Finite(double value, string name) =>
        double.IsFinite(value) ? value : throw new ArgumentOutOfRangeException(name, value, $"{name} must be a finite number (got {value}).");

    public static Point Finite(Point value, string name) =>
        double.IsFinite(value.X) && double.IsFinite(value.Y) ? value : throw new ArgumentOutOfRangeException(name, value, $"{name} must have finite coordinates.");

    public static string Name(string? value, string name) =>
        !string.IsNullOrWhiteSpace(value) ? value : throw new ArgumentException($"{name} must not be empty.", name);
}
