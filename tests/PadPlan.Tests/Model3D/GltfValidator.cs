using System.Diagnostics;
using System.Text.Json;

namespace PadPlan.Tests.Model3D;

/// <summary>The Khronos glTF validator (npm package gltf-validator), run under node. .ci/run installs it into
/// .ci/gltf-validator; PADPLAN_GLTF_VALIDATOR may name another node_modules folder that holds it.</summary>
public static class GltfValidator
{
    public static string? Node { get; } = new[] { "/usr/bin/node", "/usr/local/bin/node" }.FirstOrDefault(File.Exists);

    public static string? Modules { get; } = new[]
    {
        Environment.GetEnvironmentVariable("PADPLAN_GLTF_VALIDATOR"),
        Path.Combine(TestPaths.RepoRoot, ".ci", "gltf-validator", "node_modules"),
    }.FirstOrDefault(d => !string.IsNullOrEmpty(d) && Directory.Exists(Path.Combine(d, "gltf-validator")));

    public static bool InCi => string.Equals(Environment.GetEnvironmentVariable("CI"), "true", StringComparison.OrdinalIgnoreCase);

    public static string? Missing => Node is null ? "node is not installed" : Modules is null ? "the npm package gltf-validator is not installed (bash .ci/run installs it into .ci/gltf-validator)" : null;

    private const string Script = """
        const validator = require('gltf-validator');
        const fs = require('fs');
        (async () => {
          const out = {};
          for (const file of process.argv.slice(2)) {
            const report = await validator.validateBytes(new Uint8Array(fs.readFileSync(file)), { maxIssues: 50 });
            out[file] = { errors: report.issues.numErrors, warnings: report.issues.numWarnings,
              messages: report.issues.messages.map(m => `${m.code} ${m.message} ${m.pointer || ''}`) };
          }
          console.log(JSON.stringify(out));
        })().catch(e => { console.error(e); process.exit(1); });
        """;

    /// <summary>Validates each file; per file the number of errors and warnings and the first messages.</summary>
    public static Dictionary<string, (int Errors, int Warnings, string[] Messages)> Validate(IReadOnlyList<string> files)
    {
        var node = Node ?? throw new InvalidOperationException(Missing);
        var modules = Modules ?? throw new InvalidOperationException(Missing);
        var script = Path.Combine(TestPaths.NewTempDir(), "validate.js");
        File.WriteAllText(script, Script);
        var start = new ProcessStartInfo(node) { RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false };
        start.ArgumentList.Add(script);
        foreach (var f in files) start.ArgumentList.Add(f);
        start.Environment["NODE_PATH"] = modules;
        using var process = Process.Start(start)!;
        var stdout = process.StandardOutput.ReadToEndAsync();
        var stderr = process.StandardError.ReadToEndAsync();
        if (!process.WaitForExit(120_000)) { process.Kill(true); throw new TimeoutException("the glTF validator did not finish in 2 minutes."); }
        Assert.True(process.ExitCode == 0, $"the glTF validator failed: {stderr.Result}");
        using var doc = JsonDocument.Parse(stdout.Result);
        return doc.RootElement.EnumerateObject().ToDictionary(
            p => p.Name,
            p => (p.Value.GetProperty("errors").GetInt32(), p.Value.GetProperty("warnings").GetInt32(),
                p.Value.GetProperty("messages").EnumerateArray().Select(m => m.GetString() ?? "").ToArray()));
    }
}

/// <summary>A test that needs node and the glTF validator: skipped with the reason on a developer machine without them; in CI (CI=true) it runs and fails instead.</summary>
public sealed class GltfValidatorFactAttribute : FactAttribute
{
    public GltfValidatorFactAttribute()
    {
        if (GltfValidator.Missing is { } why && !GltfValidator.InCi) Skip = $"{why}; the Khronos glTF validation is skipped.";
    }
}
