namespace PadPlan.Output.Sheets;

/// <summary>A paper size, given upright (portrait) in mm.</summary>
public sealed record Paper(string Name, double Width, double Height)
{
    /// <summary>ISO 216: 210 x 297 mm.</summary>
    public static Paper A4 { get; } = new("A4", 210, 297);
    /// <summary>ISO 216: 297 x 420 mm.</summary>
    public static Paper A3 { get; } = new("A3", 297, 420);
    /// <summary>ANSI/ASME Y14.1 size A: 8.5 x 11 in.</summary>
    public static Paper Letter { get; } = new("Letter", 8.5 * 25.4, 11 * 25.4);

    public static IReadOnlyList<Paper> All { get; } = [A4, Letter, A3];

    /// <summary>The paper of a name (a4, letter, a3; any case), or null.</summary>
    public static Paper? Find(string name) =>
        All.FirstOrDefault(p => string.Equals(p.Name, name.Trim(), StringComparison.OrdinalIgnoreCase));

    public double WidthIn(bool landscape) => landscape ? Height : Width;
    public double HeightIn(bool landscape) => landscape ? Width : Height;
}
