namespace PadPlan.Model;

/// <summary>A part's turn on the board in quarter turns, clockwise as seen from above.</summary>
public enum Rotation
{
    R0 = 0,
    R90 = 90,
    R180 = 180,
    R270 = 270,
}

/// <summary>Conversions for <see cref="Rotation"/>.</summary>
public static class Rotations
{
    public static IReadOnlyList<Rotation> All { get; } = [Rotation.R0, Rotation.R90, Rotation.R180, Rotation.R270];

    public static int Degrees(this Rotation rotation) => (int)rotation;

    public static bool TryFromDegrees(int degrees, out Rotation rotation)
    {
        var normalised = ((degrees % 360) + 360) % 360;
        rotation = (Rotation)normalised;
        return normalised % 90 == 0;
    }

    public static Rotation Plus(this Rotation a, Rotation b) => (Rotation)(((int)a + (int)b) % 360);
}
