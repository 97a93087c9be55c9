using PadPlan.Rules;
using PadPlan.Model;
using PadPlan.Output.Tables;
using PadPlan.Rules.Checks;

namespace PadPlan.Output.CheckReports;

/// <summary>A check report as tables, one per severity (errors first), then the parasitic estimates: for the terminal and the report page.</summary>
public static class CheckReportTables
{
    public static IReadOnlyList<ReportTable> Build(CheckReport report)
    {
        var tables = new List<ReportTable>();
        foreach (var (severity, title) in new[] { (Severity.Error, "Errors"), (Severity.Warning, "Warnings"), (Severity.Info, "Notes") })
        {
            var rows = report.Findings.Where(f => f.Severity == severity).ToList();
            if (rows.Count == 0) continue;
            tables.Add(ReportTable.Create($"{title} ({rows.Count})", ["rule", "at (mm)", "problem", "fix"],
                rows.Select(f => new[] { f.RuleId, Where(f.Location), f.Message, f.Hint })));
        }
        if (report.Estimates.Count > 0)
            tables.Add(ReportTable.Create("Parasitic estimates", ["net"], report.Estimates.Select(e => new[] { e }), ParasiticEstimates.Method));
        return tables;
    }

    /// <summary>One line for the top of the report: passed or failed, and the counts.</summary>
    public static string Summary(string project, CheckReport report, bool strict)
    {
        var verdict = report.Passed(strict) ? "passed" : "FAILED";
        var notes = report.Findings.Count - report.Errors - report.Warnings;
        return $"Check of {project} {verdict}: {report.Errors} error(s), {report.Warnings} warning(s), {notes} note(s){(strict ? " (strict: warnings fail)" : "")}.";
    }

    /// <summary>The whole report as plain text; with a width, every line fits it (see <see cref="TableText.ToText"/>).</summary>
    public static string ToText(string project, CheckReport report, bool strict, int? width = null)
    {
        var summary = Summary(project, report, strict);
        var parts = new List<string> { string.Join("\n", width is { } w ? TableText.Wrap(summary, w) : [summary]) + "\n" };
        parts.AddRange(Build(report).Select(t => TableText.ToText(t, width)));
        return string.Join("\n", parts);
    }

    private static string Where(Point? p) => p is { } at ? FormattableString.Invariant($"{at.X:0.00}, {at.Y:0.00}") : "-";
}
