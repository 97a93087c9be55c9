using System.Xml.Linq;
using PadPlan.Model;
using PadPlan.Output.Drawing;
using PadPlan.Output.Sheets;
using PadPlan.Planning;
using PadPlan.ProjectFiles;
using PadPlan.Tests.Cli;
using PadPlan.Tests.Output;

namespace PadPlan.Tests.Import;

/// <summary>The import summary: printed after import, kept in the project, drawn on the report pages; and the SPICE export of the layout.</summary>
public class ImportSummaryTests
{
    [Fact]
    public void Import_prints_every_source_subcircuit_call_and_assumption()
    {
        var dir = TestPaths.NewTempDir();
        var r = CliRunner.Run("import", SpiceCorpus.PathOf("sub-opamp-numbered"), "-o", Path.Combine(dir, "p.padplan.json"));
        Assert.Equal(0, r.ExitCode);
        Assert.Contains("Import summary", r.Err);
        Assert.Contains("supply 9 V DC, landing W1 (vp, GND)", r.Err);
        Assert.Contains("supply -9 V DC, landing W2 (vn, GND)", r.Err);
        Assert.Contains("AMP8: dip-8, single op-amp pinout", r.Err);
    }

    [Fact]
    public void The_report_pages_carry_the_import_summary_table()
    {
        var project = Placed("src-kept-apart");
        var book = SheetBook.Build(project, SheetFixtures.Options(), null, []);
        var texts = book.Sheets.Where(s => s.Kind == SheetKind.Report)
            .SelectMany(s => XDocument.Parse(SvgWriter.Write(s.Page)).Descendants().Where(e => e.Name.LocalName == "text").Select(e => e.Value)).ToList();
        Assert.Contains(texts, t => t.Contains("Import summary"));
        Assert.Contains(texts, t => t.Contains("nodes kept apart"));
    }

    [Fact]
    public void Export_spice_writes_the_layout_circuit_and_refuses_without_a_target()
    {
        var dir = TestPaths.NewTempDir();
        var file = Path.Combine(dir, "p.padplan.json");
        ProjectFile.Write(Placed("dev-mos-thermal"), file);
        var deck = Path.Combine(dir, "layout.cir");
        var r = CliRunner.Run("export", file, "--spice", deck);
        Assert.True(r.ExitCode == 0, r.Err);
        var text = File.ReadAllText(deck);
        Assert.Contains(".model PWRM VDMOS", text);             // deck lines carried over
        Assert.Contains(".subckt THERM tj tc amb", text);
        Assert.Matches(@"\nMQ1 P\S+ P\S+ P\S+ sim_tn sim_tcn PWRM thermal\n", text); // leads from pads, thermal nodes kept in the simulation
        Assert.Contains("* simulation only, not on the board:\nXth sim_tn sim_tcn 0 THERM", text);
        Assert.Matches(@"\nV1 P\S+ 0 dc 12\n", text);                 // the source back at its landing
        Assert.EndsWith(".end\n", text);
        Assert.Equal(2, CliRunner.Run("export", file).ExitCode);
    }

    private static Project Placed(string deck)
    {
        var result = Placer.Place(SpiceCorpus.Import(deck).Project, new PlacerSettings(Effort: Effort.Quick));
        Assert.True(result.Succeeded, result.Failure?.Message);
        return result.Project!;
    }
}
