using System.Text.Json;
using PadPlan.IO;

namespace PadPlan.ProjectFiles.Limits;

/// <summary>Walks a parsed JSON file and refuses the first number, list, map or text outside its <see cref="LimitTable"/>, and any null list entry, naming its JSON path.</summary>
internal static class LimitCheck
{
    private static readonly JsonDocumentOptions Options = new() { CommentHandling = JsonCommentHandling.Skip, AllowTrailingCommas = true };

    /// <summary>Throws an <see cref="InputException"/> for the first value outside the limits; returns quietly when all are inside.</summary>
    public static void Check(byte[] utf8, LimitTable table, string file)
    {
        using var document = JsonDocument.Parse(utf8, Options);
        var problem = Walk(document.RootElement, "$", "$", table);
        if (problem is not null)
            throw new InputException(file, problem.Value.Message, JsonLineLocator.LineOf(utf8, problem.Value.Path), jsonPath: problem.Value.Path);
    }

    private const string SeeDocs = " (docs/limits.md).";

    private readonly record struct Problem(string Path, string Message);

    private static Problem? Walk(JsonElement element, string path, string pattern, LimitTable table)
    {
        switch (element.ValueKind)
        {
            case JsonValueKind.Number:
                var range = table.RangeOf(pattern);
                if (!element.TryGetDouble(out var value) || !range.Contains(value))
                    return new(path, $"{Shorten(element.GetRawText(), 40)} is outside the allowed range: {range.Describe()}{SeeDocs}");
                return null;
            case JsonValueKind.String:
                var length = element.GetString()!.Length;
                var maxLength = table.MaxLengthOf(pattern);
                return length > maxLength ? new(path, $"this text has {length} characters; at most {maxLength} are allowed{SeeDocs}") : null;
            case JsonValueKind.Array:
                var count = element.GetArrayLength();
                var maxItems = table.MaxItemsOf(pattern);
                if (count > maxItems) return new(path, $"this list has {count} entries; at most {maxItems} are allowed{SeeDocs}");
                var index = 0;
                foreach (var item in element.EnumerateArray())
                {
                    var itemPath = $"{path}[{index++}]";
                    if (item.ValueKind == JsonValueKind.Null) return new(itemPath, "a list entry is null; remove it or give a value.");
                    if (Walk(item, itemPath, pattern + "[*]", table) is { } inner) return inner;
                }
                return null;
            case JsonValueKind.Object:
                return table.Maps.Contains(pattern) ? WalkMap(element, path, pattern, table) : WalkObject(element, path, pattern, table);
            default:
                return null;
        }
    }

    private static Problem? WalkObject(JsonElement element, string path, string pattern, LimitTable table)
    {
        foreach (var property in element.EnumerateObject())
            if (Walk(property.Value, $"{path}.{property.Name}", $"{pattern}.{property.Name}", table) is { } inner) return inner;
        return null;
    }

    private static Problem? WalkMap(JsonElement element, string path, string pattern, LimitTable table)
    {
        var count = 0;
        var maxItems = table.MaxItemsOf(pattern);
        foreach (var property in element.EnumerateObject())
        {
            if (++count > maxItems) return new(path, $"this object has more than {maxItems} entries; at most {maxItems} are allowed{SeeDocs}");
            var entryPath = $"{path}.{property.Name}";
            if (property.Name.Length > LimitTable.DefaultMaxLength)
                return new($"{path}.{Shorten(property.Name, 40)}", $"this name has {property.Name.Length} characters; at most {LimitTable.DefaultMaxLength} are allowed{SeeDocs}");
            if (property.Value.ValueKind == JsonValueKind.Null) return new(entryPath, "an entry is null; remove it or give a value.");
            if (Walk(property.Value, entryPath, pattern + ".*", table) is { } inner) return inner;
        }
        return null;
    }

    /// <summary>At most <paramref name="max"/> characters of a value for a message, so a huge token is never echoed whole.</summary>
    public static string Shorten(string text, int max) =>
        text.Length <= max ? text : string.Concat(text.AsSpan(0, max), "…");

}
