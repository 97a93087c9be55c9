using PadPlan.Model;
using PadPlan.Output.Drawing;

namespace PadPlan.Output.Sheets;

/// <summary>
/// Colours and line patterns for nets on the assembly view. The colours avoid relying on red against green, are all dark
/// enough to print net names in, and differ in lightness; each net also gets a dash pattern, so nets stay apart on a
/// greyscale printer and for colour-blind readers. Ground is always solid black.
/// </summary>
public sealed class NetPalette
{
    /// <summary>Our own choice: blue, rust, teal, plum, olive, sky, wine; Rec. 709 luma from 0.25 to 0.52.</summary>
    public static IReadOnlyList<Ink> Colours { get; } =
    [
        Ink.Hex("#1f55a8"),
        Ink.Hex("#c2571a"),
        Ink.Hex("#0f7a6a"),
        Ink.Hex("#8e3a8a"),
        Ink.Hex("#7a6200"),
        Ink.Hex("#3c8fd0"),
        Ink.Hex("#a0304a"),
    ];

    /// <summary>Dash patterns in page mm (empty = solid); four of them against seven colours give 28 distinct pairs.</summary>
    public static IReadOnlyList<double[]> Dashes { get; } =
    [
        [],
        [2.4, 0.9],
        [0.7, 0.7],
        [2.4, 0.8, 0.6, 0.8],
    ];

    private readonly Dictionary<string, int> _index = new(StringComparer.Ordinal);
    private readonly HashSet<string> _ground = new(StringComparer.Ordinal);

    /// <summary>Nets in the project's order, then any net named only by pads, sorted, so colours stay put between runs.</summary>
    public NetPalette(Project project)
    {
        var names = new List<string>();
        foreach (var net in project.Nets)
        {
            if (net.Ground) _ground.Add(net.Name);
            else names.Add(net.Name);
        }
        var padNets = (project.Layout?.Islands() ?? []).Select(i => i.Net).OfType<string>()
            .Where(n => !_ground.Contains(n) && !names.Contains(n, StringComparer.Ordinal)).Distinct(StringComparer.Ordinal).Order(StringComparer.Ordinal);
        names.AddRange(padNets);
        for (var i = 0; i < names.Count; i++) _index[names[i]] = i;
        Nets = names;
    }

    /// <summary>The signal nets (not ground) in legend order.</summary>
    public IReadOnlyList<string> Nets { get; }

    public bool IsGround(string? net) => net is not null && _ground.Contains(net);

    public Ink InkOf(string? net) =>
        net is not null && _index.TryGetValue(net, out var i) ? Colours[i % Colours.Count] : net is null || IsGround(net) ? Ink.Black : SheetStyle.Mid;

    public Stroke StrokeOf(string? net, double width)
    {
        if (net is null || !_index.TryGetValue(net, out var i)) return Stroke.Solid(InkOf(net), width);
        return new Stroke(InkOf(net), width, Dashes[i % Dashes.Count].ToValueList());
    }
}
