using Electrostat.Geometry.Model;

namespace Electrostat.Geometry.Loading;

/// <summary>The outcome of loading a design: the design (null when there are errors) and every problem found.</summary>
/// <param name="Design">The validated design, or null when any problem is an error.</param>
/// <param name="Problems">All problems found, in file order as far as possible.</param>
public sealed record DesignLoadResult(Design? Design, IReadOnlyList<DesignProblem> Problems)
{
    /// <summary>True when at least one problem is an error (then <see cref="Design"/> is null).</summary>
    public bool HasErrors => Problems.Any(p => p.Severity == ProblemSeverity.Error);

    /// <summary>Problems of error severity.</summary>
    public IEnumerable<DesignProblem> Errors => Problems.Where(p => p.Severity == ProblemSeverity.Error);

    /// <summary>Problems of warning or note severity.</summary>
    public IEnumerable<DesignProblem> Remarks => Problems.Where(p => p.Severity != ProblemSeverity.Error);
}
