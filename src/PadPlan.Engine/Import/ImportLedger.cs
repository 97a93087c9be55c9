using PadPlan.Model;

namespace PadPlan.Import;

/// <summary>What the project builder decides on the way, gathered for the import record: the lead each netlist pin went to, and the summary lines about subcircuit calls and assumptions.</summary>
internal sealed class ImportLedger
{
    private static readonly string[] TopicOrder = ["source", "subcircuit", "rf", "assumed", "left off"];
    private readonly Dictionary<(string Ref, string Pin), (string Part, string Lead)> _leads = new(PinComparer.Instance);
    private readonly List<ImportSummaryLine> _summary = [];

    /// <summary>Inductor pins merged into a transformer's pins, filled by the winding merger.</summary>
    public Dictionary<(string Ref, string Pin), (string Ref, string Pin)> Windings { get; } = new(PinComparer.Instance);

    /// <summary>The pinout chosen for the next mapped subcircuit, when one was recognised.</summary>
    public string? Pinout { get; set; }

    public void Assumed(string reference, string what) => _summary.Add(new ImportSummaryLine("assumed", reference, what));

    /// <summary>The RF nets a parts map adds to those the deck gave, or one line saying that none is marked and the RF checks are off.</summary>
    public void RfNets(Netlist netlist, IEnumerable<Net> nets)
    {
        var named = (netlist.Summary ?? ValueList<ImportSummaryLine>.Empty).Where(l => l.Topic == "rf").Select(l => l.Item).ToHashSet(StringComparer.OrdinalIgnoreCase);
        var rf = nets.Where(n => n.Class == NetClass.Rf).ToList();
        foreach (var net in rf.Where(n => !named.Contains(NetlistText.Echo(n.Name))))
            _summary.Add(new ImportSummaryLine("rf", NetlistText.Echo(net.Name), "class rf in the parts map"));
        if (rf.Count == 0)
            _summary.Add(new ImportSummaryLine("rf", "none", "no net is marked RF, so the RF checks (short leads, parasitic estimates) are off; mark nets with a *padplan rf NET line or \"class\": \"rf\" in a parts map"));
    }

    public void Mapped(NetlistPart part, string partRef, PinMapper.Result mapped, string footprint, bool fromMap, bool assumed)
    {
        for (var i = 0; i < part.Pins.Count; i++) _leads[(part.Ref, part.Pins[i].Name)] = (partRef, mapped.Leads[i]);
        if (part.Kind == PartKind.Subcircuit)
        {
            var how = fromMap ? "pins from the parts map" : Pinout ?? (part.Positional ? "ports in call order on leads 1, 2, 3..." : "pins by lead name");
            _summary.Add(new ImportSummaryLine("subcircuit", NetlistText.Echo(part.Ref), $"{NetlistText.Echo(part.Model ?? part.Value)}: {footprint}, {how}{(assumed ? " (footprint assumed)" : "")}"));
        }
        else if (assumed) Assumed(part.Ref, $"footprint {footprint}");
        Pinout = null;
    }

    /// <summary>The record for the project: summary lines in topic order, the deck's elements with their nodes on leads, and the deck's simulation lines.</summary>
    public ImportRecord Record(Netlist netlist, IReadOnlyList<Part> parts)
    {
        var summary = (netlist.Summary ?? ValueList<ImportSummaryLine>.Empty).Concat(_summary)
            .OrderBy(l => Array.IndexOf(TopicOrder, l.Topic)).ToValueList();
        var elements = (netlist.Elements ?? ValueList<SpiceElement>.Empty).Select(OnLeads).ToValueList();
        return new ImportRecord(summary, elements, netlist.DeckLines ?? ValueList<PadPlan.Model.Spice.CarriedLine>.Empty);
    }

    private SpiceElement OnLeads(SpiceElement element)
    {
        if (element.Ref is null) return element;
        string? part = null;
        var nodes = element.Nodes.Select(n =>
        {
            if (n.Pin is null || Lead(element.Ref, n.Pin) is not { } at) return new SpiceNode(null, n.Net);
            part = at.Part;
            return new SpiceNode(at.Lead, n.Net);
        }).ToValueList();
        return new SpiceElement(element.Name, part, nodes, element.Tail);
    }

    private (string Part, string Lead)? Lead(string reference, string pin)
    {
        if (Windings.TryGetValue((reference, pin), out var merged)) (reference, pin) = merged;
        return _leads.TryGetValue((reference, pin), out var at) ? at : null;
    }

    private sealed class PinComparer : IEqualityComparer<(string Ref, string Pin)>
    {
        public static PinComparer Instance { get; } = new();
        public bool Equals((string Ref, string Pin) a, (string Ref, string Pin) b) =>
            string.Equals(a.Ref, b.Ref, StringComparison.OrdinalIgnoreCase) && string.Equals(a.Pin, b.Pin, StringComparison.OrdinalIgnoreCase);
        public int GetHashCode((string Ref, string Pin) x) =>
            HashCode.Combine(StringComparer.OrdinalIgnoreCase.GetHashCode(x.Ref), StringComparer.OrdinalIgnoreCase.GetHashCode(x.Pin));
    }
}
