using PadPlan.Import;
using PadPlan.Model;

namespace PadPlan.Tests.Planning;

/// <summary>The example circuits as the placer sees them: a netlist imported with its parts map, or a project file without its layout.</summary>
public static class ExampleProjects
{
    public static Project Unplaced(string example)
    {
        var dir = Path.Combine(TestPaths.Examples, example);
        var project = Directory.GetFiles(dir, "*.padplan.json").FirstOrDefault();
        if (project is not null) return PadPlan.ProjectFiles.ProjectFile.Read(project) with { Layout = null };
        var netlist = Directory.GetFiles(dir).Where(f => f.EndsWith(".ppn", StringComparison.Ordinal) || f.EndsWith(".cir", StringComparison.Ordinal)).Order(StringComparer.Ordinal).First();
        var library = FootprintLibrary.Load();
        var partsFile = Path.Combine(dir, "parts.json");
        return NetlistImporter.ImportFile(netlist, new ImportOptions(library, File.Exists(partsFile) ? PartsMap.Read(partsFile, library) : null)).Project;
    }

    public static IEnumerable<string> Names() =>
        Directory.GetDirectories(TestPaths.Examples).Select(Path.GetFileName).Order(StringComparer.Ordinal)!;
}
