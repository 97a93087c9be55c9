using PadPlan.Model;
using PadPlan.Output.Drawing;
using PadPlan.Output.Tables;
using PadPlan.Rules;

namespace PadPlan.Output.Sheets;

/// <summary>All printed pages of a plan, numbered: template page(s), the assembly view, then the report pages.</summary>
public sealed record SheetBook(string Title, DateOnly Date, ValueList<Sheet> Sheets)
{
    /// <summary>
    /// What the book holds, in words: the pages of each kind and the assembly view's scale, e.g. "12 pages: 1 template,
    /// 1 assembly (scale 5 : 2), 10 report". Detail pages of the assembly view are counted with it and their scale named.
    /// </summary>
    public string Summary()
    {
        var parts = new List<string>();
        foreach (var kind in Enum.GetValues<SheetKind>())
        {
            var pages = Sheets.Where(s => s.Kind == kind).ToList();
            if (pages.Count == 0) continue;
            var text = $"{pages.Count} {kind.ToString().ToLowerInvariant()}";
            if (kind == SheetKind.Assembly && pages[0].View is { } view)
            {
                text += $" (scale {AssemblySheet.ScaleText(view.Scale)}";
                if (pages.Count > 1 && pages[1].View is { } detail) text += $"; {pages.Count - 1} detail page{(pages.Count > 2 ? "s" : "")} at {AssemblySheet.ScaleText(detail.Scale)}";
                text += ")";
            }
            parts.Add(text);
        }
        return $"{Sheets.Count} page{(Sheets.Count == 1 ? "" : "s")}: {string.Join(", ", parts)}";
    }

    /// <summary>Why a project cannot be printed yet (no layout, no board size), or null when it can.</summary>
    public static string? Problem(Project project)
    {
        if (project.Layout is null) return "the project has no layout yet; run 'padplan place' first or add a \"layout\" section.";
        if (project.Board.IsAuto) return "the board size is still automatic; run 'padplan place' to fix it or set board width and height.";
        return null;
    }

    /// <summary>Builds every page. The check report and tables come from the checker and the materials step; pass null / none to leave them out. The cut list, when given, is drawn on its stock after the cutting-plan table.</summary>
    public static SheetBook Build(Project project, SheetOptions options, CheckReport? check, IReadOnlyList<ReportTable> tables, Materials.Cutting.CutList? cutting = null)
    {
        if (Problem(project) is { } problem) throw new ArgumentException($"Project {project.Name}: {problem}", nameof(project));
        var drafts = new List<SheetDraft>();
        drafts.AddRange(TemplateSheet.Build(project, options));
        drafts.AddRange(AssemblySheet.Build(project, options));
        drafts.AddRange(ReportSheets.Build(project, options, check, tables, cutting));

        var stop = NotReady(check, drafts.FindIndex(d => d.Kind == SheetKind.Report) + 1);
        var sheets = new List<Sheet>();
        var perKind = new Dictionary<SheetKind, int>();
        for (var i = 0; i < drafts.Count; i++)
        {
            var draft = drafts[i];
            perKind[draft.Kind] = perKind.GetValueOrDefault(draft.Kind) + 1;
            var page = new PageBuilder();
            foreach (var shape in draft.Body) page.Add(shape);
            TitleBlock.Draw(page, draft.Frame, project, draft.Caption, options.Date, i + 1, drafts.Count, stop);
            var title = $"{project.Name}: {draft.Caption} (sheet {i + 1} of {drafts.Count})";
            sheets.Add(new Sheet(draft.Kind, perKind[draft.Kind], page.ToPage(draft.Frame.Width, draft.Frame.Height, title), draft.View, draft.CheckBar));
        }
        return new SheetBook($"{project.Name}: PadPlan sheets", options.Date, sheets.ToValueList());
    }

    /// <summary>
    /// The mark every page carries when the check found errors, so that no page of a plan that fails (a template taped to the
    /// board, an assembly view at the bench) can be taken for a sound one on its own: "NOT READY: 1 error in the check
    /// (sheet 3)". Null when the check passed or was left out.
    /// </summary>
    public static string? NotReady(CheckReport? check, int checkSheet)
    {
        if (check is not { Errors: > 0 } failed) return null;
        var errors = failed.Errors == 1 ? "1 error" : $"{failed.Errors} errors";
        return checkSheet > 0 ? $"NOT READY: {errors} in the check (sheet {checkSheet})" : $"NOT READY: {errors} in the check";
    }
}
