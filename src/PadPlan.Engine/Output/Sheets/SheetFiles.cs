using PadPlan.Output.Drawing;

namespace PadPlan.Output.Sheets;

/// <summary>Renders a sheet book to files: sheets.pdf with all pages, and template-1.svg / .png and so on, one per page.</summary>
public static class SheetFiles
{
    public const string PdfName = "sheets.pdf";

    public static IReadOnlyList<SheetFile> Render(SheetBook book, SheetFormats formats, double dpi)
    {
        var files = new List<SheetFile>();
        if (formats.HasFlag(SheetFormats.Pdf))
            files.Add(new SheetFile(PdfName, PdfWriter.Write(book.Sheets.Select(s => s.Page).ToList(), book.Title, book.Date)));
        foreach (var sheet in book.Sheets)
        {
            if (formats.HasFlag(SheetFormats.Svg)) files.Add(new SheetFile(sheet.FileStem + ".svg", SvgWriter.WriteBytes(sheet.Page)));
            if (formats.HasFlag(SheetFormats.Png)) files.Add(new SheetFile(sheet.FileStem + ".png", PngWriter.Write(sheet.Page, dpi)));
        }
        return files;
    }
}
