using System.Text;
using PadPlan.Import;

namespace PadPlan.Tests.Import;

/// <summary>The bundled library, loaded once, and short ways to import netlist text in tests.</summary>
public static class ImportFixture
{
    public static FootprintLibrary Library { get; } = FootprintLibrary.Load();

    public static string DataDir => Path.Combine(TestPaths.RepoRoot, "tests", "PadPlan.Tests", "Import", "Data");

    public static string Data(string name) => Path.Combine(DataDir, name);

    public static ImportResult Import(string text, string file = "test.cir", string? partsMapJson = null)
    {
        var map = partsMapJson is null ? null : PartsMap.Parse(Encoding.UTF8.GetBytes(partsMapJson), "parts.json", Library);
        return NetlistImporter.Import(Encoding.UTF8.GetBytes(text), file, new ImportOptions(Library, map));
    }

    public static ImportResult ImportData(string name) =>
        NetlistImporter.ImportFile(Data(name), new ImportOptions(Library));
}
