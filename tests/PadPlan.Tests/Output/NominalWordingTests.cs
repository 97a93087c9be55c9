using PadPlan.Import;
using PadPlan.Model;
using PadPlan.Output.Tables;
using PadPlan.ProjectFiles;
using PadPlan.Tests.Cli;

namespace PadPlan.Tests.Output;

/// <summary>Where footprint figures are nominal (not a published outline), what builders read says so; the footprint's source keeps the provenance.</summary>
public class NominalWordingTests
{
    [Fact]
    public void The_footprint_view_warns_for_a_typical_footprint_and_not_for_a_JEDEC_outline()
    {
        var typical = CliRunner.Run("footprints", "res-axial-250mw");
        Assert.Equal(0, typical.ExitCode);
        Assert.Contains(Footprint.NominalWarning, typical.Out);
        Assert.Contains("source   typical", typical.Out);

        // JEDEC MS-001: the DIP outline is a published standard.
        var dip = CliRunner.Run("footprints", "dip-8");
        Assert.Equal(0, dip.ExitCode);
        Assert.DoesNotContain(Footprint.NominalWarning, dip.Out);
    }

    [Fact]
    public void The_bill_of_materials_names_the_nominal_footprints_it_uses()
    {
        var project = ProjectFile.Read(TestPaths.TinyBuffer);
        var notes = BomTable.From(project).Notes;
        var note = Assert.Single(notes, n => n.Contains(Footprint.NominalWarning));
        foreach (var f in project.Footprints.Where(f => f.Mount != MountStyle.Landing))
            Assert.Equal(f.IsNominal, note.Contains(f.Name + ",") || note.Contains(f.Name + ":"));
    }

    [Fact]
    public void No_footprint_source_points_outside_the_repository()
    {
        foreach (var f in FootprintLibrary.Load([]).Footprints)
            Assert.DoesNotContain("DOMAIN", f.Source);
    }
}
