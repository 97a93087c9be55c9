using PadPlan.Model.Standards;
using PadPlan.Model;
using PadPlan.Rules.Physics;
using PadPlan.Rules.Shapes;

namespace PadPlan.Rules.Checks;

/// <summary>What every rule needs, worked out once from geometry alone: which copper each landing point lies in, which islands lie close together, and the net each island carries.</summary>
internal sealed class CheckContext
{
    // A landing point this close outside an island's edge still counts as on it (rounding only).
    public const double Eps = 1e-6;

    private readonly Dictionary<PlacedLead, IReadOnlyList<PadCopper>> _under = new(ReferenceEqualityComparer.Instance);
    private readonly Dictionary<PadCopper, List<PlacedLead>> _leadsOn = new(ReferenceEqualityComparer.Instance);
    private readonly Dictionary<PadCopper, string?> _netOf = new(ReferenceEqualityComparer.Instance);
    private readonly Dictionary<PadCopper, int> _index = new(ReferenceEqualityComparer.Instance);

    public CheckContext(ResolvedPlan plan, CheckOptions options)
    {
        Plan = plan;
        Options = options;
        Area = plan.Board.IsAuto ? null : BoardArea.Of(plan.Board);
        for (var i = 0; i < plan.Copper.Count; i++)
        {
            _index[plan.Copper[i]] = i;
            _leadsOn[plan.Copper[i]] = [];
        }
        foreach (var lead in plan.Leads)
        {
            if (lead.Landing is null) continue;
            var under = plan.CopperAt(lead.Landing.At, Eps);
            _under[lead] = under;
            foreach (var c in under) _leadsOn[c].Add(lead);
        }
        foreach (var c in plan.Copper) _netOf[c] = IntendedNet(c);
        Pairs = NearPairs(plan.Copper);
    }

    /// <summary>Every placed part raised into 3D (in plan order): body heights and lead paths, for the height rules.</summary>
    public IReadOnlyList<PartSolid> Solids => _solids ??= Shapes.Solids.Of(Plan, lead => Under(lead) is { Count: > 0 } u ? u[0] : null);
    private IReadOnlyList<PartSolid>? _solids;

    public ResolvedPlan Plan { get; }
    public CheckOptions Options { get; }
    public RuleSettings Rules => Plan.Rules;
    /// <summary>The usable board area; null for a board whose size is still automatic.</summary>
    public BoardArea? Area { get; }
    /// <summary>Pairs of islands (by index into the plan's copper) closer than any spacing rule asks for, with their edge gap.</summary>
    public IReadOnlyList<(int A, int B, double Gap)> Pairs { get; }

    /// <summary>Leads that have a landing point.</summary>
    public IEnumerable<PlacedLead> LandedLeads => Plan.Leads.Where(l => l.Landing is not null);

    /// <summary>The islands whose copper holds the lead's landing point, deepest first; empty when it lands on the plane.</summary>
    public IReadOnlyList<PadCopper> Under(PlacedLead lead) => _under.GetValueOrDefault(lead) ?? [];

    public IReadOnlyList<PlacedLead> LeadsOn(PadCopper copper) => _leadsOn[copper];

    public int IndexOf(PadCopper copper) => _index[copper];

    /// <summary>The net an island is meant to carry (ground nets under one name): its own label, else the net most of its leads want; null when neither says.</summary>
    public string? NetOf(PadCopper copper) => _netOf[copper];

    public double Voltage(string? net) => Math.Abs(Plan.Net(net)?.Voltage ?? 0);

    /// <summary>Worst-case voltage between two nets when all that is known is each one's largest voltage to ground: opposite polarities add.</summary>
    public double VoltageBetween(string? a, string? b) => ConductorSpacing.Between(Plan.Net(a)?.Voltage, Plan.Net(b)?.Voltage);

    private string? IntendedNet(PadCopper copper)
    {
        if (copper.Island.Net is not null) return Plan.Canonical(copper.Island.Net);
        return _leadsOn[copper]
            .Select(l => Plan.Canonical(l.Net))
            .OfType<string>()
            .GroupBy(n => n, StringComparer.Ordinal)
            .OrderByDescending(g => g.Count())
            .ThenBy(g => g.Key, StringComparer.Ordinal)
            .Select(g => g.Key)
            .FirstOrDefault();
    }

    private List<(int, int, double)> NearPairs(IReadOnlyList<PadCopper> copper)
    {
        // The widest spacing any pair can need: the pad gap, or the high-voltage spacing between the two highest voltages.
        var volts = Plan.Project.Nets.Select(n => Math.Abs(n.Voltage ?? 0)).OrderDescending().ToList();
        var worstVolts = volts.Count == 0 ? 0 : volts[0] + (volts.Count > 1 ? volts[1] : 0);
        var reach = Math.Max(Rules.PadGap, ConductorSpacing.B2(worstVolts)) + Eps;
        var order = Enumerable.Range(0, copper.Count).OrderBy(i => copper[i].Island.Left).ToArray();
        var pairs = new List<(int, int, double)>();
        // Sweep along x: once an island starts farther right than this one's right edge plus the reach, no later one can be near.
        for (var p = 0; p < order.Length; p++)
        {
            var a = copper[order[p]].Island;
            for (var q = p + 1; q < order.Length; q++)
            {
                var b = copper[order[q]].Island;
                if (b.Left > a.Right + reach) break;
                if (b.Top > a.Bottom + reach || a.Top > b.Bottom + reach) continue;
                var gap = CopperGeometry.Gap(a, b);
                if (gap < reach) pairs.Add((Math.Min(order[p], order[q]), Math.Max(order[p], order[q]), gap));
            }
        }
        pairs.Sort();
        return pairs;
    }
}
