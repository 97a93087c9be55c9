namespace PadPlan.Output.Sheets;

/// <summary>One output file: its name inside the output folder and its bytes.</summary>
public sealed record SheetFile(string Name, byte[] Bytes);
