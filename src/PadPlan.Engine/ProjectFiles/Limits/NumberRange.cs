using System.Globalization;

namespace PadPlan.ProjectFiles.Limits;

/// <summary>The plausible range of one number in an input file: a closed or half-open interval and the unit it is in.</summary>
public sealed record NumberRange(double Min, double Max, string Unit, bool MinExclusive = false, bool MaxExclusive = false, bool WholeNumber = false)
{
    public bool Contains(double value) =>
        double.IsFinite(value)
        && (MinExclusive ? value > Min : value >= Min)
        && (MaxExclusive ? value < Max : value <= Max)
        && (!WholeNumber || Math.Floor(value) == value);

    /// <summary>"more than 0 and less than 1000 mm", for messages and docs.</summary>
    public string Describe()
    {
        var unit = Unit.Length > 0 ? " " + Unit : "";
        var whole = WholeNumber ? "a whole number " : "";
        if (!MinExclusive && !MaxExclusive) return $"{whole}from {Format(Min)} to {Format(Max)}{unit}";
        var low = MinExclusive ? $"more than {Format(Min)}" : $"at least {Format(Min)}";
        var high = MaxExclusive ? $"less than {Format(Max)}" : $"at most {Format(Max)}";
        return $"{whole}{low} and {high}{unit}";
    }

    private static string Format(double value) => value.ToString("0.###", CultureInfo.InvariantCulture);
}
