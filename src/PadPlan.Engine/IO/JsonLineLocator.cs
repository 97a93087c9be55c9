using System.Text;
using System.Text.Json;

namespace PadPlan.IO;

/// <summary>Finds the line of a JSON path (as "$.parts[2].ref") in a document, so that errors found after parsing can still name a line.</summary>
public static class JsonLineLocator
{
    /// <summary>The 1-based line where the value at the path starts, or of its nearest existing ancestor; null when the text is not JSON.</summary>
    public static int? LineOf(ReadOnlySpan<byte> utf8, string path)
    {
        var target = Normalise(path);
        var reader = new Utf8JsonReader(utf8, new JsonReaderOptions { CommentHandling = JsonCommentHandling.Skip, AllowTrailingCommas = true });
        var stack = new List<Frame>();
        string? pendingName = null;
        var best = (Length: -1, Offset: 0L);
        try
        {
            while (reader.Read())
            {
                if (reader.TokenType == JsonTokenType.PropertyName)
                {
                    pendingName = reader.GetString();
                    continue;
                }
                if (reader.TokenType is JsonTokenType.EndObject or JsonTokenType.EndArray)
                {
                    if (stack.Count > 0) stack.RemoveAt(stack.Count - 1);
                    continue;
                }
                var here = CurrentPath(stack, pendingName);
                pendingName = null;
                if (stack.Count > 0 && stack[^1].IsArray) stack[^1] = stack[^1] with { Index = stack[^1].Index + 1 };
                if (target.StartsWith(here, StringComparison.Ordinal) && here.Length > best.Length &&
                    (target.Length == here.Length || target[here.Length] is '.' or '['))
                    best = (here.Length, reader.TokenStartIndex);
                if (reader.TokenType is JsonTokenType.StartObject or JsonTokenType.StartArray)
                    stack.Add(new Frame(here, reader.TokenType == JsonTokenType.StartArray, -1));
            }
        }
        catch (JsonException)
        {
            // a broken document: report the best line found so far
        }
        if (best.Length < 0) return null;
        var line = 1;
        for (var i = 0; i < best.Offset && i < utf8.Length; i++)
            if (utf8[i] == (byte)'\n') line++;
        return line;
    }

    private static string CurrentPath(List<Frame> stack, string? name)
    {
        if (stack.Count == 0) return "$";
        var parent = stack[^1];
        return parent.IsArray ? $"{parent.Path}[{parent.Index + 1}]" : $"{parent.Path}.{name}";
    }

    private static string Normalise(string path) => path.StartsWith('$') ? path : "$" + (path.StartsWith('[') ? "" : ".") + path;

    private readonly record struct Frame(string Path, bool IsArray, int Index);
}
