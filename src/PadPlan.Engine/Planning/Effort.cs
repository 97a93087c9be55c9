namespace PadPlan.Planning;

/// <summary>How hard the placer works: more moves per temperature and more independent runs buy shorter leads with time.</summary>
public enum Effort
{
    Quick,
    Normal,
    Thorough,
}
