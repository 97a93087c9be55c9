using PadPlan.Model;
using PadPlan.Rules.Checks;
using PadPlan.Rules.Shapes;

namespace PadPlan.Rules.Extraction;

/// <summary>
/// The circuit as the layout builds it, from geometry alone: which copper each lead's landing point lies in, jumpers,
/// pads that touch, and the plane for leads that land on bare board. The netlist's net names are not used: each
/// connected piece is named after its first pad id, the plane is "0" (SPICE ground).
/// </summary>
public sealed class LayoutNets
{
    public const string Plane = "0";
    private readonly Dictionary<(string Ref, string Pin), string> _leads;

    private LayoutNets(Dictionary<(string Ref, string Pin), string> leads) => _leads = leads;

    /// <summary>The node a lead is soldered to; a lead with no landing gets a node of its own (it joins nothing).</summary>
    public string NodeOf(string reference, string pin) =>
        _leads.TryGetValue((reference, pin), out var node) ? node : Spiceable($"open_{reference}_{pin}");

    public static LayoutNets Of(Project project)
    {
        var plan = ResolvedPlan.Of(project);
        var copper = plan.Copper;
        var planeIndex = copper.Count;
        var sets = new UnionFind(copper.Count + 1);
        var index = copper.Select((c, i) => (c.Id, i)).ToDictionary(x => x.Id, x => x.i, StringComparer.Ordinal);
        foreach (var jumper in plan.Layout.Jumpers)
            if (index.TryGetValue(jumper.From, out var a) && index.TryGetValue(jumper.To, out var b)) sets.Union(a, b);
        for (var i = 0; i < copper.Count; i++)
            for (var k = i + 1; k < copper.Count; k++)
                if (!copper[i].IsNeighbourSegment(copper[k]) && CopperGeometry.Gap(copper[i].Island, copper[k].Island) <= CheckContext.Eps) sets.Union(i, k);
        var landed = new List<(PlacedLead Lead, int Node)>();
        foreach (var lead in plan.Leads.Where(l => l.Landing is not null))
        {
            var under = Enumerable.Range(0, copper.Count).Where(i => CopperGeometry.SignedDistance(copper[i].Island, lead.Landing!.At) <= CheckContext.Eps).ToList();
            if (under.Count == 0) { landed.Add((lead, planeIndex)); continue; }
            foreach (var i in under.Skip(1)) sets.Union(under[0], i); // a point in two islands bridges them
            landed.Add((lead, under[0]));
        }
        // name each piece after its first pad id in natural order, so names read like the sheets
        var names = new Dictionary<int, string>();
        foreach (var i in Enumerable.Range(0, copper.Count).OrderBy(i => copper[i].Id, NaturalOrder.Comparer))
            names.TryAdd(sets.Find(i), Spiceable(copper[i].Id));
        names[sets.Find(planeIndex)] = Plane;
        var leads = new Dictionary<(string, string), string>(PinKey.Comparer);
        foreach (var (lead, node) in landed) leads[(lead.Ref, lead.Pin)] = names[sets.Find(node)];
        return new LayoutNets(leads);
    }

    // SPICE node names are words: no spaces, commas, parentheses or '='.
    private static string Spiceable(string id) => new(id.Select(c => char.IsAsciiLetterOrDigit(c) || c is '_' or '-' or '.' ? c : '_').ToArray());

    private static class PinKey
    {
        public static readonly IEqualityComparer<(string, string)> Comparer = new KeyComparer();

        private sealed class KeyComparer : IEqualityComparer<(string, string)>
        {
            public bool Equals((string, string) a, (string, string) b) =>
                string.Equals(a.Item1, b.Item1, StringComparison.Ordinal) && string.Equals(a.Item2, b.Item2, StringComparison.OrdinalIgnoreCase);
            public int GetHashCode((string, string) x) => HashCode.Combine(x.Item1, StringComparer.OrdinalIgnoreCase.GetHashCode(x.Item2));
        }
    }
}
