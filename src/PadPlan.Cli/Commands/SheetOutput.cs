using PadPlan.IO;
using PadPlan.Output.CheckReports;
using PadPlan.Output.Drawing;
using PadPlan.Output.Sheets;
using PadPlan.ProjectFiles;

namespace PadPlan.Cli.Commands;

/// <summary>Writes a folder of output files (a sheet book's, the demo's) as one set: all replaced together, or none; and never a file of the builder's.</summary>
public static class SheetOutput
{
    /// <summary>What the builder may do instead when a file in the folder is refused.</summary>
    private const string Instead = "another folder (padplan replaces the files in it as one set)";

    public static IReadOnlyList<string> Write(CommandContext context, SheetBook book, string dir, SheetFormats formats, double dpi, bool force, bool list = true)
    {
        using var set = OutputSet.Begin(dir, force);
        Add(set, book, formats, dpi);
        var written = Commit(set, force);
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

    /// <summary>
    /// Puts the set in place once every file it would replace or remove is known to be PadPlan's own, unchanged output
    /// (<see cref="Recognise"/>), or with <paramref name="force"/>; else exit 2 naming the first such file, nothing written.
    /// </summary>
    public static IReadOnlyList<string> Commit(OutputSet set, bool force)
    {
        foreach (var name in set.Replaced())
        {
            var (kind, isOwn, headBytes) = Recognise(name, Path.Combine(set.Staging, name));
            OutputGuard.EnsureReplaceable(new FileInfo(Path.Combine(set.Dir, name)), force, kind, isOwn, Instead, headBytes);
        }
        return set.Commit();
    }

    /// <summary>
    /// How a file already in the folder is known as PadPlan's, by its name and, when this run writes that name again
    /// (<paramref name="staged"/>), by the new file: sheets by the mark each format carries, the check report by its
    /// format tag, a table by its first line (the same table), the project only when it is byte for byte the one written
    /// now (a changed plan is the builder's work). A project or table this run does not write again cannot be told from
    /// the builder's, so it is kept.
    /// </summary>
    private static (string Kind, Func<byte[], bool> IsOwn, int HeadBytes) Recognise(string name, string staged)
    {
        const int head = OutputGuard.HeadBytes;
        var fresh = File.Exists(staged) ? File.ReadAllBytes : (Func<string, byte[]>?)null;
        if (name.EndsWith(ProjectFile.Extension, StringComparison.Ordinal))
        {
            if (fresh is null) return NotWrittenAgain;
            var project = fresh(staged);
            return ("the project this run writes, unchanged", h => h.AsSpan().SequenceEqual(project), project.Length + 1);
        }
        switch (Path.GetExtension(name))
        {
            case ".svg": return ("a sheet that padplan wrote (marked as its own)", h => SvgWriter.IsOwn(h), head);
            case ".pdf": return ("a PDF that padplan wrote (named as its producer)", h => PdfWriter.IsOwn(h), head);
            case ".png": return ("a preview that padplan wrote (marked as its own)", PngSoftware.IsOwn, head);
            case ".json": return ("a check report that padplan wrote", h => CheckReportJson.IsOwn(h), head);
        }
        if (fresh is null) return NotWrittenAgain;
        var firstLine = TableOutput.HeaderRow(fresh(staged));
        return ("the same table that padplan wrote", h => TableOutput.HeaderRow(h).SequenceEqual(firstLine), head);
    }

    private static readonly (string, Func<byte[], bool>, int) NotWrittenAgain = ("a file this run writes again", _ => false, OutputGuard.HeadBytes);
}
