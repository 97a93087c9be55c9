using PadPlan.Editor.Sessions;
using PadPlan.Model;
using PadPlan.Planning;
using PadPlan.ProjectFiles;

namespace PadPlan.Editor.Tests;

/// <summary>"Place the rest" in the background: held parts stay, and a stop reaches the running placer.</summary>
public sealed class PlaceJobTests
{
    private static readonly string Example = Path.Combine(AppContext.BaseDirectory, "examples", "tiny-buffer", "tiny-buffer.padplan.json");

    [Fact]
    public async Task A_stopped_job_ends_without_a_plan_and_says_it_was_stopped()
    {
        var project = ProjectFile.Read(Example);
        using var stop = new CancellationTokenSource();
        await stop.CancelAsync();
        var job = PlaceJob.Start(project, new PlacerSettings(Effort: Effort.Thorough), stop);
        Assert.Null(await job.Result.WaitAsync(TimeSpan.FromMinutes(5)));
        Assert.True(job.Stopped);
        Assert.False(job.Running);
    }

    [Fact]
    public async Task Held_parts_keep_their_place_and_turn_and_the_rest_is_placed()
    {
        var project = ProjectFile.Read(Example);
        project = project with { Parts = project.Parts.Select(p => p.Ref is "Q1" or "C2" ? p with { Locked = true } : p).ToValueList() };
        var job = PlaceJob.Start(project, new PlacerSettings(Effort: Effort.Quick));
        var result = await job.Result.WaitAsync(TimeSpan.FromMinutes(5));
        Assert.NotNull(result);
        Assert.True(result.Succeeded, result.Failure?.Message);
        foreach (var held in new[] { "Q1", "C2" })
        {
            var before = project.Layout!.Placements.First(p => p.Ref == held);
            var after = result.Project!.Layout!.Placements.First(p => p.Ref == held);
            Assert.Equal(before.Position, after.Position);
            Assert.Equal(before.Rotation, after.Rotation);
        }
        Assert.True(job.Last.Run > 0); // progress reached the job
    }
}
