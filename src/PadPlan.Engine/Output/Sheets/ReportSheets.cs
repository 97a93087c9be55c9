using PadPlan.Output;
using System.Globalization;
using PadPlan.Output.Tables;
using PadPlan.Rules;
using PadPlan.Model;
using PadPlan.Output.Drawing;

namespace PadPlan.Output.Sheets;

/// <summary>The report pages: cautions, the checker's summary and findings, the lead table, then each table (cut list, BOM, build order, test plan) as given, with the cutting plan drawn on its stock right after its table.</summary>
internal static class ReportSheets
{
    public static IReadOnlyList<SheetDraft> Build(Project project, SheetOptions options, CheckReport? check, IReadOnlyList<ReportTable> tables, Materials.Cutting.CutList? cutting = null)
    {
        var frame = new PageFrame(options.Paper, false);
        var flow = new ReportFlow(frame);
        flow.NewPage();
        flow.Heading("Cautions", SheetStyle.TextHeading);
        foreach (var caution in Cautions.For(project))
            flow.Paragraph(caution, SheetStyle.TextNormal, caution.StartsWith("HIGH VOLTAGE", StringComparison.Ordinal) ? FontWeight.Bold : FontWeight.Regular, "•");
        flow.Space(4);

        flow.Heading("Check", SheetStyle.TextHeading);
        if (check is null)
        {
            flow.Paragraph("No check results are included with these sheets. Run 'padplan check' on the project and clear its errors before cutting board.", SheetStyle.TextNormal);
            flow.Space(4);
        }
        else
        {
            DrawCheck(flow, check);
        }
        ModelPicture.Draw(flow, project);
        if (ImportSummaryTable.For(project) is { } imported) TableBlock.Draw(flow, imported);
        TableBlock.Draw(flow, LeadTable.For(project));
        if (tables.Count == 0)
        {
            flow.Heading("Tables", SheetStyle.TextHeading);
            flow.Paragraph("The cut list, parts list, build order and test plan are not included with these sheets.", SheetStyle.TextNormal);
        }
        var drawn = false;
        foreach (var table in tables)
        {
            TableBlock.Draw(flow, table);
            if (cutting is null || drawn || table.Title != CutListTables.PlanTitle) continue;
            CutPlanDrawing.Draw(flow, cutting);
            drawn = true;
        }
        if (cutting is not null && !drawn) CutPlanDrawing.Draw(flow, cutting);
        return flow.Pages().Select(body => new SheetDraft(SheetKind.Report, frame, "Report: cautions, check, tables", body)).ToList();
    }

    private static void DrawCheck(ReportFlow flow, CheckReport check)
    {
        var infos = check.Findings.Count(f => f.Severity == Severity.Info);
        var verdict = check.Errors > 0 ? "NOT READY: fix the errors before cutting board." : check.Warnings > 0 ? "Passed with warnings: read them before cutting board." : "Passed.";
        flow.Paragraph($"{check.Errors} error(s), {check.Warnings} warning(s), {infos} note(s). {verdict}", SheetStyle.TextNormal, FontWeight.Bold);
        flow.Space(2);
        if (check.Findings.Count > 0)
        {
            var rows = check.Findings
                .OrderByDescending(f => f.Severity)
                .Select(f => new[] { SeverityText(f.Severity), f.RuleId, f.Message, f.Hint, Where(f) });
            TableBlock.Draw(flow, ReportTable.Create("Findings", ["Severity", "Rule", "What is wrong", "How to fix it", "Where"], rows));
        }
        if (check.Estimates.Count > 0)
        {
            flow.Heading("Estimates", SheetStyle.TextLarge);
            foreach (var line in check.Estimates) flow.Paragraph(line, SheetStyle.TextSmall, bullet: "–");
            flow.Space(4);
        }
    }

    private static string SeverityText(Severity s) => s switch
    {
        Severity.Error => "error",
        Severity.Warning => "warning",
        _ => "note",
    };

    private static string Where(Finding f)
    {
        var parts = new List<string>();
        if (f.Location is { } p) parts.Add(string.Create(CultureInfo.InvariantCulture, $"x {p.X:0.#}, y {p.Y:0.#} mm"));
        if (f.Items.Count > 0) parts.Add(string.Join(", ", f.Items));
        return string.Join("; ", parts);
    }
}
