using PadPlan.IO;

namespace PadPlan.Import;

/// <summary>
/// Where a netlist's own "footprints" line may point: a folder inside the netlist's folder (a netlist received from
/// someone else must not make PadPlan read JSON from anywhere on the disk), or a folder the user named on the command
/// line with --footprints.
/// </summary>
public static class NetlistFootprintDirs
{
    /// <summary>The full path of <paramref name="dir"/> (relative to <paramref name="netlistDir"/>), or an <see cref="InputException"/> when it leads outside and the command line did not name it.</summary>
    public static string Resolve(string netlistDir, string dir, IEnumerable<string> namedOnCommandLine, string file)
    {
        var baseDir = Path.TrimEndingDirectorySeparator(Path.GetFullPath(netlistDir));
        var full = Path.TrimEndingDirectorySeparator(Path.GetFullPath(Path.Combine(baseDir, dir)));
        if (namedOnCommandLine.Any(d => string.Equals(Path.TrimEndingDirectorySeparator(Path.GetFullPath(d)), full, StringComparison.Ordinal))) return full;
        if (Inside(Real(baseDir), Real(full))) return full;
        throw new InputException(file,
            $"the footprints line names the folder \"{NetlistText.Echo(dir)}\", which is not inside the netlist's own folder. " +
            "A netlist may name only folders below its own; to use another folder, name it on the command line with --footprints.");
    }

    private static bool Inside(string baseDir, string full)
    {
        var relative = Path.GetRelativePath(baseDir, full);
        return relative != ".." && !relative.StartsWith(".." + Path.DirectorySeparatorChar, StringComparison.Ordinal) && !Path.IsPathRooted(relative);
    }

    // Symbolic links resolved one folder at a time, so a link inside the netlist's folder cannot lead out of it.
    private static string Real(string path)
    {
        var root = Path.GetPathRoot(path) ?? "/";
        var real = root;
        foreach (var part in path[root.Length..].Split(Path.DirectorySeparatorChar, StringSplitOptions.RemoveEmptyEntries))
        {
            var next = Path.Combine(real, part);
            try
            {
                if (new DirectoryInfo(next).ResolveLinkTarget(returnFinalTarget: true) is { } target) next = Path.TrimEndingDirectorySeparator(target.FullName);
            }
            catch (IOException)
            {
                // a loop of links or an unreadable folder: keep the name as it is; reading the folder will say what is wrong
            }
            real = next;
        }
        return real;
    }
}
