using PadPlan.Import;
using PadPlan.Model;
using PadPlan.Planning;
using PadPlan.Rules;
using PadPlan.Tests.Import;

namespace PadPlan.Tests.Planning;

/// <summary>The placer never makes a pad that no lead lands on (one that only a wire link reaches joins nothing).</summary>
public class UnusedPadTests
{
    public static TheoryData<string> Decks => new(Directory.GetFiles(SpiceCorpus.Dir, "*.cir").Select(Path.GetFileNameWithoutExtension).OfType<string>().Order(StringComparer.Ordinal));

    [Theory]
    [MemberData(nameof(Decks))]
    public void Every_pad_of_a_placed_corpus_deck_holds_a_lead(string deck)
    {
        var result = Placer.Place(SpiceCorpus.Import(deck).Project, new PlacerSettings(Effort: Effort.Quick));
        Assert.True(result.Succeeded, result.Failure?.Message);
        var unused = Checker.Check(result.Project!).Findings.Where(f => f.RuleId == RuleIds.PadUnused).Select(f => f.Message).ToList();
        Assert.True(unused.Count == 0, string.Join("\n", unused));
    }

    [Fact]
    public void A_planned_pad_left_without_a_lead_is_not_written_and_no_link_reaches_it()
    {
        // Scattered layouts of random circuits: the greedy nearest-pad assignment leaves some planned pad empty.
        var seen = 0;
        for (var seed = 1; seed <= 40 && seen < 3; seed++)
        {
            var problem = ProblemBuilder.Build(TestCircuits.Random(seed, 30), PlacerSettings.Default, CostWeights.Default);
            var state = new AnnealState(problem);
            new Annealer(state, seed).Scatter();
            state.Recompute();
            var landed = Enumerable.Range(0, problem.Leads.Length).Where(l => !problem.Leads[l].Ground && problem.Leads[l].Net >= 0).Select(state.IslandOf).ToHashSet();
            var empty = problem.Items.Count(item => item.Pad is not null && !landed.Contains(item.Islands[0]));
            if (empty == 0) continue;
            seen++;
            var layout = LayoutWriter.Write(state);
            var planned = problem.Items.Count(item => item.Pad is not null);
            Assert.Equal(planned - empty, layout.Pads.Count(pad => pad is not StripPad));
            var landing = layout.Placements.SelectMany(pl => pl.Leads).Select(l => l.Pad).OfType<string>().ToHashSet(StringComparer.Ordinal);
            foreach (var pad in layout.Pads.Where(pad => pad is not StripPad)) Assert.Contains(pad.Id, landing);
            var ids = layout.Islands().Select(i => i.Id).ToHashSet(StringComparer.Ordinal);
            Assert.All(layout.Jumpers, j => Assert.True(ids.Contains(j.From) && ids.Contains(j.To), $"{j.Id} names a pad not made"));
            // numbered without gaps: P1 .. Pn
            var numbers = layout.Pads.Where(pad => pad is not StripPad).Select(pad => int.Parse(pad.Id[GeneratedIds.PadPrefix.Length..], System.Globalization.CultureInfo.InvariantCulture)).Order().ToList();
            Assert.Equal(Enumerable.Range(1, numbers.Count), numbers);
        }
        Assert.True(seen > 0, "no scattered layout left a planned pad empty, so the test proves nothing");
    }
}
