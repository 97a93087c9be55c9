using System.Text;
using PadPlan.Import;
using PadPlan.IO;
using PadPlan.Model;
using PadPlan.ProjectFiles;
using Xunit;

namespace PadPlan.Tests.ProjectFiles;

/// <summary>The per-footprint "marks" field: read from library files, kept through a project file, and a mark at a lead the footprint lacks is refused with its JSON path.</summary>
public class FootprintMarkFileTests
{
    private static string File(string marks) => $$"""
        { "format": "padplan-footprints/1", "family": "diodes", "footprints": [ {
          "name": "d", "mount": "axial", "height": 2, "body": [[-2,-1],[2,-1],[2,1],[-2,1]],
          "leads": [ { "name": "A", "exit": [-2,0], "diameter": 0.5, "minReach": 1.6, "maxReach": 20 },
                     { "name": "K", "exit": [2,0], "diameter": 0.5, "minReach": 1.6, "maxReach": 20 } ],
          "marks": {{marks}} } ] }
        """;

    [Fact]
    public void Marks_are_read_with_their_kind_and_lead()
    {
        var (footprint, _) = Assert.Single(FootprintFileReader.Parse(Encoding.UTF8.GetBytes(File("""[ { "kind": "band", "lead": "K" } ]""")), "d.json"));
        Assert.Equal(new FootprintMark(MarkKind.Band, "K"), Assert.Single(footprint.Marks));
        var back = new DtoReader("x", []).Footprint(DtoWriter.Footprint(footprint, includeFamily: true), "$");
        Assert.Equal(footprint.Marks, back.Marks);
    }

    [Theory]
    [InlineData("""[ { "kind": "band", "lead": "C" } ]""", "$.footprints[0]", "lead 'C', which the footprint does not have; use one of A, K")]
    [InlineData("""[ { "kind": "stripe", "lead": "K" } ]""", "$.footprints[0].marks[0].kind", "\"winding\"")]
    public void A_bad_mark_names_its_place_and_the_choices(string marks, string path, string hint)
    {
        var e = Assert.Throws<InputException>(() => FootprintFileReader.Parse(Encoding.UTF8.GetBytes(File(marks)), "d.json"));
        Assert.Equal(path, e.JsonPath);
        Assert.Contains(hint, e.Describe());
    }

    [Fact]
    public void Every_polarised_library_footprint_has_a_mark()
    {
        // polarised: pins named A/K (diodes, LEDs) or +/- (electrolytics); DIPs need their pin-1 end (JEDEC MS-001 index)
        var library = FootprintLibrary.Load();
        foreach (var f in library.Footprints)
        {
            var names = f.Leads.Select(l => l.Name).ToHashSet();
            if (names.Contains("K")) Assert.Contains(new FootprintMark(MarkKind.Band, "K"), f.Marks);
            if (names.Contains("+")) Assert.Contains(new FootprintMark(MarkKind.Plus, "+"), f.Marks);
            if (f.Mount == MountStyle.Strip) Assert.Contains(f.Marks, m => m.Kind == MarkKind.Notch && m.Lead == "1");
        }
    }
}
