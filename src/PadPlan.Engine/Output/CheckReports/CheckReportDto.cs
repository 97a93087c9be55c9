using PadPlan.Rules;
using System.Text.Json.Serialization;

namespace PadPlan.Output.CheckReports;

// The JSON shape of a check report (format "padplan-check/1"), kept apart from the records so the file can stay stable.

/// <summary>Root of a check report file.</summary>
public sealed class CheckReportDto
{
    public string Format { get; set; } = CheckReportJson.FormatTag;
    public string Project { get; set; } = "";
    public bool Strict { get; set; }
    public bool Passed { get; set; }
    public int Errors { get; set; }
    public int Warnings { get; set; }
    public List<FindingDto> Findings { get; set; } = [];
    public List<string> Estimates { get; set; } = [];
}

/// <summary>One finding; location is [x, y] in board mm, or null when the finding has no single place.</summary>
public sealed class FindingDto
{
    public string Rule { get; set; } = "";
    public string Severity { get; set; } = "";
    public double[]? Location { get; set; }
    public List<string> Items { get; set; } = [];
    public string Message { get; set; } = "";
    public string Hint { get; set; } = "";
}

/// <summary>Source-generated JSON metadata for check reports.</summary>
[JsonSourceGenerationOptions(PropertyNamingPolicy = JsonKnownNamingPolicy.CamelCase, WriteIndented = true)]
[JsonSerializable(typeof(CheckReportDto))]
public sealed partial class CheckJsonContext : JsonSerializerContext;
