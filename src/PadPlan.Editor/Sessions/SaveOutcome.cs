namespace PadPlan.Editor.Sessions;

/// <summary>What a save did: written (to which file name), or refused because the file changed on disk since it was loaded.</summary>
public sealed record SaveOutcome(bool Saved, string File, string Message);
