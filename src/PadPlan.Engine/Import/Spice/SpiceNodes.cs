namespace PadPlan.Import;

/// <summary>SPICE node names: case-insensitive, ground spelled "GND", and nodes joined by 0 V sources treated as one net.</summary>
internal sealed class SpiceNodes
{
    private readonly Dictionary<string, string> _spelling = new(StringComparer.OrdinalIgnoreCase);
    private readonly Dictionary<string, string> _joinedTo = new(StringComparer.OrdinalIgnoreCase);

    /// <summary>The net a node name stands for, as first spelled in the file.</summary>
    public string Name(string node)
    {
        if (NetNames.IsGround(node)) return NetNames.Ground;
        if (!_spelling.TryGetValue(node, out var first)) _spelling[node] = first = node;
        return first;
    }

    /// <summary>Records that two nodes are one net (a 0 V source is a wire).</summary>
    public void Join(string a, string b)
    {
        var (ra, rb) = (Resolve(a), Resolve(b));
        if (string.Equals(ra, rb, StringComparison.OrdinalIgnoreCase)) return;
        // ground always wins, otherwise the name that sorts first, so the result does not depend on line order
        var keep = ra == NetNames.Ground || (rb != NetNames.Ground && string.CompareOrdinal(ra, rb) < 0) ? ra : rb;
        var drop = keep == ra ? rb : ra;
        _joinedTo[drop] = keep;
    }

    /// <summary>The net a name ends up as after joins.</summary>
    public string Resolve(string name)
    {
        while (_joinedTo.TryGetValue(name, out var next)) name = next;
        return name;
    }
}
