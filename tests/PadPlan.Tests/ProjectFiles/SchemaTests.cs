using System.Text.Json.Nodes;
using Json.Schema;
using PadPlan.ProjectFiles;

namespace PadPlan.Tests.ProjectFiles;

/// <summary>The published JSON Schemas (docs/*.schema.json) agree with what PadPlan writes; checked with JsonSchema.Net, an independent validator.</summary>
public sealed class SchemaTests
{
    private static readonly Dictionary<string, JsonSchema> Loaded = [];
    private static readonly Lock Gate = new();

    // A schema registers its $id globally, so each file is loaded once.
    private static JsonSchema Load(string name)
    {
        lock (Gate)
        {
            if (!Loaded.TryGetValue(name, out var schema)) Loaded[name] = schema = JsonSchema.FromFile(Path.Combine(TestPaths.Docs, name));
            return schema;
        }
    }

    private static void AssertValid(JsonSchema schema, string file)
    {
        var result = schema.Evaluate(System.Text.Json.JsonDocument.Parse(File.ReadAllText(file)).RootElement, new EvaluationOptions { OutputFormat = OutputFormat.List });
        var errors = (result.Details ?? []).Where(d => d.Errors is not null).SelectMany(d => d.Errors!.Select(e => $"{d.InstanceLocation}: {e.Value}"));
        Assert.True(result.IsValid, $"{file} does not match the schema:\n" + string.Join("\n", errors));
    }

    public static TheoryData<string> ProjectFiles()
    {
        var data = new TheoryData<string>();
        foreach (var f in Directory.EnumerateFiles(TestPaths.Examples, "*" + ProjectFile.Extension, SearchOption.AllDirectories).Order(StringComparer.Ordinal))
            data.Add(Path.GetRelativePath(TestPaths.RepoRoot, f));
        return data;
    }

    [Theory]
    [MemberData(nameof(ProjectFiles))]
    public void Every_example_project_validates_against_the_schema(string relative) =>
        AssertValid(Load("project.schema.json"), Path.Combine(TestPaths.RepoRoot, relative));

    [Fact]
    public void A_written_project_with_every_shape_validates()
    {
        var file = Path.Combine(TestPaths.NewTempDir(), "all.padplan.json");
        ProjectFile.Write(SampleProjects.WithEveryShape(), file);
        AssertValid(Load("project.schema.json"), file);
    }

    public static TheoryData<string> ExampleNetlists()
    {
        var data = new TheoryData<string>();
        foreach (var dir in Directory.GetDirectories(TestPaths.Examples).Order(StringComparer.Ordinal))
            if (Directory.GetFiles(dir).Any(f => f.EndsWith(".ppn", StringComparison.Ordinal) || f.EndsWith(".cir", StringComparison.Ordinal)))
                data.Add(Path.GetFileName(dir));
        return data;
    }

    [Theory]
    [MemberData(nameof(ExampleNetlists))]
    public void Every_example_netlist_imports_and_places_into_projects_that_validate(string example)
    {
        var dir = Path.Combine(TestPaths.Examples, example);
        var netlist = Directory.GetFiles(dir).Where(f => f.EndsWith(".ppn", StringComparison.Ordinal) || f.EndsWith(".cir", StringComparison.Ordinal)).Order(StringComparer.Ordinal).First();
        var library = PadPlan.Import.FootprintLibrary.Load();
        var partsFile = Path.Combine(dir, "parts.json");
        var map = File.Exists(partsFile) ? PadPlan.Import.PartsMap.Read(partsFile, library) : null;
        var imported = PadPlan.Import.NetlistImporter.ImportFile(netlist, new PadPlan.Import.ImportOptions(library, map)).Project;
        var placed = PadPlan.Planning.Placer.Place(imported, new PadPlan.Planning.PlacerSettings(Effort: PadPlan.Planning.Effort.Quick));
        Assert.True(placed.Succeeded, placed.Failure?.Message);
        var outDir = TestPaths.NewTempDir();
        foreach (var (name, project) in new[] { ("imported", imported), ("placed", placed.Project!) })
        {
            var file = Path.Combine(outDir, name + ProjectFile.Extension);
            ProjectFile.Write(project, file);
            AssertValid(Load("project.schema.json"), file);
        }
    }

    [Fact]
    public void The_schema_rejects_a_bad_rotation()
    {
        var node = JsonNode.Parse(File.ReadAllText(TestPaths.TinyBuffer))!;
        node["layout"]!["placements"]![0]!["rotation"] = 45;
        Assert.False(Load("project.schema.json").Evaluate(System.Text.Json.JsonDocument.Parse(node.ToJsonString()).RootElement).IsValid);
    }

    [Fact]
    public void Every_footprint_library_file_validates_against_its_schema()
    {
        var files = Directory.Exists(TestPaths.Footprints) ? Directory.GetFiles(TestPaths.Footprints, "*.json") : [];
        foreach (var file in files.Order(StringComparer.Ordinal)) AssertValid(Load("footprints.schema.json"), file);
    }
}
