namespace Electrostat.Analysis.Clearance;

/// <summary>Clearances of every pair of conductors at different potentials, with the verdicts.</summary>
/// <param name="Pairs">One entry per pair.</param>
/// <param name="PcbCategory">The PCB spacing category checked, or null.</param>
/// <param name="PcbCaution">Citation and caution to print with the PCB table check; null when no category was requested.</param>
public sealed record ClearanceReport(IReadOnlyList<ClearancePair> Pairs, SpacingCategory? PcbCategory, string? PcbCaution)
{
    /// <summary>Fail if any pair fails either check; pass if at least one check passed and none failed; else not checked.</summary>
    public CheckVerdict Verdict
    {
        get
        {
            var all = Pairs.SelectMany(p => new[] { p.Verdict, p.PcbVerdict }).ToArray();
            if (all.Contains(CheckVerdict.Fail)) return CheckVerdict.Fail;
            return all.Contains(CheckVerdict.Pass) ? CheckVerdict.Pass : CheckVerdict.NotChecked;
        }
    }
}
