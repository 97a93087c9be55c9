using System.Reflection;

namespace PadPlan.Editor.Serving;

/// <summary>The page's files, embedded in the assembly (Page/*): read once, served as they are except for the token in the page.</summary>
internal static class PageFiles
{
    public static readonly IReadOnlyDictionary<string, string> Types = new Dictionary<string, string>(StringComparer.Ordinal)
    {
        ["editor.js"] = "text/javascript; charset=utf-8",
        ["editor.css"] = "text/css; charset=utf-8",
        ["view3d.js"] = "text/javascript; charset=utf-8",
        // three.js r170 from the npm registry (package "three", build/three.module.min.js), MIT: its licence beside it.
        ["three.module.min.js"] = "text/javascript; charset=utf-8",
        ["three.LICENSE.txt"] = "text/plain; charset=utf-8",
    };

    public static string Read(string name)
    {
        using var stream = Assembly.GetExecutingAssembly().GetManifestResourceStream("page/" + name)
            ?? throw new InvalidOperationException($"the editor page file {name} is missing from the assembly.");
        using var reader = new StreamReader(stream);
        return reader.ReadToEnd();
    }

    /// <summary>The page with the token placed in its script and style links (the token is hex, so it needs no escaping).</summary>
    public static string Index(string token) => Read("index.html").Replace("{{token}}", token, StringComparison.Ordinal);
}
