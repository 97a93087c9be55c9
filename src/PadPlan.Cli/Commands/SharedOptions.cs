using System.CommandLine;

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

    public static Option<FileInfo?> CsvOption() => new("--csv")
    {
        Description = "Also write the table as CSV to this file.",
    };

    public static Option<bool> Quiet() => new("--quiet", "-q")
    {
        Description = "Print only errors.",
    };
}
