using PadPlan.IO;

namespace PadPlan.Cli;

/// <summary>Where a command writes: results to Out, messages and progress to Err. Runs a command body and turns failures into exit codes.</summary>
public sealed class CommandContext(TextWriter stdout, TextWriter stderr, bool errIsTerminal = false, int columns = TerminalWidth.Unknown)
{
    /// <summary>Width of the terminal in characters (see <see cref="TerminalWidth"/>): text tables are fitted to it unless --wide is given.</summary>
    public int Columns { get; } = columns;

    public TextWriter Out { get; } = new VisibleTextWriter(stdout);
    public TextWriter Err { get; } = new VisibleTextWriter(stderr);
    /// <summary>Err is a terminal a person watches, so progress may redraw a line in place; otherwise only results and messages go there.</summary>
    public bool ErrIsTerminal { get; } = errIsTerminal;
    /// <summary>Stderr itself, for the progress line alone: it writes only PadPlan's own figures and the terminal codes that redraw the line, which <see cref="Err"/> would make visible.</summary>
    internal TextWriter ProgressLine { get; } = stderr;

    /// <summary>Runs a command body: bad input becomes exit 2 with a message naming the place; anything unexpected becomes exit 3.</summary>
    public int Guarded(Func<int> body)
    {
        try
        {
            return body();
        }
        catch (InputException e)
        {
            Err.WriteLine($"error: {e.Describe()}");
            return ExitCodes.InputError;
        }
        catch (UsageException e)
        {
            Err.WriteLine($"error: {e.Message}");
            return ExitCodes.InputError;
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            Err.WriteLine($"error: {e.Message}");
            return ExitCodes.InputError;
        }
        catch (Exception e)
        {
            Err.WriteLine($"internal error: {e.GetType().Name}: {e.Message}");
            Err.WriteLine("This is a fault in PadPlan, not in your files. Please report it with the input that caused it.");
            Err.WriteLine(e.StackTrace);
            return ExitCodes.InternalError;
        }
    }
}

/// <summary>A command line that parses but asks for something impossible (e.g. conflicting options).</summary>
public sealed class UsageException(string message) : Exception(message);
