using System.Text.Json;
using PadPlan.Model;
using PadPlan.Output.Geometry;
using PadPlan.ProjectFiles;
using Xunit;

namespace PadPlan.Tests.Rules;

public class GeometryExportTests
{
    private static JsonElement Export(Project p) => JsonDocument.Parse(GeometryExport.ToBytes(GeometryExport.Build(p))).RootElement;

    [Fact]
    public void Top_level_fields_and_units()
    {
        var root = Export(ProjectFile.Read(TestPaths.TinyBuffer));
        Assert.Equal("padplan-geometry/1", root.GetProperty("format").GetString());
        Assert.Equal("mm", root.GetProperty("units").GetString());
        foreach (var field in new[] { "board", "nets", "pads", "parts", "jumpers", "rules" }) Assert.True(root.TryGetProperty(field, out _), field);
        Assert.Equal(4, root.GetProperty("board").GetProperty("outline").GetArrayLength());
    }

    [Fact]
    public void Each_strip_segment_is_its_own_rect()
    {
        var root = Export(DipFixture.Project);
        var pads = root.GetProperty("pads").EnumerateArray().ToList();
        Assert.Equal(9, pads.Count);
        var a2 = pads.Single(p => p.GetProperty("id").GetString() == "A2");
        Assert.Equal("rect", a2.GetProperty("shape").GetString());
        Assert.Equal("SA", a2.GetProperty("strip").GetString());
        // Second 2.54 mm segment of a strip starting at x = 24.92, less half the 0.6 mm score at each end: 1.94 mm wide, centred at 28.73.
        Assert.Equal(1.94, a2.GetProperty("w").GetDouble(), 6);
        Assert.Equal(28.73, a2.GetProperty("x").GetDouble(), 6);
        Assert.Equal(1.6, a2.GetProperty("stockThickness").GetDouble());
    }

    [Fact]
    public void Ground_landings_have_a_null_pad_and_leads_carry_their_wanted_net()
    {
        var root = Export(DipFixture.Project);
        var j3 = root.GetProperty("parts").EnumerateArray().Single(p => p.GetProperty("ref").GetString() == "J3");
        var gnd = j3.GetProperty("leads").EnumerateArray().Single(l => l.GetProperty("pin").GetString() == "2");
        Assert.Equal(JsonValueKind.Null, gnd.GetProperty("pad").ValueKind);
        Assert.Equal("GND", gnd.GetProperty("net").GetString());
        Assert.Equal([23.27, 12.0], gnd.GetProperty("landing").EnumerateArray().Select(v => v.GetDouble()));
        // J3 sits at (22, 10); lead 2 leaves the body at +1.27 mm in x.
        Assert.Equal([23.27, 10.0], gnd.GetProperty("exit").EnumerateArray().Select(v => v.GetDouble()));
    }

    [Fact]
    public void Jumper_path_runs_from_pad_centre_to_pad_centre()
    {
        var jumper = Assert.Single(Export(DipFixture.Project).GetProperty("jumpers").EnumerateArray().ToList());
        Assert.Equal("A1", jumper.GetProperty("from").GetString());
        var path = jumper.GetProperty("path").EnumerateArray().Select(p => p[0].GetDouble()).ToList();
        Assert.Equal([26.04, 28.73], path);
    }

    [Fact]
    public void Bodies_are_in_board_coordinates()
    {
        // C1 of the DIP fixture: 6 x 3 mm body turned a quarter (270 degrees) at (33, 31): x 31.5..34.5, y 28..34.
        var c1 = Export(DipFixture.Project).GetProperty("parts").EnumerateArray().Single(p => p.GetProperty("ref").GetString() == "C1");
        var body = c1.GetProperty("body").EnumerateArray().Select(p => (X: p[0].GetDouble(), Y: p[1].GetDouble())).ToList();
        Assert.Equal(31.5, body.Min(p => p.X), 6);
        Assert.Equal(34.5, body.Max(p => p.X), 6);
        Assert.Equal(28, body.Min(p => p.Y), 6);
        Assert.Equal(34, body.Max(p => p.Y), 6);
    }

    [Fact]
    public void Same_plan_gives_the_same_bytes()
    {
        var p = ProjectFile.Read(TestPaths.TinyBuffer);
        Assert.Equal(GeometryExport.ToBytes(GeometryExport.Build(p)), GeometryExport.ToBytes(GeometryExport.Build(p)));
    }

    [Fact]
    public void A_plan_without_a_board_size_is_refused() =>
        Assert.Throws<ArgumentException>(() => GeometryExport.Build(DipFixture.Project with { Board = Board.Auto }));

    [Fact]
    public void Keepouts_are_circles_and_rects_by_their_centre()
    {
        var board = new Board(60, 40, keepouts: ValueList.Of<Keepout>(new CircleKeepout("H1", new Point(4, 4), 3.2), new RectKeepout("K1", new Point(50, 30), 6, 4)));
        var keepouts = Export(DipFixture.Project with { Board = board }).GetProperty("board").GetProperty("keepouts").EnumerateArray().ToList();
        Assert.Equal("circle", keepouts[0].GetProperty("shape").GetString());
        Assert.Equal(3.2, keepouts[0].GetProperty("d").GetDouble());
        Assert.Equal("rect", keepouts[1].GetProperty("shape").GetString());
        Assert.Equal(6, keepouts[1].GetProperty("w").GetDouble());
    }
}
