using PadPlan.Output.Drawing;

namespace PadPlan.Output.Sheets;

/// <summary>One page of a template split over several: its place in the grid (from 0) and the part of the board it shows (board mm).</summary>
public sealed record Tile(int Row, int Column, Box Region);
