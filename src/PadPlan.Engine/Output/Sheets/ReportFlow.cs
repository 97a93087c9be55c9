using PadPlan.Model;
using PadPlan.Output.Drawing;

namespace PadPlan.Output.Sheets;

/// <summary>Lays report content down the page body, top to bottom, starting a new page when the next piece does not fit.</summary>
internal sealed class ReportFlow(PageFrame frame)
{
    private readonly List<PageBuilder> _pages = [];
    private PageBuilder? _page;
    private double _y;

    public Box Body => frame.Body;
    public PageBuilder Page => _page ?? NewPage();
    public double Y => _y;

    /// <summary>Makes sure the next `height` mm fit on this page; starts a new one if not. Returns the top to draw at.</summary>
    public double Take(double height)
    {
        if (_page is null || _y + height > Body.Bottom) NewPage();
        var top = _y;
        _y += height;
        return top;
    }

    public bool Fits(double height) => _page is not null && _y + height <= Body.Bottom;

    public void Space(double height) => _y = Math.Min(_y + height, Body.Bottom);

    public PageBuilder NewPage()
    {
        _page = new PageBuilder();
        _pages.Add(_page);
        _y = Body.Top;
        return _page;
    }

    public void Heading(string text, double size)
    {
        // keep a heading with at least a few lines of what follows
        if (!Fits(size * 1.6 + 12)) NewPage();
        var top = Take(size * 1.6);
        Page.Text(TextMetrics.Fit(text, size, Body.Width, FontWeight.Bold), new Point(Body.Left, SheetStyle.BaselineBelow(top, size)), size, weight: FontWeight.Bold);
    }

    /// <summary>A wrapped paragraph, optionally hanging after a bullet.</summary>
    public void Paragraph(string text, double size, FontWeight weight = FontWeight.Regular, string bullet = "", Ink? ink = null)
    {
        var indent = bullet.Length > 0 ? size * 1.4 : 0;
        var lines = TextMetrics.Wrap(text, size, Body.Width - indent, weight);
        for (var i = 0; i < lines.Count; i++)
        {
            var top = Take(size * SheetStyle.LineGap);
            var baseline = SheetStyle.BaselineBelow(top, size);
            if (i == 0 && bullet.Length > 0) Page.Text(bullet, new Point(Body.Left, baseline), size, weight: weight, ink: ink);
            Page.Text(lines[i], new Point(Body.Left + indent, baseline), size, weight: weight, ink: ink);
        }
    }

    public IReadOnlyList<ValueList<Shape>> Pages() => _pages.Select(p => p.Shapes()).ToList();
}
