using System.Text;
using System.Text.Json.Nodes;
using PadPlan.Cli;

namespace PadPlan.Fuzz;

/// <summary>
/// Inputs at the edges of the limits, run on every fuzz run before the random cases: every footprint body at ±500 mm
/// (on the placed tiny-buffer and on the CW filter), the largest board, and the most parts (a 500-part netlist, imported,
/// placed and printed). Each command must keep the same bounds as every fuzz case (docs/limits.md, "Fuzzing").
/// </summary>
public static class EdgeCases
{
    /// <summary>One edge case: a name, and the files and command lines it runs, in order (a later command may use an earlier one's output).</summary>
    public sealed record Edge(string Name, Func<string, IReadOnlyList<string[]>> Arrange);

    private static readonly string[] Printing = ["sheets", "check", "cutlist", "bom", "testplan"];

    public static IReadOnlyList<Edge> All { get; } =
    [
        new("tiny-buffer, every body at ±500 mm", dir => ProjectCommands(dir, HugeBodies(Read("tiny-buffer", "tiny-buffer.padplan.json")), withPlace: true)),
        new("CW filter, every body at ±500 mm", dir =>
        {
            var project = Path.Combine(dir, "cw.padplan.json");
            Must(["import", Path.Combine(Corpus.Examples, "cw-filter", "cw-filter.ppn"), "-o", project, "-q"]);
            Must(["place", project, "--effort", "quick", "-q"]);
            return ProjectCommands(dir, HugeBodies(File.ReadAllBytes(project)), withPlace: true);
        }),
        new("tiny-buffer on the largest board", dir => ProjectCommands(dir, Edited(Read("tiny-buffer", "tiny-buffer.padplan.json"), p =>
        {
            p["board"]!["width"] = 999.9;
            p["board"]!["height"] = 999.9;
        }), withPlace: true)),
        new("500 parts", dir =>
        {
            var netlist = Path.Combine(dir, "many.ppn");
            var text = new StringBuilder("title five hundred parts\n");
            for (var i = 0; i < 500; i++) text.Append($"R{i + 1} 1k 1=N{i} 2=N{(i + 1) % 500}\n"); // a ring: every net joins two parts
            File.WriteAllText(netlist, text.ToString());
            var project = Path.Combine(dir, "many.padplan.json");
            return [["import", netlist, "-o", project, "-q"], ["place", project, "--effort", "quick", "-q"], .. Printing.Select(c => Args(c, project, dir))];
        }),
    ];

    private static IReadOnlyList<string[]> ProjectCommands(string dir, byte[] project, bool withPlace)
    {
        var file = Path.Combine(dir, "edge.padplan.json");
        File.WriteAllBytes(file, project);
        var commands = Printing.Select(c => Args(c, file, dir)).ToList();
        if (withPlace)
        {
            var copy = Path.Combine(dir, "edge-placed.padplan.json");
            File.WriteAllBytes(copy, project);
            commands.Add(["place", copy, "--force", "--effort", "quick", "-q"]);
        }
        return commands;
    }

    private static string[] Args(string command, string project, string dir) => command switch
    {
        "sheets" => ["sheets", project, "-o", Path.Combine(dir, "sheets-" + Path.GetFileNameWithoutExtension(project)), "--formats", "svg,pdf", "--date", "2025-01-01"],
        _ => [command, project],
    };

    private static byte[] Read(string example, string file) => File.ReadAllBytes(Path.Combine(Corpus.Examples, example, file));

    private static byte[] HugeBodies(byte[] project) => Edited(project, p =>
    {
        foreach (var footprint in p["footprints"]!.AsArray())
            footprint!["body"] = JsonNode.Parse("[[-500,-500],[500,-500],[500,500],[-500,500]]");
    });

    private static byte[] Edited(byte[] project, Action<JsonNode> change)
    {
        var node = JsonNode.Parse(project)!;
        change(node);
        return Encoding.UTF8.GetBytes(node.ToJsonString());
    }

    private static void Must(string[] args)
    {
        var err = new StringWriter();
        var code = PadPlanCli.Run(args, TextWriter.Null, err);
        if (code != 0) throw new InvalidOperationException($"setting up an edge case: padplan {string.Join(' ', args)} exited {code}: {err}");
    }
}
