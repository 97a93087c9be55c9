namespace PadPlan.Planning;

internal sealed partial class AnnealState
{
    // Nets whose leads do not all reach a pad within their limit (or whose pads are over-full), kept as an indexed set so a
    // directed move can pick one at random in O(1) without allocating.
    private readonly int[] _broken;
    private readonly int[] _brokenAt;
    private int _brokenCount;

    // Items that took part in a pair violation at the last full recount (refreshed once per temperature, so it may be stale).
    private readonly int[] _crowded;
    private readonly int[] _crowdedStamp;
    private int _crowdedCount, _recount;

    /// <summary>Items that broke a gap or overlap rule with another item at the last full recount.</summary>
    public int CrowdedCount => _crowdedCount;

    /// <summary>The k-th item that broke a gap or overlap rule at the last full recount.</summary>
    public int Crowded(int k) => _crowded[k];

    private void MarkCrowded(int i)
    {
        if (_crowdedStamp[i] == _recount) return;
        _crowdedStamp[i] = _recount;
        _crowded[_crowdedCount++] = i;
    }

    /// <summary>Nets that still break a reach or capacity rule.</summary>
    public int BrokenNetCount => _brokenCount;

    /// <summary>The k-th net that still breaks a rule (0 &lt;= k &lt; <see cref="BrokenNetCount"/>); the order is arbitrary but deterministic.</summary>
    public int BrokenNet(int k) => _broken[k];

    private void MarkNet(int n)
    {
        var broken = _netViol[n] > 1e-9;
        var at = _brokenAt[n];
        if (broken && at < 0)
        {
            _brokenAt[n] = _brokenCount;
            _broken[_brokenCount++] = n;
        }
        else if (!broken && at >= 0)
        {
            var last = _broken[--_brokenCount];
            _broken[at] = last;
            _brokenAt[last] = at;
            _brokenAt[n] = -1;
        }
    }

    /// <summary>The free lead of a net that overshoots its reach limit most (or its first free lead), and its island.</summary>
    public (int Lead, int Island) WorstLead(int net)
    {
        var free = _nets[net].FreeLeads;
        var (worst, worstV) = (-1, -1.0);
        foreach (var l in free)
        {
            var s = IslandOf(l);
            if (s < 0) continue;
            Land(l, s, out _, out _, out var v);
            if (v > worstV) (worst, worstV) = (l, v);
        }
        return worst < 0 ? (-1, -1) : (worst, IslandOf(worst));
    }
}
