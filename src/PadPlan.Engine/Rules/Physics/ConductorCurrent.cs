namespace PadPlan.Rules.Physics;

/// <summary>Current a copper conductor carries for a given temperature rise, IPC-2221 (Section 6.2): I = k dT^0.44 A^0.725, A in square mils.</summary>
public static class ConductorCurrent
{
    /// <summary>k for outer-layer conductors (in free air), IPC-2221.</summary>
    public const double KExternal = 0.048;
    /// <summary>k for inner-layer conductors, IPC-2221.</summary>
    public const double KInternal = 0.024;

    private const double MmPerMil = 0.0254;

    /// <summary>Amps a conductor of this width and copper thickness (mm) carries at the given temperature rise (deg C).</summary>
    public static double Amps(double widthMm, double thicknessMm, double tempRise, bool external = true)
    {
        var squareMils = widthMm / MmPerMil * (thicknessMm / MmPerMil);
        return K(external) * Math.Pow(tempRise, 0.44) * Math.Pow(squareMils, 0.725);
    }

    /// <summary>Narrowest conductor (mm) of the given copper thickness that carries the current within the temperature rise.</summary>
    public static double RequiredWidth(double amps, double tempRise, double thicknessMm, bool external = true)
    {
        if (amps <= 0) return 0;
        if (tempRise <= 0 || thicknessMm <= 0) throw new ArgumentOutOfRangeException(nameof(tempRise), "temperature rise and copper thickness must be positive.");
        var squareMils = Math.Pow(amps / (K(external) * Math.Pow(tempRise, 0.44)), 1 / 0.725);
        return squareMils / (thicknessMm / MmPerMil) * MmPerMil;
    }

    private static double K(bool external) => external ? KExternal : KInternal;
}
