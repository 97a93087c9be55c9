using PadPlan.IO;
using PadPlan.Model;
using PadPlan.ProjectFiles;
using PadPlan.ProjectFiles.Limits;

namespace PadPlan.Import;

/// <summary>A builder's overrides for an import: footprints by reference or by value/model, and net facts. Names match without regard to case.</summary>
public sealed class PartsMap
{
    public const string FormatTag = "padplan-parts/1";

    private readonly Dictionary<string, PartsMapEntry> _byRef;
    private readonly Dictionary<string, PartsMapEntry> _byValue;

    private PartsMap(string file, IEnumerable<PartsMapEntry> byRef, IEnumerable<PartsMapEntry> byValue, IReadOnlyList<(NetFacts Facts, int? Line)> nets)
    {
        File = file;
        _byRef = byRef.ToDictionary(e => e.Key, StringComparer.OrdinalIgnoreCase);
        _byValue = byValue.ToDictionary(e => e.Key, StringComparer.OrdinalIgnoreCase);
        Nets = nets;
    }

    public static PartsMap Empty { get; } = new("", [], [], []);

    public string File { get; }
    public IReadOnlyList<(NetFacts Facts, int? Line)> Nets { get; }

    /// <summary>The entry for a part: by its reference first, then its value, then its model.</summary>
    public PartsMapEntry? For(string reference, string? value, string? model) =>
        _byRef.GetValueOrDefault(reference)
        ?? (value is null ? null : _byValue.GetValueOrDefault(value))
        ?? (model is null ? null : _byValue.GetValueOrDefault(model));

    public static PartsMap Read(string path, FootprintLibrary library)
    {
        var bytes = InputFile.ReadAllBytes(path, InputLimits.MaxFileBytes, "parts map");
        return Parse(bytes, path, library);
    }

    public static PartsMap Parse(byte[] bytes, string file, FootprintLibrary library)
    {
        bytes = TextEncodingCheck.Utf8(bytes, file);
        var dto = JsonInput.Deserialize(bytes, ImportJsonContext.Default.PartsMapDto, InputLimits.PartsMap, file, "a parts map", d => d.Format);
        var reader = new DtoReader(file, bytes);
        if (dto.Format != FormatTag)
            throw reader.Fail("$.format", $"a parts map starts with \"format\": \"{FormatTag}\" (found {JsonInput.Describe(dto.Format)}).");
        PartsMapEntry Entry(string key, PartsMapEntryDto e, string path)
        {
            if (e.Footprint is not null && library.Find(e.Footprint) is null)
                throw reader.Fail($"{path}.footprint", library.UnknownMessage(e.Footprint));
            var sections = (e.Sections ?? []).ToDictionary(s => s.Key, s => (IReadOnlyDictionary<string, string>)s.Value, StringComparer.OrdinalIgnoreCase);
            return new PartsMapEntry(key, e.Footprint, e.Variant, e.Pins ?? [], sections, e.Value, JsonLineLocator.LineOf(bytes, path));
        }
        List<PartsMapEntry> Entries(Dictionary<string, PartsMapEntryDto>? entries, string group)
        {
            var twice = (entries ?? []).Keys.GroupBy(k => k, StringComparer.OrdinalIgnoreCase).FirstOrDefault(g => g.Count() > 1);
            if (twice is not null) throw reader.Fail($"$.{group}.{twice.Last()}", $"\"{twice.Key}\" is listed twice under \"{group}\" (names match without regard to case).");
            return (entries ?? []).Select(kv => Entry(kv.Key, kv.Value, $"$.{group}.{kv.Key}")).ToList();
        }
        var byRef = Entries(dto.Parts, "parts");
        var byValue = Entries(dto.Values, "values");
        var nets = (dto.Nets ?? []).Select(kv =>
        {
            var path = $"$.nets.{kv.Key}";
            var net = reader.Net(new NetDto
            {
                Name = kv.Key, Ground = kv.Value.Ground, Class = kv.Value.Class, Voltage = kv.Value.Voltage, VoltageEstimated = kv.Value.VoltageEstimated,
                Current = kv.Value.Current, MaxLead = kv.Value.MaxLead, Role = kv.Value.Role, OpenEnded = kv.Value.OpenEnded,
            }, path);
            var facts = new NetFacts(net.Name, kv.Value.Ground, kv.Value.Class is null ? null : net.Class, net.Voltage, net.VoltageEstimated, net.Current, net.MaxLead, kv.Value.Role is null ? null : net.Role, OpenEnded: net.OpenEnded);
            return (facts, JsonLineLocator.LineOf(bytes, path));
        }).ToList();
        return new PartsMap(file, byRef, byValue, nets);
    }
}
