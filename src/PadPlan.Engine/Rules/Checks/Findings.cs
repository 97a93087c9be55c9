using PadPlan.Model;

namespace PadPlan.Rules.Checks;

/// <summary>Short forms for making findings.</summary>
internal static class Findings
{
    public static Finding Error(string rule, string message, string hint, Point? at, params IEnumerable<string> items) =>
        new(rule, Severity.Error, message, hint, at, items.ToValueList());

    public static Finding Warning(string rule, string message, string hint, Point? at, params IEnumerable<string> items) =>
        new(rule, Severity.Warning, message, hint, at, items.ToValueList());

    public static Finding Info(string rule, string message, string hint, Point? at, params IEnumerable<string> items) =>
        new(rule, Severity.Info, message, hint, at, items.ToValueList());
}
