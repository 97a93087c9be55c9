namespace PadPlan.Fuzz;

/// <summary>The inputs the fuzzer starts from: the example projects and the example netlists (with their parts maps).</summary>
public static class Corpus
{
    public sealed record Seed(string Name, string Kind, byte[] Bytes, byte[]? PartsMap);

    public static string Examples { get; } = Path.Combine(AppContext.BaseDirectory, "examples");

    public static IReadOnlyList<Seed> Load()
    {
        var seeds = new List<Seed>();
        foreach (var dir in Directory.GetDirectories(Examples).Order(StringComparer.Ordinal))
        {
            var partsFile = Path.Combine(dir, "parts.json");
            var parts = File.Exists(partsFile) ? File.ReadAllBytes(partsFile) : null;
            foreach (var file in Directory.GetFiles(dir).Order(StringComparer.Ordinal))
            {
                var name = Path.GetFileName(file);
                if (name.EndsWith(".padplan.json", StringComparison.Ordinal)) seeds.Add(new(name, "project", File.ReadAllBytes(file), null));
                else if (name.EndsWith(".ppn", StringComparison.Ordinal) || name.EndsWith(".cir", StringComparison.Ordinal)) seeds.Add(new(name, "netlist", File.ReadAllBytes(file), parts));
            }
            if (parts is not null) seeds.Add(new("parts.json", "parts-map", parts, null));
        }
        return seeds;
    }
}
