namespace PadPlan.Materials;

/// <summary>A pair of nets that a continuity tester may find joined through parts, and why.</summary>
public sealed record DcPath(string NetA, string NetB, DcReading Reading, double? Ohms, string Through, string Note);
