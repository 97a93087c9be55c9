using System.CommandLine;
using PadPlan.Import;
using PadPlan.Model;
using PadPlan.Simulation;

namespace PadPlan.Cli.Commands;

/// <summary>Arguments and options used by several commands, defined once.</summary>
public static class SharedOptions
{
    public static Argument<FileInfo> ProjectArgument() => new("project")
    {
        Description = "The project file (*.padplan.json).",
    };

    public static Option<DirectoryInfo[]> FootprintDirs() => new("--footprints")
    {
        Description = "A folder of extra footprint files (*.json); may be given more than once.",
        AllowMultipleArgumentsPerToken = false,
    };

    /// <summary>--force for commands that write output files: replace one even when padplan did not write it (<see cref="OutputGuard"/>).</summary>
    public static Option<bool> ForceOutput() => new("--force") { Description = "Replace an existing output file even when padplan did not write it." };

    public static Option<FileInfo?> CsvOption() => new("--csv")
    {
        Description = "Also write the table as CSV to this file.",
    };

    public static Option<string?> Ngspice() => new("--ngspice")
    {
        Description = $"The ngspice program that finds the operating point (else the {SimulationOptions.EnvironmentVariable} environment variable, else ngspice on PATH); 'none' leaves the simulation out.",
    };

    /// <summary>The operating point for a command, run once: by the program --ngspice names, or found; a named program that does not exist is a usage error.</summary>
    public static SimulationResult Simulate(ParseResult parse, Option<string?> option, Project project)
    {
        var given = parse.GetValue(option);
        if (string.Equals(given, "none", StringComparison.OrdinalIgnoreCase)) return Simulator.Run(project, new SimulationOptions(Off: true));
        if (given is not null && !File.Exists(given))
            throw new UsageException($"--ngspice {given}: no such program; give the path of ngspice, 'none', or leave the option out to use {SimulationOptions.EnvironmentVariable} or PATH.");
        return Simulator.Run(project, new SimulationOptions(given));
    }

    public static Option<bool> Wide() => new("--wide")
    {
        Description = "Print each table row on one line, however wide, instead of fitting the tables to the terminal (COLUMNS, else the console's width, else 80).",
    };

    /// <summary>The width text tables are fitted to: none with --wide, else the terminal's.</summary>
    public static int? TableWidth(CommandContext context, ParseResult parse, Option<bool> wide) => parse.GetValue(wide) ? null : context.Columns;

    public static Option<bool> Quiet() => new("--quiet", "-q")
    {
        Description = "Print only errors.",
    };

    public static Option<string?> Board() => new("--board")
    {
        Description = "Board size WIDTHxHEIGHT in mm (e.g. 80x50), or auto to let the placer size it.",
    };

    /// <summary>The --board value: not given, auto (null size) or a size; a bad value is a usage error.</summary>
    public static bool TryBoardSize(ParseResult parse, Option<string?> option, out (double Width, double Height)? size)
    {
        size = null;
        if (parse.GetValue(option) is not { } text) return false;
        size = PpnReader.BoardSize(text, out var error);
        if (error is not null) throw new UsageException($"--board: {error}");
        return true;
    }
}
