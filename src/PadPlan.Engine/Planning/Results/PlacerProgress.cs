namespace PadPlan.Planning;

/// <summary>A progress report from a running placement: which run, what stage, the temperature step, the current cost and how far (mm, summed) the layout still breaks rules.</summary>
public readonly record struct PlacerProgress(int Run, string Stage, int Step, double Cost, double Violation);
