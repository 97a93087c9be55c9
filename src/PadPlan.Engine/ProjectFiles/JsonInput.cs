using System.Text.Json;
using System.Text.Json.Serialization.Metadata;
using PadPlan.IO;
using PadPlan.ProjectFiles.Limits;

namespace PadPlan.ProjectFiles;

/// <summary>Deserialises one of PadPlan's JSON files, turning a parse error into an <see cref="InputException"/> with line, column, JSON path and a plain explanation.</summary>
internal static class JsonInput
{
    /// <summary>What every PadPlan JSON format tag starts with.</summary>
    public const string PadPlanFormatPrefix = "padplan-";

    /// <summary>A format tag for a message: a PadPlan one in full, anything else not repeated.</summary>
    public static string Describe(string? format) =>
        format is null ? "nothing" : format.StartsWith(PadPlanFormatPrefix, StringComparison.Ordinal) ? $"\"{LimitCheck.Shorten(format, 40)}\"" : "a format that is not PadPlan's";

    /// <summary>
    /// The DTO, never null, with every value inside <paramref name="limits"/>; <paramref name="bytes"/> must have passed
    /// <see cref="TextEncodingCheck.Utf8"/>. <paramref name="what"/> names the kind of file in messages ("a project").
    /// </summary>
    /// <remarks>
    /// A file whose "format" (read by <paramref name="format"/>) is not a PadPlan one is returned unchecked, for the caller
    /// to refuse by its format alone: the limits walk would otherwise name a key or value of some unrelated file, and a
    /// message never repeats the content of a file PadPlan does not own.
    /// </remarks>
    public static T Deserialize<T>(byte[] bytes, JsonTypeInfo<T> type, LimitTable limits, string file, string what, Func<T, string?> format) where T : class
    {
        T? dto;
        try
        {
            dto = JsonSerializer.Deserialize(bytes, type);
        }
        catch (JsonException e) when (!NamesAPadPlanFormat(bytes))
        {
            throw new InputException(file, $"this is not a PadPlan file ({what} was expected): it does not name a PadPlan format (\"format\": \"{PadPlanFormatPrefix}...\"), and its JSON does not fit. Its content is not shown here.", inner: e);
        }
        catch (JsonException e)
        {
            throw new InputException(file, Explain(e), (int?)e.LineNumber + 1, (int?)e.BytePositionInLine + 1, e.Path, e);
        }
        if (dto is null) throw new InputException(file, $"the file holds JSON null, not {what}.", 1);
        if (format(dto)?.StartsWith(PadPlanFormatPrefix, StringComparison.Ordinal) != true) return dto;
        LimitCheck.Check(bytes, limits, file);
        return dto;
    }

    // A cheap look for a PadPlan format tag, so a parse error in someone else's JSON file is reported without its key names.
    private static bool NamesAPadPlanFormat(byte[] bytes) =>
        bytes.AsSpan().IndexOf("\"format\""u8) >= 0 && bytes.AsSpan().IndexOf("\"padplan-"u8) >= 0;

    private static string Explain(JsonException e)
    {
        var message = e.Message;
        var cut = message.IndexOf(" Path:", StringComparison.Ordinal);
        if (cut > 0) message = message[..cut];
        var converted = System.Text.RegularExpressions.Regex.Match(message, @"could not be converted to (?<type>[^ ]+?)\.?$");
        if (converted.Success)
            message = $"expected {FriendlyType(converted.Groups["type"].Value)} here. Numbers go without quotes, text in quotes, lists in [ ].";
        if (message.Contains("'0x", StringComparison.Ordinal) || message.Contains("end of data", StringComparison.OrdinalIgnoreCase) || message.Contains("expected depth", StringComparison.OrdinalIgnoreCase))
            message += " The JSON is broken or cut short; check brackets, commas and quotes.";
        return message;
    }

    private static string FriendlyType(string clrType) => clrType switch
    {
        _ when clrType.Contains("Double", StringComparison.Ordinal) && clrType.Contains("[]", StringComparison.Ordinal) => "a point [x, y]",
        _ when clrType.Contains("Double", StringComparison.Ordinal) || clrType.Contains("Int32", StringComparison.Ordinal) => "a number",
        _ when clrType.Contains("Boolean", StringComparison.Ordinal) => "true or false",
        _ when clrType.Contains("List", StringComparison.Ordinal) => "a list [ ... ]",
        _ when clrType.Contains("Dictionary", StringComparison.Ordinal) => "an object { \"name\": \"value\" }",
        "System.String" => "text in quotes",
        _ => "an object { ... }",
    };
}
