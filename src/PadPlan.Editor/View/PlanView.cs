using PadPlan.Output.Geometry;

namespace PadPlan.Editor.View;

/// <summary>What the page draws and lists after every change: the plan's geometry (the same resolved geometry the sheets draw), held items, the check's findings and the open connections.</summary>
public sealed class PlanView
{
    public string Project { get; set; } = "";
    /// <summary>The project file's name only; the page never sees or sends a path.</summary>
    public string File { get; set; } = "";
    public int Revision { get; set; }
    public bool Unsaved { get; set; }
    public bool CanUndo { get; set; }
    public bool CanRedo { get; set; }
    /// <summary>Null until the plan has a layout on a board of known size.</summary>
    public GeometryDocument? Geometry { get; set; }
    public List<PadAnchor> Pads { get; set; } = [];
    public List<string> HeldParts { get; set; } = [];
    public List<string> NetNames { get; set; } = [];
    public List<double> Punches { get; set; } = [];
    public List<FindingView> Findings { get; set; } = [];
    public List<OpenThread> Open { get; set; } = [];
    /// <summary>Polarity and pin-1 marks of the placed parts (band, notch, dot, winding start), from the footprints' marks, in board mm.</summary>
    public List<MarkView> Marks { get; set; } = [];
    /// <summary>Parts whose lead ends carry their pin names on the bench (E/B/C, A/K, +/-), as the assembly view prints them.</summary>
    public List<string> NamedPins { get; set; } = [];
    public int Errors { get; set; }
    public int Warnings { get; set; }
    /// <summary>Server time of the last check, for the status line (not a test figure).</summary>
    public double CheckMilliseconds { get; set; }
}

/// <summary>A whole pad or strip: the point a drag moves (centre, or a strip's start), its islands and whether it is held.</summary>
public sealed class PadAnchor
{
    public string Id { get; set; } = "";
    public string Kind { get; set; } = "";
    public double X { get; set; }
    public double Y { get; set; }
    public bool Held { get; set; }
    public List<string> Islands { get; set; } = [];
}

/// <summary>One finding of the check as the page lists it.</summary>
public sealed class FindingView
{
    public string Rule { get; set; } = "";
    public string Severity { get; set; } = "";
    public string Message { get; set; } = "";
    public string Hint { get; set; } = "";
    public double[]? At { get; set; }
    public List<string> Items { get; set; } = [];
}

/// <summary>A thin straight line between two pieces of one net that the check found apart: where a lead or link would join them.</summary>
public sealed class OpenThread
{
    public string Net { get; set; } = "";
    public double[] From { get; set; } = [];
    public double[] To { get; set; } = [];
}

/// <summary>One printed mark of a placed part: its outline in board mm, filled (band, dot) or drawn (notch).</summary>
public sealed class MarkView
{
    public string Ref { get; set; } = "";
    public string Lead { get; set; } = "";
    public string Kind { get; set; } = "";
    public List<double[]> Points { get; set; } = [];
    public bool Filled { get; set; }
}
