using System.Text.Json.Serialization;
using PadPlan.ProjectFiles;

namespace PadPlan.Import;

/// <summary>The on-disk shape of a parts map (format "padplan-parts/1"): footprints per reference, per value or model, and facts per net.</summary>
public sealed class PartsMapDto
{
    public string? Format { get; set; }
    /// <summary>By part reference ("Q1", or "U2" for all sections of U2).</summary>
    public Dictionary<string, PartsMapEntryDto>? Parts { get; set; }
    /// <summary>By value text ("100u") or SPICE model / subcircuit name ("OPAMP2").</summary>
    public Dictionary<string, PartsMapEntryDto>? Values { get; set; }
    /// <summary>By net name: class, voltage, current, longest lead, role, ground.</summary>
    public Dictionary<string, NetDto>? Nets { get; set; }
}

public sealed class PartsMapEntryDto
{
    public string? Footprint { get; set; }
    public string? Variant { get; set; }
    /// <summary>Symbol pin (or subcircuit pin name, or call position "1", "2"...) to footprint pin.</summary>
    public Dictionary<string, string>? Pins { get; set; }
    /// <summary>Per section letter ("A", "B"): symbol pin to footprint pin.</summary>
    public Dictionary<string, Dictionary<string, string>>? Sections { get; set; }
    public string? Value { get; set; }
    /// <summary>The part's own rating, over the footprint's typical one: largest DC voltage (V), power (W), forward current (A).</summary>
    public double? RatedVoltage { get; set; }
    public double? RatedPower { get; set; }
    public double? RatedCurrent { get; set; }
}

/// <summary>Source-generated JSON metadata for the import's own files.</summary>
[JsonSourceGenerationOptions(
    PropertyNamingPolicy = JsonKnownNamingPolicy.CamelCase,
    ReadCommentHandling = System.Text.Json.JsonCommentHandling.Skip,
    AllowTrailingCommas = true,
    UnmappedMemberHandling = JsonUnmappedMemberHandling.Disallow)]
[JsonSerializable(typeof(PartsMapDto))]
public sealed partial class ImportJsonContext : JsonSerializerContext;
