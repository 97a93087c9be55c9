using System.Globalization;
using PadPlan.Model;

namespace PadPlan.Planning;

/// <summary>What a placement made, in the figures a builder looks at first.</summary>
public sealed record PlacementSummary(
    ValueList<string> PadsBySize,
    int Pads,
    int Strips,
    int Segments,
    double TotalLead,
    double LongestLead,
    string LongestLeadName,
    double LeadFloor,
    int Jumpers,
    double JumperLength,
    double BoardWidth,
    double BoardHeight,
    bool BoardChosen,
    double UsedArea,
    double RawArea,
    double Cost,
    long Moves,
    int Runs,
    TimeSpan Time,
    int Seed,
    Effort Effort)
{
    /// <summary>The longest lead on an RF net, 0 when no net is marked RF.</summary>
    public double LongestRfLead { get; init; }
    public string LongestRfLeadName { get; init; } = "-";

    /// <summary>The summary as lines for the console.</summary>
    public IEnumerable<string> Lines()
    {
        var c = CultureInfo.InvariantCulture;
        yield return string.Create(c, $"board: {BoardWidth:0.##} x {BoardHeight:0.##} mm{(BoardChosen ? " (chosen by the placer; written into the project)" : "")}");
        yield return string.Create(c, $"area used: {UsedArea:0} mm² ({100 * UsedArea / (BoardWidth * BoardHeight):0}% of the board)");
        yield return $"pads: {Pads} cut or punched{(Strips > 0 ? $", {Strips} scored strips with {Segments} segments" : "")}";
        foreach (var line in PadsBySize) yield return "  " + line;
        yield return string.Create(c, $"leads: total {TotalLead:0.0} mm, longest {LongestLead:0.0} mm ({LongestLeadName}){(LongestRfLead > 0 ? $", longest on an RF net {LongestRfLead:0.0} mm ({LongestRfLeadName})" : "")}");
        yield return string.Create(c, $"  floor {LeadFloor:0.0} mm: no layout of these parts needs less{(Effort == Effort.Thorough ? "" : "; another --seed or --effort thorough may come nearer")}");
        yield return string.Create(c, $"jumpers: {Jumpers}{(Jumpers > 0 ? $", {JumperLength:0.0} mm of wire" : "")}");
        yield return string.Create(c, $"time: {Time.TotalSeconds:0.00} s, {Moves} moves in {Runs} run{(Runs == 1 ? "" : "s")}, seed {Seed}, effort {Effort.ToString().ToLowerInvariant()}");
    }

    /// <summary>Measures a placed project.</summary>
    internal static PlacementSummary Of(Project project, AnnealState s, long moves, int runs, TimeSpan time, PlacerSettings settings, bool boardChosen)
    {
        var layout = project.Layout!;
        var bySize = new SortedDictionary<string, int>(StringComparer.Ordinal);
        foreach (var pad in layout.Pads)
        {
            var key = pad switch
            {
                RoundPad r => string.Create(CultureInfo.InvariantCulture, $"round {r.Diameter:0.00} mm"),
                RectPad r => string.Create(CultureInfo.InvariantCulture, $"rect {Math.Min(r.Width, r.Height):0.##} x {Math.Max(r.Width, r.Height):0.##} mm"),
                StripPad st => string.Create(CultureInfo.InvariantCulture, $"strip {st.Width:0.##} mm wide, {st.Segments.Count} segments"),
                _ => pad.GetType().Name,
            };
            bySize[key] = bySize.GetValueOrDefault(key) + 1;
        }
        var figures = LayoutFigures.Of(project);
        var islands = layout.Pads.SelectMany(p => p.Islands()).ToDictionary(i => i.Id, StringComparer.Ordinal);
        var jumperLength = layout.Jumpers.Sum(j => islands[j.From].Center.DistanceTo(islands[j.To].Center));
        var extent = s.Extent();
        return new PlacementSummary(
            bySize.Select(kv => $"{kv.Value} x {kv.Key}").ToValueList(),
            layout.Pads.Count(p => p is not StripPad),
            layout.Pads.Count(p => p is StripPad),
            layout.Pads.OfType<StripPad>().Sum(p => p.Segments.Count),
            figures.TotalLead, figures.LongestLead, figures.LongestLeadName, s.Problem.LeadLengthFloor,
            layout.Jumpers.Count, jumperLength,
            project.Board.Width!.Value, project.Board.Height!.Value, boardChosen,
            extent.Width * extent.Height, s.Problem.RawArea, s.Cost, moves, runs, time, settings.Seed, settings.Effort)
        {
            LongestRfLead = figures.LongestRfLead,
            LongestRfLeadName = figures.LongestRfLeadName,
        };
    }
}
