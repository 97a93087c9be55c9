using PadPlan.IO;
using PadPlan.ProjectFiles;
using PadPlan.Tests.Cli;

namespace PadPlan.Tests.Regressions;

/// <summary>
/// Regression (issue 25): `place` on a project and on a symbolic link to it ran at once and both succeeded, and the link
/// was replaced by a plain file. The lock and the write now follow the link to the real file, and the link stays.
/// </summary>
public sealed class Regression_SymlinkPastTheLock
{
    [Fact]
    public void The_lock_of_the_real_file_holds_against_a_writer_through_a_link()
    {
        if (OperatingSystem.IsWindows()) return; // symbolic links need rights there
        var (real, link) = Linked();
        using (WriterLock.Take(real))
        {
            var result = CliRunner.Run("place", link, "--force", "--effort", "quick", "-q");
            Assert.Equal(2, result.ExitCode);
            Assert.Contains("is being changed by another padplan", result.Err, StringComparison.Ordinal);
        }
        using (WriterLock.Take(link))
            Assert.Contains("being changed", Assert.Throws<InputException>(() => WriterLock.Take(real)).Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_write_through_a_link_changes_the_real_file_and_keeps_the_link()
    {
        if (OperatingSystem.IsWindows()) return;
        var (real, link) = Linked();
        var before = File.ReadAllBytes(real);
        Assert.Equal(0, CliRunner.Run("place", link, "--force", "--effort", "quick", "--seed", "7", "-q").ExitCode);
        Assert.NotNull(new FileInfo(link).LinkTarget);
        Assert.False(before.SequenceEqual(File.ReadAllBytes(real)));
        ProjectFile.Read(real);
        Assert.False(File.Exists(real + WriterLock.Suffix));
        Assert.False(File.Exists(link + WriterLock.Suffix));
    }

    private static (string Real, string Link) Linked()
    {
        var real = TestPaths.CopyOfTinyBuffer();
        var other = Path.Combine(TestPaths.NewTempDir(), "link.padplan.json");
        File.CreateSymbolicLink(other, real);
        return (real, other);
    }
}
