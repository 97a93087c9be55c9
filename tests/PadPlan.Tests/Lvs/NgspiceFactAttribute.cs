namespace PadPlan.Tests.Lvs;

/// <summary>A test that needs ngspice (Debian package ngspice, run as `ngspice -b`). Skipped with the reason when it is missing on a developer machine; in CI (CI=true) it runs and fails instead, so it can never be skipped silently there.</summary>
public sealed class NgspiceFactAttribute : FactAttribute
{
    public NgspiceFactAttribute()
    {
        if (Ngspice.Path is null && !Ngspice.InCi) Skip = "ngspice is not installed (apt-get install ngspice); the layout-versus-circuit simulation is skipped.";
    }
}

/// <summary>The theory form of <see cref="NgspiceFactAttribute"/>.</summary>
public sealed class NgspiceTheoryAttribute : TheoryAttribute
{
    public NgspiceTheoryAttribute()
    {
        if (Ngspice.Path is null && !Ngspice.InCi) Skip = "ngspice is not installed (apt-get install ngspice); the layout-versus-circuit simulation is skipped.";
    }
}
