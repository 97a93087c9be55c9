using System.Diagnostics;
using PadPlan.IO;

namespace PadPlan.Tests.IO;

/// <summary>One writer at a time: a held lock refuses a second writer naming the pid; a lock of an ended process is taken over.</summary>
public sealed class WriterLockTests
{
    private static string NewFile()
    {
        var file = Path.Combine(TestPaths.NewTempDir(), "p.padplan.json");
        File.WriteAllText(file, "{}");
        return file;
    }

    [Fact]
    public void A_second_writer_is_refused_with_the_owner_pid()
    {
        var file = NewFile();
        using (WriterLock.Take(file))
        {
            var e = Assert.Throws<InputException>(() => WriterLock.Take(file));
            Assert.Contains($"p.padplan.json is being changed by another padplan (pid {Environment.ProcessId})", e.Message, StringComparison.Ordinal);
        }
        using (WriterLock.Take(file)) { } // released: free again
        Assert.False(File.Exists(file + WriterLock.Suffix));
    }

    [Fact]
    public void A_lock_left_by_an_ended_process_is_taken_over()
    {
        var file = NewFile();
        using var ended = Process.Start(new ProcessStartInfo("sh", "-c true") { UseShellExecute = false })!;
        ended.WaitForExit();
        File.WriteAllText(file + WriterLock.Suffix, $"{ended.Id}\n12345\n");
        using var taken = WriterLock.Take(file);
        Assert.StartsWith($"{Environment.ProcessId}\n", File.ReadAllText(taken.LockPath), StringComparison.Ordinal);
    }

    [Fact]
    public void A_lock_whose_pid_now_belongs_to_another_program_is_taken_over()
    {
        // pid 1 runs, but did not start at the recorded time: the pid was reused, the old owner is gone
        var file = NewFile();
        File.WriteAllText(file + WriterLock.Suffix, "1\n42\n");
        using var taken = WriterLock.Take(file);
    }

    [Fact]
    public void A_held_lock_refuses_a_padplan_in_another_process()
    {
        var file = TestPaths.CopyOfTinyBuffer();
        var before = File.ReadAllBytes(file);
        using (WriterLock.Take(file))
        {
            var cli = Path.Combine(AppContext.BaseDirectory, "padplan.dll");
            var start = new ProcessStartInfo("dotnet") { RedirectStandardError = true, RedirectStandardOutput = true, UseShellExecute = false };
            foreach (var arg in new[] { cli, "place", file, "--effort", "quick", "-q" }) start.ArgumentList.Add(arg);
            using var child = Process.Start(start)!;
            var err = child.StandardError.ReadToEnd();
            child.WaitForExit();
            Assert.Equal(2, child.ExitCode);
            Assert.Contains($"is being changed by another padplan (pid {Environment.ProcessId})", err, StringComparison.Ordinal);
        }
        Assert.Equal(before, File.ReadAllBytes(file));
    }
}
