using System.Globalization;
using System.Text;
using Electrostat.Analysis;
using Electrostat.Rendering.Layout;

namespace Electrostat.Rendering.Report;

/// <summary>
/// Potential and |E| sampled on a regular grid of design points, for the report's pointer readout. Points outside
/// the meshed design regions (conductors, holes) carry NaN.
/// </summary>
/// <remarks>
/// Grid point (i, j) is at x = X0 + i·Step, y = Y0 + j·Step (metres), stored row by row (j outer). The potential is the
/// exact P1 interpolant; |E| is the recovered field interpolated in the same triangle. Sampling walks each triangle's
/// bounding box once, so it costs O(triangles + grid points).
/// </remarks>
public sealed class ReadoutGrid
{
    private ReadoutGrid(double x0, double y0, double step, int nx, int ny, double[] potential, double[] field)
    {
        X0Metres = x0; Y0Metres = y0; StepMetres = step; Columns = nx; Rows = ny;
        PotentialVolts = potential; FieldVoltsPerMetre = field;
    }

    /// <summary>x of column 0, metres.</summary>
    public double X0Metres { get; }

    /// <summary>y of row 0, metres.</summary>
    public double Y0Metres { get; }

    /// <summary>Grid spacing, metres.</summary>
    public double StepMetres { get; }

    /// <summary>Number of columns.</summary>
    public int Columns { get; }

    /// <summary>Number of rows.</summary>
    public int Rows { get; }

    /// <summary>Potential per grid point, volts (NaN outside).</summary>
    public double[] PotentialVolts { get; }

    /// <summary>Recovered |E| per grid point, V/m (NaN outside).</summary>
    public double[] FieldVoltsPerMetre { get; }

    /// <summary>Samples the design box [minX, maxX] × [minY, maxY] with about <paramref name="columns"/> columns.</summary>
    /// <param name="context">The solved design.</param>
    /// <param name="minX">Box left, metres.</param>
    /// <param name="minY">Box bottom, metres.</param>
    /// <param name="maxX">Box right, metres.</param>
    /// <param name="maxY">Box top, metres.</param>
    /// <param name="columns">Wanted number of columns (at least 2).</param>
    public static ReadoutGrid Sample(AnalysisContext context, double minX, double minY, double maxX, double maxY, int columns)
    {
        ArgumentNullException.ThrowIfNull(context);
        ArgumentOutOfRangeException.ThrowIfLessThan(columns, 2);
        double step = (maxX - minX) / (columns - 1);
        if (!(step > 0)) step = Math.Max(maxY - minY, 1e-9) / (columns - 1);
        int nx = columns, ny = Math.Max(2, (int)Math.Floor((maxY - minY) / step) + 1);
        var phi = new double[nx * ny];
        var field = new double[nx * ny];
        Array.Fill(phi, double.NaN);
        Array.Fill(field, double.NaN);
        var m = context.Mesh;
        var rec = context.Recovered;
        var pot = context.Solution.PotentialVolts;
        for (int t = 0; t < m.TriangleCount; t++)
        {
            if (context.MaterialOfRegion(m.TriangleRegion[t]) is null) continue;
            int a = m.Triangles[3 * t], b = m.Triangles[3 * t + 1], c = m.Triangles[3 * t + 2];
            double xa = m.X[a], ya = m.Y[a], xb = m.X[b], yb = m.Y[b], xc = m.X[c], yc = m.Y[c];
            double det = (xb - xa) * (yc - ya) - (xc - xa) * (yb - ya);
            if (det == 0) continue;
            int i0 = Math.Max(0, (int)Math.Ceiling((Math.Min(xa, Math.Min(xb, xc)) - minX) / step));
            int i1 = Math.Min(nx - 1, (int)Math.Floor((Math.Max(xa, Math.Max(xb, xc)) - minX) / step));
            int j0 = Math.Max(0, (int)Math.Ceiling((Math.Min(ya, Math.Min(yb, yc)) - minY) / step));
            int j1 = Math.Min(ny - 1, (int)Math.Floor((Math.Max(ya, Math.Max(yb, yc)) - minY) / step));
            int sa = rec.CornerSide[3 * t], sb = rec.CornerSide[3 * t + 1], sc = rec.CornerSide[3 * t + 2];
            for (int j = j0; j <= j1; j++)
            {
                double y = minY + j * step;
                for (int i = i0; i <= i1; i++)
                {
                    double x = minX + i * step;
                    double l1 = ((x - xa) * (yc - ya) - (xc - xa) * (y - ya)) / det;
                    double l2 = ((xb - xa) * (y - ya) - (x - xa) * (yb - ya)) / det;
                    double l0 = 1 - l1 - l2;
                    const double tol = -1e-9;
                    if (l0 < tol || l1 < tol || l2 < tol) continue;
                    int k = j * nx + i;
                    phi[k] = l0 * pot[a] + l1 * pot[b] + l2 * pot[c];
                    double ex = l0 * rec.SideFieldXVoltsPerMetre[sa] + l1 * rec.SideFieldXVoltsPerMetre[sb] + l2 * rec.SideFieldXVoltsPerMetre[sc];
                    double ey = l0 * rec.SideFieldYVoltsPerMetre[sa] + l1 * rec.SideFieldYVoltsPerMetre[sb] + l2 * rec.SideFieldYVoltsPerMetre[sc];
                    field[k] = Math.Sqrt(ex * ex + ey * ey);
                }
            }
        }
        return new ReadoutGrid(minX, minY, step, nx, ny, phi, field);
    }

    /// <summary>
    /// The grid and the map's pixel mapping as compact JSON for the page script: x0, y0, step (metres), nx, ny,
    /// phi (V, 6 significant digits), e (V/m, 4 significant digits), null outside; frame (pixels per metre and offsets).
    /// </summary>
    /// <param name="frame">The field map's design-to-pixel mapping.</param>
    /// <param name="mirrored">True when the map shows the mirrored full section (negative x reads as |x|).</param>
    /// <param name="unitMetres">Metres per design unit, for printing coordinates.</param>
    /// <param name="unitSymbol">Design unit symbol.</param>
    public string ToJson(MapFrame frame, bool mirrored, double unitMetres, string unitSymbol)
    {
        var inv = CultureInfo.InvariantCulture;
        var sb = new StringBuilder();
        sb.Append(inv, $"{{\"x0\":{X0Metres:R},\"y0\":{Y0Metres:R},\"step\":{StepMetres:R},\"nx\":{Columns},\"ny\":{Rows},");
        sb.Append(inv, $"\"frame\":{{\"minX\":{frame.MinXMetres:R},\"maxY\":{frame.MaxYMetres:R},\"ppm\":{frame.PixelsPerMetre:R},\"ox\":{frame.OffsetX:R},\"oy\":{frame.OffsetY:R}}},");
        sb.Append(inv, $"\"mirrored\":{(mirrored ? "true" : "false")},\"unit\":{unitMetres:R},\"unitSymbol\":\"{unitSymbol}\",\"phi\":[");
        Append(sb, PotentialVolts, "G6");
        sb.Append("],\"e\":[");
        Append(sb, FieldVoltsPerMetre, "G4");
        sb.Append("]}");
        return sb.ToString();
    }

    private static void Append(StringBuilder sb, double[] values, string format)
    {
        for (int i = 0; i < values.Length; i++)
        {
            if (i > 0) sb.Append(',');
            if (double.IsNaN(values[i])) sb.Append("null");
            else sb.Append(values[i].ToString(format, CultureInfo.InvariantCulture));
        }
    }
}
