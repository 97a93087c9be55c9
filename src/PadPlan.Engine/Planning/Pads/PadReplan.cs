namespace PadPlan.Planning;

/// <summary>
/// What failed tries taught about the pads of a project's nets, for planning them again: nets whose leads from elsewhere get
/// pads of their own instead of an IC's strip segments, and nets whose leads lie in groups too far apart for one pad.
/// Only a failing try adds to it, so layouts that place the first time never see it.
/// </summary>
internal sealed class PadReplan
{
    public SortedSet<string> OwnPads { get; } = new(StringComparer.Ordinal);
    public SortedDictionary<string, int> Split { get; } = new(StringComparer.Ordinal);

    /// <summary>Takes in the nets a failed layout left broken; true when that changes the plan.</summary>
    public bool Learn(AnnealState failed)
    {
        var grew = false;
        foreach (var net in failed.NetsShortAtStrips()) grew |= OwnPads.Add(net);
        foreach (var (net, groups) in failed.NetsSplitApart())
        {
            if (groups <= Split.GetValueOrDefault(net, 1)) continue;
            Split[net] = groups;
            grew = true;
        }
        return grew;
    }
}
