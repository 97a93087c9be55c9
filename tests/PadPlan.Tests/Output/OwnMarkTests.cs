using System.Diagnostics;
using System.Xml.Linq;
using PadPlan.Output.Drawing;
using PadPlan.Output.Sheets;
using PadPlan.Tests.Cli;
using Xunit;

namespace PadPlan.Tests.Output;

/// <summary>
/// Sheet files say in their first bytes that PadPlan wrote them, so a later run replaces its own and leaves a builder's
/// file alone (Cli/OutputOverwriteTests). The PNG mark is tested with the pHYs chunk in PngResolutionTests.
/// </summary>
public class OwnMarkTests
{
    private static readonly SheetBook Book = SheetBook.Build(SheetFixtures.TinyBuffer(), SheetFixtures.Options(), null, []);

    [Fact]
    public void An_svg_sheet_starts_with_its_mark_as_an_xml_comment()
    {
        var svg = SvgWriter.WriteBytes(Book.Sheets[0].Page);
        Assert.True(SvgWriter.IsOwn(svg.AsSpan(0, 4096)));
        // an XML reader sees the mark as a comment before the root element (XML 1.0, 2.5 Comments), so it draws nothing
        var document = XDocument.Parse(System.Text.Encoding.UTF8.GetString(svg));
        Assert.Equal(" a PadPlan sheet ", Assert.IsType<XComment>(document.FirstNode).Value);
        Assert.Equal("svg", document.Root!.Name.LocalName);

        Assert.False(SvgWriter.IsOwn("<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n<svg xmlns=\"http://www.w3.org/2000/svg\"/>\n"u8));
        // a sheet from before the mark (the same text without it) is not recognised either: refused once, then replaced with --force
        var unmarked = System.Text.Encoding.UTF8.GetString(svg).Replace("<!-- a PadPlan sheet -->\n", "", StringComparison.Ordinal);
        Assert.False(SvgWriter.IsOwn(System.Text.Encoding.UTF8.GetBytes(unmarked)));
    }

    [ProgramOnPathFact("pdfinfo", "poppler-utils")]
    public void A_pdf_names_padplan_as_producer_and_creator_for_an_outside_reader_and_in_its_first_bytes()
    {
        var pdf = PdfWriter.Write(Book.Sheets.Select(s => s.Page).ToList(), Book.Title, Book.Date);
        Assert.True(PdfWriter.IsOwn(pdf.AsSpan(0, 4096)));
        Assert.Equal(pdf, PdfWriter.Write(Book.Sheets.Select(s => s.Page).ToList(), Book.Title, Book.Date));

        // poppler's pdfinfo reads the document information dictionary (ISO 32000-1:2008, 14.3.3, Producer and Creator keys)
        var file = Path.Combine(TestPaths.NewTempDir(), "sheets.pdf");
        File.WriteAllBytes(file, pdf);
        var start = new ProcessStartInfo("pdfinfo", [file]) { RedirectStandardOutput = true, RedirectStandardError = true };
        using var process = Process.Start(start)!;
        var info = process.StandardOutput.ReadToEnd();
        process.WaitForExit();
        Assert.Equal(0, process.ExitCode);
        Assert.Matches(@"(?m)^Producer:\s+PadPlan$", info);
        Assert.Matches(@"(?m)^Creator:\s+PadPlan$", info);
    }

    [Fact]
    public void A_pdf_from_another_producer_is_not_padplans()
    {
        using var stream = new MemoryStream();
        using (var document = SkiaSharp.SKDocument.CreatePdf(stream, new SkiaSharp.SKDocumentPdfMetadata { Producer = "Another program", Creator = "PadPlan" }))
        {
            document.BeginPage(100, 100);
            document.EndPage();
            document.Close();
        }
        Assert.False(PdfWriter.IsOwn(stream.ToArray()));
        Assert.False(PdfWriter.IsOwn("notes\n/Producer (PadPlan)\n"u8));
    }
}
