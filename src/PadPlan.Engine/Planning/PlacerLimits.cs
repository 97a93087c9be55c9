namespace PadPlan.Planning;

/// <summary>Fixed numbers of the engine, gathered in one place so none hides in a loop.</summary>
internal static class PlacerLimits
{
    /// <summary>Kept inside every hard limit so that rounding coordinates to 0.01 mm can never break a rule.</summary>
    public const double Safety = 0.03;
    /// <summary>Extra room demanded on every gap and reach while annealing, dropped for the final check, so small leftovers of annealing are still legal.</summary>
    public const double AnnealSlack = 0.4;
    /// <summary>Gap kept between part bodies so parts do not touch (common practice, no source).</summary>
    public const double BodyGap = 0.3;
    /// <summary>Coordinates written to the project are rounded to this step (mm).</summary>
    public const double WriteStep = 0.01;
    /// <summary>Longest rectangle the planner cuts for one net before it splits the net over jumpered pads (common practice, no source).</summary>
    public const double MaxRectLength = 30.0;
    /// <summary>Lead reach distances tried for ground landings beyond the shortest one (mm).</summary>
    public static readonly double[] GroundSteps = [0, 1.5, 3.0];
    /// <summary>Directions tried for a ground landing, as turns from the lead's outward direction (degrees).</summary>
    public static readonly double[] GroundTurns = [0, 45, -45, 90, -90, 135, -135, 180];
    /// <summary>VPR target acceptance rate for the move-range limiter (Betz and Rose, 1997).</summary>
    public const double TargetAcceptance = 0.44;
    /// <summary>VPR initial temperature: this many standard deviations of the cost change of random moves.</summary>
    public const double StartTemperatureSigmas = 20;
    /// <summary>VPR stopping rule: temperature below this fraction of the mean cost per net.</summary>
    public const double StopFraction = 0.005;
    /// <summary>Safety stop on the number of temperature steps.</summary>
    public const int MaxSteps = 400;
    /// <summary>Floor on moves per temperature (before the effort factor): small circuits are cheap, so they get a thorough search anyway.</summary>
    public const int MinMovesPerTemperature = 600;
    /// <summary>Extra temperature steps at the final temperature while rules are still broken.</summary>
    public const int CleanupSteps = 12;
    /// <summary>Smallest move range (mm).</summary>
    public const double MinRange = 0.5;
    /// <summary>Times the automatic board region may grow when a layout does not fit.</summary>
    public const int AutoGrowTries = 4;
    /// <summary>Growth of the automatic region per try.</summary>
    public const double AutoGrowFactor = 1.2;
    /// <summary>Area allowance of the first automatic region over the sum of body and pad areas.</summary>
    public const double AutoAreaFactor = 2.6;
}
