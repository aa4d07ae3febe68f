using Electrostat.Analysis.Pipeline;
using Electrostat.Analysis.Validation;
using Xunit.Abstractions;

namespace Electrostat.Analysis.Tests.Validation;

public class ValidationSuiteTests(ITestOutputHelper output)
{
    /// <summary>
    /// The whole published-reference suite at the default accuracy (what <c>electrostat validate</c> runs; about a
    /// minute in Release on the 2-core build machine): every case must be within its tolerance, and on smooth cases
    /// the tool's own error estimate must be at least the true error. The references and their sources are in
    /// <see cref="ValidationSuite"/> and the design files' headers.
    /// </summary>
    [Fact]
    public void EveryCase_WithinTolerance_AndEstimatesBracketSmoothCases()
    {
        var rows = ValidationRunner.Run(Path.Combine(RepoPaths.Geometries, "validation"), accuracy: AccuracyLevel.Normal);
        foreach (var r in rows)
            output.WriteLine($"{r.Case.Name}: ref {r.Case.ReferenceValue:G6}, ours {r.Measurement?.Value:G6}, err {r.RelativeError:P3}, est {r.Measurement?.EstimatedRelativeError:P3} {r.Failure}");
        Assert.All(rows, r => Assert.Null(r.Failure));
        Assert.All(rows, r => Assert.True(r.WithinTolerance, $"{r.Case.Name}: error {r.RelativeError:P3} exceeds {r.Case.RelativeTolerance:P2}"));
        Assert.All(rows, r => Assert.True(r.EstimateBrackets, $"{r.Case.Name}: estimate {r.Measurement!.EstimatedRelativeError:P3} below the true error {r.RelativeError:P3}"));
        Assert.Contains(rows, r => r.Case.Smooth && !double.IsNaN(r.Measurement!.EstimatedRelativeError));
    }

    [Fact]
    public void EveryCaseDesignFileExists()
    {
        string folder = Path.Combine(RepoPaths.Geometries, "validation");
        Assert.All(ValidationSuite.DesignFiles, f => Assert.True(File.Exists(Path.Combine(folder, f)), f));
    }

    [Fact]
    public void Row_OutsideTolerance_Fails()
    {
        // The check itself must be able to fail: a value 1 % off against a 0.5 % tolerance.
        var c = ValidationSuite.Cases[0];
        var row = new ValidationRow(c, new ValidationMeasurement(c.ReferenceValue * 1.01, 0.02), 1, 0, null);
        Assert.False(row.Passed);
        var under = new ValidationRow(c, new ValidationMeasurement(c.ReferenceValue * 1.004, 0.001), 1, 0, null);
        Assert.True(under.WithinTolerance);
        Assert.False(under.EstimateBrackets);
    }
}
