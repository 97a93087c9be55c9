using PadPlan.Output.Drawing;
using PadPlan.Output.Sheets;
using PadPlan.Output.Tables;
using SkiaSharp;
using Svg.Skia;
using UglyToad.PdfPig;
using Xunit;

namespace PadPlan.Tests.Output;

/// <summary>True scale, measured on the output files by outside readers (PdfPig for PDF, Svg.Skia for SVG), not taken from our own numbers.</summary>
public class ScaleTests
{
    private const double PtPerMm = 72 / 25.4; // ISO 32000-1, 8.3.2.1: default user unit 1/72 in

    [Theory]
    // ISO 216: A4 210 x 297 mm = 595.276 x 841.890 pt; A3 297 x 420 mm = 841.890 x 1190.551 pt
    [InlineData("a4", 595.276, 841.890)]
    [InlineData("a3", 841.890, 1190.551)]
    // ANSI/ASME Y14.1: Letter 8.5 x 11 in = 612 x 792 pt
    [InlineData("letter", 612.0, 792.0)]
    public void Pdf_pages_have_the_exact_paper_size_in_points(string paper, double shortSide, double longSide)
    {
        var book = SheetBook.Build(SheetFixtures.TinyBuffer(), SheetFixtures.Options(Paper.Find(paper)), null, []);
        using var pdf = PdfDocument.Open(PdfWriter.Write(book.Sheets.Select(s => s.Page).ToList(), book.Title, book.Date));
        Assert.Equal(book.Sheets.Count, pdf.NumberOfPages);
        foreach (var page in pdf.GetPages())
        {
            var (w, h) = (page.Width, page.Height);
            Assert.Equal(shortSide, Math.Min(w, h), 2);
            Assert.Equal(longSide, Math.Max(w, h), 2);
        }
    }

    [Fact]
    public void Pdf_check_bars_span_50_mm_and_2_in()
    {
        var book = SheetBook.Build(SheetFixtures.TinyBuffer(), SheetFixtures.Options(), null, []);
        using var pdf = PdfDocument.Open(PdfWriter.Write(book.Sheets.Select(s => s.Page).ToList(), book.Title, book.Date));
        var template = pdf.GetPage(1);
        // the bars are the filled, thin, wide shapes on the page
        var bars = template.Paths
            .Where(p => p.IsFilled)
            .Select(p => p.GetBoundingRectangle())
            .OfType<UglyToad.PdfPig.Core.PdfRectangle>()
            .Where(r => r.Height < 5 && r.Width > 100)
            .Select(r => r.Width)
            .Order()
            .ToList();
        Assert.Equal(2, bars.Count);
        Assert.Equal(141.73, bars[0], 2);  // 50 mm x 72/25.4
        Assert.Equal(144.00, bars[1], 2);  // 2 in x 72
        Assert.Contains("measure the bar before cutting", template.Text);
    }

    [Fact]
    public void Svg_root_is_sized_in_mm_with_a_viewbox_in_mm()
    {
        var book = SheetBook.Build(SheetFixtures.TinyBuffer(), SheetFixtures.Options(), null, []);
        var svg = System.Xml.Linq.XDocument.Parse(SvgWriter.Write(book.Sheets[0].Page)).Root!;
        Assert.Equal("210mm", svg.Attribute("width")!.Value);
        Assert.Equal("297mm", svg.Attribute("height")!.Value);
        Assert.Equal("0 0 210 297", svg.Attribute("viewBox")!.Value);
    }

    [Theory]
    [InlineData(150)]
    [InlineData(300)]
    public void Svg_rendered_by_svg_skia_shows_board_and_check_bar_at_true_length(int dpi)
    {
        var project = SheetFixtures.TinyBuffer();
        var sheet = SheetBook.Build(project, SheetFixtures.Options(), null, []).Sheets[0];
        using var image = RenderSvg(SvgWriter.Write(sheet.Page), dpi);
        var pxPerMm = dpi / 25.4; // CSS Values and Units: 1 in = 25.4 mm = 96 px; rendered at dpi/96
        AssertBoardAndBar(image, sheet, pxPerMm, project.Board);
    }

    [Fact]
    public void Png_preview_shows_board_and_check_bar_at_true_length()
    {
        var project = SheetFixtures.DipOnStrips();
        var sheet = SheetBook.Build(project, SheetFixtures.Options(), null, []).Sheets[0];
        using var image = RenderedImage.FromPng(PngWriter.Write(sheet.Page, 300));
        AssertBoardAndBar(image, sheet, 300 / 25.4, project.Board);
    }

    /// <summary>Scans just inside the board's top and left edges (past any corner rounding) and through the middle of the 50 mm bar; the page positions only pick the scan lines, the lengths come from the pixels.</summary>
    private static void AssertBoardAndBar(RenderedImage image, Sheet sheet, double pxPerMm, PadPlan.Model.Board board)
    {
        var (boardWidth, boardHeight) = (board.Width!.Value, board.Height!.Value);
        var corner = sheet.View!.ToPage(new PadPlan.Model.Point(0, 0));
        var inset = board.CornerRadius + 1;
        bool Near(double px, double mm) => Math.Abs(px / pxPerMm - mm) < 1;
        // a line just inside the top edge meets only the two side edges (pads keep a 2 mm margin)
        var row = image.RowRuns((int)Math.Round((corner.Y + inset) * pxPerMm));
        var sides = row.Where(r => Near(Centre(r), corner.X) || Near(Centre(r), corner.X + boardWidth)).ToList();
        Assert.Equal(2, sides.Count);
        Within(boardWidth * pxPerMm, Centre(sides[1]) - Centre(sides[0]));

        var column = image.ColumnRuns((int)Math.Round((corner.X + inset) * pxPerMm));
        var ends = column.Where(r => Near(Centre(r), corner.Y) || Near(Centre(r), corner.Y + boardHeight)).ToList();
        Assert.Equal(2, ends.Count);
        Within(boardHeight * pxPerMm, Centre(ends[1]) - Centre(ends[0]));

        var bar = sheet.CheckBar!.Value;
        var barRow = image.RowRuns((int)Math.Round(bar.Center.Y * pxPerMm));
        var longest = barRow.Max(r => r.End - r.Start);
        Within(50 * pxPerMm, longest);
    }

    private static double Centre((int Start, int End) run) => (run.Start + run.End) / 2.0;

    private static void Within(double expected, double actual) =>
        Assert.True(Math.Abs(actual - expected) <= expected * 0.005, $"expected {expected:0.0} px within 0.5 %, measured {actual:0.0} px");

    internal static RenderedImage RenderSvg(string svgText, int dpi)
    {
        using var svg = new SKSvg();
        using var stream = new MemoryStream(System.Text.Encoding.UTF8.GetBytes(svgText));
        var picture = svg.Load(stream) ?? throw new InvalidOperationException("Svg.Skia could not read the SVG");
        var scale = dpi / 96f;
        var bounds = picture.CullRect;
        var bitmap = new SKBitmap((int)Math.Round(bounds.Width * scale), (int)Math.Round(bounds.Height * scale));
        using var canvas = new SKCanvas(bitmap);
        canvas.Clear(SKColors.White);
        canvas.Scale(scale);
        canvas.DrawPicture(picture);
        return new RenderedImage(bitmap);
    }
}
