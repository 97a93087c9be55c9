using PadPlan.IO;
using PadPlan.ProjectFiles.Limits;

namespace PadPlan.Import;

/// <summary>Reads a netlist file in either format (told apart by content, then by extension) and builds a project from it.</summary>
public static class NetlistImporter
{
    public enum Format { Ppn, Spice }

    public static ImportResult ImportFile(string path, ImportOptions options) => Import(ReadFile(path), path, options);

    /// <summary>The bytes of a netlist file: a regular file of at most <see cref="InputLimits.MaxNetlistBytes"/>.</summary>
    public static byte[] ReadFile(string path) => InputFile.ReadAllBytes(path, InputLimits.MaxNetlistBytes, "netlist file");

    public static ImportResult Import(byte[] bytes, string file, ImportOptions options) => ProjectBuilder.Build(Read(bytes, file), options);

    /// <summary>The netlist's circuit, refused (exit 2) when it is over a limit of docs/limits.md: bytes and line length first, then element lines counted before any is parsed, then parts.</summary>
    public static Netlist Read(byte[] bytes, string file)
    {
        if (bytes.Length > InputLimits.MaxNetlistBytes)
            throw new InputException(file, $"the netlist file is larger than {InputLimits.MaxNetlistBytes / (1024 * 1024)} MB, the most PadPlan reads (see docs/limits.md).");
        var lines = NetlistText.Lines(bytes, file);
        NetlistLimits.CheckLines(lines, file);
        var netlist = Detect(lines, file) == Format.Ppn ? PpnReader.Read(lines, file) : SpiceReader.Read(lines, file);
        NetlistLimits.CheckParts(netlist.Parts.Count, file);
        return netlist;
    }

    // name=value words that SPICE element lines carry (m=, ic=, tc1=, l=, w=...): not the own format's PIN=NET.
    private static readonly HashSet<string> SpiceInstanceParameters = new(StringComparer.OrdinalIgnoreCase)
        { "m", "ic", "tc", "tc1", "tc2", "l", "w", "area", "temp", "dtemp", "scale", "nt", "ad", "as", "pd", "ps", "nrd", "nrs", "td", "r", "rser", "z0", "off" };

    /// <summary>SPICE marks itself with dot commands, '*' comments and '+' continuations; the own format with '#' comments, net/board/title lines and PIN=NET words. The extension decides a tie.</summary>
    public static Format Detect(string[] lines, string file)
    {
        int spice = 0, ppn = 0;
        foreach (var raw in lines.Skip(1).Take(400))
        {
            var line = raw.TrimStart();
            if (line.Length == 0) continue;
            var lower = line.ToLowerInvariant();
            if (line[0] is '.' or '*' or '+') spice++;
            else if (line[0] == '#' || lower.StartsWith("net ", StringComparison.Ordinal) || lower.StartsWith("board ", StringComparison.Ordinal) || lower.StartsWith("title ", StringComparison.Ordinal)) ppn++;
            else if (line.Split([' ', '\t'], StringSplitOptions.RemoveEmptyEntries).Skip(1).Any(w => w.Length > 2 && w.IndexOf('=') is > 0 and var at && at < w.Length - 1 && !w.Contains('(') && !SpiceInstanceParameters.Contains(w[..at]))
                     && !line.Contains('(')) ppn++;
        }
        var first = lines.Length > 0 ? lines[0].TrimStart().ToLowerInvariant() : "";
        if (first.StartsWith('#') || first.StartsWith("title ", StringComparison.Ordinal) || first.StartsWith("net ", StringComparison.Ordinal) || first.StartsWith("board ", StringComparison.Ordinal)) ppn += 2;
        if (spice != ppn) return spice > ppn ? Format.Spice : Format.Ppn;
        var ext = Path.GetExtension(file).ToLowerInvariant();
        if (ext == PpnReader.Extension) return Format.Ppn;
        if (SpiceReader.Extensions.Contains(ext)) return Format.Spice;
        throw new InputException(file, "cannot tell whether this is a PadPlan netlist or a SPICE netlist. Name it *.ppn (PadPlan) or *.cir (SPICE).", 1);
    }
}
