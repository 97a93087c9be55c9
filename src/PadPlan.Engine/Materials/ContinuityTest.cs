namespace PadPlan.Materials;

/// <summary>One line of the continuity test plan: probe A against probe B, what the meter must show, and why.</summary>
public sealed record ContinuityTest(int Number, string Test, string ProbeA, string ProbeB, string Expect, string Why);
