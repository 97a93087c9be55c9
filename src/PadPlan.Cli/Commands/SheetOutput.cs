using PadPlan.IO;
using PadPlan.Output.Sheets;

namespace PadPlan.Cli.Commands;

/// <summary>Writes a sheet book's files into a folder, each atomically, and lists them on standard output.</summary>
public static class SheetOutput
{
    public static IReadOnlyList<string> Write(CommandContext context, SheetBook book, string dir, SheetFormats formats, double dpi, bool list = true)
    {
        Directory.CreateDirectory(dir);
        var written = new List<string>();
        foreach (var sheetFile in SheetFiles.Render(book, formats, dpi))
        {
            var path = Path.Combine(dir, sheetFile.Name);
            AtomicFile.WriteAllBytes(path, sheetFile.Bytes);
            written.Add(path);
            if (list) context.Out.WriteLine(path);
        }
        return written;
    }
}
