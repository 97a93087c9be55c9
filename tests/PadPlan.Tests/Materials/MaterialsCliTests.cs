using PadPlan.Tests.Cli;

namespace PadPlan.Tests.Materials;

public sealed class MaterialsCliTests
{
    [Fact]
    public void Cutlist_prints_the_three_tables_and_exits_0()
    {
        var r = CliRunner.Run("cutlist", TestPaths.TinyBuffer);
        Assert.Equal(0, r.ExitCode);
        Assert.Contains("Round pads to punch", r.Out);
        Assert.Contains("Rectangles and strips to cut", r.Out);
        Assert.Contains("Cutting plan", r.Out);
        Assert.Contains("No stock given", r.Out);
    }

    [Fact]
    public void Cutlist_with_bad_stock_text_exits_2_and_says_what_to_type()
    {
        var r = CliRunner.Run("cutlist", TestPaths.TinyBuffer, "--stock", "100by160");
        Assert.Equal(2, r.ExitCode);
        Assert.Contains("--stock", r.Err);
        Assert.Contains("100x160", r.Err);
        Assert.Equal("", r.Out);
    }

    [Fact]
    public void Cutlist_on_too_small_stock_exits_1_naming_the_pieces()
    {
        // The 6.35 mm disc needs a 7.35 mm square punching strip; a 7 x 7 mm offcut cannot hold it.
        var r = CliRunner.Run("cutlist", TestPaths.TinyBuffer, "--stock", "7x7", "--kerf", "0");
        Assert.Equal(1, r.ExitCode);
        Assert.Contains("stock is too small", r.Err);
        Assert.Contains("D6.35/1.6-1", r.Err);
        Assert.Contains("DOES NOT FIT", r.Out);
    }

    [Fact]
    public void Cutlist_writes_one_csv_per_table()
    {
        var dir = TestPaths.NewTempDir();
        var csv = Path.Combine(dir, "cuts.csv");
        var r = CliRunner.Run("cutlist", TestPaths.TinyBuffer, "--stock", "50x30", "--stock", "40x40", "--csv", csv);
        Assert.Equal(0, r.ExitCode);
        Assert.StartsWith("Punch (mm),Board (mm),Count,Pads\r\n", File.ReadAllText(csv));
        Assert.StartsWith("Piece,Kind,", File.ReadAllText(Path.Combine(dir, "cuts-pieces.csv")));
        Assert.StartsWith("Stock,Piece,", File.ReadAllText(Path.Combine(dir, "cuts-plan.csv")));
    }

    [Fact]
    public void Commands_on_a_project_without_layout_exit_2()
    {
        var dir = TestPaths.NewTempDir();
        var path = Path.Combine(dir, "unplaced.padplan.json");
        var project = PadPlan.ProjectFiles.ProjectFile.Read(TestPaths.TinyBuffer) with { Layout = null };
        PadPlan.ProjectFiles.ProjectFile.Write(project, path);
        var r = CliRunner.Run("cutlist", path);
        Assert.Equal(2, r.ExitCode);
        Assert.Contains("padplan place", r.Err);
    }

    [Fact]
    public void Bom_prints_the_bom_and_with_build_order_the_steps_and_writes_csv_beside()
    {
        var dir = TestPaths.NewTempDir();
        var csv = Path.Combine(dir, "parts.csv");
        var r = CliRunner.Run("bom", TestPaths.TinyBuffer, "--build-order", "--csv", csv);
        Assert.Equal(0, r.ExitCode);
        Assert.Contains("Bill of materials", r.Out);
        Assert.Contains("Build order", r.Out);
        Assert.StartsWith("Qty,Part,Value,Code,Series,Rating,Footprint,References\r\n", File.ReadAllText(csv));
        Assert.StartsWith("Step,Do,What,Where,Note,Done\r\n", File.ReadAllText(Path.Combine(dir, "parts-build-order.csv")));
        var plain = CliRunner.Run("bom", TestPaths.TinyBuffer);
        Assert.DoesNotContain("Build order", plain.Out);
    }

    [Fact]
    public void Testplan_prints_the_sheet_and_rejects_a_bad_threshold()
    {
        var r = CliRunner.Run("testplan", TestPaths.TinyBuffer);
        Assert.Equal(0, r.ExitCode);
        Assert.Contains("Continuity test plan", r.Out);
        Assert.Contains("Paths through parts", r.Out);
        var bad = CliRunner.Run("testplan", TestPaths.TinyBuffer, "--beep-below", "-3");
        Assert.Equal(2, bad.ExitCode);
        Assert.Contains("--beep-below", bad.Err);
    }

    [Fact]
    public void Output_is_the_same_bytes_on_every_run()
    {
        foreach (var command in new[] { "cutlist", "bom", "testplan" })
            Assert.Equal(CliRunner.Run(command, TestPaths.TinyBuffer).Out, CliRunner.Run(command, TestPaths.TinyBuffer).Out);
    }
}
