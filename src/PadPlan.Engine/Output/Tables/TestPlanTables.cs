using PadPlan.Materials;
using PadPlan.Model;

namespace PadPlan.Output.Tables;

/// <summary>The continuity test plan as report tables: the test sheet with a Done column, and the paths through parts.</summary>
public static class TestPlanTables
{
    /// <summary>The continuity sheet, the paths through parts, and the power-up section (from the operating point, or upper bounds when there is none).</summary>
    public static IReadOnlyList<ReportTable> Tables(Project project, double threshold = DcPaths.DefaultThreshold, PadPlan.Simulation.SimulationResult? simulation = null)
    {
        var paths = DcPaths.Find(project, threshold);
        return [Sheet(project, paths), PathTable(project, paths), PowerUpTable.For(project, simulation)];
    }

    public static ReportTable Sheet(Project project, DcPaths paths)
    {
        var rows = TestPlan.Tests(project, paths).Select(t => new[] { t.Number.ToString(), t.Test, t.ProbeA, t.ProbeB, t.Expect, t.Why, "" }).ToList();
        var notes = new List<string>
        {
            "Test the board unpowered, with a continuity beeper. 'beeps' = must sound; 'silent' = must not; other entries are readings the parts make on purpose.",
            "'diode ... V, red on P..': in the meter's diode mode (about 1 mA), red probe on that pad, black on the other, the meter reads in that range; reversed it reads open. Ranges are the usual ones for silicon, germanium, Schottky and LED junctions (common practice, no source).",
            $"A beeper sounds below roughly 30-50 Ω (meters differ; common practice, no source): paths below {Mm.Of(paths.Threshold)} Ω through parts are listed as reading low.",
            "Electrolytic capacitors may beep briefly while they charge from the meter; the sound should stop.",
            "ICs: internal protection diodes may make a pin read low one way round to a supply or ground pin.",
        };
        if (Cautions.HighVoltageWarning(project) is { } hv) notes.Add("Caution: " + hv);
        return ReportTable.Create("Continuity test plan", ["#", "Test", "Probe A", "Probe B", "Expect", "Why", "Done"], rows, notes);
    }

    public static ReportTable PathTable(Project project, DcPaths paths) => ReportTable.Create(
        "Paths through parts (these read low on a sound board)",
        ["Net A", "Net B", "Reads", "Through", "Note"],
        paths.Paths.Select(p => new[] { p.NetA, p.NetB, ReadingText(p), p.Through, p.Note }),
        [
            paths.Paths.Count == 0
                ? "No part makes a path that reads low: every 'apart' test must be silent."
                : $"Worked out from the netlist: windings, beads and fuses about 0 Ω; resistor networks as the meter sees them (series and parallel); threshold {Mm.Of(paths.Threshold)} Ω. '{DcPaths.Plane}' is ground.",
        ]);

    private static string ReadingText(DcPath path) => path.Reading switch
    {
        DcReading.Low => path.Ohms is { } r && r >= 1e-6 ? $"low, about {r.ToString("0.#", System.Globalization.CultureInfo.InvariantCulture)} Ω" : "low, about 0 Ω",
        DcReading.OneWay when path.Junction is { BothWays: true } j => string.Create(System.Globalization.CultureInfo.InvariantCulture, $"diode {j.Range.Low:0.0#}-{j.Range.High:0.0#} V both ways"),
        DcReading.OneWay when path.Junction is { } j => string.Create(System.Globalization.CultureInfo.InvariantCulture, $"diode {j.Range.Low:0.0#}-{j.Range.High:0.0#} V, + on {j.Anode}"),
        DcReading.OneWay => "diode, one way only",
        _ => "may read low",
    };
}
