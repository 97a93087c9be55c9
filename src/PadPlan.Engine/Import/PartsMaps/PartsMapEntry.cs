namespace PadPlan.Import;

/// <summary>One parts-map override: the footprint, pin order and pin mapping for a reference, value or model.</summary>
/// <param name="Key">The reference, value or model it applies to.</param>
/// <param name="Pins">Symbol pin to footprint pin; empty to keep the usual mapping.</param>
/// <param name="Sections">Section letter to that section's pin mapping, for multi-section packages.</param>
/// <param name="Value">BOM text to use instead of the netlist's, when given.</param>
/// <param name="Line">Line of the entry in the parts-map file.</param>
/// <param name="Rating">The part's own rating, which overrides the footprint's typical one; null when the entry gives none.</param>
public sealed record PartsMapEntry(
    string Key,
    string? Footprint,
    string? Variant,
    IReadOnlyDictionary<string, string> Pins,
    IReadOnlyDictionary<string, IReadOnlyDictionary<string, string>> Sections,
    string? Value,
    int? Line,
    PadPlan.Model.Rating? Rating = null);
