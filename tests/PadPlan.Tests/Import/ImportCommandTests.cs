using PadPlan.ProjectFiles;
using PadPlan.Tests.Cli;

namespace PadPlan.Tests.Import;

public class ImportCommandTests
{
    private static string Write(string dir, string name, string text)
    {
        var path = Path.Combine(dir, name);
        File.WriteAllText(path, text);
        return path;
    }

    [Fact]
    public void Imports_every_netlist_in_the_test_data_and_the_examples_into_a_readable_project()
    {
        var netlists = new[] { ImportFixture.DataDir, TestPaths.Examples }
            .SelectMany(d => Directory.EnumerateFiles(d, "*", SearchOption.AllDirectories))
            .Where(f => Path.GetExtension(f) is ".ppn" or ".cir" or ".sp" or ".spice" || f.EndsWith(".net", StringComparison.Ordinal))
            .Order(StringComparer.Ordinal).ToList();
        Assert.True(netlists.Count >= 5);
        var dir = TestPaths.NewTempDir();
        foreach (var netlist in netlists)
        {
            var output = Path.Combine(dir, Path.GetFileName(netlist) + ".padplan.json");
            var r = CliRunner.Run("import", netlist, "-o", output);
            Assert.True(r.ExitCode == 0, $"{netlist}: {r.Err}");
            var project = ProjectFile.Read(output);
            Assert.NotEmpty(project.Parts);
            Assert.All(project.Parts, p => Assert.NotNull(project.FindFootprint(p.Footprint)));
        }
    }

    [Fact]
    public void Same_netlist_gives_byte_identical_projects()
    {
        var dir = TestPaths.NewTempDir();
        var a = Path.Combine(dir, "a.padplan.json");
        var b = Path.Combine(dir, "b.padplan.json");
        Assert.Equal(0, CliRunner.Run("import", ImportFixture.Data("every-element.cir"), "-o", a).ExitCode);
        Assert.Equal(0, CliRunner.Run("import", ImportFixture.Data("every-element.cir"), "-o", b).ExitCode);
        Assert.Equal(File.ReadAllBytes(a), File.ReadAllBytes(b));
    }

    [Fact]
    public void Board_option_sets_the_size_and_an_existing_output_is_kept_without_force()
    {
        var dir = TestPaths.NewTempDir();
        var output = Path.Combine(dir, "p.padplan.json");
        Assert.Equal(0, CliRunner.Run("import", ImportFixture.Data("coupled.cir"), "-o", output, "--board", "60x40").ExitCode);
        Assert.Equal((60.0, 40.0), (ProjectFile.Read(output).Board.Width!.Value, ProjectFile.Read(output).Board.Height!.Value));
        var before = File.ReadAllBytes(output);
        var again = CliRunner.Run("import", ImportFixture.Data("dual-opamp.cir"), "-o", output);
        Assert.Equal(2, again.ExitCode);
        Assert.Equal(before, File.ReadAllBytes(output));
        Assert.Equal(0, CliRunner.Run("import", ImportFixture.Data("dual-opamp.cir"), "-o", output, "--force").ExitCode);
    }

    [Theory]
    [InlineData("bad.cir", "title\nR1 a 0 1k\n&1 a 0 x\n", ":3:", "unknown element letter")]
    [InlineData("bad.cir", "title\nR1 a 0 1k\nC1 a\n", ":3:", "missing nodes")]
    [InlineData("bad.cir", "title\n+ continued\n", ":2:", "continuation")]
    [InlineData("bad.cir", "title\nR1 a 0 1k\nR2 a 0 abc\n", ":3:", "bad value")]
    [InlineData("bad.ppn", "R1 1k 1=A 2=GND\nC1 1n cap-disk-5mm 1=A 2=GND\n", ":2:", "cap-disc-5mm")]
    [InlineData("bad.ppn", "R1 1k 1=A 2=GND\nQ1 NPN to92 C=A B=A X=GND\n", ":2:", "do not match footprint")]
    [InlineData("bad.cir", "title\nR1 a 0 1k\nR1 a 0 2k\n", ":3:", "duplicate reference")]
    public void Bad_input_exits_2_with_file_line_and_a_plain_message(string name, string text, string line, string message)
    {
        var dir = TestPaths.NewTempDir();
        var netlist = Write(dir, name, text);
        var output = Path.Combine(dir, "out.padplan.json");
        var r = CliRunner.Run("import", netlist, "-o", output);
        Assert.Equal(2, r.ExitCode);
        Assert.Contains($"{name}{line}", r.Err);
        Assert.Contains(message, r.Err);
        Assert.DoesNotContain("internal error", r.Err);
        Assert.False(File.Exists(output));
    }

    [Fact]
    public void Binary_garbage_exits_2()
    {
        var dir = TestPaths.NewTempDir();
        var netlist = Path.Combine(dir, "garbage.cir");
        File.WriteAllBytes(netlist, [0x7f, 0x45, 0x4c, 0x46, 0x02, 0x01, 0x01, 0x00, 0x00, 0xff]);
        var r = CliRunner.Run("import", netlist, "-o", Path.Combine(dir, "o.padplan.json"));
        Assert.Equal(2, r.ExitCode);
        Assert.Contains("garbage.cir:1:", r.Err);
        Assert.Contains("not a text netlist", r.Err);
    }

    [Fact]
    public void A_net_with_one_connection_is_printed_as_a_warning_and_exits_0()
    {
        var dir = TestPaths.NewTempDir();
        var netlist = Write(dir, "lonely.ppn", "R1 1k 1=A 2=GND\nR2 1k 1=A 2=NOWHERE\n");
        var r = CliRunner.Run("import", netlist, "-o", Path.Combine(dir, "o.padplan.json"));
        Assert.Equal(0, r.ExitCode);
        Assert.Contains("warning:", r.Err);
        Assert.Contains("NOWHERE has only one connection", r.Err);
    }

    [Fact]
    public void A_parts_map_and_a_users_footprint_folder_are_used_and_recorded()
    {
        var dir = TestPaths.NewTempDir();
        var own = Directory.CreateDirectory(Path.Combine(dir, "my-footprints")).FullName;
        File.WriteAllText(Path.Combine(own, "big.json"), File.ReadAllText(Path.Combine(TestPaths.Footprints, "resistors.json")).Replace("\"res-axial-", "\"big-res-axial-"));
        var map = Write(dir, "parts.json", """{ "format": "padplan-parts/1", "parts": { "R1": { "footprint": "big-res-axial-2w", "value": "1k 2 W" } }, "nets": { "a": { "class": "rf", "maxLead": 4 } } }""");
        var netlist = Write(dir, "c.cir", "title\nR1 a 0 1k\nC1 a 0 1n\n");
        var output = Path.Combine(dir, "o.padplan.json");
        var r = CliRunner.Run("import", netlist, "-o", output, "--parts", map, "--footprints", own);
        Assert.True(r.ExitCode == 0, r.Err);
        var p = ProjectFile.Read(output);
        Assert.Equal(("big-res-axial-2w", "1k 2 W"), (p.FindPart("R1")!.Footprint, p.FindPart("R1")!.Value));
        Assert.Equal((PadPlan.Model.NetClass.Rf, 4.0), (p.FindNet("a")!.Class, p.FindNet("a")!.MaxLead!.Value));
        Assert.Equal(["my-footprints"], p.FootprintDirs);
        Assert.NotNull(p.FindFootprint("big-res-axial-2w"));
    }

    [Fact]
    public void A_footprints_line_in_a_ppn_names_a_folder_relative_to_the_netlist()
    {
        var dir = TestPaths.NewTempDir();
        var own = Directory.CreateDirectory(Path.Combine(dir, "parts")).FullName;
        File.WriteAllText(Path.Combine(own, "mine.json"), File.ReadAllText(Path.Combine(TestPaths.Footprints, "leds.json")).Replace("\"led-", "\"panel-led-"));
        var netlist = Write(dir, "n.ppn", "footprints parts\nLED1 red panel-led-5mm A=V K=K1\nR1 1k 1=K1 2=GND\nJ1 supply 1=V 2=GND\n");
        var output = Path.Combine(dir, "out", "n.padplan.json");
        var r = CliRunner.Run("import", netlist, "-o", output);
        Assert.True(r.ExitCode == 0, r.Err);
        var p = ProjectFile.Read(output);
        Assert.Equal("panel-led-5mm", p.FindPart("LED1")!.Footprint);
        Assert.Equal(["../parts"], p.FootprintDirs);
    }

    [Fact]
    public void Footprints_lists_one_a_line_and_shows_details()
    {
        var list = CliRunner.Run("footprints");
        Assert.Equal(0, list.ExitCode);
        var lines = list.Out.Split('\n', StringSplitOptions.RemoveEmptyEntries);
        Assert.Equal(ImportFixture.Library.Footprints.Count + 1, lines.Length);
        var one = CliRunner.Run("footprints", "dip-8");
        Assert.Equal(0, one.ExitCode);
        Assert.Contains("JEDEC MS-001", one.Out);
        var none = CliRunner.Run("footprints", "dip8");
        Assert.Equal(2, none.ExitCode);
        Assert.Contains("dip-8", none.Err);
    }
}
