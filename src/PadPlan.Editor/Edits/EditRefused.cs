namespace PadPlan.Editor.Edits;

/// <summary>An edit that cannot be applied (unknown item, missing field); the message tells the user why and nothing changes.</summary>
public sealed class EditRefused(string message) : Exception(message);
