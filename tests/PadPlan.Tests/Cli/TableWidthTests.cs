using System.Diagnostics;
using PadPlan.Cli;
using PadPlan.Output.Tables;
using PadPlan.ProjectFiles;
using PadPlan.Tests.Output;

namespace PadPlan.Tests.Cli;

/// <summary>
/// Text tables fit the terminal: COLUMNS (the POSIX shell variable, IEEE Std 1003.1 "Environment Variables"), else
/// the console's width, else 80 columns; long cells wrap inside their column; --wide keeps one line per row.
/// </summary>
public sealed class TableWidthTests
{
    public static TheoryData<string> Examples => ["tiny-buffer", "cw-filter", "valve-stage"];

    private static string Placed(string example)
    {
        var file = Path.Combine(TestPaths.NewTempDir(), example + ProjectFile.Extension);
        File.WriteAllBytes(file, ProjectFile.ToBytes(ExampleProjects.Placed(example)));
        return file;
    }

    private static int Longest(string text) => text.Split('\n').Max(l => l.TrimEnd('\r').Length);

    [Theory]
    [MemberData(nameof(Examples))]
    public void At_80_columns_no_table_command_prints_a_line_over_80_characters(string example)
    {
        var file = Placed(example);
        foreach (var args in new[] { new[] { "check", file }, ["bom", file, "--build-order"], ["cutlist", file], ["testplan", file] })
        {
            var result = CliRunner.RunAt(80, args);
            Assert.True(result.ExitCode is 0 or 1, result.Err);
            Assert.True(Longest(result.Out) <= 80, $"{args[0]}: a line of {Longest(result.Out)} characters:\n{result.Out}");
            Assert.True(Longest(result.Err) <= 80, $"{args[0]} (stderr): a line of {Longest(result.Err)} characters:\n{result.Err}");
        }
    }

    [Fact]
    public void Wide_keeps_one_line_per_row_and_the_same_cells()
    {
        var file = Placed("cw-filter");
        var wide = CliRunner.RunAt(80, "bom", file, "--wide").Out;
        var fitted = CliRunner.RunAt(80, "bom", file).Out;
        var table = BomTable.From(ProjectFile.Read(file));
        Assert.Equal(TableText.ToText(table), wide);
        // title, header, rule, one line per row, then the notes
        Assert.Equal(3 + table.Rows.Count + table.Notes.Count, wide.TrimEnd('\n').Split('\n').Length);
        Assert.True(Longest(wide) > 80, "the BOM of the CW filter is wider than 80 columns, so this test would not show wrapping");
        // every character of every cell is still there after wrapping (words longer than their column are split, not cut)
        Assert.Equal(Letters(wide), Letters(fitted));
        Assert.True(Longest(fitted) <= 80);
    }

    private static string Letters(string text) => new([.. text.Where(c => !char.IsWhiteSpace(c) && c != '-').Order()]);

    [Theory]
    [InlineData("100", 80, 100)]
    [InlineData(null, 132, 132)]
    [InlineData(null, null, 80)]
    [InlineData("", null, 80)]
    [InlineData("wide", 120, 120)]
    [InlineData("10", null, TerminalWidth.Narrowest)]
    public void The_width_comes_from_columns_then_the_console_then_80(string? columns, int? console, int expected) =>
        Assert.Equal(expected, TerminalWidth.Resolve(columns, console));

    [Fact]
    public void Wrapping_breaks_at_spaces_and_cuts_only_words_longer_than_the_column()
    {
        Assert.Equal(["lay the", "strip"], TableText.Wrap("lay the strip", 8));
        Assert.Equal(["abcdefgh", "ij k"], TableText.Wrap("abcdefghij k", 8));
        // a hyphenated name longer than the column breaks after its last hyphen that fits, not inside a piece
        Assert.Equal(["res-axial-", "250mw"], TableText.Wrap("res-axial-250mw", 12));
        Assert.Equal(["res-", "axial-", "250mw"], TableText.Wrap("res-axial-250mw", 6));
    }

    /// <summary>
    /// At 80 columns a table whose columns cannot all hold their longest word whole (the tiny buffer's BOM) is given widths
    /// that hold every piece of a hyphenated name, so nothing is cut inside a piece ("res-axial-25" / "0mw" before).
    /// </summary>
    [Fact]
    public void A_table_too_wide_for_whole_words_wraps_after_hyphens_and_cuts_nothing()
    {
        var table = BomTable.From(ProjectFile.Read(TestPaths.TinyBuffer));
        var text = TableText.ToText(table, 80);
        Assert.True(Longest(text) <= 80);
        Assert.Contains("res-axial-", text);
        Assert.DoesNotContain("0mw", text.Replace("250mw", ""));
    }

    [Fact]
    public void The_program_reads_COLUMNS_from_its_environment()
    {
        var dll = typeof(PadPlanCli).Assembly.Location;
        var file = Placed("cw-filter");
        var start = new ProcessStartInfo("dotnet") { RedirectStandardOutput = true, RedirectStandardError = true };
        foreach (var a in new[] { dll, "testplan", file }) start.ArgumentList.Add(a);
        start.Environment["COLUMNS"] = "60";
        using var process = Process.Start(start)!;
        var output = process.StandardOutput.ReadToEnd();
        process.StandardError.ReadToEnd();
        process.WaitForExit();
        Assert.Equal(0, process.ExitCode);
        Assert.True(Longest(output) <= 60, output);
        Assert.True(Longest(output) > 40, "the test plan should use the width it is given");
    }
}
