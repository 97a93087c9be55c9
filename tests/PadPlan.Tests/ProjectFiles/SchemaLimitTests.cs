using System.Text.Encodings.Web;
using System.Text.Json;
using System.Text.Json.Nodes;
using PadPlan.ProjectFiles.Limits;

namespace PadPlan.Tests.ProjectFiles;

/// <summary>
/// The published schemas carry the same limits as <see cref="InputLimits"/> (minimum/maximum, maxItems, maxLength), and
/// every number in them has both bounds. PADPLAN_UPDATE_SCHEMA=1 writes the limits into docs/*.schema.json instead.
/// </summary>
public sealed class SchemaLimitTests
{
    public static TheoryData<string> Schemas() => new() { "project.schema.json", "footprints.schema.json" };

    private static IEnumerable<LimitTable> TablesFor(string schema) =>
        schema == "project.schema.json" ? [InputLimits.Project] : [InputLimits.FootprintFile];

    [Theory]
    [MemberData(nameof(Schemas))]
    public void The_schema_publishes_the_input_limits(string schema)
    {
        var file = Path.Combine(TestPaths.RepoRoot, "docs", schema);
        var text = File.ReadAllText(file);
        var root = JsonNode.Parse(text)!.AsObject();
        var missing = new List<string>();
        foreach (var table in TablesFor(schema)) Apply(root, table, missing);
        Assert.Empty(missing);
        var unbounded = new List<string>();
        FindUnboundedNumbers(root, "#", unbounded);
        Assert.Empty(unbounded);
        var expected = root.ToJsonString(new JsonSerializerOptions { WriteIndented = true, Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping }) + "\n";
        if (Environment.GetEnvironmentVariable("PADPLAN_UPDATE_SCHEMA") == "1")
        {
            File.WriteAllText(file, expected);
            return;
        }
        Assert.True(expected == text.ReplaceLineEndings("\n"), $"docs/{schema} does not carry the limits of InputLimits; run the tests with PADPLAN_UPDATE_SCHEMA=1 and review the change.");
    }

    [Fact]
    public void Docs_limits_md_lists_every_limit()
    {
        var file = Path.Combine(TestPaths.RepoRoot, "docs", "limits.md");
        var text = File.ReadAllText(file).ReplaceLineEndings("\n");
        const string begin = "<!-- limits:begin -->\n", end = "<!-- limits:end -->";
        var from = text.IndexOf(begin, StringComparison.Ordinal);
        var to = text.IndexOf(end, StringComparison.Ordinal);
        Assert.True(from >= 0 && to > from, "docs/limits.md needs the markers <!-- limits:begin --> and <!-- limits:end -->");
        var expected = text[..(from + begin.Length)] + LimitsMarkdown() + text[to..];
        if (Environment.GetEnvironmentVariable("PADPLAN_UPDATE_SCHEMA") == "1")
        {
            File.WriteAllText(file, expected);
            return;
        }
        Assert.True(expected == text, "docs/limits.md does not list the limits of InputLimits; run the tests with PADPLAN_UPDATE_SCHEMA=1 and review the change.");
    }

    private static string LimitsMarkdown()
    {
        var sb = new System.Text.StringBuilder();
        foreach (var table in new[] { InputLimits.Project, InputLimits.FootprintFile, InputLimits.PartsMap })
        {
            sb.Append($"\n### {char.ToUpperInvariant(table.Kind[0])}{table.Kind[1..]} files\n\n| JSON path | limit |\n|---|---|\n");
            var rows = table.Numbers.Select(kv => (kv.Key, kv.Value.Describe()))
                .Concat(table.MaxItems.Select(kv => (kv.Key, $"at most {kv.Value} {(table.Maps.Contains(kv.Key) ? "names" : "entries")}")))
                .Concat(table.MaxLength.Select(kv => (kv.Key, $"at most {kv.Value} characters")))
                .OrderBy(r => r.Key, StringComparer.Ordinal);
            foreach (var (path, limit) in rows) sb.Append($"| `{path}` | {limit} |\n");
        }
        return sb.Append('\n').ToString();
    }

    private static void Apply(JsonObject root, LimitTable table, List<string> missing)
    {
        foreach (var (pattern, range) in table.Numbers)
        {
            if (Resolve(root, pattern) is not { } node) { missing.Add(pattern); continue; }
            node.Remove("minimum"); node.Remove("exclusiveMinimum"); node.Remove("maximum"); node.Remove("exclusiveMaximum");
            node[range.MinExclusive ? "exclusiveMinimum" : "minimum"] = range.Min;
            node[range.MaxExclusive ? "exclusiveMaximum" : "maximum"] = range.Max;
        }
        foreach (var (pattern, max) in table.MaxItems)
        {
            if (Resolve(root, pattern) is not { } node) { missing.Add(pattern); continue; }
            node[table.Maps.Contains(pattern) ? "maxProperties" : "maxItems"] = max;
        }
        foreach (var (pattern, max) in table.MaxLength)
        {
            if (Resolve(root, pattern) is not { } node) { missing.Add(pattern); continue; }
            if (node["enum"] is null && node["const"] is null) node["maxLength"] = max;
        }
    }

    // "$.a[*].b.*" -> properties.a / items / properties.b / additionalProperties, following local $refs.
    private static JsonObject? Resolve(JsonObject root, string pattern)
    {
        JsonObject? node = root;
        var rest = pattern[1..];
        while (rest.Length > 0 && node is not null)
        {
            node = Deref(root, node);
            if (rest.StartsWith("[*]", StringComparison.Ordinal))
            {
                node = node["items"] as JsonObject;
                rest = rest[3..];
            }
            else if (rest.StartsWith(".*", StringComparison.Ordinal))
            {
                node = node["additionalProperties"] as JsonObject;
                rest = rest[2..];
            }
            else
            {
                var end = rest.IndexOfAny(['.', '['], 1);
                var name = end < 0 ? rest[1..] : rest[1..end];
                node = node["properties"]?[name] as JsonObject;
                rest = end < 0 ? "" : rest[end..];
            }
        }
        return node is null ? null : Deref(root, node);
    }

    private static JsonObject Deref(JsonObject root, JsonObject node)
    {
        while (node["$ref"]?.GetValue<string>() is { } reference && reference.StartsWith("#/", StringComparison.Ordinal))
            node = reference[2..].Split('/').Aggregate((JsonNode)root, (n, key) => n[key]!).AsObject();
        return node;
    }

    private static void FindUnboundedNumbers(JsonNode? node, string where, List<string> found)
    {
        switch (node)
        {
            case JsonObject obj:
                var type = obj["type"]?.ToJsonString() ?? "";
                if ((type.Contains("number", StringComparison.Ordinal) || type.Contains("integer", StringComparison.Ordinal))
                    && (obj["minimum"] ?? obj["exclusiveMinimum"]) is null | (obj["maximum"] ?? obj["exclusiveMaximum"]) is null)
                    found.Add(where);
                foreach (var (key, value) in obj) FindUnboundedNumbers(value, $"{where}/{key}", found);
                break;
            case JsonArray array:
                for (var i = 0; i < array.Count; i++) FindUnboundedNumbers(array[i], $"{where}/{i}", found);
                break;
        }
    }
}
