using PadPlan.Model;
using PadPlan.Materials;
using PadPlan.Output.Tables;
using static PadPlan.Tests.Materials.Circuits;

namespace PadPlan.Tests.Materials;

public sealed class BuildOrderTests
{
    // The tiny buffer by hand: IN -> C1 -> BASE -> Q1 (with R1, R2) -> EMIT -> R3, C2 -> OUT -> J2.
    // Stage 0 glues P1 P2 and solders J1 (1 mm) before C1 (7 mm); stage 1 glues P3 P4, then J3 (on P3, supply only),
    // R1, R2 (2.4 mm) before Q1 (5.2 mm); stage 2 glues P5, R3 before C2; stage 3 is J2; the test comes last.
    [Fact]
    public void Tiny_buffer_follows_the_signal_path_and_solders_low_before_tall()
    {
        var project = PadPlan.ProjectFiles.ProjectFile.Read(TestPaths.TinyBuffer);
        var steps = BuildOrder.Steps(project);
        var order = steps.Select(s => s.Action == "Solder" ? s.What.Split(' ')[0] : $"{s.Action}: {s.What}").ToList();
        Assert.Equal(
            ["Glue pads: P1, P2", "J1", "C1", "Glue pads: P3, P4", "J3", "R1", "R2", "Q1", "Glue pads: P5", "R3", "C2", "J2", "Test: the finished board"],
            order);
        Assert.Equal(Enumerable.Range(1, steps.Count), steps.Select(s => s.Number));
        Assert.Contains("ground: 2 to the plane", steps.Single(s => s.What.StartsWith("R2 ", StringComparison.Ordinal)).Note);
        Assert.Equal("", steps.Single(s => s.What.StartsWith("R1 ", StringComparison.Ordinal)).Note);
    }

    [Fact]
    public void Every_pad_is_glued_once_and_every_placed_part_soldered_once()
    {
        var project = PadPlan.ProjectFiles.ProjectFile.Read(TestPaths.TinyBuffer);
        var steps = BuildOrder.Steps(project);
        var glued = steps.Where(s => s.Action == "Glue pads").SelectMany(s => s.What.Split(", ")).ToList();
        Assert.Equal(project.Layout!.Pads.Select(p => p.Id).Order(), glued.Order());
        Assert.Equal(project.Parts.Select(p => p.Ref).Order(), steps.Where(s => s.Action == "Solder").Select(s => s.What.Split(' ')[0]).Order());
    }

    [Fact]
    public void A_wire_link_is_fitted_as_soon_as_both_its_pads_are_down()
    {
        var project = LinkedProject();
        var order = BuildOrder.Steps(project).Select(s => $"{s.Action}: {s.What.Split(' ')[0]}").ToList();
        Assert.Equal(
            ["Glue pads: P1,", "Solder: R1", "Glue pads: P3,", "Fit jumper: W1", "Solder: R2", "Solder: C1", "Test: the"],
            order);
        Assert.Contains("ground: 2 to the plane", BuildOrder.Steps(project).Single(s => s.What.StartsWith("C1", StringComparison.Ordinal)).Note);
    }

    [Fact]
    public void Without_an_input_net_the_order_goes_left_to_right()
    {
        var project = LinkedProject();
        project = project with { Nets = project.Nets.Select(n => n with { Role = SignalRole.None }).ToValueList() };
        var solder = BuildOrder.Steps(project).Where(s => s.Action == "Solder").Select(s => s.What.Split(' ')[0]).ToList();
        // R1 lands from x = 10, R2 from x = 30, C1 from x = 40.
        Assert.Equal(["R1", "R2", "C1"], solder);
        Assert.Contains("left to right", TableText.ToText(BuildOrderTable.Table(project)));
    }

    [Fact]
    public void The_table_carries_glue_and_fume_cautions_and_high_voltage_when_needed()
    {
        var project = LinkedProject();
        var text = TableText.ToText(BuildOrderTable.Table(project));
        Assert.Contains("cyanoacrylate", text, StringComparison.OrdinalIgnoreCase);
        Assert.Contains("flux fume", text, StringComparison.OrdinalIgnoreCase);
        Assert.DoesNotContain("above 50 V", text);
        var hv = project with { Nets = project.Nets.Select(n => n.Name == "MID" ? new Net("MID", Voltage: 250) : n).ToValueList() };
        Assert.Contains("above 50 V", TableText.ToText(BuildOrderTable.Table(hv)));
    }

    /// <summary>IN -R1- MID (pads P2 and P3 joined by link W1) -R2- OUT -C1- ground; pads left to right.</summary>
    public static Project LinkedProject()
    {
        var pads = ValueList.Of<Pad>(
            new RoundPad("P1", "IN", new Point(10, 20), 4.76), new RoundPad("P2", "MID", new Point(20, 20), 4.76),
            new RoundPad("P3", "MID", new Point(30, 20), 4.76), new RectPad("P4", "OUT", new Point(40, 20), 5, 8));
        Placement Place(string reference, double x, params (string Pin, string? Pad, double X)[] leads) =>
            new(reference, new Point(x, 25), Rotation.R0, leads.Select(l => new LeadLanding(l.Pin, l.Pad, new Point(l.X, 20))).ToValueList());
        var layout = new Layout(pads,
            ValueList.Of(Place("R1", 15, ("1", "P1", 10), ("2", "P2", 20)), Place("R2", 35, ("1", "P3", 30), ("2", "P4", 40)), Place("C1", 45, ("1", "P4", 41), ("2", null, 48))),
            ValueList.Of(new Jumper("W1", "P2", "P3")));
        var nets = new[] { Gnd, new Net("IN", Role: SignalRole.Input), new Net("MID"), new Net("OUT", Role: SignalRole.Output) };
        return Project([Part("R1", "10k", "res", "1=IN", "2=MID"), Part("R2", "10k", "res", "1=MID", "2=OUT"), Part("C1", "10n", "cap", "1=OUT", "2=GND")], nets, layout);
    }
}
