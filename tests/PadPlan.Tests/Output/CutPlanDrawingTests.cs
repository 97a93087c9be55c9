using PadPlan.Materials.Cutting;
using PadPlan.Model;
using PadPlan.Output.Drawing;
using PadPlan.Output.Sheets;
using PadPlan.Output.Tables;

namespace PadPlan.Tests.Output;

/// <summary>The cutting plan drawn on its stock, checked on the drawing model (shapes in page mm), not on pixels.</summary>
public sealed class CutPlanDrawingTests
{
    // A4 portrait body, roughly: what the report pages give the drawing.
    private const double Width = 190;
    private const double Height = 240;

    public static TheoryData<string, double, double> Cases() => new()
    {
        { "tiny-buffer", 0, 0 },
        { "xtal-osc-40m", 0, 0 },
        { "cw-filter", 0, 0 },
        { "jfet-preamp", 0, 0 },
        { "valve-stage", 0, 0 },
        // a large sheet of board, drawn at a reduced scale
        { "xtal-osc-40m", 400, 300 },
        // a small offcut: the pieces crowd it
        { "cw-filter", 60, 45 },
    };

    private static (CutList List, IReadOnlyList<CutPlanFigure> Figures) Draw(string example, double stockWidth, double stockHeight)
    {
        var layout = ExampleProjects.Placed(example).Layout!;
        var thicknesses = layout.Pads.Select(p => p.StockThickness).Distinct().Order().ToList();
        var options = stockWidth > 0
            ? new CutOptions(thicknesses.Select((t, i) => new StockPiece($"S{i + 1}", stockWidth, stockHeight, t)).ToValueList())
            : CutOptions.Default;
        var list = CutListBuilder.Build(layout, options);
        var figures = list.Plan.Used
            .Select(s => CutPlanDrawing.Figure(list, s, new Point(10, 20), CutPlanDrawing.ScaleFor(s, Width, Height), Width))
            .ToList();
        Assert.NotEmpty(figures);
        return (list, figures);
    }

    [Theory, MemberData(nameof(Cases))]
    public void The_stock_outline_is_drawn_at_the_stated_scale(string example, double w, double h)
    {
        foreach (var f in Draw(example, w, h).Figures)
        {
            // drawn size = true size x scale (the scale is what the caption states), within 0.01 mm
            Assert.Equal(f.Stock.Width * f.Scale, f.Outline.Width, 0.01);
            Assert.Equal(f.Stock.Height * f.Scale, f.Outline.Height, 0.01);
            Assert.Contains(f.Shapes.OfType<RectShape>(), r => r.Box == f.Outline && r.Fill is null);
            var caption = Assert.Single(f.Shapes.OfType<TextShape>(), t => t.Text.StartsWith(f.Stock.Id + ":", StringComparison.Ordinal));
            Assert.Contains(f.ScaleDenominator == 1 ? "Scale 1 : 1" : $"scale 1 : {f.ScaleDenominator} (not for measuring)", caption.Text);
            Assert.True(f.Outline.Width <= Width + 1e-9 && f.Outline.Height <= Height + 1e-9, "the drawing must fit the page");
            // every id, in the piece or in the side column, lies within the width and the height the figure takes
            var area = new Box(10, 20, 10 + Width, 20 + f.Height);
            Assert.All(f.Pieces, p => Assert.True(area.Contains(p.Label), $"{p.Id}'s label leaves the figure"));
        }
    }

    [Fact]
    public void True_size_when_the_stock_fits_else_the_first_round_scale_that_does()
    {
        Assert.Equal(1, CutPlanDrawing.ScaleFor(new StockPiece("S", 100, 160, 1.6), Width, Height));
        // 400 mm does not fit 190 mm at 1 : 1 (400) or 1 : 2 (200); at 1 : 5 it is 80 mm
        Assert.Equal(5, CutPlanDrawing.ScaleFor(new StockPiece("S", 400, 300, 1.6), Width, Height));
        // 300 mm tall fits 240 mm only at 1 : 2 (150 mm)
        Assert.Equal(2, CutPlanDrawing.ScaleFor(new StockPiece("S", 150, 300, 1.6), Width, Height));
    }

    [Theory, MemberData(nameof(Cases))]
    public void Every_piece_is_drawn_to_scale_inside_its_stock_outline(string example, double w, double h)
    {
        var (list, figures) = Draw(example, w, h);
        foreach (var f in figures)
        {
            var placed = list.Plan.On(f.Stock).ToList();
            Assert.Equal(placed.Select(p => p.Piece.Id).Order(), f.Pieces.Select(p => p.Id).Order());
            foreach (var p in placed)
            {
                var drawn = f.Pieces.Single(d => d.Id == p.Piece.Id);
                Assert.True(f.Outline.Contains(drawn.Outline), $"{p.Piece.Id} is drawn outside stock {f.Stock.Id}");
                Assert.Equal(p.Width * f.Scale, drawn.Outline.Width, 0.01);
                Assert.Equal(p.Height * f.Scale, drawn.Outline.Height, 0.01);
                Assert.Contains(f.Shapes.OfType<RectShape>(), r => r.Box == drawn.Outline);
            }
            // one circle per punched disc, inside its punching strip
            var discs = placed.Where(p => p.Piece.Kind == CutPieceKind.PunchStrip).Sum(p => p.Piece.Pads.Count);
            Assert.Equal(discs, f.Discs.Count);
            Assert.All(f.Discs, d => Assert.Contains(f.Pieces, p => p.Outline.Contains(d)));
        }
    }

    [Theory, MemberData(nameof(Cases))]
    public void Every_cut_is_drawn_once_and_numbered_1_to_n(string example, double w, double h)
    {
        var (list, figures) = Draw(example, w, h);
        foreach (var f in figures)
        {
            var cuts = list.Plan.CutsOn(f.Stock);
            var lines = f.Shapes.OfType<LineShape>().Where(l => l.Stroke.Dash.Count > 0).ToList();
            Assert.Equal(cuts.Count, lines.Count);
            Assert.Equal(Enumerable.Range(1, cuts.Count), f.Cuts.Select(c => c.Number));
            var numbers = f.Shapes.OfType<TextShape>().Where(t => t.Anchor == TextAnchor.Middle && int.TryParse(t.Text, out _)).Select(t => int.Parse(t.Text)).Order();
            Assert.Equal(Enumerable.Range(1, cuts.Count), numbers);
            foreach (var c in f.Cuts)
            {
                // the numbered bubble sits on its own cut line, or on a short leader from a point of it
                Assert.True(Geometry2D.NearestOnSegment(c.Anchor, c.From, c.To).DistanceTo(c.Anchor) < 1e-6, $"cut {c.Number}'s leader does not start on its line");
                Assert.True(c.Label.DistanceTo(c.Anchor) < 1e-6 || f.Shapes.OfType<LineShape>().Any(l => l.From == c.Anchor && l.Stroke.Dash.Count == 0),
                    $"cut {c.Number}'s number is off its line with no leader");
                Assert.True(c.Label.DistanceTo(c.Anchor) <= CutPlanDrawing.MaxLeader, $"cut {c.Number}'s number is far from its line");
                var cut = cuts[c.Number - 1];
                Assert.Equal(cut.Start.DistanceTo(cut.End) * f.Scale, c.From.DistanceTo(c.To), 0.01);
            }
        }
    }

    [Theory, MemberData(nameof(Cases))]
    public void Labels_do_not_overlap_each_other(string example, double w, double h)
    {
        foreach (var f in Draw(example, w, h).Figures)
        {
            var labels = f.Pieces.Select(p => (Name: "piece " + p.Id, Box: p.Label))
                .Concat(f.Cuts.Select(c => (Name: "cut " + c.Number, Box: c.Label))).ToList();
            for (var i = 0; i < labels.Count; i++)
                for (var j = i + 1; j < labels.Count; j++)
                    Assert.False(labels[i].Box.Overlaps(labels[j].Box), $"{example} {f.Stock.Id}: {labels[i].Name} overlaps {labels[j].Name}");
            // a cut's number never touches another number or a piece's id (the issue's rule; the 0.4 mm gap is ours)
            foreach (var cut in f.Cuts)
                foreach (var other in labels.Where(l => l.Name != "cut " + cut.Number))
                    Assert.True(cut.Label.DistanceTo(other.Box) > 0.3, $"{example} {f.Stock.Id}: cut {cut.Number} touches {other.Name}");
            // each id is written whole, or as a key number that the key under the drawing names; never cut short
            var texts = f.Shapes.OfType<TextShape>().Select(t => t.Text).ToList();
            foreach (var p in f.Pieces)
            {
                Assert.DoesNotContain('…', p.Text);
                if (p.Text != p.Id) Assert.Contains(texts, t => t.Contains($"{p.Text} = {p.Id}", StringComparison.Ordinal));
            }
        }
    }

    [Fact]
    public void Pieces_too_small_for_their_id_at_a_reduced_scale_get_a_key_number_beside_the_stock_on_a_leader()
    {
        var f = Assert.Single(Draw("xtal-osc-40m", 400, 300).Figures);
        Assert.Equal(5, f.ScaleDenominator);
        var outside = f.Pieces.Where(p => !p.Outline.Contains(p.Label)).ToList();
        Assert.NotEmpty(outside);
        foreach (var p in outside)
        {
            Assert.StartsWith("#", p.Text);
            Assert.Contains(f.Shapes.OfType<TextShape>(), t => t.Text.Contains($"{p.Text} = {p.Id}", StringComparison.Ordinal));
            Assert.True(p.Label.Left >= f.Outline.Right, $"{p.Id}'s id is not beside the stock");
            Assert.Contains(f.Shapes.OfType<LineShape>(), l => l.From == p.Outline.Center);
        }
    }

    [Fact]
    public void The_report_pages_draw_the_plan_right_after_the_cutting_plan_table()
    {
        var project = SheetFixtures.TinyBuffer();
        var materials = MaterialsTables.Of(project);
        var book = SheetBook.Build(project, SheetFixtures.Options(), null, materials.All, materials.Cutting);
        var texts = book.Sheets.SelectMany(s => s.Page.Shapes.OfType<TextShape>()).Select(t => t.Text).ToList();
        var table = texts.FindIndex(t => t.StartsWith("Cutting plan (corner", StringComparison.Ordinal));
        var drawing = texts.FindIndex(t => t == "Cutting plan drawn on the stock");
        var next = texts.FindIndex(t => t == materials.Bom.Title);
        Assert.True(table >= 0 && drawing > table && next > drawing, $"table {table}, drawing {drawing}, next table {next}");
        Assert.Contains(texts, t => t.StartsWith("S1: 100 x 160 mm", StringComparison.Ordinal) && t.Contains("Scale 1 : 1"));
    }
}
