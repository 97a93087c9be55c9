using Xunit;
using PadPlan.Model;
using PadPlan.Planning;
using PadPlan.ProjectFiles;

namespace PadPlan.Tests.Planning;

public class PlacerTests
{
    private static readonly PlacerSettings Quick = new(Seed: 3, Effort: Effort.Quick);

    private static Project Placed(Project project, PlacerSettings? settings = null)
    {
        var result = Placer.Place(project, settings ?? Quick);
        Assert.True(result.Succeeded, result.Failure?.Message);
        return result.Project!;
    }

    private static Project TinyBufferWithoutLayout() => ProjectFile.Read(TestPaths.TinyBuffer) with { Layout = null };

    [Fact]
    public void Tiny_buffer_on_its_own_board_breaks_no_rule()
    {
        var placed = Placed(TinyBufferWithoutLayout());
        Assert.Empty(CheckerVerdict.Check(placed));
        Assert.Equal(50, placed.Board.Width);
    }

    [Fact]
    public void Automatic_board_is_whole_millimetres_and_holds_everything()
    {
        var project = TinyBufferWithoutLayout() with { Board = Board.Auto };
        var placed = Placed(project);
        Assert.Equal(Math.Round(placed.Board.Width!.Value), placed.Board.Width);
        Assert.Equal(Math.Round(placed.Board.Height!.Value), placed.Board.Height);
        Assert.Empty(CheckerVerdict.Check(placed));
        // The hand-placed fixture needs 50 x 36 mm; an automatic board should be no bigger than that.
        Assert.True(placed.Board.Width * placed.Board.Height <= 50 * 36, $"{placed.Board.Width} x {placed.Board.Height}");
    }

    [Fact]
    public void Dip_sits_on_strip_segments_and_its_ground_pin_reaches_the_plane()
    {
        var placed = Placed(TestCircuits.DipStage(Board.Auto));
        Assert.Empty(CheckerVerdict.Check(placed));
        var u1 = placed.Layout!.Placements.Single(p => p.Ref == "U1");
        Assert.Null(u1.Leads.Single(l => l.Pin == "4").Pad);
        var strips = placed.Layout.Pads.OfType<StripPad>().ToList();
        // pins 1-3 on one strip, 5-8 on the other; pin 4 is ground and breaks the row
        Assert.Equal(7, strips.Sum(s => s.Segments.Count));
        // JEDEC MS-001: segments at the 2.54 mm pin pitch
        Assert.All(strips.SelectMany(s => s.Segments), s => Assert.Equal(2.54, s.Length, 6));
        // each pin lands straight below itself (coordinates are written to 0.01 mm)
        foreach (var landing in u1.Leads.Where(l => l.Pad is not null))
            Assert.True(u1.ToBoard(TestFootprints.Dip8.LeadForPin(landing.Pin, null)!.Exit).DistanceTo(landing.At) < 0.01, landing.Pin);
    }

    [Fact]
    public void Input_lands_left_of_output_on_a_wide_board()
    {
        // DOMAIN 1: build along the signal path and keep input and output apart; the flow term pulls them to opposite edges.
        var placed = Placed(TestCircuits.DipStage(new Board(90, 40)));
        var x = placed.Layout!.Placements.ToDictionary(p => p.Ref, p => p.Position.X);
        Assert.True(x["J1"] < x["J2"], $"input at x {x["J1"]}, output at x {x["J2"]}");
    }

    [Fact]
    public void Keep_outs_stay_clear()
    {
        var keepouts = ValueList.Of<Keepout>(new CircleKeepout("hole", new Point(30, 22), 8), new RectKeepout("standoff", new Point(10, 8), 8, 8));
        var placed = Placed(TestCircuits.DipStage(new Board(60, 45, keepouts: keepouts)));
        Assert.Empty(CheckerVerdict.Check(placed));
    }

    [Fact]
    public void Same_seed_gives_byte_identical_files_with_or_without_threads()
    {
        var project = TestCircuits.DipStage(Board.Auto);
        var a = ProjectFile.ToBytes(Placed(project, Quick));
        var b = ProjectFile.ToBytes(Placed(project, Quick with { AllowThreads = false }));
        Assert.Equal(a, b);
        var other = ProjectFile.ToBytes(Placed(project, Quick with { Seed = 4 }));
        Assert.NotEqual(a, other);
    }

    /// <summary>At normal effort on a small circuit the independent runs share the cores as a pool and finish in any order; the file must not show it.</summary>
    [Fact]
    public void Pooled_runs_give_byte_identical_files_with_or_without_threads()
    {
        var project = TinyBufferWithoutLayout();
        var settings = new PlacerSettings(Seed: 2);
        Assert.True(settings.RefinesFor(project.Parts.Count) > 0, "the pool is only used where refining runs follow");
        var a = ProjectFile.ToBytes(Placed(project, settings));
        var b = ProjectFile.ToBytes(Placed(project, settings with { AllowThreads = false }));
        Assert.Equal(a, b);
    }

    [Fact]
    public void Locked_parts_and_pads_stay_exactly_where_they_were()
    {
        var fixture = ProjectFile.Read(TestPaths.TinyBuffer);
        var lockedPad = (RoundPad)fixture.Layout!.Pads.Single(p => p.Id == "P2") with { Locked = true };
        var layout = fixture.Layout with { Pads = fixture.Layout.Pads.Select(p => p.Id == "P2" ? lockedPad : p).ToValueList() };
        var parts = fixture.Parts.Select(p => p.Ref is "Q1" or "C1" ? p with { Locked = true } : p).ToValueList();
        var project = fixture with { Layout = layout, Parts = parts };
        var placed = Placed(project);
        Assert.Empty(CheckerVerdict.Check(placed));
        Assert.Contains(lockedPad, placed.Layout!.Pads);
        foreach (var reference in new[] { "Q1", "C1" })
        {
            var before = fixture.Layout.Placements.Single(p => p.Ref == reference);
            var after = placed.Layout.Placements.Single(p => p.Ref == reference);
            Assert.Equal((before.Position, before.Rotation), (after.Position, after.Rotation));
        }
    }

    [Fact]
    public void Keep_existing_keeps_a_whole_hand_placed_layout()
    {
        var fixture = ProjectFile.Read(TestPaths.TinyBuffer);
        var placed = Placed(fixture, Quick with { KeepExisting = true });
        Assert.Equal(fixture.Layout!.Pads, placed.Layout!.Pads);
        Assert.Equal(fixture.Layout.Placements.Select(p => (p.Ref, p.Position, p.Rotation)).OrderBy(p => p.Ref),
            placed.Layout.Placements.Select(p => (p.Ref, p.Position, p.Rotation)).OrderBy(p => p.Ref));
    }

    /// <summary>
    /// Holding a part holds where its ground leads meet the plane: the placement problem starts each such lead on the landing
    /// the layout gives it, not on its first candidate (which broke rules the layout kept, so a placed project held whole, or
    /// a swap with most of the board held, found no legal layout).
    /// </summary>
    [Fact]
    public void Held_parts_start_with_their_ground_leads_where_the_layout_has_them()
    {
        var fixture = Placed(TinyBufferWithoutLayout(), Quick);
        var problem = ProblemBuilder.Build(fixture, Quick with { KeepExisting = true }, CostWeights.Default);
        var state = new AnnealState(problem);
        state.Recompute();
        var grounded = problem.Items.Where(i => i.IsPart).SelectMany(i => i.GroundLeads.Select(l => (Item: i, Lead: l))).ToList();
        Assert.Contains(grounded, g => problem.Leads[g.Lead].StartChoice != 0); // else the check below proves little
        foreach (var (item, l) in grounded)
        {
            var written = fixture.Layout!.Placements.Single(p => p.Ref == item.Part!.Ref).Leads.Single(x => x.Pin == problem.Leads[l].Pin).At;
            var (x, y) = state.GroundPoint(l);
            Assert.True(Math.Abs(x - written.X) <= 0.01 && Math.Abs(y - written.Y) <= 0.01, $"{item.Part!.Ref}.{problem.Leads[l].Pin} starts at ({x:0.###}, {y:0.###}), the layout has {written}");
        }
        Assert.Equal(0, state.Violation, 9);
    }

    [Fact]
    public void Too_small_a_board_fails_with_the_size_it_needs()
    {
        var project = TinyBufferWithoutLayout() with { Board = new Board(16, 12) };
        var result = Placer.Place(project, Quick);
        Assert.False(result.Succeeded);
        Assert.StartsWith("board too small: the parts do not fit on 16 x 12 mm", result.Failure!.Message);
        Assert.True(result.Failure.BoardTooSmall);
        Assert.Contains("--board", result.Failure.Hint);
    }

    [Fact]
    public void A_net_too_big_for_any_pad_without_jumpers_fails_and_says_what_to_change()
    {
        // 40 resistors all on one net: the largest rectangle (8 x 30 mm) holds 3 x 11 = 33 leads.
        var parts = Enumerable.Range(1, 40).Select(i => TestCircuits.Part($"R{i}", "res-axial-250mw", ("1", "BUS"), ("2", "GND")));
        var project = TestCircuits.Project("bus", Board.Auto, [new Net("GND", Ground: true), new Net("BUS")], parts, RuleSettings.Default with { AllowJumpers = false });
        var result = Placer.Place(project, Quick);
        Assert.False(result.Succeeded);
        Assert.Contains("net BUS has 40 leads", result.Failure!.Message);
        Assert.Contains("allowJumpers", result.Failure.Hint);
    }

    [Fact]
    public void A_big_net_spreads_over_jumpered_pads_when_jumpers_are_allowed()
    {
        var parts = Enumerable.Range(1, 40).Select(i => TestCircuits.Part($"R{i}", "res-axial-250mw", ("1", "BUS"), ("2", "GND")));
        var project = TestCircuits.Project("bus", Board.Auto, [new Net("GND", Ground: true), new Net("BUS")], parts);
        var placed = Placed(project);
        Assert.Empty(CheckerVerdict.Check(placed));
        Assert.True(placed.Layout!.Jumpers.Count >= 1);
    }
}
