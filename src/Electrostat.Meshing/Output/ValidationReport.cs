namespace Electrostat.Meshing.Output;

/// <summary>Result of <see cref="MeshResult.Validate"/>: empty <see cref="Errors"/> means every invariant holds.</summary>
/// <param name="Errors">One line per violated invariant (at most a few per kind).</param>
public sealed record ValidationReport(IReadOnlyList<string> Errors)
{
    /// <summary>True when no invariant is violated.</summary>
    public bool IsValid => Errors.Count == 0;

    /// <inheritdoc />
    public override string ToString() => IsValid ? "valid" : string.Join(Environment.NewLine, Errors);
}
