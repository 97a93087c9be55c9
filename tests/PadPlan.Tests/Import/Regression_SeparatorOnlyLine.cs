using System.Text;
using PadPlan.Import;
using PadPlan.IO;

namespace PadPlan.Tests.Import;

/// <summary>Regression: a SPICE line holding only a separator (found by the fuzz test: "\n)") crashed the reader instead of being read past or refused.</summary>
public sealed class Regression_SeparatorOnlyLine
{
    [Theory]
    [InlineData("\n)")]
    [InlineData("title\n( )\nR1 a 0 1k\n")]
    public void A_line_of_separators_is_not_a_crash(string text)
    {
        try
        {
            NetlistImporter.Import(Encoding.UTF8.GetBytes(text), "sep.cir", new ImportOptions(ImportFixture.Library));
        }
        catch (InputException)
        {
            // refusing it as bad input is fine too
        }
    }
}
