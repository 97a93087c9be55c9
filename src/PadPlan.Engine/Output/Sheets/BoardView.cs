using PadPlan.Model;
using PadPlan.Output.Drawing;

namespace PadPlan.Output.Sheets;

/// <summary>Where board millimetres land on a page: page = Origin + board x Scale (Scale 1 on the template).</summary>
public sealed record BoardView(Point Origin, double Scale)
{
    public Point ToPage(Point board) => Origin + board * Scale;
    public Box ToPage(Box board) => new(Origin.X + board.Left * Scale, Origin.Y + board.Top * Scale, Origin.X + board.Right * Scale, Origin.Y + board.Bottom * Scale);
    public double Length(double boardMm) => boardMm * Scale;
    public Point ToBoard(Point page) => (page - Origin) * (1 / Scale);
}
