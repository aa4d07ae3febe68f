using Electrostat.Geometry.Model;

namespace Electrostat.Analysis.Clearance;

/// <summary>
/// Geometric clearance between every pair of conductors at different potentials (the enclosure wall included),
/// computed exactly on the design's lines and arcs, checked against the design's <c>checks</c> and optionally against
/// the PCB spacing table (<see cref="PcbSpacingTable"/>).
/// </summary>
public static class ClearanceAnalyzer
{
    /// <summary>Caution printed with every PCB spacing table check.</summary>
    public const string PcbCaution = "Spacing from " + PcbSpacingTable.Source +
        ". The table is a design aid: confirm every value against the current edition of the standard and any applicable product safety standard.";

    /// <summary>Two potentials closer than this fraction of the largest potential magnitude count as equal.</summary>
    private const double SamePotentialFraction = 1e-9;

    /// <summary>Clearances of a solved design (floating conductors at their computed potentials).</summary>
    /// <param name="context">The analysis context.</param>
    /// <param name="pcbCategory">PCB spacing category to check, or null.</param>
    public static ClearanceReport Analyze(AnalysisContext context, SpacingCategory? pcbCategory = null)
    {
        ArgumentNullException.ThrowIfNull(context);
        return Analyze(context.Design, context.ConductorPotentialVolts, pcbCategory);
    }

    /// <summary>Clearances of a design with given conductor potentials (no field solution needed).</summary>
    /// <param name="design">The design.</param>
    /// <param name="conductorPotentialVolts">Potential of design conductor k, volts.</param>
    /// <param name="pcbCategory">PCB spacing category to check, or null.</param>
    public static ClearanceReport Analyze(Design design, Func<int, double> conductorPotentialVolts, SpacingCategory? pcbCategory = null)
    {
        ArgumentNullException.ThrowIfNull(design);
        ArgumentNullException.ThrowIfNull(conductorPotentialVolts);
        var outlines = ConductorOutline.Of(design, conductorPotentialVolts);
        double vmax = outlines.Select(o => Math.Abs(o.PotentialVolts)).Where(double.IsFinite).DefaultIfEmpty(0).Max();
        var pairs = new List<ClearancePair>();
        for (int i = 0; i < outlines.Count; i++)
        {
            for (int j = i + 1; j < outlines.Count; j++)
            {
                var a = outlines[i];
                var b = outlines[j];
                if (a.ConductorIndex >= 0 && b.ConductorIndex >= 0 &&
                    design.Conductors[a.ConductorIndex].ElectrodeIndex == design.Conductors[b.ConductorIndex].ElectrodeIndex)
                    continue;
                double dv = Math.Abs(a.PotentialVolts - b.PotentialVolts);
                if (!double.IsNaN(dv) && dv <= SamePotentialFraction * vmax) continue;
                var (distance, pa, pb) = a.DistanceTo(b);
                double? required = design.Checks.ClearanceFor(a.Name, b.Name);
                var verdict = required is double r ? (distance >= r ? CheckVerdict.Pass : CheckVerdict.Fail) : CheckVerdict.NotChecked;
                double? pcb = null;
                var pcbVerdict = CheckVerdict.NotChecked;
                if (pcbCategory is SpacingCategory cat && double.IsFinite(dv))
                {
                    pcb = PcbSpacingTable.MinimumSpacingMetres(cat, dv);
                    pcbVerdict = distance >= pcb ? CheckVerdict.Pass : CheckVerdict.Fail;
                }
                pairs.Add(new ClearancePair(a.Name, b.Name, dv, distance, pa, pb, required, verdict, pcb, pcbVerdict));
            }
        }
        return new ClearanceReport(pairs, pcbCategory, pcbCategory is null ? null : PcbCaution);
    }
}
