using System.Xml.Linq;
using PadPlan.Model;
using PadPlan.Output.Drawing;
using PadPlan.Output.Sheets;
using PadPlan.Output.Tables;
using PadPlan.Rules;
using UglyToad.PdfPig;
using Xunit;

namespace PadPlan.Tests.Output;

/// <summary>What the sheet files hold: repeatable bytes, escaped names, selectable text, the report's content and size limits.</summary>
public class SheetOutputTests
{
    [Fact]
    public void Output_is_byte_identical_across_runs()
    {
        var first = Render(SheetFixtures.DipOnStrips());
        var second = Render(SheetFixtures.DipOnStrips());
        Assert.Equal(first.Select(f => f.Name), second.Select(f => f.Name));
        for (var i = 0; i < first.Count; i++) Assert.True(first[i].Bytes.AsSpan().SequenceEqual(second[i].Bytes), $"{first[i].Name} differs between runs");
    }

    [Fact]
    public void The_date_comes_from_the_options_and_into_the_pdf_information()
    {
        var book = SheetBook.Build(SheetFixtures.TinyBuffer(), SheetFixtures.Options() with { Date = new DateOnly(2024, 12, 31) }, null, []);
        using var pdf = PdfDocument.Open(PdfWriter.Write(book.Sheets.Select(s => s.Page).ToList(), book.Title, book.Date));
        Assert.Contains("2024-12-31", pdf.GetPage(1).Text);
        Assert.StartsWith("D:20241231", pdf.Information.CreationDate);
    }

    [Fact]
    public void Names_with_xml_characters_stay_well_formed_and_readable()
    {
        var project = SheetFixtures.DipOnStrips(name: "<in&out> \"amp\" \u0001");
        var book = SheetBook.Build(project, SheetFixtures.Options(), null, []);
        foreach (var sheet in book.Sheets)
        {
            var svg = SvgWriter.Write(sheet.Page);
            var doc = XDocument.Parse(svg); // throws if the escaping failed
            var texts = doc.Descendants().Where(e => e.Name.LocalName == "text").Select(e => e.Value).ToList();
            Assert.Contains(texts, t => t.StartsWith("<in&out> \"amp\"", StringComparison.Ordinal));
        }
        var assembly = XDocument.Parse(SvgWriter.Write(book.Sheets.First(s => s.Kind == SheetKind.Assembly).Page));
        Assert.Contains(assembly.Descendants().Where(e => e.Name.LocalName == "text"), e => e.Value == "dual op-amp <8-pin>");
        using var pdf = PdfDocument.Open(PdfWriter.Write(book.Sheets.Select(s => s.Page).ToList(), book.Title, book.Date));
        Assert.Contains("<in&out>", pdf.GetPage(1).Text);
    }

    [Fact]
    public void Pdf_text_is_selectable_and_the_file_stays_under_1_mb()
    {
        var files = Render(SheetFixtures.DipOnStrips(300, 250), SheetFormats.Pdf);
        var bytes = files.Single().Bytes;
        Assert.True(bytes.Length < 1_000_000, $"sheets.pdf is {bytes.Length} bytes");
        using var pdf = PdfDocument.Open(bytes);
        Assert.True(pdf.NumberOfPages >= 5);
        var words = pdf.GetPage(1).GetWords().Select(w => w.Text).ToList();
        Assert.Contains("S1", words);
        Assert.Contains("P1", words);
    }

    [Fact]
    public void Report_pages_carry_the_check_summary_findings_and_tables_flowing_over_pages()
    {
        var check = new CheckReport(
            ValueList.Of(
                new Finding("pad-gap", Severity.Error, "P1 and S1a are 0.4 mm apart", "move P1 left by 0.6 mm", new Point(12, 20), ValueList.Of("P1", "S1a")),
                new Finding("lead-reach", Severity.Warning, "R1 lead 2 reaches 16 mm", "move R1 closer", null, ValueList.Of("R1"))),
            ValueList.Of("P1: about 0.51 pF to ground"));
        var rows = Enumerable.Range(1, 120).Select(i => new[] { $"Pad P{i}", "3.97 mm disc", "1" });
        var tables = new[] { ReportTable.Create("Cut list", ["Item", "Size", "Qty"], rows, ["Punch discs from 0.8 mm stock."]), ReportTable.Create("Test plan", ["From", "To", "Expect"], [["P1", "S1c", "continuity"]]) };
        var book = SheetBook.Build(SheetFixtures.DipOnStrips(), SheetFixtures.Options(), check, tables);
        var reports = book.Sheets.Where(s => s.Kind == SheetKind.Report).ToList();
        Assert.True(reports.Count >= 2, "120 rows do not fit one page");
        var text = string.Join("\n", reports.SelectMany(s => Texts(s.Page)));
        Assert.Contains("1 error(s), 1 warning(s)", text);
        Assert.Contains("P1 and S1a are 0.4 mm apart", text);
        Assert.Contains("P1: about 0.51 pF to ground", text);
        Assert.Contains("Cut list (continued)", text);
        Assert.Contains("Pad P120", text);
        Assert.Contains("Punch discs from 0.8 mm stock.", text);
        Assert.Contains("Test plan", text);
        // every page is numbered "n of m" in its title block
        for (var i = 0; i < book.Sheets.Count; i++) Assert.Contains($"{i + 1} of {book.Sheets.Count}", Texts(book.Sheets[i].Page));
    }

    [Theory]
    // DOMAIN §7 cautions; 50 V is where this project starts to call a net high voltage (common practice, no source)
    [InlineData(12, false)]
    [InlineData(50, false)]
    [InlineData(300, true)]
    public void High_voltage_caution_appears_only_above_50_volts(double volts, bool expected)
    {
        var book = SheetBook.Build(SheetFixtures.DipOnStrips(supplyVolts: volts), SheetFixtures.Options(), null, []);
        var report = string.Join(" ", book.Sheets.Where(s => s.Kind == SheetKind.Report).SelectMany(s => Texts(s.Page)));
        var template = string.Join(" ", Texts(book.Sheets[0].Page));
        Assert.Equal(expected, report.Contains("HIGH VOLTAGE", StringComparison.Ordinal));
        Assert.Equal(expected, template.Contains("high voltage", StringComparison.Ordinal));
        Assert.Contains("glass-fibre dust", template);
        Assert.Contains("glass-fibre dust", report);
    }

    [Fact]
    public void Net_colours_differ_in_grey_and_each_net_has_its_own_colour_and_dash()
    {
        // Rec. 709 luma (ITU-R BT.709) as a greyscale printer would reduce the colours
        var lumas = NetPalette.Colours.Select(c => c.Luma).Order().ToList();
        Assert.All(lumas, l => Assert.InRange(l, 0.15, 0.6)); // dark enough for text on white
        var palette = new NetPalette(SheetFixtures.DipOnStrips());
        var styles = palette.Nets.Select(n => (palette.InkOf(n), string.Join(",", palette.StrokeOf(n, 0.5).Dash))).ToList();
        Assert.Equal(styles.Count, styles.Distinct().Count());
        Assert.Equal(Ink.Black, palette.InkOf("GND"));
    }

    [Fact]
    public void A_project_without_layout_cannot_be_printed()
    {
        var project = SheetFixtures.TinyBuffer() with { Layout = null };
        Assert.Contains("padplan place", SheetBook.Problem(project));
        Assert.Throws<ArgumentException>(() => SheetBook.Build(project, SheetFixtures.Options(), null, []));
    }

    private static IReadOnlyList<SheetFile> Render(Project project, SheetFormats formats = SheetFormats.All) =>
        SheetFiles.Render(SheetBook.Build(project, SheetFixtures.Options(), null, []), formats, 50);

    private static IEnumerable<string> Texts(DrawingPage page) =>
        page.Shapes.SelectMany(s => s is ClipGroup g ? (IEnumerable<Shape>)g.Shapes : [s]).OfType<TextShape>().Select(t => t.Text);
}
