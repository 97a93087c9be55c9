using System.Diagnostics;
using System.Globalization;
using System.Text;
using PadPlan.Bench;
using PadPlan.Model;
using PadPlan.Planning;
using PadPlan.ProjectFiles;
using PadPlan.Rules;

// Placement benchmark: synthetic circuits of several sizes plus every example, placed at one effort, each beside the row
// baseline; then both starts side by side, and the seed-to-seed spread on the examples.
// Usage: dotnet run -c Release --project bench/PadPlan.Bench -- [--sizes 20,50,100,200,500,1000] [--effort normal] [--seed 1]
//          [--repeat 3] [--seeds 10] [--best-known 50] [--start mixed|spring|scatter] [--skip-compare] [--skip-steady] [--steady-only]
//          [--write docs/benchmarks.md]
//        ... -- --cost-breakdown CASE N (the placer's cost of seeds 1-N's layouts, term by term)
//        ... -- --profile N (stage timings and work per move of one run), --preview PROJECT OUT.png (rough picture of a placed project),
//        ... -- --edit-recheck N (the editor's work after one change on an N-part plan: edit, check, view)
//        ... -- --sim-deck PROJECT (print the deck the operating point runs for a project)
//        ... -- --operating-point N (the operating point by ngspice of an N-part board, as a command runs it once)
//        ... -- [--seed S] --synthetic N OUT.padplan.json (write an unplaced synthetic circuit for `padplan place`)
var sizes = new[] { 20, 50, 100, 200, 500, 1000 };
var effort = Effort.Normal;
var seed = 1;
var repeat = 3;
var seeds = 10;
var start = StartKind.Mixed;
var compare = true;
var steady = true;
var main = true;
var bestKnown = 0;
string? only = null;
string? write = null;
for (var i = 0; i < args.Length; i++)
{
    switch (args[i])
    {
        case "--sizes": sizes = [.. args[++i].Split(',').Select(int.Parse)]; break;
        case "--effort": effort = Enum.Parse<Effort>(args[++i], ignoreCase: true); break;
        case "--seed": seed = int.Parse(args[++i], CultureInfo.InvariantCulture); break;
        case "--repeat": repeat = int.Parse(args[++i], CultureInfo.InvariantCulture); break;
        case "--seeds": seeds = int.Parse(args[++i], CultureInfo.InvariantCulture); break;
        case "--start": start = Enum.Parse<StartKind>(args[++i], ignoreCase: true); break;
        case "--skip-compare": compare = false; break;
        case "--skip-steady": steady = false; break;
        case "--steady-only": main = false; compare = false; break;
        case "--cases": only = args[++i]; break;
        case "--runs-study" or "--cost-breakdown":
        {
            var study = args[i];
            var name = args[++i];
            var n = int.Parse(args[++i], CultureInfo.InvariantCulture);
            var home = FindRoot();
            var studied = Steadiness.Cases(Examples(home, ExampleProjects(home)));
            var c = studied.FirstOrDefault(c => c.Name.Contains(name, StringComparison.Ordinal));
            if (c.Project is null)
            {
                Console.Error.WriteLine($"{study}: no case's name contains \"{name}\"; the cases are {string.Join(", ", studied.Select(x => x.Name))}.");
                return 2;
            }
            if (study == "--runs-study") RunsStudy.Run(c.Project, n, new PlacerSettings(seed, effort));
            else CostBreakdown.Run(c.Project, c.Name, n, new PlacerSettings(seed, effort));
            return 0;
        }
        case "--best-known": bestKnown = int.Parse(args[++i], CultureInfo.InvariantCulture); break;
        case "--write": write = args[++i]; break;
        case "--preview": Preview.Write(args[++i], args[++i]); return 0;
        case "--synthetic": ProjectFile.Write(SyntheticCircuit.Make(int.Parse(args[++i], CultureInfo.InvariantCulture), seed), args[++i]); return 0;
        case "--edit-recheck": EditRecheck.Run(int.Parse(args[++i], CultureInfo.InvariantCulture), 50); return 0;
        case "--sim-deck": Console.Write(PadPlan.Simulation.CircuitDeck.Of(ProjectFile.Read(args[++i])).Text); return 0;
        case "--operating-point": OperatingPointBench.Run(int.Parse(args[++i], CultureInfo.InvariantCulture), 20, Path.Combine(FindRoot(), "examples")); return 0;
        case "--profile": Profile.Run(int.Parse(args[++i], CultureInfo.InvariantCulture), new PlacerSettings(seed, effort) { Start = start }); return 0;
        default: Console.Error.WriteLine($"unknown argument {args[i]}"); return 2;
    }
}
var root = FindRoot();
var settings = new PlacerSettings(seed, effort) { Start = start };
var cases = new List<(string Name, Project Project)>();
foreach (var n in sizes) cases.Add(($"synthetic {n}", SyntheticCircuit.Make(n, 1000 + n)));
var projects = ExampleProjects(root);
cases.AddRange(projects);
var examples = Examples(root, projects);
cases.AddRange(examples.Where(e => !cases.Any(c => c.Name == e.Name)));

var loadBefore = Machine.Load();
var began = DateTime.UtcNow;
var report = new StringBuilder();
report.AppendLine(CultureInfo.InvariantCulture, $"Machine: {Machine.Describe()}.");
if (main)
{
    var rows = cases.Select(c => Measure(c.Name, c.Project, settings, repeat)).ToList();
    report.AppendLine();
    report.AppendLine(CultureInfo.InvariantCulture, $"Effort {effort.ToString().ToLowerInvariant()}, seed {seed}, {start.ToString().ToLowerInvariant()} start, each case placed {repeat} times (times: median, lowest-highest); quality figures are the same in every run.");
    report.AppendLine();
    report.Append(MainTable(rows));
}
if (compare)
{
    Console.Error.WriteLine("both starts side by side ...");
    report.AppendLine();
    report.AppendLine("Both starts side by side, one placement each (with the effort's runs), in the same benchmark run; cases of up to 500 parts (a scatter start at 1,000 parts seldom legalises and makes the region grow, minutes per try):");
    report.AppendLine();
    report.Append(StartTable([.. cases.Where(c => c.Project.Parts.Count <= 500)], settings));
}
if (steady)
{
    Console.Error.WriteLine($"seed spread over {seeds} seeds ...");
    report.AppendLine();
    report.AppendLine(CultureInfo.InvariantCulture, $"Seed to seed at {effort.ToString().ToLowerInvariant()} effort, seeds 1-{seeds}: total lead, longest lead and longest lead on an RF net (mm), median (lowest-highest); spread = highest / lowest - 1; best known = the lowest total lead of {(bestKnown > 0 ? $"seeds 1-{bestKnown} at thorough effort and the seeds here" : "(not run: --best-known N)")}:");
    report.AppendLine();
    report.Append(Steadiness.Table([.. Steadiness.Cases(examples).Where(c => only is null || only.Split(',').Any(o => c.Name.Contains(o, StringComparison.Ordinal)))], settings, seeds, bestKnown));
}
var loadAfter = Machine.Load();
report.AppendLine();
report.AppendLine(CultureInfo.InvariantCulture, $"Run {began:yyyy-MM-dd HH:mm} UTC, {(DateTime.UtcNow - began).TotalMinutes:0.0} min; 1-minute load average {loadBefore:0.0} before, {loadAfter:0.0} after (2 cores: a load above 2 means other work shared them).");
Console.WriteLine(report);
if (write is not null)
{
    var path = Path.Combine(root, write);
    var text = File.Exists(path) ? File.ReadAllText(path) : "";
    const string begin = "<!-- results:begin -->", end = "<!-- results:end -->";
    var block = $"{begin}\n{report.ToString().TrimEnd()}\n{end}";
    var a = text.IndexOf(begin, StringComparison.Ordinal);
    var b = text.IndexOf(end, StringComparison.Ordinal);
    text = a >= 0 && b > a ? text[..a] + block + text[(b + end.Length)..] : text + "\n" + block + "\n";
    PadPlan.IO.AtomicFile.WriteAllText(path, text);
    Console.Error.WriteLine($"wrote {path}");
}
return 0;

static BenchRow Measure(string name, Project project, PlacerSettings settings, int repeat)
{
    Console.Error.WriteLine($"{name}: {project.Parts.Count} parts ...");
    var load = Machine.Load();
    var problem = ProblemBuilder.Build(project, settings, CostWeights.Default);
    var baseline = RowBaseline.Place(problem);
    var floor = problem.LeadLengthFloor;
    var baseLeads = baseline.LeadTotal() / Math.Max(1e-9, floor);
    var baseViolations = baseline.Problems().Count();
    var wall = new List<double>();
    var cpu = new List<double>();
    PlacementResult? result = null;
    for (var k = 0; k < repeat; k++)
    {
        var process = Process.GetCurrentProcess();
        var cpu0 = process.TotalProcessorTime;
        var clock = Stopwatch.StartNew();
        result = Placer.Place(project, settings);
        wall.Add(clock.Elapsed.TotalSeconds);
        process.Refresh();
        cpu.Add((process.TotalProcessorTime - cpu0).TotalSeconds);
    }
    var loadText = FormattableString.Invariant($"{load:0.0}/{Machine.Load():0.0}");
    if (!result!.Succeeded)
        return new BenchRow(name, project.Parts.Count, false, result.Failure!.Message, Spread.Of(wall), Spread.Of(cpu), 0, -1, 0, 0, 0, 0, 0, baseViolations, baseLeads, baseline.Cost, "-", loadText);
    var s = result.Summary!;
    // Violations are counted by the independent checker, not by the placer's own legality test.
    var checkClock = Stopwatch.StartNew();
    var check = Checker.Check(result.Project!);
    var checkMs = checkClock.Elapsed.TotalMilliseconds;
    var wireFloor = floor + problem.JumperFloor;
    Console.Error.WriteLine(FormattableString.Invariant($"  {Spread.Of(wall)} s, cost {s.Cost:0} vs baseline {baseline.Cost:0}, load {loadText}"));
    return new BenchRow(name, project.Parts.Count, true, "", Spread.Of(wall), Spread.Of(cpu), s.Moves / Spread.Of(wall).Median, check.Errors, checkMs,
        s.TotalLead / Math.Max(1e-9, floor), (s.TotalLead + s.JumperLength) / Math.Max(1e-9, wireFloor), s.UsedArea / s.RawArea, s.Cost,
        baseViolations, baseLeads, baseline.Cost, FormattableString.Invariant($"{s.BoardWidth:0} x {s.BoardHeight:0}"), loadText);
}

static string MainTable(List<BenchRow> rows)
{
    var table = new StringBuilder();
    table.AppendLine("| case | parts | time (s) | CPU (s) | load before/after | moves/s | violations (checker) | check (ms) | lead / floor | wire / floor | area / raw | cost | board (mm) | baseline violations | baseline lead / floor | baseline cost | cost gain |");
    table.AppendLine("|---|---|---|---|---|---|---|---|---|---|---|---|---|---|---|---|---|");
    foreach (var r in rows)
        table.AppendLine(r.Placed
            ? FormattableString.Invariant($"| {r.Case} | {r.Parts} | {r.Seconds} | {r.CpuSeconds.Median:0.00} | {r.Load} | {r.MovesPerSecond:0} | {r.Violations} | {r.CheckMilliseconds:0.0} | {r.LeadRatio:0.00} | {r.WireRatio:0.00} | {r.AreaRatio:0.00} | {r.Cost:0} | {r.Board} | {r.BaselineViolations} | {r.BaselineLeadRatio:0.00} | {r.BaselineCost:0} | {r.Gain:0.0}x |")
            : FormattableString.Invariant($"| {r.Case} | {r.Parts} | {r.Seconds} | {r.CpuSeconds.Median:0.00} | {r.Load} | - | failed: {r.Note} | - | - | - | - | - | - | {r.BaselineViolations} | {r.BaselineLeadRatio:0.00} | {r.BaselineCost:0} | - |"));
    return table.ToString();
}

static string StartTable(List<(string Name, Project Project)> cases, PlacerSettings settings)
{
    var table = new StringBuilder();
    table.AppendLine("| case | spring: time (s) | spring: cost | spring: lead / floor | scatter: time (s) | scatter: cost | scatter: lead / floor | lower cost |");
    table.AppendLine("|---|---|---|---|---|---|---|---|");
    foreach (var (name, project) in cases)
    {
        var floor = ProblemBuilder.Build(project, settings, CostWeights.Default).LeadLengthFloor;
        var cells = new List<string>();
        var costs = new List<double>();
        foreach (var kind in new[] { StartKind.Spring, StartKind.Scatter })
        {
            var clock = Stopwatch.StartNew();
            var result = Placer.Place(project, settings with { Start = kind });
            var seconds = clock.Elapsed.TotalSeconds;
            if (!result.Succeeded) { cells.Add(FormattableString.Invariant($"{seconds:0.00} | failed | -")); costs.Add(double.MaxValue); continue; }
            cells.Add(FormattableString.Invariant($"{seconds:0.00} | {result.Summary!.Cost:0} | {result.Summary.TotalLead / Math.Max(1e-9, floor):0.00}"));
            costs.Add(result.Summary.Cost);
        }
        var winner = costs[0] <= costs[1] ? "spring" : "scatter";
        table.AppendLine(FormattableString.Invariant($"| {name} | {cells[0]} | {cells[1]} | {winner} ({Math.Max(costs[0], costs[1]) / Math.Min(costs[0], costs[1]) - 1:P0}) |"));
    }
    return table.ToString();
}

// Every example project under examples/, its layout removed.
static List<(string Name, Project Project)> ExampleProjects(string root) =>
    [.. Directory.GetFiles(Path.Combine(root, "examples"), "*.padplan.json", SearchOption.AllDirectories).Order(StringComparer.Ordinal)
        .Select(file => ($"example {Path.GetFileName(file).Replace(".padplan.json", "")}", ProjectFile.Read(file) with { Layout = null }))];

// The examples of the steadiness table: the example projects that no example netlist imports as well, then every netlist imported.
static List<(string Name, Project Project)> Examples(string root, List<(string Name, Project Project)> projects)
{
    var imported = ExampleNetlists.ImportAll(Path.Combine(root, "examples")).ToList();
    imported.InsertRange(0, projects.Where(p => !imported.Any(e => e.Name == p.Name)));
    return imported;
}

static string FindRoot()
{
    var dir = new DirectoryInfo(AppContext.BaseDirectory);
    while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "PadPlan.sln"))) dir = dir.Parent;
    return dir?.FullName ?? Directory.GetCurrentDirectory();
}
