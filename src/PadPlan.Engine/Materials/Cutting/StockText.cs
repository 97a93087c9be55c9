using System.Globalization;
using System.Text.RegularExpressions;

namespace PadPlan.Materials.Cutting;

/// <summary>Reads stock sizes as the builder types them: "100x160" (mm) or "100x160x0.8" with the board thickness.</summary>
public static partial class StockText
{
    [GeneratedRegex(@"^\s*(\d+(?:\.\d+)?)\s*[xX×*]\s*(\d+(?:\.\d+)?)(?:\s*[xX×*]\s*(\d+(?:\.\d+)?))?\s*(?:mm)?\s*$")]
    private static partial Regex Size();

    /// <summary>Parses one stock size; the thickness defaults to the given one. Throws <see cref="FormatException"/> with a message saying what to type.</summary>
    public static StockPiece Parse(string text, string id, double defaultThickness)
    {
        var m = Size().Match(text ?? "");
        if (!m.Success)
            throw new FormatException($"'{text}' is not a stock size: give WIDTHxHEIGHT in millimetres, e.g. 100x160, or add the board thickness, e.g. 100x160x0.8.");
        double Read(int group) => double.Parse(m.Groups[group].Value, CultureInfo.InvariantCulture);
        var width = Read(1);
        var height = Read(2);
        var thickness = m.Groups[3].Success ? Read(3) : defaultThickness;
        if (width <= 0 || height <= 0 || thickness <= 0)
            throw new FormatException($"'{text}': stock width, height and thickness must be more than 0 mm.");
        return new StockPiece(id, width, height, thickness);
    }
}
