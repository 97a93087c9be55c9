using PadPlan.Rules;
using Xunit;

namespace PadPlan.Tests.Rules;

public class RuleDocsTests
{
    [Fact]
    public void Every_rule_id_is_documented()
    {
        var doc = File.ReadAllText(Path.Combine(TestPaths.Docs, "rules.md"));
        Assert.All(RuleIds.All, id => Assert.Contains($"`{id}`", doc));
        Assert.Equal(RuleIds.All.Count, RuleIds.All.Distinct().Count());
    }
}
