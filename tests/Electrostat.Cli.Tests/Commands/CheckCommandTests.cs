using System.Diagnostics;

namespace Electrostat.Cli.Tests.Commands;

public class CheckCommandTests
{
    public static TheoryData<string> Examples() => new(RepoPaths.ExampleDesigns());

    [Theory]
    [MemberData(nameof(Examples))]
    public void Check_AcceptsEveryExample(string path)
    {
        var (exit, stdout, stderr) = CliRun.Run("check", path);
        Assert.True(exit == ExitCodes.Ok, stderr);
        Assert.Equal("", stderr);
        Assert.Contains("symmetry", stdout, StringComparison.Ordinal);
        Assert.Contains("conductors", stdout, StringComparison.Ordinal);
        Assert.Contains("materials", stdout, StringComparison.Ordinal);
        Assert.Contains("valid: 0 errors", stdout, StringComparison.Ordinal);
    }

    [Fact]
    public void Check_PrintsPotentialsAreasAndParameters()
    {
        var (exit, stdout, _) = CliRun.Run("check", Path.Combine(RepoPaths.Geometries, "hv-electrode-over-plate.json"));
        Assert.Equal(ExitCodes.Ok, exit);
        Assert.Contains("20 kV", stdout, StringComparison.Ordinal);
        Assert.Contains("planar, depth 100 mm", stdout, StringComparison.Ordinal);
        Assert.Contains("gap", stdout, StringComparison.Ordinal);
        Assert.Contains("area 100 mm^2", stdout, StringComparison.Ordinal); // the 10 mm × 10 mm spacer
    }

    [Fact]
    public void Check_WithSet_OverridesParameter()
    {
        var (exit, stdout, stderr) = CliRun.Run("check", Path.Combine(RepoPaths.Geometries, "hv-electrode-over-plate.json"), "--set", "spacer_width=12");
        Assert.True(exit == ExitCodes.Ok, stderr);
        Assert.Contains("area 120 mm^2", stdout, StringComparison.Ordinal);
    }

    [Fact]
    public void Check_InvalidDesign_Exits2WithLocatedErrorsOnStderr()
    {
        string path = Path.Combine(Path.GetTempPath(), $"electrostat-bad-{Guid.NewGuid():N}.json");
        File.WriteAllText(path, "{\n  \"units\": \"mm\",\n  \"symmetry\": \"planar\",\n  \"enclosure\": { \"margin\": 5 },\n  \"conductors\": [ { \"name\": \"a\", \"potental\": 1, \"shape\": { \"type\": \"circle\", \"center\": [0, 0], \"radius\": 1 } } ]\n}\n");
        try
        {
            var (exit, stdout, stderr) = CliRun.Run("check", path);
            Assert.Equal(ExitCodes.InputError, exit);
            Assert.Equal("", stdout);
            Assert.Contains($"{path}:5:", stderr, StringComparison.Ordinal);
            Assert.Contains("did you mean 'potential'?", stderr, StringComparison.Ordinal);
            Assert.Contains("the design is not valid", stderr, StringComparison.Ordinal);
            Assert.DoesNotContain("   at ", stderr, StringComparison.Ordinal); // no stack trace
        }
        finally
        {
            File.Delete(path);
        }
    }

    public static TheoryData<string> InvalidExamples() =>
        new(Directory.EnumerateFiles(Path.Combine(RepoPaths.Geometries, "invalid"), "*.json").OrderBy(p => p, StringComparer.Ordinal));

    [Theory]
    [MemberData(nameof(InvalidExamples))]
    public void Check_RejectsEveryInvalidExampleWithLocatedMessages(string path)
    {
        var (exit, stdout, stderr) = CliRun.Run("check", path);
        Assert.Equal(ExitCodes.InputError, exit);
        Assert.Equal("", stdout);
        Assert.Matches(@":\d+:\d+: error: ", stderr);
    }

    [Fact]
    public void Check_MissingFile_Exits2()
    {
        var (exit, _, stderr) = CliRun.Run("check", "no/such/file.json");
        Assert.Equal(ExitCodes.InputError, exit);
        Assert.Contains("cannot read the design file", stderr, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData(new[] { "check" }, "missing argument")]
    [InlineData(new[] { "check", "a.json", "--sett", "x=1" }, "unknown option --sett")]
    [InlineData(new[] { "check", "a.json", "--set", "novalue" }, "--set expects name=value")]
    [InlineData(new[] { "chek", "a.json" }, "did you mean \"check\"?")]
    [InlineData(new string[0], "usage: electrostat")]
    public void BadCommandLine_Exits2WithMessage(string[] args, string message)
    {
        var (exit, _, stderr) = CliRun.Run(args);
        Assert.Equal(ExitCodes.InputError, exit);
        Assert.Contains(message, stderr, StringComparison.Ordinal);
    }

    [Fact]
    public void Help_ListsCheck()
    {
        var (exit, stdout, _) = CliRun.Run("--help");
        Assert.Equal(ExitCodes.Ok, exit);
        Assert.Contains("check", stdout, StringComparison.Ordinal);
        var (exit2, usage, _) = CliRun.Run("check", "--help");
        Assert.Equal(ExitCodes.Ok, exit2);
        Assert.Contains("--set", usage, StringComparison.Ordinal);
    }

    [Fact]
    public async Task BuiltExecutable_ChecksExampleEndToEnd()
    {
        string dll = Path.Combine(AppContext.BaseDirectory, "electrostat.dll");
        Assert.True(File.Exists(dll), dll);
        var psi = new ProcessStartInfo("dotnet") { RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false };
        psi.ArgumentList.Add(dll);
        psi.ArgumentList.Add("check");
        psi.ArgumentList.Add(Path.Combine(RepoPaths.Geometries, "feedthrough-axisymmetric.json"));
        using var p = Process.Start(psi)!;
        var stdout = p.StandardOutput.ReadToEndAsync();
        var stderr = p.StandardError.ReadToEndAsync();
        using var timeout = new CancellationTokenSource(TimeSpan.FromSeconds(60));
        await p.WaitForExitAsync(timeout.Token);
        string err = await stderr;
        Assert.True(p.ExitCode == 0, err);
        Assert.Contains("axisymmetric", await stdout, StringComparison.Ordinal);
    }
}
