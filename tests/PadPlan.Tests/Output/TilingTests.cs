using PadPlan.Output.Drawing;
using PadPlan.Output.Sheets;
using UglyToad.PdfPig;
using Xunit;

namespace PadPlan.Tests.Output;

/// <summary>Boards larger than the printable area: split over several template pages that overlap and carry alignment marks.</summary>
public class TilingTests
{
    [Theory]
    // length, window, overlap -> expected number of spans (common practice, no source: the smallest count whose spans overlap by at least the overlap)
    [InlineData(50, 176, 12, 1)]
    [InlineData(176, 176, 12, 1)]
    [InlineData(177, 176, 12, 2)]
    [InlineData(340, 176, 12, 2)]
    [InlineData(341, 176, 12, 3)]
    [InlineData(1000, 100, 10, 11)]
    public void Spans_cover_the_board_with_at_least_the_overlap(double length, double window, double overlap, int count)
    {
        var spans = TilePlan.Spans(length, window, overlap);
        Assert.Equal(count, spans.Count);
        Assert.Equal(0, spans[0].From, 9);
        Assert.Equal(length, spans[^1].To, 9);
        foreach (var (from, to) in spans) Assert.True(to - from <= window + 1e-9);
        for (var i = 1; i < spans.Count; i++) Assert.True(spans[i - 1].To - spans[i].From >= overlap - 1e-9, $"spans {i - 1} and {i} overlap by {spans[i - 1].To - spans[i].From:0.##} mm");
    }

    [Fact]
    public void A_board_larger_than_a4_is_tiled_with_overlap_and_marks_on_both_neighbours()
    {
        var project = SheetFixtures.DipOnStrips(300, 250);
        var options = SheetFixtures.Options();
        var book = SheetBook.Build(project, options, null, []);
        var templates = book.Sheets.Where(s => s.Kind == SheetKind.Template).ToList();
        Assert.True(templates.Count >= 4, $"a 300 x 250 mm board needs at least 2 x 2 A4 pages, got {templates.Count}");

        using var pdf = PdfDocument.Open(PdfWriter.Write(book.Sheets.Select(s => s.Page).ToList(), book.Title, book.Date));
        Assert.Equal(book.Sheets.Count, pdf.NumberOfPages);
        for (var i = 0; i < templates.Count; i++)
        {
            var page = pdf.GetPage(i + 1);
            // every page is still A4 (ISO 216: 595.276 x 841.890 pt) and still carries its own check bar
            Assert.Equal(595.276, Math.Min(page.Width, page.Height), 2);
            Assert.Equal(841.890, Math.Max(page.Width, page.Height), 2);
            Assert.Contains("measure the bar before cutting", page.Text);
            Assert.Contains($"part {i + 1} of {templates.Count}", page.Text);
        }

        // the visible board windows (page mm, at 1:1 mapped back to board mm) cover the whole board and overlap
        var regions = templates.Select(s => Visible(s, project.Board.Width!.Value, project.Board.Height!.Value)).ToList();
        for (var x = 0.5; x < 300; x += 7)
            for (var y = 0.5; y < 250; y += 7)
                Assert.Contains(regions, r => r.Left <= x && x <= r.Right && r.Top <= y && y <= r.Bottom);
        Assert.True(regions[0].Right - regions[1].Left >= options.TileOverlap - 1e-6);

        // alignment mark A sits between sheets 1 and 2, at the same board point on both
        var marksA = templates.Take(2).Select(s => MarkAt(s, "A")).ToList();
        Assert.All(marksA, m => Assert.NotNull(m));
        Assert.Equal(marksA[0]!.Value.X, marksA[1]!.Value.X, 6);
        Assert.Equal(marksA[0]!.Value.Y, marksA[1]!.Value.Y, 6);
    }

    [Fact]
    public void A_board_that_fits_takes_one_template_page()
    {
        var book = SheetBook.Build(SheetFixtures.TinyBuffer(), SheetFixtures.Options(), null, []);
        Assert.Single(book.Sheets, s => s.Kind == SheetKind.Template);
        Assert.DoesNotContain(book.Sheets[0].Page.Shapes.OfType<ClipGroup>().SelectMany(g => g.Shapes).OfType<TextShape>(), t => t.Text.StartsWith("Trim along", StringComparison.Ordinal));
    }

    /// <summary>The board area a template page shows: its clip window mapped back through the page's board view, cut to the board.</summary>
    private static Box Visible(Sheet sheet, double width, double height)
    {
        var clip = sheet.Page.Shapes.OfType<ClipGroup>().Single().Clip;
        var o = sheet.View!.Origin;
        return new Box(Math.Max(0, clip.Left - o.X), Math.Max(0, clip.Top - o.Y), Math.Min(width, clip.Right - o.X), Math.Min(height, clip.Bottom - o.Y));
    }

    /// <summary>Board position of the alignment mark's label on a page (its text sits at a fixed offset from the mark).</summary>
    private static PadPlan.Model.Point? MarkAt(Sheet sheet, string name)
    {
        var text = sheet.Page.Shapes.OfType<ClipGroup>().SelectMany(g => g.Shapes).OfType<TextShape>().FirstOrDefault(t => t.Text == name && t.Weight == FontWeight.Bold);
        return text is null ? null : text.At - sheet.View!.Origin;
    }
}
