using System.Globalization;

namespace PadPlan.Planning;

internal sealed partial class AnnealState
{
    /// <summary>The rules the current layout still breaks, in words, worst first.</summary>
    public IEnumerable<string> Problems()
    {
        var found = new List<(double V, string Text)>();
        for (var n = 0; n < _nets.Length; n++)
            if (_netViol[n] > 1e-9)
                found.Add((_netViol[n], string.Create(CultureInfo.InvariantCulture, $"net {_nets[n].Net.Name}: not every lead reaches a pad within its limit ({_nets[n].MaxLead:0.#} mm) or the pads are full")));
        for (var l = 0; l < _leads.Length; l++)
            if (_runs[l] && RunNear(l, _lx[l], _ly[l]) is var run && run > 1e-9)
                found.Add((run, $"lead {_items[_leads[l].Item].Name}.{_leads[l].Pin} runs through or too close under the body of {string.Join(", ", BodiesOverRun(l).Select(j => _items[j].Name).DefaultIfEmpty("another part"))}"));
        CommittedCrossings((l, cross) =>
        {
            if (cross > 1e-9) found.Add((cross, $"lead {_items[_leads[l].Item].Name}.{_leads[l].Pin} crosses or passes too near a bare lead of another net"));
        });
        for (var i = 0; i < _items.Length; i++)
        {
            if (_unaryViol[i] > 1e-9)
                found.Add((_unaryViol[i], $"{_items[i].Name}: outside the board margin, on a keep-out, or its ground lead is too close to its own strip"));
            for (var j = i + 1; j < _items.Length; j++)
            {
                var v = Pair(i, j);
                if (v > 1e-9) found.Add((v, $"{_items[i].Name} and {_items[j].Name} are closer than the rules allow"));
            }
        }
        return found.OrderByDescending(f => f.V).Select(f => f.Text);
    }

    /// <summary>
    /// Nets the layout still breaks at an IC's strip segments: a lead that does not reach, or whose run passes under a body,
    /// on a net that lands on strip segments. Planned again with pads of their own, such leads can land beside their parts,
    /// and a wire link joins the pad to the segment, instead of going round or under the IC.
    /// </summary>
    public IReadOnlyCollection<string> NetsShortAtStrips()
    {
        var found = new SortedSet<string>(StringComparer.Ordinal);
        bool OnStrips(int n) => _nets[n].Islands.Any(s => _islands[s].StripGroup >= 0 && _items[_islands[s].Item].IsPart);
        for (var n = 0; n < _nets.Length; n++)
            if (_netViol[n] > 1e-9 && OnStrips(n)) found.Add(_nets[n].Net.Name);
        for (var l = 0; l < _leads.Length; l++)
        {
            var net = _leads[l].Net;
            if (_runs[l] && net >= 0 && _leads[l].OwnIsland < 0 && RunNear(l, _lx[l], _ly[l]) > 1e-9 && OnStrips(net)) found.Add(_nets[net].Net.Name);
        }
        return found;
    }

    /// <summary>
    /// Nets that still break a rule with their free leads in more than one group, each group's exits farther than twice the
    /// net's reach limit from every other's (single linkage): one pad cannot serve them all, each group wants one of its own.
    /// </summary>
    public IReadOnlyDictionary<string, int> NetsSplitApart()
    {
        var found = new SortedDictionary<string, int>(StringComparer.Ordinal);
        for (var n = 0; n < _nets.Length; n++)
        {
            if (_netViol[n] <= 1e-9) continue;
            var groups = LeadGroups(_nets[n].FreeLeads, 2 * _nets[n].MaxLead);
            if (groups > 1) found[_nets[n].Net.Name] = groups;
        }
        return found;
    }

    /// <summary>Groups of leads whose exits are linked by steps of at most <paramref name="link"/> mm.</summary>
    private int LeadGroups(int[] leads, double link)
    {
        var group = new int[leads.Length];
        for (var a = 0; a < leads.Length; a++) group[a] = a;
        int Root(int a) { while (group[a] != a) a = group[a] = group[group[a]]; return a; }
        var groups = leads.Length;
        for (var a = 0; a < leads.Length; a++)
            for (var b = a + 1; b < leads.Length; b++)
            {
                var (dx, dy) = (_exX[leads[a]] - _exX[leads[b]], _exY[leads[a]] - _exY[leads[b]]);
                if (dx * dx + dy * dy > link * link) continue;
                var (ra, rb) = (Root(a), Root(b));
                if (ra == rb) continue;
                group[ra] = rb;
                groups--;
            }
        return groups;
    }

    /// <summary>Total length of all leads as they land now (mm).</summary>
    public double LeadTotal()
    {
        var total = 0.0;
        for (var l = 0; l < _leads.Length; l++)
        {
            var lead = _leads[l];
            if (lead.Ground) total += lead.GroundReach[GroundChoice[l]];
            else if (lead.OwnIsland < 0 && IslandOf(l) >= 0) total += Land(l, IslandOf(l), out _, out _, out _);
        }
        return total;
    }
}
