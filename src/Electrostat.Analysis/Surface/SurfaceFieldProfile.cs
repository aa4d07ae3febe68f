using System.Globalization;
using System.Text;

namespace Electrostat.Analysis.Surface;

/// <summary>|E|, the normal field and the surface charge along one conductor's meshed surface.</summary>
/// <remarks>
/// The surface is walked with the field region on the left (counter-clockwise round the conductor's field side).
/// Where the material on the field side changes (a triple point) two samples share one arc length, one per material.
/// </remarks>
/// <param name="ConductorName">Conductor name, or "enclosure".</param>
/// <param name="ConductorIndex">Index into <c>Design.Conductors</c>, -1 for the enclosure wall.</param>
/// <param name="Samples">Samples in walking order.</param>
/// <param name="IntegratedChargeCoulombs">∮σ dl (planar, C per metre of depth) or ∮σ 2πr dl (axisymmetric, C) by the
/// trapezoidal rule: a Gauss's-law cross-check of the conductor charge.</param>
public sealed record SurfaceFieldProfile(string ConductorName, int ConductorIndex, IReadOnlyList<SurfaceFieldSample> Samples, double IntegratedChargeCoulombs)
{
    /// <summary>Largest |E| along the surface, V/m (0 when empty).</summary>
    public double PeakFieldVoltsPerMetre => Samples.Count == 0 ? 0 : Samples.Max(s => s.FieldVoltsPerMetre);

    /// <summary>CSV text with a header line; lengths in metres, fields in V/m, charge density in C/m².</summary>
    public string ToCsv()
    {
        var sb = new StringBuilder();
        sb.Append("conductor,piece,arc_length_m,x_m,y_m,field_V_per_m,normal_field_V_per_m,surface_charge_C_per_m2,material\n");
        foreach (var s in Samples)
        {
            sb.Append(CultureInfo.InvariantCulture, $"{Quote(ConductorName)},{s.Piece},{s.ArcLengthMetres:R},{s.XMetres:R},{s.YMetres:R},{s.FieldVoltsPerMetre:R},{s.NormalFieldVoltsPerMetre:R},{s.SurfaceChargeDensityCoulombsPerSquareMetre:R},{Quote(s.MaterialName ?? "")}\n");
        }
        return sb.ToString();
    }

    private static string Quote(string text) =>
        text.IndexOfAny([',', '"', '\n']) >= 0 ? "\"" + text.Replace("\"", "\"\"", StringComparison.Ordinal) + "\"" : text;
}
