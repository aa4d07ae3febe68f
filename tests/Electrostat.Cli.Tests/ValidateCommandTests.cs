namespace Electrostat.Cli.Tests;

public class ValidateCommandTests
{
    [Fact]
    public void Validate_OneCase_WritesMarkdownTable_AndExitsZero()
    {
        // The two-layer plate case is exact for P1 elements (linear potential in each layer), so it is quick and
        // its row must pass: C' = ε0 w / (d1/εr1 + d2/εr2) (Griffiths, Introduction to Electrodynamics, ch. 4).
        string outFile = Path.Combine(Path.GetTempPath(), $"electrostat-validate-{Guid.NewGuid():N}.md");
        try
        {
            var (exit, stdout, _) = CliRun.Run("validate", "--case", "two-layer", "--designs", Path.Combine(RepoPaths.Geometries, "validation"), "--out", outFile);
            Assert.Equal(0, exit);
            Assert.Contains("1 of 1 cases pass.", stdout, StringComparison.Ordinal);
            string md = File.ReadAllText(outFile);
            Assert.Contains("| case | published source | reference | ours | relative error | tool's estimate |", md, StringComparison.Ordinal);
            Assert.Contains("126.4884 pF/m", md, StringComparison.Ordinal);
        }
        finally
        {
            File.Delete(outFile);
        }
    }

    [Fact]
    public void Validate_NoMatchingCase_IsUsageError()
    {
        var (exit, _, stderr) = CliRun.Run("validate", "--case", "no-such-case", "--designs", Path.Combine(RepoPaths.Geometries, "validation"));
        Assert.Equal(2, exit);
        Assert.Contains("no validation case matches", stderr, StringComparison.Ordinal);
    }

    [Fact]
    public void Validate_MissingFolder_IsUsageError()
    {
        var (exit, _, stderr) = CliRun.Run("validate", "--designs", "/nonexistent/folder");
        Assert.Equal(2, exit);
        Assert.Contains("folder not found", stderr, StringComparison.Ordinal);
    }
}
