using PadPlan.Model;
using PadPlan.Output.Drawing;

namespace PadPlan.Output.Sheets;

/// <summary>A page before the book numbers it: what it shows, without the title block.</summary>
internal sealed record SheetDraft(SheetKind Kind, PageFrame Frame, string Caption, ValueList<Shape> Body, BoardView? View = null, Box? CheckBar = null);
