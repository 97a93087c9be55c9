using PadPlan.Model;
using PadPlan.Output.Drawing;

namespace PadPlan.Output.Sheets;

/// <summary>
/// Which pin names the assembly view prints, and the shapes of the footprint's marks (cathode band, pin-1 notch and
/// dot, winding-start dot) on a placed part. The DIP index notch sits at the pin-1 end (JEDEC MS-001); the band marks
/// the cathode end of a diode body (JEDEC DO-35/DO-41 outlines show it there).
/// </summary>
public static class PinMarks
{
    /// <summary>Radius of mark dots in board mm, and the least they shrink to on the page.</summary>
    private const double DotRadius = 0.35;
    private const double MinDotRadius = 0.4;

    /// <summary>Pin names are printed for every lead of a part with three or more leads, and for two-lead parts whose pins carry names (A/K, +/-).</summary>
    public static bool NamesShown(Footprint footprint, IReadOnlyList<string> pins) =>
        footprint.Leads.Count >= 3 || pins.Any(p => !p.All(char.IsAsciiDigit));

    /// <summary>A pin name as printed: a minus sign rather than a hyphen.</summary>
    public static string Display(string pin) => pin == "-" ? "\u2212" : pin;

    /// <summary>True when the part is polarised or has several pins, so the view must show which way round it goes.</summary>
    public static bool NeedsMark(Footprint footprint, IReadOnlyList<string> pins) => NamesShown(footprint, pins) || footprint.Marks.Count > 0;

    /// <summary>The drawn marks of a placed part, in page mm.</summary>
    public static IEnumerable<SceneMark> Shapes(Part part, Footprint footprint, Placement placement, BoardView view)
    {
        var (minX, minY) = (footprint.Body.Min(p => p.X), footprint.Body.Min(p => p.Y));
        var (maxX, maxY) = (footprint.Body.Max(p => p.X), footprint.Body.Max(p => p.Y));
        var body = new Box(minX, minY, maxX, maxY);
        var alongX = body.Width >= body.Height;
        var dotRadius = Math.Max(MinDotRadius, view.Length(DotRadius));
        Point Page(Point local) => view.ToPage(placement.ToBoard(local));
        foreach (var mark in footprint.Marks)
        {
            var lead = footprint.Leads.First(l => string.Equals(l.Name, mark.Lead, StringComparison.Ordinal));
            var toward = alongX ? Math.Sign(lead.Exit.X - body.Center.X) : Math.Sign(lead.Exit.Y - body.Center.Y);
            if (toward == 0) toward = -1;
            switch (mark.Kind)
            {
                case MarkKind.Band:
                {
                    var length = alongX ? body.Width : body.Height;
                    var (near, far) = (0.1 * length, 0.26 * length);
                    var band = alongX
                        ? (toward > 0 ? new Box(maxX - far, minY, maxX - near, maxY) : new Box(minX + near, minY, minX + far, maxY))
                        : (toward > 0 ? new Box(minX, maxY - far, maxX, maxY - near) : new Box(minX, minY + near, maxX, minY + far));
                    yield return new SceneMark(part.Ref, mark.Lead, mark.Kind, Geometry2D.Corners(band).Select(Page).ToValueList(), Filled: true);
                    break;
                }
                case MarkKind.Notch:
                {
                    var r = Math.Min(1.0, 0.22 * (alongX ? body.Height : body.Width));
                    var end = alongX ? new Point(toward > 0 ? maxX : minX, body.Center.Y) : new Point(body.Center.X, toward > 0 ? maxY : minY);
                    var inward = alongX ? new Point(-toward, 0) : new Point(0, -toward);
                    var side = new Point(-inward.Y, inward.X);
                    var arc = Enumerable.Range(0, 9).Select(i => Math.PI * i / 8)
                        .Select(a => end + side * (r * Math.Cos(a)) + inward * (r * Math.Sin(a)));
                    yield return new SceneMark(part.Ref, mark.Lead, mark.Kind, arc.Select(Page).ToValueList(), Filled: false);
                    break;
                }
                case MarkKind.Dot:
                {
                    var inset = body.Inflate(-Math.Min(0.9, 0.3 * Math.Min(body.Width, body.Height)));
                    yield return Disc(part.Ref, mark, Page(inset.Nearest(lead.Exit)), dotRadius);
                    break;
                }
                case MarkKind.Winding:
                {
                    var d = body.Center - lead.Exit;
                    var at = d.Length > 1e-9 ? lead.Exit + d * (Math.Min(1.2, d.Length / 2) / d.Length) : lead.Exit;
                    yield return Disc(part.Ref, mark, Page(at), dotRadius);
                    break;
                }
                case MarkKind.Plus:
                    // the "+" is the lead's printed pin name; nothing more to draw
                    break;
            }
        }
    }

    private static SceneMark Disc(string reference, FootprintMark mark, Point center, double radius) =>
        new(reference, mark.Lead, mark.Kind, Enumerable.Range(0, 12).Select(i => center + new Point(Math.Cos(i * Math.PI / 6), Math.Sin(i * Math.PI / 6)) * radius).ToValueList(), Filled: true);
}
