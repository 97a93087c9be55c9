using PadPlan.Rules;
using System.Text;
using System.Text.Json;

namespace PadPlan.Output.CheckReports;

/// <summary>Writes a check report as JSON for scripts and CI: rule id, severity, location in mm, items, message and hint.</summary>
public static class CheckReportJson
{
    public const string FormatTag = "padplan-check/1";

    /// <summary>The first bytes of a file are a check report of PadPlan's (any version of the format).</summary>
    public static bool IsOwn(ReadOnlySpan<byte> head) => head.IndexOf("\"format\": \"padplan-check/"u8) >= 0;

    public static CheckReportDto ToDto(string project, CheckReport report, bool strict) => new()
    {
        Project = project,
        Strict = strict,
        Passed = report.Passed(strict),
        Errors = report.Errors,
        Warnings = report.Warnings,
        Findings = report.Findings.Select(f => new FindingDto
        {
            Rule = f.RuleId,
            Severity = f.Severity.ToString().ToLowerInvariant(),
            Location = f.Location is { } p ? [Round(p.X), Round(p.Y)] : null,
            Items = f.Items.ToList(),
            Message = f.Message,
            Hint = f.Hint,
        }).ToList(),
        Estimates = report.Estimates.ToList(),
    };

    /// <summary>UTF-8 JSON, LF line ends, ending in a newline.</summary>
    public static byte[] ToBytes(string project, CheckReport report, bool strict)
    {
        var json = JsonSerializer.Serialize(ToDto(project, report, strict), CheckJsonContext.Default.CheckReportDto);
        return Encoding.UTF8.GetBytes(json.ReplaceLineEndings("\n") + "\n");
    }

    // Board coordinates to a micrometre: enough for any saw, and free of binary-fraction noise.
    private static double Round(double mm) => Math.Round(mm, 3);
}
