using PadPlan.IO;
using PadPlan.Model;

namespace PadPlan.Import;

/// <summary>The footprints an import may use: the bundled library plus the builder's own folders. Later folders may not redefine a name.</summary>
public sealed class FootprintLibrary
{
    private readonly Dictionary<string, Footprint> _byName;

    private FootprintLibrary(IReadOnlyList<Footprint> footprints)
    {
        Footprints = footprints;
        _byName = footprints.ToDictionary(f => f.Name, StringComparer.OrdinalIgnoreCase);
    }

    /// <summary>Every footprint, sorted by family then name.</summary>
    public IReadOnlyList<Footprint> Footprints { get; }

    public Footprint? Find(string name) => _byName.GetValueOrDefault(name);

    /// <summary>The footprint of that name, or bad input naming the place and the nearest names the library holds.</summary>
    public Footprint Require(string name, string file, int? line, string? jsonPath = null) =>
        Find(name) ?? throw new InputException(file, UnknownMessage(name), line, jsonPath: jsonPath);

    public string UnknownMessage(string name)
    {
        var near = NameDistance.Nearest(name, _byName.Keys, 3);
        var hint = near.Count == 0 ? "" : $" Did you mean {string.Join(", ", near)}?";
        return $"unknown footprint \"{name}\".{hint} Run 'padplan footprints' for the list, or add a footprint file with --footprints DIR.";
    }

    /// <summary>Loads the bundled library and then every *.json in each extra folder (in name order, so the result is repeatable).</summary>
    public static FootprintLibrary Load(IEnumerable<string>? extraDirs = null)
    {
        var bundled = BundledFolder() ?? throw new InputException("footprints", "cannot find the bundled footprint library (a folder 'footprints' beside padplan). Reinstall PadPlan.");
        var all = new List<Footprint>();
        var origin = new Dictionary<string, string>(StringComparer.OrdinalIgnoreCase);
        foreach (var dir in new[] { bundled }.Concat(extraDirs ?? []))
        {
            if (!Directory.Exists(dir)) throw new InputException(dir, "no such footprint folder.");
            foreach (var file in Directory.GetFiles(dir, "*.json").Order(StringComparer.Ordinal))
                foreach (var (footprint, path) in FootprintFileReader.Read(file))
                {
                    if (origin.TryGetValue(footprint.Name, out var first))
                        throw FootprintFileReader.Fail(file, path, $"footprint \"{footprint.Name}\" is already defined in {first}; give yours another name.");
                    origin[footprint.Name] = file;
                    all.Add(footprint);
                }
        }
        return new FootprintLibrary(all.OrderBy(f => f.Family, StringComparer.Ordinal).ThenBy(f => f.Name, NaturalOrder.Comparer).ToList());
    }

    /// <summary>The bundled footprints/ folder: beside the program, else found by walking up from it (tests and development runs).</summary>
    public static string? BundledFolder()
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null)
        {
            var candidate = Path.Combine(dir.FullName, "footprints");
            if (Directory.Exists(candidate) && Directory.GetFiles(candidate, "*.json").Length > 0) return candidate;
            dir = dir.Parent;
        }
        return null;
    }
}
