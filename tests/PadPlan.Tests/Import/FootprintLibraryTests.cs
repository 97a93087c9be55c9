using PadPlan.Import;
using PadPlan.IO;
using PadPlan.Model;

namespace PadPlan.Tests.Import;

public class FootprintLibraryTests
{
    private static FootprintLibrary Lib => ImportFixture.Library;

    [Fact]
    public void Holds_at_least_thirty_footprints_each_with_a_source()
    {
        Assert.True(Lib.Footprints.Count >= 30, $"only {Lib.Footprints.Count} footprints");
        Assert.All(Lib.Footprints, f => Assert.False(string.IsNullOrWhiteSpace(f.Source), f.Name));
    }

    [Theory]
    [InlineData("res-axial-125mw"), InlineData("res-axial-250mw"), InlineData("res-axial-500mw"), InlineData("res-axial-1w"), InlineData("res-axial-2w")]
    [InlineData("diode-glass-do35"), InlineData("diode-plastic-do41")]
    [InlineData("cap-disc-2.5mm"), InlineData("cap-disc-5mm")]
    [InlineData("cap-film-5mm"), InlineData("cap-film-7.5mm"), InlineData("cap-film-10mm"), InlineData("cap-film-15mm")]
    [InlineData("cap-elec-5mm"), InlineData("cap-elec-6.3mm"), InlineData("cap-elec-8mm"), InlineData("cap-elec-10mm"), InlineData("cap-elec-12.5mm")]
    [InlineData("choke-axial"), InlineData("choke-radial")]
    [InlineData("toroid-10mm-2"), InlineData("toroid-13mm-4"), InlineData("toroid-18mm-6")]
    [InlineData("to92"), InlineData("to92-wide"), InlineData("to126"), InlineData("to220")]
    [InlineData("dip-8"), InlineData("dip-14"), InlineData("dip-16")]
    [InlineData("trimmer-pot"), InlineData("trimmer-cap"), InlineData("hc49-u"), InlineData("hc49-s"), InlineData("led-3mm"), InlineData("led-5mm")]
    [InlineData("landing-1"), InlineData("landing-8")]
    public void Has_the_footprints_the_issue_asks_for(string name) => Assert.NotNull(Lib.Find(name));

    // IPC-A-610 / J-STD-001 lead forming (DOMAIN §3): straight run >= 1 d and >= 0.8 mm, inside bend radius
    // 1 d below 0.8 mm, 1.5 d up to 1.2 mm, 2 d above; reach = straight + radius + d/2.
    [Theory]
    [InlineData("res-axial-250mw", 0.6, 1.7)]        // 0.8 + 0.6 + 0.3
    [InlineData("diode-plastic-do41", 0.85, 2.55)]   // 0.85 + 1.275 + 0.425
    [InlineData("diode-plastic-do201", 1.3, 4.55)]   // 1.3 + 2.6 + 0.65
    public void Axial_minimum_reach_follows_the_lead_forming_rule(string name, double diameter, double reach)
    {
        var f = Lib.Find(name)!;
        Assert.Equal(MountStyle.Axial, f.Mount);
        Assert.All(f.Leads, l => Assert.Equal(diameter, l.Diameter, 3));
        Assert.All(f.Leads, l => Assert.Equal(reach, l.MinReach, 3));
    }

    [Theory]
    [InlineData("dip-8", 8), InlineData("dip-14", 14), InlineData("dip-16", 16)]
    public void Dip_leads_sit_on_the_jedec_grid_and_reach_only_their_strip_segment(string name, int pins)
    {
        // JEDEC MS-001: 2.54 mm pitch, 7.62 mm between rows; pin 1 top left, numbered down and back up.
        var f = Lib.Find(name)!;
        Assert.Equal(MountStyle.Strip, f.Mount);
        Assert.Equal(pins, f.Leads.Count);
        for (var i = 1; i < pins / 2; i++) Assert.Equal(2.54, f.Leads[i].Exit.Y - f.Leads[i - 1].Exit.Y, 6);
        Assert.Equal(7.62, f.Leads[pins - 1].Exit.X - f.Leads[0].Exit.X, 6);
        Assert.Equal(f.Leads[0].Exit.Y, f.Leads[pins - 1].Exit.Y, 6);
        Assert.All(f.Leads, l => Assert.True(l.MinReach == 0 && l.MaxReach <= 1.5));
    }

    [Fact]
    public void To220_outer_leads_are_5_08_mm_apart() // JEDEC TO-220AB (DOMAIN §4)
    {
        var f = Lib.Find("to220")!;
        Assert.Equal(5.08, f.Leads[2].Exit.X - f.Leads[0].Exit.X, 6);
    }

    [Theory] // radial electrolytic can diameter -> lead spacing, DOMAIN §4 (typical, common practice)
    [InlineData("cap-elec-5mm", 2.0), InlineData("cap-elec-6.3mm", 2.5), InlineData("cap-elec-8mm", 3.5), InlineData("cap-elec-10mm", 5.0), InlineData("cap-elec-12.5mm", 5.0)]
    public void Electrolytic_lead_spacing_follows_the_can_size(string name, double spacing)
    {
        var f = Lib.Find(name)!;
        Assert.Equal(spacing, f.Leads[1].Exit.X - f.Leads[0].Exit.X, 6);
        Assert.Equal(["+", "-"], f.Leads.Select(l => l.Name));
    }

    [Fact]
    public void An_unknown_name_suggests_the_nearest_ones()
    {
        var e = Assert.Throws<InputException>(() => Lib.Require("to-92", "x.ppn", 4));
        Assert.Equal(4, e.Line);
        Assert.Contains("to92", e.Message);
        // a size typed short ("6mm" for the 6.3 mm can) is named among the three: of the names two edits away, those that
        // begin as the typed one does come first
        var can = Assert.Throws<InputException>(() => Lib.Require("cap-elec-6mm", "x.ppn", 4));
        Assert.Contains("cap-elec-6.3mm", can.Message);
    }

    [Fact]
    public void A_users_folder_adds_footprints_and_may_not_redefine_a_bundled_one()
    {
        var dir = TestPaths.NewTempDir();
        var own = File.ReadAllText(Path.Combine(TestPaths.Footprints, "leds.json")).Replace("\"led-3mm\"", "\"led-3mm-green\"").Replace("\"led-5mm\"", "\"led-5mm-green\"");
        File.WriteAllText(Path.Combine(dir, "mine.json"), own);
        Assert.NotNull(FootprintLibrary.Load([dir]).Find("led-5mm-green"));

        File.WriteAllText(Path.Combine(dir, "mine.json"), File.ReadAllText(Path.Combine(TestPaths.Footprints, "leds.json")));
        var e = Assert.Throws<InputException>(() => FootprintLibrary.Load([dir]));
        Assert.Contains("already defined", e.Message);
        Assert.NotNull(e.Line);
    }
}
