namespace PadPlan.IO;

/// <summary>Bad input from a user's file: carries the file, the place in it and what to do. The command line turns it into exit code 2.</summary>
public sealed class InputException : Exception
{
    public InputException(string file, string message, int? line = null, int? column = null, string? jsonPath = null, Exception? inner = null)
        : base(message, inner)
    {
        File = file;
        Line = line;
        Column = column;
        JsonPath = jsonPath;
    }

    public string File { get; }
    /// <summary>1-based line, when known.</summary>
    public int? Line { get; }
    /// <summary>1-based column, when known.</summary>
    public int? Column { get; }
    /// <summary>JSON path of the offending value, for JSON files.</summary>
    public string? JsonPath { get; }

    /// <summary>"file:line:col: path: message", leaving out what is unknown.</summary>
    public string Describe()
    {
        var place = File;
        if (Line is not null) place += $":{Line}";
        if (Line is not null && Column is not null) place += $":{Column}";
        var path = JsonPath is null ? "" : $" at {JsonPath}";
        return $"{place}{path}: {Message}";
    }
}
