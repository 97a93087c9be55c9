using System.Diagnostics;
using System.Globalization;

namespace PadPlan.IO;

/// <summary>
/// One writer at a time for a file: an exclusive lock file "NAME.lock" beside it, holding the owner's process id and
/// start time. A second writer is refused at once; a lock left by a process that has ended is taken over. Dispose to
/// release. Any program that changes PadPlan files (the command line, an editor) takes this lock first.
/// </summary>
public sealed class WriterLock : IDisposable
{
    public const string Suffix = ".lock";

    private bool _released;

    private WriterLock(string file, string lockPath)
    {
        File = file;
        LockPath = lockPath;
    }

    /// <summary>The file this lock guards.</summary>
    public string File { get; }
    public string LockPath { get; }

    /// <summary>Takes the lock for <paramref name="file"/>, or throws an <see cref="InputException"/> naming the process that holds it.</summary>
    /// <remarks>A symbolic link is followed: the lock sits beside the real file, so two paths to one file share it.</remarks>
    public static WriterLock Take(string file)
    {
        var full = AtomicFile.RealPath(file);
        var lockPath = full + Suffix;
        for (var attempt = 0; attempt < 5; attempt++)
        {
            if (TryCreate(lockPath)) return new WriterLock(full, lockPath);
            var owner = Owner.Read(lockPath);
            if (owner is null)
            {
                Thread.Sleep(20); // released between our two looks: look again
                continue;
            }
            if (owner.Value.IsRunning())
                throw new InputException(file, $"{Path.GetFileName(full)} is being changed by another padplan (pid {owner.Value.Pid}). Wait for it to finish; if no padplan is running, delete {Path.GetFileName(lockPath)}.");
            TakeOverStale(lockPath, owner.Value);
        }
        throw new InputException(file, $"{Path.GetFileName(full)} is being changed by another padplan; try again in a moment.");
    }

    public void Dispose()
    {
        if (_released) return;
        _released = true;
        if (Owner.Read(LockPath) is { } owner && owner == Owner.Current) System.IO.File.Delete(LockPath);
    }

    // The lock appears whole or not at all: the owner is written to a temporary file, which is then linked to the lock's
    // name only if no lock is there (File.Move without overwrite). So a lock file is never empty while its owner lives,
    // and an empty one (a full disk, an older PadPlan) is stale at once.
    private static bool TryCreate(string lockPath)
    {
        var dir = Path.GetDirectoryName(lockPath) ?? ".";
        var temp = Path.Combine(dir, $".{Path.GetFileName(lockPath)}.{Environment.ProcessId}.{Guid.NewGuid():N}.tmp");
        try
        {
            using (var stream = new FileStream(temp, FileMode.CreateNew, FileAccess.Write, FileShare.None))
            {
                stream.Write(System.Text.Encoding.ASCII.GetBytes(Owner.Current.ToText()));
                stream.Flush(flushToDisk: true);
            }
            System.IO.File.Move(temp, lockPath, overwrite: false);
            return true;
        }
        catch (IOException) when (System.IO.File.Exists(lockPath))
        {
            return false;
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            throw new InputException(Path.GetFileName(lockPath), $"cannot create the lock file beside the project ({e.Message.Replace(temp, lockPath, StringComparison.Ordinal)}); nothing was written.");
        }
        finally
        {
            try { System.IO.File.Delete(temp); } catch (Exception e) when (e is IOException or UnauthorizedAccessException) { /* cleaned by RemoveStaleTemps */ }
        }
    }

    // Move the stale lock aside under a name of our own, and delete it only if it is still the one we judged stale:
    // two processes taking over at once cannot both win, and neither deletes a fresh lock.
    private static void TakeOverStale(string lockPath, Owner stale)
    {
        var aside = $"{lockPath}.{Environment.ProcessId}.{Guid.NewGuid():N}.stale";
        try
        {
            System.IO.File.Move(lockPath, aside);
        }
        catch (IOException)
        {
            return; // someone else moved it first
        }
        if (Owner.Read(aside) == stale) System.IO.File.Delete(aside);
        else
        {
            try { System.IO.File.Move(aside, lockPath); } catch (IOException) { System.IO.File.Delete(aside); }
        }
    }

    /// <summary>Who holds a lock: process id and its start time (so a reused process id is not mistaken for the owner).</summary>
    private readonly record struct Owner(int Pid, long StartTicks)
    {
        public static Owner Current { get; } = new(Environment.ProcessId, StartOf(Process.GetCurrentProcess()));

        public string ToText() => string.Create(CultureInfo.InvariantCulture, $"{Pid}\n{StartTicks}\n");

        public static Owner? Read(string path)
        {
            string[] lines;
            try
            {
                lines = System.IO.File.ReadAllLines(path);
            }
            catch (Exception e) when (e is IOException or UnauthorizedAccessException)
            {
                return null;
            }
            if (lines.Length < 2 || !int.TryParse(lines[0], CultureInfo.InvariantCulture, out var pid) || !long.TryParse(lines[1], CultureInfo.InvariantCulture, out var start))
                return new Owner(0, 0); // a lock appears with its owner written (TryCreate), so one without is stale
            return new Owner(pid, start);
        }

        public bool IsRunning()
        {
            if (Pid == Environment.ProcessId) return this == Current;
            if (Pid <= 0) return false;
            try
            {
                using var process = Process.GetProcessById(Pid);
                // start times read by different processes differ by milliseconds (Linux derives them from the boot time)
                return !process.HasExited && Math.Abs(StartOf(process) - StartTicks) < TimeSpan.TicksPerSecond;
            }
            catch (Exception e) when (e is ArgumentException or InvalidOperationException or System.ComponentModel.Win32Exception)
            {
                return false;
            }
        }

        private static long StartOf(Process process)
        {
            try
            {
                return process.StartTime.ToUniversalTime().Ticks;
            }
            catch (Exception e) when (e is InvalidOperationException or System.ComponentModel.Win32Exception or NotSupportedException)
            {
                return 0;
            }
        }
    }
}
