using PadPlan.IO;
using PadPlan.Output.Sheets;

namespace PadPlan.Cli.Commands;

/// <summary>Writes a sheet book's files into a folder as one set (all replaced together, or none), and lists them on standard output.</summary>
public static class SheetOutput
{
    public static IReadOnlyList<string> Write(CommandContext context, SheetBook book, string dir, SheetFormats formats, double dpi, bool list = true)
    {
        using var set = OutputSet.Begin(dir);
        Add(set, book, formats, dpi);
        var written = set.Commit();
        if (list)
            foreach (var path in written) context.Out.WriteLine(path);
        return written;
    }

    /// <summary>Renders the book into a set being built; nothing reaches the target folder until the set is committed.</summary>
    public static int Add(OutputSet set, SheetBook book, SheetFormats formats, double dpi)
    {
        var count = 0;
        foreach (var sheetFile in SheetFiles.Render(book, formats, dpi))
        {
            set.Add(sheetFile.Name, sheetFile.Bytes);
            count++;
        }
        return count;
    }
}
