using PadPlan.Editor.Sessions;
using PadPlan.ProjectFiles;

namespace PadPlan.Editor.Tests.Regressions;

/// <summary>Regression (issue 25): keeping a copy of a copy nested the numbers ("p-2-2-2.padplan.json"). The number now goes on the base name.</summary>
public sealed class Regression_CopyOfACopyNests
{
    [Fact]
    public void Each_copy_of_a_copy_takes_the_next_number_of_the_base_name()
    {
        using var copy = new ExampleCopy();
        var session = EditSession.Open(copy.ProjectPath);
        var stem = Path.GetFileName(copy.ProjectPath)[..^ProjectFile.Extension.Length];
        var names = new List<string>();
        for (var i = 0; i < 3; i++)
        {
            Assert.True(session.SaveCopy().Saved);
            names.Add(session.FileName);
        }
        Assert.Equal([$"{stem}-2{ProjectFile.Extension}", $"{stem}-3{ProjectFile.Extension}", $"{stem}-4{ProjectFile.Extension}"], names);
    }
}
