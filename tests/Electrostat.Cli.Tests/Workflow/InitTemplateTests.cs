using Electrostat.Cli.Templates;

namespace Electrostat.Cli.Tests.Workflow;

public class InitTemplateTests
{
    public static TheoryData<string> Templates()
    {
        var d = new TheoryData<string>();
        foreach (var t in StarterTemplates.All) d.Add(t.Name);
        return d;
    }

    [Theory]
    [MemberData(nameof(Templates))]
    public void Init_Template_PassesCheckAndSolve(string template)
    {
        using var dir = new WorkflowDesigns();
        string file = dir.PathOf(template + ".json");
        var (exit, stdout, stderr) = CliRun.Run("init", "--template", template, file);
        Assert.True(exit == 0, stdout + stderr);
        Assert.StartsWith("//", File.ReadAllText(file), StringComparison.Ordinal); // commented for the new user

        var check = CliRun.Run("check", file);
        Assert.True(check.Exit == 0, check.Out + check.Err);
        var solve = CliRun.Run("solve", file, "--accuracy", "coarse", "--out", dir.PathOf("out"));
        Assert.True(solve.Exit is 0 or 1, $"exit {solve.Exit}\n{solve.Out}\n{solve.Err}");
        Assert.True(File.Exists(Path.Combine(dir.PathOf("out"), "results.json")));
        Assert.DoesNotContain("warning: Adaptive refinement", solve.Out, StringComparison.Ordinal);
    }

    [Fact]
    public void Init_ExistingFile_RefusesAndLeavesItUnchanged()
    {
        using var dir = new WorkflowDesigns();
        string file = dir.Write("mine.json", "{ \"keep\": true }");
        var (exit, _, stderr) = CliRun.Run("init", file);
        Assert.Equal(2, exit);
        Assert.Contains("already exists", stderr, StringComparison.Ordinal);
        Assert.Equal("{ \"keep\": true }", File.ReadAllText(file));
    }

    [Fact]
    public void Init_UnknownTemplate_IsUsageError()
    {
        using var dir = new WorkflowDesigns();
        var (exit, _, stderr) = CliRun.Run("init", "--template", "nope", dir.PathOf("x.json"));
        Assert.Equal(2, exit);
        Assert.Contains("electrode-pair", stderr, StringComparison.Ordinal);
        Assert.False(File.Exists(dir.PathOf("x.json")));
    }
}
