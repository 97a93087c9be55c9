using System.Text.Json.Serialization;

namespace PadPlan.Output.Geometry;

// The JSON shape of a geometry export (format "padplan-geometry/1"); docs/geometry-export.md describes every field.
// All coordinates are board millimetres: origin at the top-left corner, x to the right, y down.

/// <summary>Root of a geometry export.</summary>
public sealed class GeometryDocument
{
    public string Format { get; set; } = GeometryExport.FormatTag;
    public string Units { get; set; } = "mm";
    public string Project { get; set; } = "";
    public BoardGeometry Board { get; set; } = new();
    public List<NetGeometry> Nets { get; set; } = [];
    public List<ShapeGeometry> Pads { get; set; } = [];
    public List<PartGeometry> Parts { get; set; } = [];
    public List<JumperGeometry> Jumpers { get; set; } = [];
    public RulesGeometry Rules { get; set; } = new();
}

public sealed class BoardGeometry
{
    public double Width { get; set; }
    public double Height { get; set; }
    public double CornerRadius { get; set; }
    /// <summary>Outline polygon, clockwise as seen; rounded corners as short straight pieces.</summary>
    public List<double[]> Outline { get; set; } = [];
    public double Margin { get; set; }
    public double Thickness { get; set; }
    public List<ShapeGeometry> Keepouts { get; set; } = [];
}

/// <summary>A round ({"shape": "round", x, y, d}) or axis-aligned rectangular ({"shape": "rect", x, y, w, h}) shape by its centre: keep-outs and copper islands.</summary>
public sealed class ShapeGeometry
{
    public string Id { get; set; } = "";
    /// <summary>For a strip segment, the id of its strip; otherwise the pad's own id.</summary>
    public string? Strip { get; set; }
    public string? Net { get; set; }
    public string Shape { get; set; } = "";
    public double X { get; set; }
    public double Y { get; set; }
    public double? D { get; set; }
    public double? W { get; set; }
    public double? H { get; set; }
    public double? StockThickness { get; set; }
}

public sealed class NetGeometry
{
    public string Name { get; set; } = "";
    public bool Ground { get; set; }
    public string Class { get; set; } = "";
    [JsonIgnore(Condition = JsonIgnoreCondition.Never)]
    public double? Voltage { get; set; }
    public double? Current { get; set; }
    /// <summary>The longest lead the check allowed on this net (mm).</summary>
    public double MaxLead { get; set; }
}

public sealed class PartGeometry
{
    public string Ref { get; set; } = "";
    public string Value { get; set; } = "";
    public string Footprint { get; set; } = "";
    public double[] Position { get; set; } = [];
    public int Rotation { get; set; }
    public List<double[]> Body { get; set; } = [];
    public List<LeadGeometry> Leads { get; set; } = [];
}

public sealed class LeadGeometry
{
    public string Pin { get; set; } = "";
    /// <summary>The net the circuit wants on this lead; null for a pin the netlist leaves unconnected.</summary>
    [JsonIgnore(Condition = JsonIgnoreCondition.Never)]
    public string? Net { get; set; }
    public double[] Exit { get; set; } = [];
    public double[] Landing { get; set; } = [];
    /// <summary>The pad or segment id the plan names; null for a ground landing on the plane.</summary>
    [JsonIgnore(Condition = JsonIgnoreCondition.Never)]
    public string? Pad { get; set; }
    public double Diameter { get; set; }
    public double Reach { get; set; }
    public double MinReach { get; set; }
    public double MaxReach { get; set; }
}

public sealed class JumperGeometry
{
    public string Id { get; set; } = "";
    public string From { get; set; } = "";
    public string To { get; set; } = "";
    /// <summary>From the centre of the first pad, through the bend points, to the centre of the second.</summary>
    public List<double[]> Path { get; set; } = [];
}

/// <summary>The clearances and limits the check uses.</summary>
public sealed class RulesGeometry
{
    public double PadGap { get; set; }
    public double GroundGap { get; set; }
    public double BoardMargin { get; set; }
    public Dictionary<string, double> MaxLead { get; set; } = [];
    public double TempRise { get; set; }
    public double CopperThickness { get; set; }
    public double StockPermittivity { get; set; }
    public List<LeadCapacityGeometry> LeadCapacity { get; set; } = [];
    public double LeadSpacing { get; set; }
    public string HighVoltageTable { get; set; } = "";
}

public sealed class LeadCapacityGeometry
{
    public double PadSize { get; set; }
    public int Leads { get; set; }
}

/// <summary>Source-generated JSON metadata for geometry exports.</summary>
[JsonSourceGenerationOptions(
    PropertyNamingPolicy = JsonKnownNamingPolicy.CamelCase,
    WriteIndented = true,
    DefaultIgnoreCondition = JsonIgnoreCondition.WhenWritingNull)]
[JsonSerializable(typeof(GeometryDocument))]
public sealed partial class GeometryJsonContext : JsonSerializerContext;
