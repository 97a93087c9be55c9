using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using PadPlan.Model;
using PadPlan.Materials.Cutting;

namespace PadPlan.Tests.Materials;

public sealed class GuillotinePackerTests
{
    private static CutPiece Piece(string id, double w, double h, double t = 1.6) => new(id, CutPieceKind.Rect, w, h, t, ValueList.Of(id));
    private static StockPiece Stock(string id, double w, double h, double t = 1.6) => new(id, w, h, t);

    // Hand-worked example. Stock 100 x 60 mm, kerf 2 mm; pieces 58 x 60, 40 x 29, 40 x 29.
    // One cut 2 mm wide right down the 60 mm side at x = 58..60 (120 mm²) and one 2 mm cut across the 40 mm
    // right-hand part at y = 29..31 (80 mm²) waste 200 mm² of 6000: utilisation 5800 / 6000 = 96.67 %.
    [Fact]
    public void Hand_worked_example_with_kerf_gives_expected_utilisation()
    {
        var plan = GuillotinePacker.Pack([Piece("A", 58, 60), Piece("B", 40, 29), Piece("C", 40, 29)], [Stock("S1", 100, 60)], kerf: 2);
        Assert.True(plan.Complete);
        Assert.Null(PlanGeometry.Problem(plan));
        Assert.Equal(5800.0 / 6000.0, plan.Utilisation, 9);
        var a = plan.Placed.Single(p => p.Piece.Id == "A");
        Assert.Equal((0.0, 0.0), (a.X, a.Y));
        var c = plan.Placed.Single(p => p.Piece.Id == "C");
        Assert.Equal((60.0, 31.0), (c.X, c.Y));
    }

    // Four 49 x 49 squares on a 100 x 100 offcut with a 2 mm kerf: 49 + 2 + 49 = 100 exactly, so all four fit;
    // utilisation 4 x 2401 / 10000 = 96.04 % (hand-worked).
    [Fact]
    public void Squares_fill_the_stock_exactly_with_kerf_between()
    {
        var pieces = Enumerable.Range(1, 4).Select(i => Piece($"Q{i}", 49, 49)).ToList();
        var plan = GuillotinePacker.Pack(pieces, [Stock("S1", 100, 100)], kerf: 2);
        Assert.True(plan.Complete);
        Assert.Null(PlanGeometry.Problem(plan));
        Assert.Equal(0.9604, plan.Utilisation, 9);
        // A fifth square cannot fit: the kerf is not free.
        var five = GuillotinePacker.Pack(pieces.Append(Piece("Q5", 49, 49)), [Stock("S1", 100, 100)], kerf: 2);
        Assert.Single(five.Unplaced);
    }

    [Fact]
    public void A_long_piece_is_turned_to_fit_and_one_too_long_is_reported_unplaced()
    {
        var plan = GuillotinePacker.Pack([Piece("long", 150, 10), Piece("too-long", 170, 10)], [Stock("S1", 100, 160)], kerf: 1);
        var placed = Assert.Single(plan.Placed);
        Assert.Equal("long", placed.Piece.Id);
        Assert.True(placed.Turned);
        Assert.Equal("too-long", Assert.Single(plan.Unplaced).Id);
        Assert.False(plan.Complete);
    }

    [Fact]
    public void Pieces_go_only_on_stock_of_their_thickness_and_fill_stock_in_the_order_given()
    {
        var plan = GuillotinePacker.Pack(
            [Piece("thin", 10, 10, 0.8), Piece("thick1", 10, 10), Piece("thick2", 10, 10)],
            [Stock("A", 50, 50), Stock("B", 50, 50), Stock("C", 50, 50, 0.8)], kerf: 1);
        Assert.True(plan.Complete);
        Assert.Equal("C", plan.Placed.Single(p => p.Piece.Id == "thin").StockId);
        // First fit over stock pieces: both thick pieces go on A, B stays whole.
        Assert.All(plan.Placed.Where(p => p.Piece.Thickness == 1.6), p => Assert.Equal("A", p.StockId));
        Assert.Equal(["A", "C"], plan.Used.Select(s => s.Id));
    }

    [Fact]
    public void Same_input_gives_the_same_plan()
    {
        var pieces = Enumerable.Range(1, 12).Select(i => Piece($"P{i}", 5 + i % 5 * 7, 4 + i % 3 * 9)).ToList();
        var a = GuillotinePacker.Pack(pieces, [Stock("S1", 60, 60), Stock("S2", 40, 80)], 1);
        var b = GuillotinePacker.Pack(Enumerable.Reverse(pieces), [Stock("S1", 60, 60), Stock("S2", 40, 80)], 1);
        Assert.Equal(a, b);
    }

    [Fact]
    public void The_geometry_check_itself_catches_overlap_and_non_guillotine_layouts()
    {
        // Guard against a checker that cannot fail: a hand-made overlapping plan and the classic pinwheel.
        var s = Stock("S1", 100, 100);
        var overlap = new CuttingPlan(ValueList.Of(s), ValueList.Of(
            new PlacedPiece(Piece("a", 20, 20), "S1", 0, 0, false), new PlacedPiece(Piece("b", 20, 20), "S1", 10, 10, false)), ValueList<CutPiece>.Empty, 0);
        Assert.NotNull(PlanGeometry.Problem(overlap));
        var pinwheel = new[]
        {
            new PlacedPiece(Piece("n", 60, 30), "S1", 0, 0, false), new PlacedPiece(Piece("e", 30, 60), "S1", 60, 0, false),
            new PlacedPiece(Piece("s", 60, 30), "S1", 30, 60, false), new PlacedPiece(Piece("w", 30, 60), "S1", 0, 30, false),
        };
        Assert.False(PlanGeometry.Guillotine(pinwheel, 0));
    }

    public static Arbitrary<(List<CutPiece> Pieces, List<StockPiece> Stock, double Kerf)> Cases()
    {
        var thickness = Gen.Elements(0.8, 1.6);
        // Half-millimetre steps, as a builder measures.
        var piece = from w in Gen.Choose(2, 160) from h in Gen.Choose(2, 120) from t in thickness select (W: w / 2.0, H: h / 2.0, T: t);
        var stock = from w in Gen.Choose(10, 200) from h in Gen.Choose(10, 200) from t in thickness select (W: (double)w, H: (double)h, T: t);
        var gen =
            from ps in Gen.ListOf(piece).Select(l => l.Take(40).ToList())
            from ss in Gen.NonEmptyListOf(stock).Select(l => l.Take(3).ToList())
            from k in Gen.Elements(0.0, 0.5, 1.0, 2.5)
            select (ps.Select((p, i) => Piece($"p{i}", p.W, p.H, p.T)).ToList(),
                    ss.Select((s, i) => Stock($"S{i + 1}", s.W, s.H, s.T)).ToList(), k);
        return gen.ToArbitrary();
    }

    [Property(MaxTest = 200)]
    public Property Random_pieces_never_overlap_stay_inside_and_are_all_accounted_for() => SoundPlans();

    // Regression: this seed found a plan that straight through-cuts could not separate, when free rectangles were merged.
    [Property(MaxTest = 200, Replay = "1543471839459631928,13206902977362732251")]
    public Property Regression_merged_free_space_broke_the_guillotine_property() => SoundPlans();

    private static Property SoundPlans() =>
        Prop.ForAll(Cases(), c =>
        {
            var plan = GuillotinePacker.Pack(c.Pieces, c.Stock, c.Kerf);
            var ids = plan.Placed.Select(p => p.Piece.Id).Concat(plan.Unplaced.Select(p => p.Id)).Order().ToList();
            var problem = PlanGeometry.Problem(plan)
                ?? (ids.SequenceEqual(c.Pieces.Select(p => p.Id).Order()) ? null : "a piece is neither placed nor reported")
                ?? (plan.Utilisation <= 1 + 1e-9 ? null : "utilisation over 100 %");
            return (problem is null).Label(problem ?? "");
        });

    [Property(MaxTest = 100)]
    public Property A_piece_reported_unplaced_is_never_one_that_fits_an_empty_stock_alone() =>
        Prop.ForAll(Cases(), c =>
        {
            // With a single piece each, the packer must place it whenever it fits some stock of its thickness either way round.
            return c.Pieces.All(p =>
            {
                var fits = c.Stock.Any(s => s.IsThickness(p.Thickness)
                    && ((p.Width <= s.Width && p.Height <= s.Height) || (p.Height <= s.Width && p.Width <= s.Height)));
                return GuillotinePacker.Pack([p], c.Stock, c.Kerf).Complete == fits;
            });
        });
}
