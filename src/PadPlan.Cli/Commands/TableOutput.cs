using PadPlan.IO;
using PadPlan.Model;
using PadPlan.Output.Tables;
using PadPlan.ProjectFiles;
using PadPlan.Rules;
using PadPlan.Simulation;

namespace PadPlan.Cli.Commands;

/// <summary>Shared steps of the table commands (cutlist, bom, testplan): read a project, print tables, write CSV files.</summary>
public static class TableOutput
{
    /// <summary>Reads a project that must already hold a layout.</summary>
    public static Project ReadPlaced(FileInfo file)
    {
        var project = ProjectFile.Read(file.FullName);
        if (project.Layout is null || project.Layout.Pads.Count == 0)
            throw new InputException(file.FullName, "the project has no layout (no pads) yet. Run 'padplan place' on it first, or add a layout by hand.");
        return project;
    }

    /// <summary>
    /// Says on stderr when the plan fails its check, so that a cut list, build order or test sheet of a plan that is not
    /// ready cannot pass for a sound one (as every sheet page is marked NOT READY). The check is the full one, at the
    /// operating point when ngspice is found (the simulation given, else ngspice from the environment or PATH).
    /// </summary>
    public static void WarnIfNotReady(CommandContext context, FileInfo file, Project project, SimulationResult? simulation = null)
    {
        var errors = Checker.Check(project, new CheckOptions(Simulation: simulation ?? Simulator.Run(project))).Errors;
        if (errors > 0) context.Err.WriteLine(NotReadyWarning(errors, file.Name, pagesMarked: false));
    }

    /// <summary>The one wording of the stop on the terminal, for the tables and (with every page marked) for the sheets.</summary>
    public static string NotReadyWarning(int errors, string fileName, bool pagesMarked)
    {
        var them = errors == 1 ? "it" : "them";
        return $"warning: NOT READY: the plan fails its check with {errors} error{(errors == 1 ? "" : "s")}{(pagesMarked ? ", and every page is marked so" : "")}; " +
               $"'padplan check {fileName}' lists {them}. Fix {them} before cutting board.";
    }

    /// <summary>Prints the tables as text to standard output, a blank line between them, fitted to `width` characters when given.</summary>
    public static void Print(CommandContext context, IEnumerable<ReportTable> tables, int? width) =>
        context.Out.Write(string.Join("\n", tables.Select(t => TableText.ToText(t, width))));

    /// <summary>
    /// Writes each table as CSV: the first to the file named, the others beside it with the table's name added
    /// ("bom.csv", "bom-build-order.csv"), so each file is one plain table a spreadsheet opens. The files are written as
    /// one set: all of them, or (on a failure) none. A file that exists is replaced only when it is padplan's CSV of the
    /// same table (its header row is the table's), or with <paramref name="force"/>.
    /// </summary>
    public static void WriteCsv(CommandContext context, FileInfo file, IReadOnlyList<(string Suffix, ReportTable Table)> tables, bool force)
    {
        var dir = file.DirectoryName ?? ".";
        var stem = Path.GetFileNameWithoutExtension(file.Name);
        var ext = file.Extension.Length > 0 ? file.Extension : ".csv";
        var files = tables.Select((t, i) => (Path: i == 0 ? file.FullName : Path.Combine(dir, $"{stem}-{t.Suffix}{ext}"), Bytes: new System.Text.UTF8Encoding(false).GetBytes(TableText.ToCsv(t.Table)))).ToList();
        foreach (var (path, bytes) in files)
        {
            var header = HeaderRow(bytes);
            OutputGuard.EnsureReplaceable(new FileInfo(path), force, "a table that padplan wrote", head => HeaderRow(head).SequenceEqual(header));
        }
        AtomicFile.WriteAll(files);
        foreach (var (path, _) in files) context.Err.WriteLine($"wrote {path}");
    }

    /// <summary>The first line of a table's bytes (a CSV file's header row, a text table's title), without its line end.</summary>
    internal static byte[] HeaderRow(byte[] bytes)
    {
        var end = Array.IndexOf(bytes, (byte)'\n');
        return end < 0 ? bytes : bytes[..end];
    }
}
