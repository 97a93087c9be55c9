using PadPlan.Model;

namespace PadPlan.Import;

/// <summary>An imported project (no layout yet) and the warnings met on the way.</summary>
public sealed record ImportResult(Project Project, ValueList<ImportNote> Notes);
