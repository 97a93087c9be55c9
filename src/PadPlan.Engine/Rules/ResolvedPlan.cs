using PadPlan.Model;

namespace PadPlan.Rules;

/// <summary>A project's layout turned into board-coordinate geometry: every copper island, every placed part with its body and leads. Built once and shared by the rules and the geometry export.</summary>
public sealed class ResolvedPlan
{
    private readonly Dictionary<string, Net> _nets;
    private readonly Dictionary<string, PadCopper> _copperById;

    private ResolvedPlan(Project project, Layout layout)
    {
        Project = project;
        Layout = layout;
        _nets = project.Nets.ToDictionary(n => n.Name, StringComparer.Ordinal);
        Copper = layout.Pads
            .SelectMany(pad => pad.Islands().Select((island, i) => new PadCopper(island, pad, pad is StripPad ? i : -1)))
            .ToList();
        _copperById = Copper.ToDictionary(c => c.Id, StringComparer.Ordinal);
        var placements = layout.Placements.ToDictionary(p => p.Ref, StringComparer.Ordinal);
        var parts = new List<PlacedPart>();
        var unplaced = new List<Part>();
        foreach (var part in project.Parts)
        {
            if (placements.TryGetValue(part.Ref, out var placement)) parts.Add(Place(project, part, placement));
            else unplaced.Add(part);
        }
        Parts = parts;
        Unplaced = unplaced;
        GroundName = project.Nets.FirstOrDefault(n => n.Ground)?.Name;
    }

    public Project Project { get; }
    public Layout Layout { get; }
    public Board Board => Project.Board;
    public RuleSettings Rules => Project.Rules;
    /// <summary>Every island of every pad, in pad order.</summary>
    public IReadOnlyList<PadCopper> Copper { get; }
    /// <summary>Placed parts, in netlist order.</summary>
    public IReadOnlyList<PlacedPart> Parts { get; }
    /// <summary>Parts of the netlist that the layout does not place.</summary>
    public IReadOnlyList<Part> Unplaced { get; }
    /// <summary>The name the report gives the ground plane: the first ground net of the netlist.</summary>
    public string? GroundName { get; }

    public IEnumerable<PlacedLead> Leads => Parts.SelectMany(p => p.Leads);

    /// <summary>Resolves a project's layout; the project must have one.</summary>
    public static ResolvedPlan Of(Project project) =>
        new(project, project.Layout ?? throw new InvalidOperationException($"project {project.Name} has no layout yet."));

    public Net? Net(string? name) => name is not null && _nets.TryGetValue(name, out var net) ? net : null;

    public bool IsGround(string? net) => Net(net)?.Ground == true;

    /// <summary>The net as the copper sees it: every ground net is the one plane, so all of them map to one name.</summary>
    public string? Canonical(string? net) => IsGround(net) ? GroundName : net;

    /// <summary>The islands whose copper holds a point (or lies within <paramref name="tolerance"/> of it), deepest first; empty on the bare plane.</summary>
    public IReadOnlyList<PadCopper> CopperAt(Point at, double tolerance) => Copper
        .Select(c => (Copper: c, Distance: Shapes.CopperGeometry.SignedDistance(c.Island, at)))
        .Where(x => x.Distance <= tolerance)
        .OrderBy(x => x.Distance)
        .Select(x => x.Copper)
        .ToList();

    /// <summary>A pad or segment by id; null when the id names a whole strip or nothing.</summary>
    public PadCopper? CopperById(string id) => _copperById.GetValueOrDefault(id);

    private static PlacedPart Place(Project project, Part part, Placement placement)
    {
        var footprint = project.FootprintOf(part);
        var pins = footprint.PinNames(part.Variant);
        var leads = footprint.Leads.Select((lead, i) =>
        {
            var pin = pins[i];
            var landing = placement.Leads.FirstOrDefault(l => string.Equals(l.Pin, pin, StringComparison.OrdinalIgnoreCase));
            return new PlacedLead(part.Ref, pin, part.NetOf(pin), placement.ToBoard(lead.Exit), landing, lead);
        }).ToValueList();
        var body = footprint.Body.Select(placement.ToBoard).ToValueList();
        return new PlacedPart(part, footprint, placement, body, leads);
    }
}
