using PadPlan.Import;

namespace PadPlan.Tests.Import;

/// <summary>The corpus of small SPICE decks in Import/Corpus, each written to exercise one construct.</summary>
public static class SpiceCorpus
{
    public static string Dir => Path.Combine(TestPaths.RepoRoot, "tests", "PadPlan.Tests", "Import", "Corpus");

    public static string PathOf(string name) => Path.Combine(Dir, name + ".cir");

    public static ImportResult Import(string name) => NetlistImporter.ImportFile(PathOf(name), new ImportOptions(ImportFixture.Library));

    /// <summary>Decks whose board is the whole circuit (nothing left off, no floating source), so layout and deck must simulate alike.</summary>
    public static IEnumerable<string> Buildable => Directory.GetFiles(Dir, "*.cir").Select(Path.GetFileNameWithoutExtension).OfType<string>()
        .Where(n => n is not ("dev-behavioural" or "param-unevaluable" or "src-loop-probe")).Order(StringComparer.Ordinal);
}
