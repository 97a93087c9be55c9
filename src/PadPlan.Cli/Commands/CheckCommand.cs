using System.CommandLine;
using PadPlan.IO;
using PadPlan.ProjectFiles;
using PadPlan.Rules;
using PadPlan.Output.CheckReports;

namespace PadPlan.Cli.Commands;

/// <summary>`padplan check`: Check a plan against its circuit: connectivity, spacing, reach, high voltage; estimate parasitics.</summary>
public static class CheckCommand
{
    public static Command Create(CommandContext context)
    {
        var project = SharedOptions.ProjectArgument();
        var json = new Option<FileInfo?>("--json") { Description = "Also write the findings as JSON to this file." };
        var force = SharedOptions.ForceOutput();
        var strict = new Option<bool>("--strict") { Description = "Fail (exit 1) on warnings too, not only on errors." };
        var parasitics = new Option<bool>("--parasitics") { Description = "Estimate pad capacitance and lead inductance for every net, not only rf nets." };
        var quiet = SharedOptions.Quiet();
        var ngspice = SharedOptions.Ngspice();
        var wide = SharedOptions.Wide();
        var command = new Command("check", "Check a plan against its circuit: connectivity, spacing, reach, high voltage; polarity and ratings at the simulated operating point; estimate parasitics.")
        {
            project, json, strict, parasitics, quiet, ngspice, wide, force,
        };
        command.SetAction(parse => context.Guarded(() =>
        {
            var file = parse.GetValue(project)!;
            var plan = ProjectFile.Read(file.FullName);
            var isStrict = parse.GetValue(strict);
            var simulation = SharedOptions.Simulate(parse, ngspice, plan);
            var report = Checker.Check(plan, new CheckOptions(parse.GetValue(parasitics), simulation));
            if (parse.GetValue(json) is { } jsonFile)
            {
                OutputGuard.EnsureReplaceable(jsonFile, parse.GetValue(force), "a check report that padplan wrote", head => CheckReportJson.IsOwn(head));
                AtomicFile.WriteAllBytes(jsonFile.FullName, CheckReportJson.ToBytes(plan.Name, report, isStrict));
                context.Err.WriteLine($"Wrote {jsonFile.FullName}");
            }
            if (parse.GetValue(quiet))
            {
                if (!report.Passed(isStrict)) context.Out.WriteLine(CheckReportTables.Summary(plan.Name, report, isStrict));
            }
            else context.Out.Write(CheckReportTables.ToText(plan.Name, report, isStrict, SharedOptions.TableWidth(context, parse, wide)));
            return report.Passed(isStrict) ? ExitCodes.Success : ExitCodes.RuleViolations;
        }));
        return command;
    }
}
