using PadPlan.Import;
using PadPlan.Model;
using PadPlan.Rules;

namespace PadPlan.Tests.Rules;

/// <summary>A net with one connection joins nothing: an error, unless the netlist marks it open-ended (a test point, an antenna lead).</summary>
public class SingleConnectionTests
{
    private static Project Imported(string text, string name)
    {
        var netlist = NetlistImporter.Read(System.Text.Encoding.UTF8.GetBytes(text.Replace("\r\n", "\n")), name);
        return ProjectBuilder.Build(netlist, new ImportOptions(FootprintLibrary.Load([]), null, null, [])).Project;
    }

    private static List<Finding> Findings(Project project) =>
        Checker.Check(project with { Layout = Layout.Empty }).Findings.Where(f => f.RuleId == RuleIds.SingleConnection).ToList();

    private const string Ppn = """
        net GND ground
        R1 10k 1=A 2=B
        R2 10k 1=B 2=GND
        J1 "probe" 1=A
        R3 1k 1=B 2=TP
        """;

    [Fact]
    public void A_net_with_one_connection_is_an_error_naming_it()
    {
        var f = Assert.Single(Findings(Imported(Ppn, "t.ppn")));
        Assert.Equal(Severity.Error, f.Severity);
        Assert.Contains("net TP has only one connection (R3.2)", f.Message);
        Assert.Contains("open-ended", f.Hint);
    }

    [Fact]
    public void Marked_open_ended_in_a_padplan_netlist_it_is_only_a_note()
    {
        var project = Imported(Ppn + "\nnet TP open-end\n", "t.ppn");
        Assert.True(project.FindNet("TP")!.OpenEnded);
        Assert.Equal(Severity.Info, Assert.Single(Findings(project)).Severity);
    }

    private const string Spice = """
        Antenna preamp input, invented
        L1 ant in 1u
        C1 in 0 100p
        R1 in out 1k
        R2 out 0 1k
        R3 out tp 100
        """;

    [Fact]
    public void Marked_open_ended_by_the_SPICE_comment_line_it_is_only_a_note_and_import_does_not_warn()
    {
        var plain = Imported(Spice + "\n.end\n", "t.cir");
        Assert.Equal(2, Findings(plain).Count(f => f.Severity == Severity.Error));

        var netlist = NetlistImporter.Read(System.Text.Encoding.UTF8.GetBytes(Spice + "\n*PadPlan open-end ANT, tp\n.end\n"), "t.cir");
        var result = ProjectBuilder.Build(netlist, new ImportOptions(FootprintLibrary.Load([]), null, null, []));
        Assert.All(Findings(result.Project), f => Assert.Equal(Severity.Info, f.Severity));
        Assert.True(result.Project.FindNet("ant")!.OpenEnded);
        Assert.DoesNotContain(result.Notes, n => n.Describe().Contains("only one connection"));
    }

    [Fact]
    public void Marked_open_ended_in_a_parts_map_it_is_only_a_note()
    {
        var dir = TestPaths.NewTempDir();
        var map = Path.Combine(dir, "parts.json");
        File.WriteAllText(map, """{ "format": "padplan-parts/1", "nets": { "ant": { "openEnded": true }, "tp": { "openEnded": true } } }""");
        var library = FootprintLibrary.Load([]);
        var netlist = NetlistImporter.Read(System.Text.Encoding.UTF8.GetBytes(Spice + "\n.end\n"), "t.cir");
        var project = ProjectBuilder.Build(netlist, new ImportOptions(library, PartsMap.Read(map, library))).Project;
        Assert.All(Findings(project), f => Assert.Equal(Severity.Info, f.Severity));
        Assert.Equal(2, Findings(project).Count);
    }

    [Fact]
    public void The_marker_survives_the_project_file()
    {
        var project = Imported(Ppn + "\nnet TP open-end\n", "t.ppn");
        var path = Path.Combine(TestPaths.NewTempDir(), "t.padplan.json");
        PadPlan.ProjectFiles.ProjectFile.Write(project, path);
        Assert.Contains("\"openEnded\": true", File.ReadAllText(path));
        Assert.True(PadPlan.ProjectFiles.ProjectFile.Read(path).FindNet("TP")!.OpenEnded);
    }

    [Fact]
    public void Place_refuses_a_circuit_with_a_lone_connection_before_placing_and_changes_nothing()
    {
        var dir = TestPaths.NewTempDir();
        var netlist = Path.Combine(dir, "t.ppn");
        File.WriteAllText(netlist, Ppn);
        var project = Path.Combine(dir, "t.padplan.json");
        Assert.Equal(0, Cli.CliRunner.Run("import", netlist, "-o", project, "--quiet").ExitCode);
        var before = File.ReadAllBytes(project);
        var run = Cli.CliRunner.Run("place", project, "--quiet");
        Assert.Equal(1, run.ExitCode);
        Assert.Contains("single-connection", run.Err);
        Assert.Contains("net TP", run.Err);
        Assert.Equal(before, File.ReadAllBytes(project));
    }
}
