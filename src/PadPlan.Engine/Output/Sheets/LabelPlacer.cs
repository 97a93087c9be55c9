using PadPlan.Output.Drawing;

namespace PadPlan.Output.Sheets;

/// <summary>Puts labels where they cover no pad, mark or other label: tries the candidates in order and takes the first clear one, else the one that covers least. Lives for one page.</summary>
internal sealed class LabelPlacer(Box bounds)
{
    private readonly List<Box> _taken = [];

    public void Block(Box box) => _taken.Add(box);

    /// <summary>Chooses among candidate boxes (first preferred) and blocks the chosen one.</summary>
    public Box Place(IReadOnlyList<Box> candidates)
    {
        var best = candidates[0];
        var bestCost = double.MaxValue;
        foreach (var candidate in candidates)
        {
            var cost = Cost(candidate);
            if (cost < bestCost - 1e-9)
            {
                best = candidate;
                bestCost = cost;
            }
            if (cost == 0) break;
        }
        // keep a little air round each label so neighbouring labels do not read as one
        _taken.Add(best.Inflate(1.0));
        return best;
    }

    private double Cost(Box candidate)
    {
        var cost = bounds.Contains(candidate) ? 0.0 : 1000.0;
        foreach (var other in _taken) cost += other.OverlapArea(candidate);
        return cost;
    }

    /// <summary>Eight boxes of a label's size around an item's box, each a gap away: right, above, below, left, then the corners.</summary>
    public static IReadOnlyList<Box> Around(Box item, double width, double height, double gap)
    {
        var c = item.Center;
        var right = item.Right + gap;
        var left = item.Left - gap - width;
        var above = item.Top - gap - height;
        var below = item.Bottom + gap;
        return
        [
            Box.Of(right, c.Y - height / 2, width, height),
            Box.Of(c.X - width / 2, above, width, height),
            Box.Of(c.X - width / 2, below, width, height),
            Box.Of(left, c.Y - height / 2, width, height),
            Box.Of(right, above, width, height),
            Box.Of(right, below, width, height),
            Box.Of(left, above, width, height),
            Box.Of(left, below, width, height),
        ];
    }
}
