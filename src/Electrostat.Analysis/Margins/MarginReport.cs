namespace Electrostat.Analysis.Margins;

/// <summary>Breakdown margins of every material present in the mesh, with the overall verdict.</summary>
/// <param name="Materials">One entry per material, in order of first region attribute.</param>
public sealed record MarginReport(IReadOnlyList<MaterialMargin> Materials)
{
    /// <summary>Fail if any material fails; pass if at least one passes and none fails; else not checked.</summary>
    public CheckVerdict Verdict =>
        Materials.Any(m => m.Verdict == CheckVerdict.Fail) ? CheckVerdict.Fail
        : Materials.Any(m => m.Verdict == CheckVerdict.Pass) ? CheckVerdict.Pass
        : CheckVerdict.NotChecked;
}
