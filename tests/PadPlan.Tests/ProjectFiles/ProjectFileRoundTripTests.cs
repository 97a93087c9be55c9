using PadPlan.Model;
using PadPlan.ProjectFiles;

namespace PadPlan.Tests.ProjectFiles;

public sealed class ProjectFileRoundTripTests
{
    [Fact]
    public void Project_to_json_to_project_gives_an_equal_value()
    {
        var project = ProjectFile.Read(TestPaths.TinyBuffer);
        var again = ProjectFile.Parse(ProjectFile.ToBytes(project), "memory");
        Assert.Equal(project, again);
    }

    [Theory]
    [InlineData("dev-mos-thermal")]      // thermal nodes with no lead, a left-off subcircuit call
    [InlineData("dev-behavioural")]      // left-off elements with no nodes
    [InlineData("sub-opamp-numbered")]   // a pinout, .subckt deck lines
    public void Round_trip_keeps_the_import_record(string deck)
    {
        var project = PadPlan.Tests.Import.SpiceCorpus.Import(deck).Project;
        Assert.NotEmpty(project.Imported!.Summary);
        Assert.NotEmpty(project.Imported.Elements);
        var again = ProjectFile.Parse(ProjectFile.ToBytes(project), "memory");
        Assert.Equal(project, again);
    }

    [Fact]
    public void Round_trip_keeps_every_kind_of_pad_keepout_and_jumper()
    {
        var project = SampleProjects.WithEveryShape();
        var again = ProjectFile.Parse(ProjectFile.ToBytes(project), "memory");
        Assert.Equal(project, again);
        Assert.Equal(3, again.Layout!.Pads.Count);
        Assert.IsType<StripPad>(again.Layout.Pads[2]);
    }

    [Fact]
    public void Writing_the_same_project_twice_gives_identical_bytes()
    {
        var dir = TestPaths.NewTempDir();
        var project = ProjectFile.Read(TestPaths.TinyBuffer);
        var a = Path.Combine(dir, "a.padplan.json");
        var b = Path.Combine(dir, "b.padplan.json");
        ProjectFile.Write(project, a);
        ProjectFile.Write(ProjectFile.Read(a), b);
        Assert.Equal(File.ReadAllBytes(a), File.ReadAllBytes(b));
    }

    [Fact]
    public void The_bundled_example_is_stored_in_canonical_form()
    {
        // The fixture is written by ProjectFile.Write, so reading and writing it changes nothing.
        var bytes = File.ReadAllBytes(TestPaths.TinyBuffer);
        Assert.Equal(bytes, ProjectFile.ToBytes(ProjectFile.Parse(bytes, "tiny")));
    }

    [Fact]
    public void Writing_leaves_no_temporary_files_behind()
    {
        var dir = TestPaths.NewTempDir();
        ProjectFile.Write(ProjectFile.Read(TestPaths.TinyBuffer), Path.Combine(dir, "p.padplan.json"));
        Assert.Equal(["p.padplan.json"], Directory.GetFiles(dir).Select(Path.GetFileName));
    }
}
