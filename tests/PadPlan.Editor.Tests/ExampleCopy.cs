namespace PadPlan.Editor.Tests;

/// <summary>A copy of an example project in a fresh temporary folder, removed again at the end of the test.</summary>
public sealed class ExampleCopy : IDisposable
{
    public ExampleCopy(string example = "tiny-buffer")
    {
        Folder = Path.Combine(Path.GetTempPath(), "padplan-editor-" + Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(Folder);
        ProjectPath = Path.Combine(Folder, example + ".padplan.json");
        File.Copy(Path.Combine(AppContext.BaseDirectory, "examples", example, example + ".padplan.json"), ProjectPath);
    }

    public string Folder { get; }
    public string ProjectPath { get; }

    public string Beside(string name) => Path.Combine(Folder, name);

    public void Dispose()
    {
        try
        {
            Directory.Delete(Folder, recursive: true);
        }
        catch (IOException)
        {
            // a leftover temporary folder is harmless
        }
    }
}
