using System.Globalization;

namespace PadPlan.Cli;

/// <summary>How wide the terminal is, for fitting text tables: COLUMNS when set to a number, else the console's width, else 80.</summary>
public static class TerminalWidth
{
    /// <summary>The width assumed when nothing says otherwise (the classic terminal); common practice, no source.</summary>
    public const int Unknown = 80;
    /// <summary>Narrowest width honoured; below it tables would be mostly line breaks.</summary>
    public const int Narrowest = 40;

    /// <summary>COLUMNS (the POSIX shell variable for the terminal's width) wins when it is a whole number; then the console's own width when there is one.</summary>
    public static int Resolve(string? columnsVariable, int? consoleWidth)
    {
        if (int.TryParse(columnsVariable?.Trim(), NumberStyles.None, CultureInfo.InvariantCulture, out var columns) && columns > 0)
            return Math.Max(Narrowest, columns);
        return consoleWidth is { } w && w > 0 ? Math.Max(Narrowest, w) : Unknown;
    }

    /// <summary>The width of the console standard output writes to, or null when it goes to a file or pipe.</summary>
    public static int? Console()
    {
        if (System.Console.IsOutputRedirected) return null;
        try { return System.Console.WindowWidth; }
        catch (IOException) { return null; }
    }
}
