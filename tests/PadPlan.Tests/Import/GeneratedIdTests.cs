using PadPlan.Import;
using PadPlan.IO;
using PadPlan.Model;

namespace PadPlan.Tests.Import;

/// <summary>Ids PadPlan makes up (pads P1..., jumpers ST1...) never clash with a part reference from either netlist format.</summary>
public class GeneratedIdTests
{
    private static ImportResult Import(string text, string name) =>
        NetlistImporter.Import(System.Text.Encoding.UTF8.GetBytes(text.Replace("\r\n", "\n")), name, new ImportOptions(FootprintLibrary.Load([])));

    // SPICE element letters (Berkeley SPICE3 / ngspice manual): S is a voltage-controlled switch, which PadPlan cannot place, so
    // an S line is left off the board with a warning and no SPICE element ever becomes a part whose reference starts with the
    // jumper prefix.
    [Fact]
    public void The_SPICE_element_of_the_jumper_prefix_letter_is_left_off_not_made_a_part()
    {
        Assert.Equal('S', GeneratedIds.JumperPrefix[0]);
        var result = Import($"title\n{GeneratedIds.Jumper(1)} a b c d SW\nR1 a b 1k\nR2 c d 1k\n.model SW sw\n.end\n", "t.cir");
        Assert.DoesNotContain(result.Project.Parts, p => p.Ref.StartsWith(GeneratedIds.JumperPrefix, StringComparison.OrdinalIgnoreCase));
        Assert.Contains(result.Notes, n => n.Message.Contains(GeneratedIds.Jumper(1)) && n.Message.Contains("switch"));
        // The letters that do become parts (R C L D Q J M X, and V I as wire landings W1...) are not the jumper prefix's first letter.
        Assert.DoesNotContain(GeneratedIds.JumperPrefix[0], "RCLDQJMXVIW");
    }

    [Fact]
    public void Every_padplan_netlist_reference_prefix_gives_the_jumper_prefix_no_meaning()
    {
        // The reference prefixes the PadPlan netlist knows (docs/netlist-format.md): none is the jumper prefix or starts it.
        foreach (var prefix in new[] { "R", "VR", "RV", "C", "VC", "CV", "TC", "L", "T", "D", "CR", "LED", "Q", "U", "IC", "Y", "XTAL", "J", "W", "P", "CN", "CON" })
        {
            Assert.NotEqual(GeneratedIds.JumperPrefix, prefix);
            Assert.NotNull(PpnReader.KindOf(prefix + "1", null));
        }
        Assert.Null(PpnReader.KindOf(GeneratedIds.Jumper(1), null));
    }

    [Theory]
    [InlineData("ST3 \"a part\" res-axial-250mw 1=A 2=B", "t.ppn", "ST3")]
    [InlineData("st12 \"a part\" res-axial-250mw 1=A 2=B", "t.ppn", "st12")]
    [InlineData("P2 \"wire\" landing-2 1=A 2=B", "t.ppn", "P2")]
    public void Import_refuses_a_reference_of_a_generated_form_naming_file_and_line(string line, string name, string reference)
    {
        var e = Assert.Throws<InputException>(() => Import($"net GND ground\n{line}\nR1 1k 1=A 2=B\n", name));
        Assert.Equal(2, e.Line);
        Assert.Contains($"part reference {reference} has the form PadPlan gives", e.Message);
        Assert.Contains("Rename the part", e.Message);
    }

    [Fact]
    public void A_SPICE_subcircuit_call_that_drops_its_X_into_a_generated_form_is_refused()
    {
        var e = Assert.Throws<InputException>(() => Import("title\nXST2 a b PAIR\nR1 a b 1k\n.subckt PAIR 1 2\n.ends\n.end\n", "t.cir"));
        Assert.Contains("part reference ST2", e.Message);
    }

    [Fact]
    public void References_that_only_begin_like_a_generated_id_are_fine()
    {
        var result = Import("net GND ground\nP2A \"wire\" landing-2 1=A 2=GND\nSTR1 \"strain relief\" res-axial-250mw 1=A 2=B\nR1 1k 1=A 2=B\n", "t.ppn");
        Assert.Contains(result.Project.Parts, p => p.Ref == "P2A");
    }

    [Fact]
    public void Placed_jumpers_get_ST_ids_and_no_id_in_a_layout_is_also_a_part_reference()
    {
        var dir = TestPaths.NewTempDir();
        var project = Path.Combine(dir, "cw.padplan.json");
        Assert.Equal(0, Cli.CliRunner.Run("import", Path.Combine(TestPaths.Examples, "cw-filter", "cw-filter.ppn"), "-o", project, "--quiet").ExitCode);
        Assert.Equal(0, Cli.CliRunner.Run("place", project, "--effort", "quick", "--quiet").ExitCode);
        var placed = PadPlan.ProjectFiles.ProjectFile.Read(project);
        Assert.All(placed.Layout!.Jumpers, j => Assert.Matches($"^{GeneratedIds.JumperPrefix}[0-9]+$", j.Id));
        var refs = placed.Parts.Select(p => p.Ref).ToHashSet(StringComparer.OrdinalIgnoreCase);
        var ids = placed.Layout.Jumpers.Select(j => j.Id).Concat(placed.Layout.Islands().Select(i => i.Id)).Concat(placed.Layout.Pads.Select(p => p.Id));
        Assert.DoesNotContain(ids, refs.Contains);
    }
}
