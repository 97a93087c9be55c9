using PadPlan.Model;

namespace PadPlan.Output.Drawing;

/// <summary>One line of text. At is the anchor on the baseline; Size is the em size in page mm; Angle turns the text clockwise about At, in degrees.</summary>
public sealed record TextShape(string Text, Point At, double Size, TextAnchor Anchor = TextAnchor.Start, FontWeight Weight = FontWeight.Regular, Ink? Ink = null, double Angle = 0) : Shape
{
    /// <summary>Single-line text: line breaks become spaces, since each back end draws one line per shape; other control and bidi characters are made visible or dropped (<see cref="VisibleText"/>), once for SVG, PDF and PNG alike.</summary>
    public string Text { get; } = VisibleText.Of((Text ?? "").ReplaceLineEndings(" "));
    public double Size { get; } = Size > 0 && double.IsFinite(Size) ? Size : throw new ArgumentOutOfRangeException(nameof(Size), Size, "text size must be positive.");
    public Ink Colour => Ink ?? Drawing.Ink.Black;
}
