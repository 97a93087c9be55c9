namespace PadPlan.Output.Sheets;

/// <summary>Which files to write for a sheet book.</summary>
[Flags]
public enum SheetFormats
{
    None = 0,
    /// <summary>One PDF holding every page.</summary>
    Pdf = 1,
    /// <summary>One SVG per page.</summary>
    Svg = 2,
    /// <summary>One PNG preview per page.</summary>
    Png = 4,
    All = Pdf | Svg | Png,
}
