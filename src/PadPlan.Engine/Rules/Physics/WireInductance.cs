namespace PadPlan.Rules.Physics;

/// <summary>Self-inductance of a straight round wire far from other conductors (Rosa; Grover, "Inductance Calculations"; Terman, "Radio Engineers' Handbook"). Lengths in mm, result in nH; valid for length much greater than radius.</summary>
public static class WireInductance
{
    /// <summary>Low frequency (uniform current): L = 0.2 l (ln(2l/r) - 0.75).</summary>
    public static double LowFrequency(double lengthMm, double radiusMm) => Formula(lengthMm, radiusMm, 0.75);

    /// <summary>High frequency (current on the skin): L = 0.2 l (ln(2l/r) - 1).</summary>
    public static double HighFrequency(double lengthMm, double radiusMm) => Formula(lengthMm, radiusMm, 1.0);

    // A lead only a few radii long is outside the formula's range; it has next to no inductance,
    // so the result is held at zero rather than going negative.
    private static double Formula(double l, double r, double constant)
    {
        if (r <= 0) throw new ArgumentOutOfRangeException(nameof(r), r, "wire radius must be positive.");
        if (l <= 0) return 0;
        return Math.Max(0, 0.2 * l * (Math.Log(2 * l / r) - constant));
    }
}
