using PadPlan.Output.Drawing;

namespace PadPlan.Output.Sheets;

/// <summary>The regions of one page: the paper, the printable area inside the margin, the title block along the bottom and the body above it.</summary>
public sealed record PageFrame(Paper Paper, bool Landscape)
{
    public double Width => Paper.WidthIn(Landscape);
    public double Height => Paper.HeightIn(Landscape);
    public Box Printable => new(SheetStyle.Margin, SheetStyle.Margin, Width - SheetStyle.Margin, Height - SheetStyle.Margin);
    public Box TitleBox => Printable with { Top = Printable.Bottom - SheetStyle.TitleHeight };
    /// <summary>Above the title block, with a small gap.</summary>
    public Box Body => Printable with { Bottom = TitleBox.Top - 3 };
    public string PaperText => $"{Paper.Name} {(Landscape ? "landscape" : "portrait")}";
}
