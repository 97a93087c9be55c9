namespace PadPlan.Planning;

/// <summary>A progress report from a running placement: which run, what stage, the temperature step and the current cost.</summary>
public readonly record struct PlacerProgress(int Run, string Stage, int Step, double Cost, int Violations);
