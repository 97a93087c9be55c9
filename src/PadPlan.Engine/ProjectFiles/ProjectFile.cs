using System.Text.Json;
using PadPlan.IO;
using PadPlan.Model;
using PadPlan.ProjectFiles.Limits;

namespace PadPlan.ProjectFiles;

/// <summary>Reads and writes PadPlan project files (JSON, format "padplan-project/1", usual name *.padplan.json).</summary>
public static class ProjectFile
{
    public const string FormatTag = "padplan-project/1";
    public const string FormatPrefix = "padplan-project/";
    public const string Extension = ".padplan.json";

    /// <summary>Reads and checks a project file; throws <see cref="InputException"/> naming the place of any problem.</summary>
    public static Project Read(string path)
    {
        var bytes = InputFile.ReadAllBytes(path, InputLimits.MaxFileBytes, "project file", "Create one with 'padplan import NETLIST -o FILE.padplan.json'.");
        return Parse(bytes, path);
    }

    /// <summary>Parses and checks project JSON; the file name is used in messages only.</summary>
    public static Project Parse(byte[] bytes, string fileName)
    {
        bytes = TextEncodingCheck.Utf8(bytes, fileName);
        var dto = JsonInput.Deserialize(bytes, ProjectJsonContext.Default.ProjectDto, InputLimits.Project, fileName, "a project", d => d.Format);
        var reader = new DtoReader(fileName, bytes);
        if (dto.Format is null)
            throw reader.Fail("$.format", $"missing \"format\": a PadPlan project file starts with \"format\": \"{FormatTag}\".");
        if (dto.Format != FormatTag)
            throw reader.Fail("$.format", dto.Format.StartsWith(FormatPrefix, StringComparison.Ordinal)
                ? $"this file is format {JsonInput.Describe(dto.Format)}; this PadPlan reads \"{FormatTag}\". Use a PadPlan version that knows that format."
                : $"this file has {JsonInput.Describe(dto.Format)}, not a PadPlan project format; expected \"{FormatTag}\".");
        var project = new Project(
            reader.Need(dto.Name, "$.name", "project name"),
            reader.Board(dto.Board, "$.board"),
            reader.Toolkit(dto.Toolkit, "$.toolkit"),
            reader.Rules(dto.Rules, "$.rules"),
            (dto.Nets ?? []).Select((n, i) => reader.Net(n, $"$.nets[{i}]")).ToValueList(),
            reader.Need(dto.Parts, "$.parts", "part list").Select((p, i) => reader.Part(p, $"$.parts[{i}]")).ToValueList(),
            (dto.Footprints ?? []).Select((f, i) => reader.Footprint(f, $"$.footprints[{i}]")).ToValueList(),
            dto.Layout is null ? null : reader.Layout(dto.Layout, "$.layout"),
            dto.Description ?? "",
            dto.FootprintDirs?.ToValueList(),
            dto.Imported is null ? null : reader.Imported(dto.Imported, "$.imported"));
        var problem = ProjectValidator.FirstProblem(project);
        if (problem is not null) throw reader.Fail(problem.Value.Path, problem.Value.Message);
        return project;
    }

    /// <summary>The JSON bytes of a project: UTF-8, indented, LF line ends, ending in a newline. Same project, same bytes.</summary>
    public static byte[] ToBytes(Project project)
    {
        var json = JsonSerializer.Serialize(DtoWriter.Project(project), ProjectJsonContext.Default.ProjectDto);
        return System.Text.Encoding.UTF8.GetBytes(json.ReplaceLineEndings("\n") + "\n");
    }

    /// <summary>
    /// Claims a project file for changing, before it is read: leftovers of killed runs removed, a read-only file refused,
    /// and the one-writer lock taken (a second writer is refused). Dispose the claim after writing.
    /// </summary>
    public static WriterLock Claim(string path)
    {
        AtomicFile.EnsureReplaceable(path);
        Directory.CreateDirectory(Path.GetDirectoryName(Path.GetFullPath(path)) ?? ".");
        var claim = WriterLock.Take(path);
        AtomicFile.RemoveStaleTemps(Path.GetDirectoryName(claim.File) ?? ".", Path.GetFileName(claim.File));
        return claim;
    }

    /// <summary>
    /// Writes a project atomically (the old file stays whole until the new one is complete), after checking that it reads
    /// back: the one place every project write goes through (import, place, swap, the editor's save).
    /// </summary>
    public static void Write(Project project, string path) => AtomicFile.WriteAllBytes(path, ToCheckedBytes(project, path));

    /// <summary>
    /// The bytes of <paramref name="project"/>, checked exactly as <see cref="Read"/> checks a file (every limit of
    /// docs/limits.md, every name referring to something that exists). Anything out of range throws an
    /// <see cref="InputException"/> (exit 2) naming the JSON path and the limit, so no command writes a file that PadPlan
    /// would then refuse. Call it before writing a project by any other route.
    /// </summary>
    public static byte[] ToCheckedBytes(Project project, string path)
    {
        var bytes = ToBytes(project);
        try
        {
            Parse(bytes, path);
        }
        catch (InputException e)
        {
            throw new InputException(path,
                $"the project to be written would be refused when read back, so nothing was written: {e.Message} " +
                "Bring that value within its limit (in the netlist, parts map or options) and run again.",
                jsonPath: e.JsonPath, inner: e);
        }
        return bytes;
    }
}
