using PadPlan.ProjectFiles;
using PadPlan.Tests.Cli;

namespace PadPlan.Tests.Regressions;

/// <summary>
/// Regression (issue 25): 13 % of successful fuzz imports wrote a project that `check` then refused (a value, board size,
/// voltage ... out of range). Every project write now goes through <see cref="ProjectFile.ToCheckedBytes"/>, which
/// checks it exactly as reading does: out of range is exit 2 naming the JSON path, and nothing is written.
/// </summary>
public sealed class Regression_WrittenProjectRefused
{
    [Theory]
    [InlineData("n.ppn", "title n\nR1 1k 1={1} 2=GND\nR2 1k 1={1} 2=GND\n", "$.nets[1].name")]
    [InlineData("b.ppn", "title b\nboard 1500x100\nR1 1k 1=A 2=GND\n", "$.board.width")]
    [InlineData("s.cir", "supply\nV1 a 0 DC 1e9\nR1 a 0 1k\n", "$.nets[1].voltage")]
    public void An_import_that_would_write_an_unreadable_project_exits_2_and_writes_nothing(string name, string template, string path)
    {
        var dir = TestPaths.NewTempDir();
        var netlist = Path.Combine(dir, name);
        File.WriteAllText(netlist, string.Format(System.Globalization.CultureInfo.InvariantCulture, template, new string('x', 300), new string('N', 150)));
        var output = Path.Combine(dir, "out.padplan.json");
        var result = CliRunner.Run("import", netlist, "-o", output, "-q");
        Assert.True(result.ExitCode == 2, $"exit {result.ExitCode}: {result.Err}");
        Assert.Contains(path, result.Err, StringComparison.Ordinal);
        Assert.Contains("nothing was written", result.Err, StringComparison.Ordinal);
        Assert.False(File.Exists(output));
    }

    [Fact]
    public void Every_project_that_reads_also_writes_and_the_checked_bytes_are_the_plain_ones()
    {
        var project = ProjectFile.Read(TestPaths.TinyBuffer);
        Assert.Equal(ProjectFile.ToBytes(project), ProjectFile.ToCheckedBytes(project, "t.padplan.json"));
    }

    [Fact]
    public void A_project_out_of_range_is_refused_before_writing_naming_the_path()
    {
        var project = ProjectFile.Read(TestPaths.TinyBuffer);
        var wide = project with { Description = new string('d', 2001) };
        var file = Path.Combine(TestPaths.NewTempDir(), "w.padplan.json");
        var e = Assert.Throws<PadPlan.IO.InputException>(() => ProjectFile.Write(wide, file));
        Assert.Equal("$.description", e.JsonPath);
        Assert.False(File.Exists(file));
    }
}
