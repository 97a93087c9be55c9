using PadPlan.Materials;
using PadPlan.Model;
using PadPlan.Model.Values;
using PadPlan.Output.Tables;

namespace PadPlan.Output.Tables;

/// <summary>The bill of materials: parts grouped by kind, normalised value and footprint, with quantities and references.</summary>
public static class BomTable
{
    public static ReportTable From(Project project)
    {
        var lines = project.Parts
            .Select(p => (Part: p, Kind: PartKinds.Of(p, project.FindFootprint(p.Footprint))))
            .Select(x => (x.Part, x.Kind, Value: PartValue.Read(x.Part, x.Kind), Rated: RatingText(x.Part, project.FindFootprint(x.Part.Footprint))))
            .GroupBy(x => (x.Kind, Key: x.Value is { } v ? Key(v) : x.Part.Value.Trim().ToLowerInvariant(), Footprint: x.Part.Footprint.ToLowerInvariant(), x.Rated))
            .OrderBy(g => g.Key.Kind).ThenBy(g => g.First().Value?.Number ?? double.MaxValue).ThenBy(g => g.Key.Key, StringComparer.Ordinal).ThenBy(g => g.Key.Footprint, StringComparer.Ordinal)
            .Select(g =>
            {
                var first = g.First();
                var series = first.Value is { } v && PartKinds.HasSeriesValue(g.Key.Kind) ? SeriesText(v.Number) : "";
                var code = first.Value is { } c && PartKinds.HasSeriesValue(g.Key.Kind) ? c.ToIecCode() : "";
                var refs = g.Select(x => x.Part.Ref).Order(NaturalOrder.Comparer);
                return new[]
                {
                    g.Count().ToString(), PartKinds.Name(g.Key.Kind), PartValue.Display(first.Part, first.Kind), code, series, g.Key.Rated,
                    first.Part.Footprint, string.Join(" ", refs),
                };
            })
            .ToList();
        var nominal = project.Parts.Select(p => project.FindFootprint(p.Footprint)).OfType<Footprint>().Where(f => f.IsNominal && f.Mount != MountStyle.Landing)
            .Select(f => f.Name).Distinct(StringComparer.OrdinalIgnoreCase).Order(NaturalOrder.Comparer).ToList();
        var notes = new List<string>
        {
            $"{project.Parts.Count} parts in {lines.Count} lines.",
            "Values normalised; Code is the IEC 60062 letter-and-digit code; Series is the smallest IEC 60063 series (E12, E24) holding the value, or 'off E24'.",
        };
        if (lines.Any(l => l[5].Length > 0))
            notes.Add($"Rating: what the check judges the part against, its largest DC voltage, power and forward current: the parts map's figure, else the footprint's ({Rating.TypicalWarning}). Buy parts rated at least this.");
        if (nominal.Count > 0) notes.Add($"Footprints {string.Join(", ", nominal)}: {Footprint.NominalWarning} (body and lead spacing differ between makers).");
        return ReportTable.Create(
            "Bill of materials",
            ["Qty", "Part", "Value", "Code", "Series", "Rating", "Footprint", "References"],
            lines,
            notes);
    }

    /// <summary>
    /// The rating the operating-point check judges a part against (<see cref="Rating.For"/>), as
    /// "25 V" or "0.5 W, 0.2 A" (no-break spaces before the units); empty when neither gives one.
    /// </summary>
    public static string RatingText(Part part, Footprint? footprint)
    {
        var r = Rating.For(part, footprint);
        static string F(double v) => v.ToString("0.###", System.Globalization.CultureInfo.InvariantCulture);
        var figures = new List<string>();
        // a no-break space keeps each figure with its unit when a narrow terminal wraps the column
        if (r.Volts is { } v) figures.Add($"{F(v)}\u00A0V");
        if (r.Watts is { } w) figures.Add($"{F(w)}\u00A0W");
        if (r.Amps is { } a) figures.Add($"{F(a)}\u00A0A");
        return string.Join(", ", figures);
    }

    // Values equal to 9 significant digits are the same value, however they were written (4k7, 4.7k, 4700).
    private static string Key(ComponentValue value) =>
        value.Number.ToString("G9", System.Globalization.CultureInfo.InvariantCulture) + value.Unit;

    private static string SeriesText(double number) => ESeries.SeriesOf(number) is { Length: > 0 } s ? s : "off E24";
}
