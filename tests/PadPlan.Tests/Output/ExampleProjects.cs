using System.Collections.Concurrent;
using PadPlan.Import;
using PadPlan.Model;
using PadPlan.Planning;
using PadPlan.ProjectFiles;

namespace PadPlan.Tests.Output;

/// <summary>The bundled examples imported and placed the way `padplan demo` does it (seed 1, quick effort), once per test run.</summary>
public static class ExampleProjects
{
    private static readonly ConcurrentDictionary<string, Project> Cache = new();

    public static Project Placed(string name) => Cache.GetOrAdd(name, Place);

    private static Project Place(string name)
    {
        if (name == "tiny-buffer") return ProjectFile.Read(TestPaths.TinyBuffer);
        var folder = Path.Combine(TestPaths.Examples, name);
        var netlist = Directory.EnumerateFiles(folder).Where(f => f.EndsWith(".ppn", StringComparison.Ordinal) || f.EndsWith(".cir", StringComparison.Ordinal)).Order(StringComparer.Ordinal).First();
        var library = FootprintLibrary.Load();
        var partsFile = Path.Combine(folder, "parts.json");
        var map = File.Exists(partsFile) ? PartsMap.Read(partsFile, library) : null;
        var imported = NetlistImporter.ImportFile(netlist, new ImportOptions(library, map, null, null));
        var placed = Placer.Place(imported.Project, new PlacerSettings(Effort: Effort.Quick));
        return placed.Project ?? throw new InvalidOperationException($"example {name} did not place: {placed.Failure?.Message}");
    }
}
