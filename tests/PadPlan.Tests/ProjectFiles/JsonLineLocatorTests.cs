using PadPlan.IO;

namespace PadPlan.Tests.ProjectFiles;

public sealed class JsonLineLocatorTests
{
    private static readonly byte[] Doc = System.Text.Encoding.UTF8.GetBytes("{\n  \"a\": 1,\n  \"list\": [\n    {\"x\": 1},\n    {\"x\": 2,\n     \"y\": [5, 6]}\n  ]\n}\n");

    [Theory]
    [InlineData("$", 1)]
    [InlineData("$.a", 2)]
    [InlineData("$.list", 3)]
    [InlineData("$.list[0]", 4)]
    [InlineData("$.list[1].x", 5)]
    [InlineData("$.list[1].y[1]", 6)]
    [InlineData("$.list[1].missing", 5)]
    public void Finds_the_line_of_a_path_or_its_nearest_parent(string path, int line) =>
        Assert.Equal(line, JsonLineLocator.LineOf(Doc, path));
}
