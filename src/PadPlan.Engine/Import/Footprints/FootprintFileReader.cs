using PadPlan.IO;
using PadPlan.Model;
using PadPlan.ProjectFiles;
using PadPlan.ProjectFiles.Limits;

namespace PadPlan.Import;

/// <summary>Reads one footprint library file (format "padplan-footprints/1": one family, a list of footprints).</summary>
public static class FootprintFileReader
{
    public const string FormatTag = "padplan-footprints/1";

    /// <summary>The footprints of a file, each with its JSON path for later messages.</summary>
    public static IReadOnlyList<(Footprint Footprint, string Path)> Read(string file)
    {
        var bytes = InputFile.ReadAllBytes(file, InputLimits.MaxFileBytes, "footprint file");
        return Parse(bytes, file);
    }

    public static IReadOnlyList<(Footprint Footprint, string Path)> Parse(byte[] bytes, string file)
    {
        bytes = TextEncodingCheck.Utf8(bytes, file);
        var dto = JsonInput.Deserialize(bytes, ProjectJsonContext.Default.FootprintFileDto, InputLimits.FootprintFile, file, "footprints", d => d.Format);
        var reader = new DtoReader(file, bytes);
        if (dto.Format != FormatTag)
            throw reader.Fail("$.format", $"a footprint file starts with \"format\": \"{FormatTag}\" (found {JsonInput.Describe(dto.Format)}).");
        var family = reader.Need(dto.Family, "$.family", "family name (e.g. \"resistors\")");
        var list = reader.Need(dto.Footprints, "$.footprints", "footprint list");
        return list.Select((f, i) => (reader.Footprint(f, $"$.footprints[{i}]", family), $"$.footprints[{i}]")).ToList();
    }

    internal static InputException Fail(string file, string path, string message)
    {
        byte[] bytes;
        try { bytes = File.ReadAllBytes(file); } catch (IOException) { bytes = []; }
        return new InputException(file, message, JsonLineLocator.LineOf(bytes, path), jsonPath: path);
    }

    /// <summary>A System.Text.Json message without its trailing path and position, which the caller reports itself.</summary>
}
