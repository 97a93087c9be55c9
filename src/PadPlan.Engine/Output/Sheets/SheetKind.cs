namespace PadPlan.Output.Sheets;

/// <summary>The three kinds of sheet, in the order they are printed.</summary>
public enum SheetKind
{
    /// <summary>The 1:1 pad template to tape onto the board.</summary>
    Template,
    /// <summary>The enlarged view to build from.</summary>
    Assembly,
    /// <summary>Check summary, cautions and the tables of the materials step.</summary>
    Report,
}
