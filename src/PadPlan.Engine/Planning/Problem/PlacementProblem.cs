using PadPlan.Model;

namespace PadPlan.Planning;

/// <summary>A project compiled for the annealer: flat arrays of items, islands, leads and nets, plus the region and rules. Built once, read by every run.</summary>
internal sealed class PlacementProblem
{
    public required Project Project;
    public required ProblemItem[] Items;
    public required ProblemIsland[] Islands;
    public required ProblemLead[] Leads;
    public required ProblemNet[] Nets;
    public required Region Region;
    /// <summary>The board size is the placer's to choose.</summary>
    public required bool AutoBoard;
    public required CostWeights Weights;
    public required RuleSettings Rules;
    public ValueList<Keepout> Keepouts => Project.Board.Keepouts;

    /// <summary>Sum of body and pad areas: the floor under any used area (mm²).</summary>
    public double RawArea
    {
        get
        {
            var area = 0.0;
            foreach (var item in Items)
                if (item.HasBody) area += (item.BodyMaxX - item.BodyMinX) * (item.BodyMaxY - item.BodyMinY);
            foreach (var island in Islands)
                area += island.Round ? Math.PI * island.HalfW * island.HalfW : 4 * island.HalfW * island.HalfH;
            return area;
        }
    }

    /// <summary>The floor under the total lead length (mm), part by part: see <see cref="WireFloor"/>.</summary>
    public double LeadLengthFloor => Items.Where(i => i.IsPart).Sum(i => WireFloor.LeadsOf(this, i));

    /// <summary>The floor under the total jumper length (mm), net by net: see <see cref="WireFloor"/>.</summary>
    public double JumperFloor => Nets.Sum(n => WireFloor.JumpersOf(this, n));

    public PlacementProblem WithRegion(Region region) => new()
    {
        Project = Project, Items = Items, Islands = Islands, Leads = Leads, Nets = Nets,
        Region = region, AutoBoard = AutoBoard, Weights = Weights, Rules = Rules,
    };
}
