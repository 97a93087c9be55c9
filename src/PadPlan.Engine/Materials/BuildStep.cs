namespace PadPlan.Materials;

/// <summary>One numbered step of the build: what to do, to what, where, and anything to mind.</summary>
public sealed record BuildStep(int Number, string Action, string What, string Where, string Note);
