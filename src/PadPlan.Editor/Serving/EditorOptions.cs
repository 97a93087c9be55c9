using PadPlan.Planning;

namespace PadPlan.Editor.Serving;

/// <summary>How to run the editor: which project, which loopback port (0: any free port), the per-run token (random when null) and how hard "place the rest" works.</summary>
public sealed record EditorOptions(string ProjectPath, int Port = 0, string? Token = null, Effort Effort = Effort.Normal)
{
    /// <summary>Largest request body the server reads; an edit is a few hundred bytes.</summary>
    public const long MaxBodyBytes = 64 * 1024;
}
