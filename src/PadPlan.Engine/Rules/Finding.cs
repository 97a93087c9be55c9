using PadPlan.Model;

namespace PadPlan.Rules;

/// <summary>How bad a finding is: errors fail a check, warnings fail only a strict one.</summary>
public enum Severity
{
    Info,
    Warning,
    Error,
}

/// <summary>One thing the checker found: which rule, how bad, where on the board (mm), which items, what is wrong and how to fix it.</summary>
public sealed record Finding(string RuleId, Severity Severity, string Message, string Hint, Point? Location, ValueList<string> Items);

/// <summary>Everything a check found, with the estimates it made on the way (lines of text for the report).</summary>
public sealed record CheckReport(ValueList<Finding> Findings, ValueList<string> Estimates)
{
    public int Errors => Findings.Count(f => f.Severity == Severity.Error);
    public int Warnings => Findings.Count(f => f.Severity == Severity.Warning);
    public bool Passed(bool strict) => Errors == 0 && (!strict || Warnings == 0);
}
