using PadPlan.Output.Drawing;

namespace PadPlan.Output.Sheets;

/// <summary>One printed page: its kind, its number among pages of that kind, and the drawing. View is where the board lies on it; CheckBar where the 50 mm bar is (template only).</summary>
public sealed record Sheet(SheetKind Kind, int Number, DrawingPage Page, BoardView? View = null, Box? CheckBar = null)
{
    /// <summary>The file name without extension, e.g. "template-1".</summary>
    public string FileStem => $"{Kind.ToString().ToLowerInvariant()}-{Number}";
}
