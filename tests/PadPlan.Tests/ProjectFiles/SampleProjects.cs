using PadPlan.Model;
using PadPlan.ProjectFiles;

namespace PadPlan.Tests.ProjectFiles;

/// <summary>Small projects built in code for file-format tests (invented data).</summary>
internal static class SampleProjects
{
    public static Project WithEveryShape()
    {
        var tiny = ProjectFile.Read(TestPaths.TinyBuffer);
        var board = new Board(60, 40, cornerRadius: 3, margin: 2.5, thickness: 1.6,
            keepouts: ValueList.Of<Keepout>(new CircleKeepout("H1", new Point(5, 5), 3.2), new RectKeepout("HS", new Point(50, 30), 10, 6)));
        var pads = ValueList.Of<Pad>(
            new RoundPad("P1", "IN", new Point(10, 10), 3.97),
            new RectPad("P2", "BASE", new Point(20, 10), 5, 8, 0.8, Locked: true),
            new StripPad("S1", new Point(30, 20), false, 5, ValueList.Of(new StripSegment("S1.1", "VCC", 2.54), new StripSegment("S1.2", null, 2.54))));
        var layout = new Layout(pads, ValueList<Placement>.Empty, ValueList.Of(new Jumper("W1", "P1", "P2", ValueList.Of(new Point(15, 14)))));
        return tiny with { Board = board, Layout = layout, Description = "every shape", Rules = new RuleSettings { PadGap = 1.2, AllowJumpers = false } };
    }
}
