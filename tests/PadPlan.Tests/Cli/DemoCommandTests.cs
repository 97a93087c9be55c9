using PadPlan.Cli.Commands;
using PadPlan.ProjectFiles;

namespace PadPlan.Tests.Cli;

/// <summary>`padplan demo` runs the whole pipeline from a bundled netlist to printed sheets.</summary>
public sealed class DemoCommandTests
{
    [Fact]
    public void The_demo_writes_every_promised_file_and_the_plan_checks_clean()
    {
        var dir = TestPaths.NewTempDir();
        var result = CliRunner.Run("demo", "-o", dir, "--date", "2026-01-15");
        Assert.True(result.ExitCode == 0, result.Err);
        foreach (var name in DemoCommand.TextFiles.Concat(["sheets.pdf", "template-1.svg", "assembly-1.png", "xtal-osc-40m" + ProjectFile.Extension]))
            Assert.True(new FileInfo(Path.Combine(dir, name)).Length > 0, $"{name} is missing or empty");
        Assert.Contains("0 error(s)", File.ReadAllText(Path.Combine(dir, "check.txt")));
        var project = ProjectFile.Read(Path.Combine(dir, "xtal-osc-40m" + ProjectFile.Extension));
        Assert.NotNull(project.Layout);
        Assert.Equal(project.Parts.Count, project.Layout!.Placements.Count);
    }

    [Fact]
    public void Two_demo_runs_give_identical_files()
    {
        var a = TestPaths.NewTempDir();
        var b = TestPaths.NewTempDir();
        Assert.Equal(0, CliRunner.Run("demo", "-o", a, "--date", "2026-01-15", "--example", "jfet-preamp").ExitCode);
        Assert.Equal(0, CliRunner.Run("demo", "-o", b, "--date", "2026-01-15", "--example", "jfet-preamp").ExitCode);
        var names = Directory.GetFiles(a).Select(Path.GetFileName).Order(StringComparer.Ordinal).ToList();
        Assert.Equal(names, Directory.GetFiles(b).Select(Path.GetFileName).Order(StringComparer.Ordinal).ToList());
        foreach (var name in names)
            Assert.True(File.ReadAllBytes(Path.Combine(a, name!)).SequenceEqual(File.ReadAllBytes(Path.Combine(b, name!))), $"{name} differs between runs");
    }
}
