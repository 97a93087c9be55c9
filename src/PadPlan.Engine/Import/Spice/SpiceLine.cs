namespace PadPlan.Import;

/// <summary>One logical SPICE line: the text with its '+' continuations joined and comments removed, and the line it starts on.</summary>
public sealed record SpiceLine(string Text, int Line);
