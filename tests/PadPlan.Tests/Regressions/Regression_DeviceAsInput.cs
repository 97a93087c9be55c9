using PadPlan.IO;
using PadPlan.Tests.Cli;

namespace PadPlan.Tests.Regressions;

/// <summary>
/// Regression (issue 25): the 16 MB size limit used the file's length, which is 0 for /dev/zero, so a project, netlist,
/// parts map or footprint file that was a device ended in exit 3 after 4.2 GB; a FIFO hung forever. Only regular files
/// are read now (the type is checked before opening) and the size is counted while reading.
/// </summary>
public sealed class Regression_DeviceAsInput
{
    public static TheoryData<string> Commands => new()
    {
        "check {0}",
        "place {0} --effort quick -q",
        "import {0} -o {1}",
        "import {2} -o {1} --parts {0}",
    };

    [Theory]
    [MemberData(nameof(Commands))]
    public void A_device_is_refused_with_exit_2(string command)
    {
        if (!File.Exists("/dev/zero")) return; // Unix only: no device file to give
        var result = Run(command, "/dev/zero");
        Assert.True(result.ExitCode == 2, $"exit {result.ExitCode}: {result.Err}");
        Assert.Contains("a device, not a regular", result.Err, StringComparison.Ordinal);
    }

    [Theory]
    [MemberData(nameof(Commands))]
    public async Task A_fifo_is_refused_with_exit_2_and_does_not_hang(string command)
    {
        if (OperatingSystem.IsWindows()) return; // no FIFOs in the file system
        var fifo = Path.Combine(TestPaths.NewTempDir(), "in.padplan.json");
        using (var make = System.Diagnostics.Process.Start("mkfifo", fifo)) make.WaitForExit();
        var run = Task.Run(() => Run(command, fifo));
        // nobody ever writes to the FIFO: opening it would wait for ever, so finishing at all is the test
        var finished = await Task.WhenAny(run, Task.Delay(TimeSpan.FromMinutes(2)));
        Assert.True(finished == run, "the command hung on a FIFO");
        var result = await run;
        Assert.True(result.ExitCode == 2, $"exit {result.ExitCode}: {result.Err}");
        Assert.Contains("FIFO", result.Err, StringComparison.Ordinal);
    }

    [Fact]
    public void A_file_over_the_cap_is_refused_by_counting_what_is_read()
    {
        var file = Path.Combine(TestPaths.NewTempDir(), "big.json");
        File.WriteAllBytes(file, new byte[1001]);
        var e = Assert.Throws<InputException>(() => InputFile.ReadAllBytes(file, 1000, "test file"));
        Assert.Contains("larger than", e.Message, StringComparison.Ordinal);
        Assert.Equal(1000, InputFile.ReadAllBytes(Path.Combine(file[..^8], Write(file[..^8], 1000)), 1000, "test file").Length);
    }

    private static string Write(string dir, int size)
    {
        File.WriteAllBytes(Path.Combine(dir, "exact.json"), new byte[size]);
        return "exact.json";
    }

    private static CliRunner.Result Run(string command, string input)
    {
        var dir = TestPaths.NewTempDir();
        var netlist = Path.Combine(TestPaths.Examples, "jfet-preamp", "jfet-preamp.cir");
        var args = string.Format(System.Globalization.CultureInfo.InvariantCulture, command, input, Path.Combine(dir, "out.padplan.json"), netlist).Split(' ');
        return CliRunner.Run(args);
    }
}
