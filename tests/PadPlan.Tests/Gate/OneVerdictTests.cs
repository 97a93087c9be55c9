using PadPlan.Model;
using PadPlan.ProjectFiles;
using PadPlan.Rules;
using PadPlan.Tests.Cli;

namespace PadPlan.Tests.Gate;

/// <summary>
/// One verdict from placer to checker: whatever the circuit, `place` exits 0 only when `check` then finds no error, and a failed `place`
/// leaves the project file as it was. Run through the command line on every example, every test netlist and high-voltage cases.
/// </summary>
public class OneVerdictTests
{
    private static string Data(string name) => Path.Combine(TestPaths.RepoRoot, "tests", "PadPlan.Tests", "Import", "Data", name);

    public static TheoryData<string, string?> Netlists()
    {
        var data = new TheoryData<string, string?>
        {
            { Path.Combine(TestPaths.Examples, "xtal-osc-40m", "xtal-osc-40m.ppn"), null },
            { Path.Combine(TestPaths.Examples, "cw-filter", "cw-filter.ppn"), null },
            { Path.Combine(TestPaths.Examples, "jfet-preamp", "jfet-preamp.cir"), Path.Combine(TestPaths.Examples, "jfet-preamp", "parts.json") },
            { Path.Combine(TestPaths.Examples, "valve-stage", "valve-stage.cir"), Path.Combine(TestPaths.Examples, "valve-stage", "parts.json") },
        };
        foreach (var file in Directory.GetFiles(Path.Combine(TestPaths.RepoRoot, "tests", "PadPlan.Tests", "Import", "Data")).Order(StringComparer.Ordinal))
            data.Add(file, null);
        return data;
    }

    [Theory]
    [MemberData(nameof(Netlists))]
    public void Place_exits_0_only_when_check_finds_no_error(string netlist, string? parts)
    {
        var project = Import(netlist, parts);
        AssertOneVerdict(project);
    }

    [Fact]
    public void The_hand_placed_example_placed_afresh_passes_the_check()
    {
        var path = Path.Combine(TestPaths.NewTempDir(), "tiny.padplan.json");
        File.Copy(TestPaths.TinyBuffer, path);
        AssertOneVerdict(path, "--force");
    }

    // A 250 V common-cathode triode stage whose socket has no footprint of its own: it is imported as a generic 8-pin part, so its
    // pins sit on scored strips with the anode (250 V) beside the grid. Invented circuit.
    private const string ValveOnStrip = """
        Triode stage, socket imported as a generic 8-pin part
        VHT HT 0 DC 250
        VIN IN 0 SIN(0 0.5 1k)
        C1 IN GRID 47n
        R1 GRID 0 1meg
        X1 0 0 A GRID K 0 0 0 OCTAL_SOCKET
        R3 K 0 1.5k
        C2 K 0 22u
        R4 HT A 100k
        C4 A OUT 100n
        R6 OUT 0 470k
        IOUT OUT 0 0
        .subckt OCTAL_SOCKET p1 p2 p3 p4 p5 p6 p7 p8
        .ends
        .end
        """;

    [Fact]
    public void A_250_V_valve_socket_on_a_strip_gets_scores_wide_enough_for_IPC_2221_B2()
    {
        var project = ImportText(ValveOnStrip, "valve.cir");
        var placed = AssertOneVerdict(project);
        Assert.True(placed, "the valve stage should place");
        var strips = ProjectFile.Read(project).Layout!.Pads.OfType<StripPad>().ToList();
        var anodeStrip = strips.Single(s => s.Segments.Any(g => g.Net == "A"));
        // IPC-2221B, Table 6-1, B2: 171-250 V needs 1.25 mm between bare external conductors; the score is all there is between segments.
        Assert.True(anodeStrip.ScoreWidth >= 1.25, $"score {anodeStrip.ScoreWidth} mm beside a 250 V anode");
        // The other row carries no high voltage next to another net, so it keeps the toolkit's 0.6 mm score.
        Assert.Contains(strips, s => s.ScoreWidth == 0.6);
        // The builder is told to cut the wider score.
        var cuts = CliRunner.Run("cutlist", project, "--wide");
        Assert.Contains($"each {anodeStrip.ScoreWidth.ToString(System.Globalization.CultureInfo.InvariantCulture)} mm wide", cuts.Out);
    }

    public static TheoryData<string, bool> HighVoltageCases() => new()
    {
        // 150 V between anode and grid: B2 asks 0.6 mm, which the ordinary score gives.
        { ValveOnStrip.Replace("DC 250", "DC 150"), true },
        // 300 V: B2 asks 1.25 mm (251-300 V row); a 2.54 mm pitch still leaves copper for the lead.
        { ValveOnStrip.Replace("DC 250", "DC 300"), true },
        // 400 V: B2 asks 2.5 mm (301-500 V row), more than 1.6 mm stock and more than a 2.54 mm pitch can give: place must refuse.
        { ValveOnStrip.Replace("DC 250", "DC 400"), false },
        // Anode beside a pin on an open-ended net: a net of 0 V beside 250 V, so the strip is still scored wide.
        { ValveOnStrip.Replace("X1 0 0 A GRID K 0 0 0", "X1 0 0 A NC GRID K 0 0").Replace(".ends\n", ".ends\n*padplan open-end NC\n"), true },
    };

    [Theory]
    [MemberData(nameof(HighVoltageCases))]
    public void High_voltage_strips_place_only_when_the_check_agrees(string netlist, bool placeable)
    {
        var project = ImportText(netlist, "hv.cir");
        Assert.Equal(placeable, AssertOneVerdict(project));
    }

    [Fact]
    public void Too_high_a_voltage_between_strip_neighbours_names_the_pins_and_the_table()
    {
        var project = ImportText(ValveOnStrip.Replace("DC 250", "DC 400"), "hv.cir");
        // 3.2 mm stock is thick enough for 400 V over the pad edge (B2: 2.5 mm), so the scores are what fails.
        var thick = ProjectFile.Read(project);
        ProjectFile.Write(thick with { Toolkit = thick.Toolkit with { StockThickness = 3.2 } }, project);
        var run = CliRunner.Run("place", project, "--effort", "quick", "--quiet");
        Assert.Equal(1, run.ExitCode);
        Assert.Contains("X1.3 (net A) and X1.4 (net GRID)", run.Err);
        Assert.Contains("Table 6-1", run.Err);
        Assert.Contains("was not changed", run.Err);
    }

    /// <summary>Places the project and checks it; asserts the two agree and a failed place changed nothing. True when it placed.</summary>
    private static bool AssertOneVerdict(string project, params string[] extra)
    {
        var before = File.ReadAllBytes(project);
        var place = CliRunner.Run(["place", project, "--effort", "quick", "--quiet", .. extra]);
        Assert.True(place.ExitCode is 0 or 1, $"place exit {place.ExitCode}: {place.Err}");
        if (place.ExitCode != 0)
        {
            Assert.Equal(before, File.ReadAllBytes(project));
            Assert.Contains("what to change:", place.Err);
            return false;
        }
        var check = CliRunner.Run("check", project, "--quiet");
        var report = Checker.Check(ProjectFile.Read(project));
        Assert.True(report.Errors == 0, $"place said yes, check says: {string.Join("; ", report.Findings.Where(f => f.Severity == Severity.Error).Select(f => $"{f.RuleId}: {f.Message}"))}");
        Assert.Equal(0, check.ExitCode);
        return true;
    }

    private static string Import(string netlist, string? parts)
    {
        var project = Path.Combine(TestPaths.NewTempDir(), "p.padplan.json");
        var run = parts is null
            ? CliRunner.Run("import", netlist, "-o", project, "--quiet")
            : CliRunner.Run("import", netlist, "--parts", parts, "-o", project, "--quiet");
        Assert.True(run.ExitCode == 0, run.Err);
        return project;
    }

    private static string ImportText(string text, string name)
    {
        var file = Path.Combine(TestPaths.NewTempDir(), name);
        File.WriteAllText(file, text.Replace("\r\n", "\n"));
        return Import(file, null);
    }
}
