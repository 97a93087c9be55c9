using PadPlan.Import;
using PadPlan.Model;

namespace PadPlan.Bench;

/// <summary>Imports every example netlist (with its parts map, when it has one) as a benchmark case.</summary>
internal static class ExampleNetlists
{
    public static IEnumerable<(string Name, Project Project)> ImportAll(string examples)
    {
        var library = FootprintLibrary.Load();
        foreach (var dir in Directory.GetDirectories(examples).Order(StringComparer.Ordinal))
        {
            var netlist = Directory.GetFiles(dir).Where(f => f.EndsWith(".ppn", StringComparison.Ordinal) || f.EndsWith(".cir", StringComparison.Ordinal)).Order(StringComparer.Ordinal).FirstOrDefault();
            if (netlist is null) continue;
            var partsFile = Path.Combine(dir, "parts.json");
            var map = File.Exists(partsFile) ? PartsMap.Read(partsFile, library) : null;
            yield return ($"example {Path.GetFileName(dir)}", NetlistImporter.ImportFile(netlist, new ImportOptions(library, map)).Project);
        }
    }
}
