using System.Globalization;
using System.Text;
using System.Text.Json.Nodes;

namespace PadPlan.Fuzz;

/// <summary>Seeded damage to an input file: truncation, deleted and duplicated keys and entries, wrong types, extreme numbers, nulls, control characters, long text and byte flips.</summary>
public sealed class Mutator(Random random)
{
    /// <summary>Numbers that have broken things before, the edges of the documented limits, and a few absurd ones.</summary>
    private static readonly string[] Extremes =
    [
        "1e308", "-1e308", "0", "-0.0", "-1", "1e-300", "4.9e-324", "2147483648", "-2147483649", "99999999999999999999",
        "499.999", "500.001", "999.999", "1000", "49.999", "50", "0.5", "0.4999", "2000", "-2000", "2000.001", "100", "1e5",
    ];

    private static readonly string[] Hostile = ["\u001b[2J", "\u202Eevil", "\u0000", "=SUM(A1:A9)", "@cmd", "-2+3", "\t\r", "\"quoted\"", "a,b"];

    public (byte[] Bytes, string What) Mutate(byte[] input, bool json)
    {
        var steps = 1 + random.Next(3);
        var bytes = input;
        var what = new List<string>();
        for (var i = 0; i < steps; i++)
        {
            var (next, step) = json ? MutateJson(bytes) : MutateText(bytes);
            bytes = next;
            what.Add(step);
        }
        return (bytes, string.Join("; ", what));
    }

    private (byte[], string) MutateJson(byte[] input)
    {
        var pick = random.Next(14);
        if (pick == 0) return Truncate(input);
        if (pick == 1) return FlipBytes(input);
        if (pick == 2) return DuplicateLine(input);
        JsonNode? root;
        var nodes = new List<(JsonNode? Node, JsonNode Parent, string? Key, int Index)>();
        try
        {
            root = JsonNode.Parse(input, documentOptions: new System.Text.Json.JsonDocumentOptions { AllowTrailingCommas = true, CommentHandling = System.Text.Json.JsonCommentHandling.Skip });
            if (root is not null) Collect(root, nodes);
        }
        catch (Exception e) when (e is System.Text.Json.JsonException or ArgumentException or InvalidOperationException)
        {
            return FlipBytes(input); // already broken by an earlier step (or a key given twice)
        }
        if (root is null) return FlipBytes(input);
        if (nodes.Count == 0) return Truncate(input);
        var (node, parent, key, index) = nodes[random.Next(nodes.Count)];
        string what;
        switch (pick)
        {
            case 3 or 4:
                var numbers = nodes.Where(n => n.Node is JsonValue v && v.GetValueKind() == System.Text.Json.JsonValueKind.Number).ToList();
                if (numbers.Count == 0) goto default;
                (node, parent, key, index) = numbers[random.Next(numbers.Count)];
                var extreme = random.Next(4) == 0 ? Scaled(node!) : Extremes[random.Next(Extremes.Length)];
                Set(parent, key, index, JsonNode.Parse(extreme));
                what = $"number at {Where(parent, key, index)} = {extreme}";
                break;
            case 5:
                if (parent is JsonObject o) { o.Remove(key!); what = $"deleted {Where(parent, key, index)}"; }
                else { ((JsonArray)parent).RemoveAt(index); what = $"deleted entry {Where(parent, key, index)}"; }
                break;
            case 6:
                JsonNode? wrong = random.Next(6) switch { 0 => "text", 1 => true, 2 => new JsonArray(), 3 => new JsonObject(), 4 => 42, _ => null };
                Set(parent, key, index, wrong);
                what = $"wrong type at {Where(parent, key, index)}";
                break;
            case 7:
                var arrays = nodes.Where(n => n.Node is JsonArray { Count: > 0 }).ToList();
                if (arrays.Count == 0) goto default;
                var array = (JsonArray)arrays[random.Next(arrays.Count)].Node!;
                array[random.Next(array.Count)] = null;
                what = "null list entry";
                break;
            case 8:
                var lists = nodes.Where(n => n.Node is JsonArray { Count: > 0 }).ToList();
                if (lists.Count == 0) goto default;
                var list = (JsonArray)lists[random.Next(lists.Count)].Node!;
                var copies = random.Next(3) == 0 ? random.Next(100, 3000) : 1;
                var entry = list[random.Next(list.Count)];
                for (var c = 0; c < copies; c++) list.Add(entry?.DeepClone());
                what = $"entry duplicated {copies} time(s)";
                break;
            case 9 or 10:
                var texts = nodes.Where(n => n.Node is JsonValue v && v.GetValueKind() == System.Text.Json.JsonValueKind.String).ToList();
                if (texts.Count == 0) goto default;
                (node, parent, key, index) = texts[random.Next(texts.Count)];
                var text = node!.GetValue<string>();
                var changed = random.Next(3) == 0
                    ? text + new string((char)('a' + random.Next(26)), random.Next(100, 20_000))
                    : text.Insert(random.Next(text.Length + 1), Hostile[random.Next(Hostile.Length)]);
                Set(parent, key, index, changed);
                what = $"text at {Where(parent, key, index)} changed ({changed.Length} chars)";
                break;
            default:
                Set(parent, key, index, JsonNode.Parse(Extremes[random.Next(Extremes.Length)]));
                what = $"value at {Where(parent, key, index)} replaced by a number";
                break;
        }
        return (Encoding.UTF8.GetBytes(root.ToJsonString()), what);
    }

    private (byte[], string) MutateText(byte[] input)
    {
        var lines = Encoding.UTF8.GetString(input).Split('\n').ToList();
        switch (random.Next(8))
        {
            case 0: return Truncate(input);
            case 1: return FlipBytes(input);
            case 2:
                if (lines.Count > 1) lines.RemoveAt(random.Next(lines.Count));
                return (Join(lines), "deleted a line");
            case 3: return DuplicateLine(input);
            case 4:
                var at = random.Next(lines.Count);
                var tokens = lines[at].Split(' ');
                tokens[random.Next(tokens.Length)] = random.Next(3) switch { 0 => Extremes[random.Next(Extremes.Length)], 1 => "xyz", _ => "" };
                lines[at] = string.Join(' ', tokens);
                return (Join(lines), $"token on line {at + 1} replaced");
            case 5:
                lines.Insert(random.Next(lines.Count + 1), random.Next(3) switch { 0 => ".subckt unfinished a b", 1 => ".control", _ => "R99 n1 n2 n3" });
                return (Join(lines), "unterminated section or bad line");
            case 6:
                var line = random.Next(lines.Count);
                lines[line] += " " + new string('7', random.Next(100, 100_000));
                return (Join(lines), $"long token on line {line + 1}");
            default:
                var l = random.Next(lines.Count);
                lines[l] = lines[l].Insert(random.Next(lines[l].Length + 1), Hostile[random.Next(Hostile.Length)]);
                return (Join(lines), $"hostile text on line {l + 1}");
        }
    }

    private static byte[] Join(List<string> lines) => Encoding.UTF8.GetBytes(string.Join('\n', lines));

    private (byte[], string) Truncate(byte[] input)
    {
        var cut = input.Length == 0 ? 0 : random.Next(input.Length);
        return (input[..cut], $"cut to {cut} bytes");
    }

    private (byte[], string) FlipBytes(byte[] input)
    {
        var copy = (byte[])input.Clone();
        var flips = 1 + random.Next(4);
        for (var i = 0; i < flips && copy.Length > 0; i++) copy[random.Next(copy.Length)] ^= (byte)(1 << random.Next(8));
        return (copy, $"{flips} bit flip(s)");
    }

    private (byte[], string) DuplicateLine(byte[] input)
    {
        var lines = Encoding.UTF8.GetString(input).Split('\n').ToList();
        var at = random.Next(lines.Count);
        lines.Insert(at, lines[at]);
        return (Join(lines), $"line {at + 1} duplicated (keys twice)");
    }

    private string Scaled(JsonNode number)
    {
        var value = number.GetValue<double>();
        var factor = new[] { -1, 10, 0.1, 1000, 1e-6 }[random.Next(5)];
        var scaled = value * factor;
        // JSON has no infinity: a product past the largest double becomes the largest one written out
        if (!double.IsFinite(scaled)) return scaled > 0 ? "1e308" : "-1e308";
        return scaled.ToString("R", CultureInfo.InvariantCulture);
    }

    private static void Collect(JsonNode node, List<(JsonNode?, JsonNode, string?, int)> into)
    {
        switch (node)
        {
            case JsonObject obj:
                foreach (var (key, value) in obj)
                {
                    into.Add((value, obj, key, -1));
                    if (value is not null) Collect(value, into);
                }
                break;
            case JsonArray array:
                for (var i = 0; i < array.Count; i++)
                {
                    into.Add((array[i], array, null, i));
                    if (array[i] is { } item) Collect(item, into);
                }
                break;
        }
    }

    private static void Set(JsonNode parent, string? key, int index, JsonNode? value)
    {
        if (parent is JsonObject obj) obj[key!] = value;
        else ((JsonArray)parent)[index] = value;
    }

    private static string Where(JsonNode parent, string? key, int index) => key is null ? $"{parent.GetPath()}[{index}]" : $"{parent.GetPath()}.{key}";
}
