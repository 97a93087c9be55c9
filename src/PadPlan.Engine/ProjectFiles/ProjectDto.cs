using System.Text.Json.Serialization;

namespace PadPlan.ProjectFiles;

// The on-disk shape of a project file. Kept apart from the model so that the file format can stay
// stable while the model evolves, and so that every value can be checked with its JSON path.
// Every property is nullable: the mapper reports what is missing, with its path.

/// <summary>Root of a project file (format "padplan-project/1").</summary>
public sealed class ProjectDto
{
    public string? Format { get; set; }
    public string? Name { get; set; }
    public string? Description { get; set; }
    public BoardDto? Board { get; set; }
    public ToolkitDto? Toolkit { get; set; }
    public RulesDto? Rules { get; set; }
    public List<string>? FootprintDirs { get; set; }
    public List<NetDto>? Nets { get; set; }
    public List<PartDto>? Parts { get; set; }
    public List<FootprintDto>? Footprints { get; set; }
    public LayoutDto? Layout { get; set; }
    public ImportRecordDto? Imported { get; set; }
}

public sealed class BoardDto
{
    /// <summary>Width in mm; leave out width and height for an automatic size.</summary>
    public double? Width { get; set; }
    public double? Height { get; set; }
    public double? CornerRadius { get; set; }
    public double? Margin { get; set; }
    public double? Thickness { get; set; }
    public List<ShapeDto>? Keepouts { get; set; }
}

/// <summary>A round or rectangular shape by its centre: keep-outs, and (with net and id) pads.</summary>
public sealed class ShapeDto
{
    public string? Id { get; set; }
    public string? Shape { get; set; }
    public double? X { get; set; }
    public double? Y { get; set; }
    public double? D { get; set; }
    public double? W { get; set; }
    public double? H { get; set; }
}

public sealed class ToolkitDto
{
    public List<double>? Punches { get; set; }
    public double? StockThickness { get; set; }
    public double? Permittivity { get; set; }
    public List<double>? StripWidths { get; set; }
    public List<LeadCapacityDto>? LeadCapacity { get; set; }
    public double? LeadSpacing { get; set; }
    public double? StripPitch { get; set; }
    public double? ScoreWidth { get; set; }
}

public sealed class LeadCapacityDto
{
    public double? PadSize { get; set; }
    public int? Leads { get; set; }
}

public sealed class RulesDto
{
    public double? PadGap { get; set; }
    public double? GroundGap { get; set; }
    public double? LeadGap { get; set; }
    public double? MaxLeadRf { get; set; }
    public double? MaxLeadAudio { get; set; }
    public double? MaxLeadGeneral { get; set; }
    public double? MaxLeadPower { get; set; }
    public double? MaxLeadHv { get; set; }
    public bool? AllowJumpers { get; set; }
    public double? TempRise { get; set; }
    public double? CopperThickness { get; set; }
}

public sealed class NetDto
{
    public string? Name { get; set; }
    public bool? Ground { get; set; }
    public string? Class { get; set; }
    public double? Voltage { get; set; }
    public bool? VoltageEstimated { get; set; }
    public double? Current { get; set; }
    public double? MaxLead { get; set; }
    public string? Role { get; set; }
    public bool? OpenEnded { get; set; }
}

public sealed class PartDto
{
    public string? Ref { get; set; }
    public string? Value { get; set; }
    public string? Footprint { get; set; }
    public string? Variant { get; set; }
    /// <summary>Symbol pin name to net name, in pin order.</summary>
    public Dictionary<string, string>? Pins { get; set; }
    public bool? Locked { get; set; }
    public bool? FootprintAssumed { get; set; }
    /// <summary>The part's own rating, over its footprint's typical one.</summary>
    public double? RatedVoltage { get; set; }
    public double? RatedPower { get; set; }
    public double? RatedCurrent { get; set; }
}

/// <summary>A footprint, as held in a project file and in the library files under footprints/.</summary>
public sealed class FootprintDto
{
    public string? Name { get; set; }
    public string? Description { get; set; }
    /// <summary>Typical largest DC voltage across the part (V).</summary>
    public double? RatedVoltage { get; set; }
    /// <summary>Typical power the part may dissipate (W).</summary>
    public double? RatedPower { get; set; }
    /// <summary>Typical largest forward current (A).</summary>
    public double? RatedCurrent { get; set; }
    public string? Mount { get; set; }
    public double? Height { get; set; }
    /// <summary>Body shape in the 3D model: lying, cylinder, disc, box, to92, dip, toroid, can, trimmer, wires; default from the mount.</summary>
    public string? Shape { get; set; }
    /// <summary>Height above the pad tops where the leads leave the body, mm; default from the shape.</summary>
    public double? LeadBend { get; set; }
    /// <summary>Upright parts mounted like a hairpin: the lead that runs down the outside of the body.</summary>
    public string? OutsideLead { get; set; }
    public string? Source { get; set; }
    /// <summary>Plan-view outline as [x, y] points in mm, part origin at (0, 0).</summary>
    public List<double[]>? Body { get; set; }
    public List<FootprintLeadDto>? Leads { get; set; }
    public List<PinVariantDto>? Variants { get; set; }
    public List<FootprintMarkDto>? Marks { get; set; }
    /// <summary>Family, filled from the library file; optional in a project.</summary>
    public string? Family { get; set; }
}

public sealed class FootprintLeadDto
{
    public string? Name { get; set; }
    public double[]? Exit { get; set; }
    public double? Diameter { get; set; }
    public double? MinReach { get; set; }
    public double? MaxReach { get; set; }
}

/// <summary>A polarity or orientation mark at one lead: kind "band", "plus", "dot", "notch" or "winding".</summary>
public sealed class FootprintMarkDto
{
    public string? Kind { get; set; }
    public string? Lead { get; set; }
}

public sealed class PinVariantDto
{
    public string? Name { get; set; }
    public List<string>? Pins { get; set; }
}

/// <summary>A footprint library file: one family of footprints (format "padplan-footprints/1").</summary>
public sealed class FootprintFileDto
{
    public string? Format { get; set; }
    public string? Family { get; set; }
    public List<FootprintDto>? Footprints { get; set; }
}

public sealed class LayoutDto
{
    public List<PadDto>? Pads { get; set; }
    public List<PlacementDto>? Placements { get; set; }
    public List<JumperDto>? Jumpers { get; set; }
}

public sealed class PadDto
{
    public string? Id { get; set; }
    /// <summary>"round", "rect" or "strip".</summary>
    public string? Shape { get; set; }
    public string? Net { get; set; }
    /// <summary>Centre for round and rect pads; centre of the starting end for strips.</summary>
    public double? X { get; set; }
    public double? Y { get; set; }
    public double? D { get; set; }
    public double? W { get; set; }
    public double? H { get; set; }
    public double? Stock { get; set; }
    public bool? Locked { get; set; }
    public bool? Vertical { get; set; }
    public double? Score { get; set; }
    public List<SegmentDto>? Segments { get; set; }
}

public sealed class SegmentDto
{
    public string? Id { get; set; }
    public string? Net { get; set; }
    public double? Length { get; set; }
}

public sealed class PlacementDto
{
    public string? Ref { get; set; }
    public double? X { get; set; }
    public double? Y { get; set; }
    public int? Rotation { get; set; }
    public List<LandingDto>? Leads { get; set; }
}

public sealed class LandingDto
{
    public string? Pin { get; set; }
    /// <summary>Pad or segment id; null lands the lead on the ground plane.</summary>
    public string? Pad { get; set; }
    public double? X { get; set; }
    public double? Y { get; set; }
}

public sealed class JumperDto
{
    public string? Id { get; set; }
    public string? From { get; set; }
    public string? To { get; set; }
    public List<double[]>? Path { get; set; }
}

/// <summary>Source-generated JSON metadata for every file PadPlan reads and writes.</summary>
[JsonSourceGenerationOptions(
    PropertyNamingPolicy = JsonKnownNamingPolicy.CamelCase,
    WriteIndented = true,
    DefaultIgnoreCondition = JsonIgnoreCondition.WhenWritingNull,
    ReadCommentHandling = System.Text.Json.JsonCommentHandling.Skip,
    AllowTrailingCommas = true,
    UnmappedMemberHandling = JsonUnmappedMemberHandling.Disallow)]
[JsonSerializable(typeof(ProjectDto))]
[JsonSerializable(typeof(FootprintFileDto))]
public sealed partial class ProjectJsonContext : JsonSerializerContext;
