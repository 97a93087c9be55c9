using PadPlan.Output.Drawing;

namespace PadPlan.Output.Sheets;

/// <summary>The look of every sheet in one place: black on white, thin lines, sizes in page mm chosen for reading on paper at arm's length.</summary>
internal static class SheetStyle
{
    /// <summary>Edge band most printers cannot reach (mm); common practice, no source.</summary>
    public const double Margin = 10;
    public const double TitleHeight = 14;

    public const double TextTiny = 1.6;
    public const double TextSmall = 2.0;
    public const double TextNormal = 2.6;
    public const double TextLarge = 3.4;
    public const double TextHeading = 4.6;
    /// <summary>Baseline-to-baseline distance as a share of the em size.</summary>
    public const double LineGap = 1.3;

    public static readonly Ink Faint = Ink.Grey(0.62);
    public static readonly Ink Mid = Ink.Grey(0.38);
    public static readonly Ink Shade = Ink.Grey(0.9);

    public static readonly Stroke Hair = Stroke.Solid(Ink.Black, 0.12);
    public static readonly Stroke Fine = Stroke.Solid(Ink.Black, 0.18);
    public static readonly Stroke Thin = Stroke.Solid(Ink.Black, 0.25);
    public static readonly Stroke Normal = Stroke.Solid(Ink.Black, 0.35);
    public static readonly Stroke Heavy = Stroke.Solid(Ink.Black, 0.5);
    public static readonly Stroke FaintLine = Stroke.Solid(Faint, 0.2);
    public static readonly Stroke Rule = Stroke.Solid(Ink.Grey(0.7), 0.15);

    /// <summary>Baseline of text whose em box is placed with its top at the given y.</summary>
    public static double BaselineBelow(double top, double size) => top + size * 0.78;
}
