using System.Text.RegularExpressions;
using PadPlan.Tests.Cli;
using Xunit;

namespace PadPlan.Tests.Output;

/// <summary>
/// One word for each thing: the glossary in docs/workflow.md names, for each term, the words not used for it. None of
/// them may appear in what the builder reads: the bench's page and server messages, the sheets, and the command line's
/// tables and reports.
/// </summary>
public partial class GlossaryTests
{
    /// <summary>The "not" column of the glossary table: each back-quoted word, with the term it stands against.</summary>
    private static List<(string Term, string Not)> Unwanted()
    {
        var text = File.ReadAllText(Path.Combine(TestPaths.Docs, "workflow.md"));
        var start = text.IndexOf("## Glossary", StringComparison.Ordinal);
        Assert.True(start >= 0, "docs/workflow.md has no glossary");
        var rows = text[start..].Split('\n').Where(l => l.StartsWith('|') && !l.StartsWith("|---", StringComparison.Ordinal)).Skip(1);
        var result = new List<(string, string)>();
        foreach (var row in rows)
        {
            var cells = row.Split('|');
            foreach (Match m in Quoted().Matches(cells[^2])) result.Add((cells[1].Trim(), m.Groups[1].Value));
        }
        return result;
    }

    [Fact]
    public void The_glossary_names_the_pairs_the_words_were_chosen_between()
    {
        var unwanted = Unwanted();
        Assert.Contains(("jumper", "wire link"), unwanted);
        Assert.Contains(("mm²", "mm^2"), unwanted);
        Assert.Contains(("pad template", "placement sheet"), unwanted);
    }

    [Fact]
    public void The_bench_the_sheets_and_the_reports_use_only_the_glossary_words()
    {
        var texts = new Dictionary<string, string>();
        foreach (var file in Directory.EnumerateFiles(Path.Combine(TestPaths.RepoRoot, "src", "PadPlan.Editor"), "*", SearchOption.AllDirectories)
                     .Where(f => f.EndsWith(".cs", StringComparison.Ordinal) || f.EndsWith(".js", StringComparison.Ordinal) || f.EndsWith(".html", StringComparison.Ordinal))
                     .Where(f => !f.Contains($"{Path.DirectorySeparatorChar}obj{Path.DirectorySeparatorChar}", StringComparison.Ordinal) && !f.Contains($"{Path.DirectorySeparatorChar}bin{Path.DirectorySeparatorChar}", StringComparison.Ordinal)))
            texts[Path.GetRelativePath(TestPaths.RepoRoot, file)] = File.ReadAllText(file);

        var project = TestPaths.CopyOfTinyBuffer();
        var sheets = Path.Combine(Path.GetDirectoryName(project)!, "sheets");
        foreach (var args in new[]
        {
            new[] { "check", project }, ["bom", project, "--build-order"], ["testplan", project], ["cutlist", project],
            ["place", project, "--force", "--effort", "quick"], ["swap", project, "R1", "--footprint", "res-axial-500mw", "--dry-run"],
            ["sheets", project, "-o", sheets, "--formats", "svg"],
        })
        {
            var run = CliRunner.Run(args);
            texts[$"padplan {args[0]}"] = run.Out + run.Err;
        }
        foreach (var svg in Directory.EnumerateFiles(sheets, "*.svg")) texts[Path.GetFileName(svg)] = File.ReadAllText(svg);

        var found = from text in texts
                    from u in Unwanted()
                    where Regex.IsMatch(text.Value, $@"(?<!\w){Regex.Escape(u.Not)}(?!\w)", RegexOptions.IgnoreCase) // whole words: "mm offcut" is not "mm off"
                    select $"{text.Key} says \"{u.Not}\" where the glossary word is \"{u.Term}\"";
        Assert.Empty(found);
    }

    [GeneratedRegex("`([^`]+)`")]
    private static partial Regex Quoted();
}
