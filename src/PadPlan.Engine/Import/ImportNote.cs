namespace PadPlan.Import;

/// <summary>A warning from an import: the file, the line when known, and what to look at.</summary>
public sealed record ImportNote(string File, int? Line, string Message)
{
    public string Describe() => Line is null ? $"{File}: {Message}" : $"{File}:{Line}: {Message}";
}
