namespace PadPlan.IO;

/// <summary>Reads a user's input file whole, refusing one too large to be real input, and turning file-system failures into <see cref="InputException"/>s that name the file.</summary>
public static class InputFile
{
    /// <summary>The file's bytes; <paramref name="what"/> names the kind of file in messages ("project file").</summary>
    public static byte[] ReadAllBytes(string path, long maxBytes, string what, string? missingHint = null)
    {
        try
        {
            var length = new FileInfo(path).Length;
            if (length > maxBytes)
                throw new InputException(path, $"the {what} is {length / (1024 * 1024)} MB; PadPlan reads files of at most {maxBytes / (1024 * 1024)} MB (see docs/limits.md).");
            return File.ReadAllBytes(path);
        }
        catch (FileNotFoundException)
        {
            throw new InputException(path, $"no such {what}.{(missingHint is null ? "" : " " + missingHint)}");
        }
        catch (DirectoryNotFoundException)
        {
            throw new InputException(path, $"the folder of this {what} does not exist.");
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            throw new InputException(path, $"cannot read the {what}: {e.Message}");
        }
    }
}
