namespace PadPlan.Planning;

/// <summary>The rectangle every pad, body and ground landing must stay inside (board coordinates, mm).</summary>
internal readonly record struct Region(double MinX, double MinY, double MaxX, double MaxY)
{
    public double Width => MaxX - MinX;
    public double Height => MaxY - MinY;
    public double CentreX => (MinX + MaxX) / 2;
    public double CentreY => (MinY + MaxY) / 2;

    /// <summary>The usable rectangle of a board of the given size: shrunk by the margin on every side.</summary>
    public static Region OfBoard(double width, double height, double margin) => new(margin, margin, width - margin, height - margin);
}
