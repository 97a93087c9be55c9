namespace PadPlan.Rules.Physics;

/// <summary>Capacitance of a pad over the ground plane as a parallel-plate capacitor, C = e0 er A / d, without fringing.</summary>
public static class PlateCapacitance
{
    /// <summary>Permittivity of free space in pF per mm (8.8541878128e-12 F/m, CODATA 2018).</summary>
    public const double E0PicofaradPerMm = 8.8541878128e-3;

    /// <summary>Capacitance in pF of a plate of this area (mm²) over the plane through stock of this thickness (mm) and relative permittivity.</summary>
    public static double Picofarads(double areaMm2, double thicknessMm, double relativePermittivity)
    {
        if (thicknessMm <= 0) throw new ArgumentOutOfRangeException(nameof(thicknessMm), thicknessMm, "stock thickness must be positive.");
        return E0PicofaradPerMm * relativePermittivity * areaMm2 / thicknessMm;
    }
}
