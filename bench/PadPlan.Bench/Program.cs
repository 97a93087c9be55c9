using System.Diagnostics;
using System.Globalization;
using System.Text;
using PadPlan.Bench;
using PadPlan.Model;
using PadPlan.Planning;
using PadPlan.ProjectFiles;
using PadPlan.Rules;

// Placement benchmark: synthetic circuits of several sizes plus every example, placed at one effort, each beside the row baseline.
// Usage: dotnet run -c Release --project bench/PadPlan.Bench -- [--sizes 20,50,100,200,500] [--effort normal] [--seed 1] [--write docs/benchmarks.md]
//        ... -- --profile N (stage timings of one run), --preview PROJECT OUT.png (rough picture of a placed project),
//        ... -- --edit-recheck N (the editor's work after one change on an N-part plan: edit, check, view)
//        ... -- [--seed S] --synthetic N OUT.padplan.json (write an unplaced synthetic circuit for `padplan place`)
var sizes = new[] { 20, 50, 100, 200, 500 };
var effort = Effort.Normal;
var seed = 1;
string? write = null;
for (var i = 0; i < args.Length; i++)
{
    switch (args[i])
    {
        case "--sizes": sizes = [.. args[++i].Split(',').Select(int.Parse)]; break;
        case "--effort": effort = Enum.Parse<Effort>(args[++i], ignoreCase: true); break;
        case "--seed": seed = int.Parse(args[++i], CultureInfo.InvariantCulture); break;
        case "--write": write = args[++i]; break;
        case "--preview": Preview.Write(args[++i], args[++i]); return 0;
        case "--synthetic": ProjectFile.Write(SyntheticCircuit.Make(int.Parse(args[++i], CultureInfo.InvariantCulture), seed), args[++i]); return 0;
        case "--edit-recheck": EditRecheck.Run(int.Parse(args[++i], CultureInfo.InvariantCulture), 50); return 0;
        case "--profile": Profile.Run(int.Parse(args[++i], CultureInfo.InvariantCulture), new PlacerSettings(seed, effort)); return 0;
        default: Console.Error.WriteLine($"unknown argument {args[i]}"); return 2;
    }
}
var root = FindRoot();
var settings = new PlacerSettings(seed, effort);
var cases = new List<(string Name, Project Project)>();
foreach (var n in sizes) cases.Add(($"synthetic {n}", SyntheticCircuit.Make(n, 1000 + n)));
foreach (var file in Directory.GetFiles(Path.Combine(root, "examples"), "*.padplan.json", SearchOption.AllDirectories).Order(StringComparer.Ordinal))
    cases.Add(($"example {Path.GetFileName(file).Replace(".padplan.json", "")}", ProjectFile.Read(file) with { Layout = null }));
cases.AddRange(ExampleNetlists.ImportAll(Path.Combine(root, "examples")));

var rows = new List<BenchRow>();
foreach (var (name, project) in cases)
{
    Console.Error.WriteLine($"{name}: {project.Parts.Count} parts ...");
    var problem = ProblemBuilder.Build(project, settings, CostWeights.Default);
    var baseline = RowBaseline.Place(problem);
    var baseLeads = baseline.LeadTotal() / Math.Max(1e-9, problem.LeadLengthFloor);
    var baseExtent = baseline.Extent();
    var baseViolations = baseline.Problems().Count();
    var clock = Stopwatch.StartNew();
    var result = Placer.Place(project, settings);
    var seconds = clock.Elapsed.TotalSeconds;
    if (!result.Succeeded)
    {
        rows.Add(new BenchRow(name, project.Parts.Count, false, result.Failure!.Message, seconds, 0, -1, 0, 0, 0, 0, baseViolations, baseLeads, baseExtent.Width * baseExtent.Height / problem.RawArea, baseline.Cost, "-"));
        continue;
    }
    var s = result.Summary!;
    // Violations are counted by the independent checker, not by the placer's own legality test.
    var checkClock = Stopwatch.StartNew();
    var check = Checker.Check(result.Project!);
    var checkMs = checkClock.Elapsed.TotalMilliseconds;
    rows.Add(new BenchRow(name, project.Parts.Count, true, "", seconds, s.Moves / seconds, check.Errors, checkMs,
        s.TotalLead / Math.Max(1e-9, s.LeadFloor), s.UsedArea / s.RawArea, s.Cost,
        baseViolations, baseLeads, baseExtent.Width * baseExtent.Height / problem.RawArea, baseline.Cost,
        FormattableString.Invariant($"{s.BoardWidth:0} x {s.BoardHeight:0}")));
    Console.Error.WriteLine(FormattableString.Invariant($"  {seconds:0.00} s, cost {s.Cost:0} vs baseline {baseline.Cost:0}"));
}

var table = new StringBuilder();
table.AppendLine("| case | parts | time (s) | moves/s | violations (checker) | check (ms) | lead / floor | area / raw | cost | board (mm) | baseline violations | baseline lead / floor | baseline area / raw | baseline cost | cost gain |");
table.AppendLine("|---|---|---|---|---|---|---|---|---|---|---|---|---|---|---|");
foreach (var r in rows)
    table.AppendLine(r.Placed
        ? FormattableString.Invariant($"| {r.Case} | {r.Parts} | {r.Seconds:0.00} | {r.MovesPerSecond:0} | {r.Violations} | {r.CheckMilliseconds:0.0} | {r.LeadRatio:0.00} | {r.AreaRatio:0.00} | {r.Cost:0} | {r.Board} | {r.BaselineViolations} | {r.BaselineLeadRatio:0.00} | {r.BaselineAreaRatio:0.00} | {r.BaselineCost:0} | {r.Gain:0.0}x |")
        : FormattableString.Invariant($"| {r.Case} | {r.Parts} | {r.Seconds:0.00} | - | failed: {r.Note} | - | - | - | - | - | {r.BaselineViolations} | {r.BaselineLeadRatio:0.00} | {r.BaselineAreaRatio:0.00} | {r.BaselineCost:0} | - |"));
var machine = Machine();
Console.WriteLine(machine);
Console.WriteLine();
Console.Write(table);
if (write is not null)
{
    var path = Path.Combine(root, write);
    var text = File.Exists(path) ? File.ReadAllText(path) : "";
    const string begin = "<!-- results:begin -->", end = "<!-- results:end -->";
    var block = $"{begin}\n{machine}\n\nEffort {effort.ToString().ToLowerInvariant()}, seed {seed}, {settings.RunsFor(PlacerSettings.SmallCircuit)} runs per case up to {PlacerSettings.SmallCircuit} parts, {settings.RunsFor(PlacerSettings.SmallCircuit + 1)} above.\n\n{table}{end}";
    var a = text.IndexOf(begin, StringComparison.Ordinal);
    var b = text.IndexOf(end, StringComparison.Ordinal);
    text = a >= 0 && b > a ? text[..a] + block + text[(b + end.Length)..] : text + "\n" + block + "\n";
    PadPlan.IO.AtomicFile.WriteAllText(path, text);
    Console.Error.WriteLine($"wrote {path}");
}
return 0;

static string Machine()
{
    var cpu = "unknown CPU";
    try
    {
        cpu = File.ReadLines("/proc/cpuinfo").FirstOrDefault(l => l.StartsWith("model name", StringComparison.Ordinal))?.Split(':', 2)[1].Trim() ?? cpu;
    }
    catch (IOException)
    {
        // not Linux: leave the CPU unnamed
    }
    return $"Machine: {Environment.ProcessorCount} logical processors (nproc), {cpu}; {System.Runtime.InteropServices.RuntimeInformation.FrameworkDescription}, {System.Runtime.InteropServices.RuntimeInformation.OSDescription}.";
}

static string FindRoot()
{
    var dir = new DirectoryInfo(AppContext.BaseDirectory);
    while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "PadPlan.sln"))) dir = dir.Parent;
    return dir?.FullName ?? Directory.GetCurrentDirectory();
}
