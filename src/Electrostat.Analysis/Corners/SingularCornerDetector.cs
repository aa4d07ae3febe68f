using System.Globalization;
using Electrostat.Analysis.Clearance;
using Electrostat.Geometry.Model;
using Electrostat.Geometry.Shapes;

namespace Electrostat.Analysis.Corners;

/// <summary>
/// Finds conductor corners with a field-side angle above 180° and no fillet, and reports the field near each.
/// </summary>
/// <remarks>
/// <para>Detection is on the exact geometry: where two pieces of a conductor outline meet with a jump of tangent
/// direction (more than <see cref="SmoothTurnRadians"/>), the field-side angle is β = π + turn for conductors (their
/// material lies left of the counter-clockwise outline, the field on the right) and β = π − turn for the enclosure
/// wall (field inside). Corners with β ≤ 180° + 0.5° are not singular. Skipped: corners lying on the enclosure wall
/// (the wall or a mirror plane changes the angle), enclosure corners next to a symmetry plane or the axis, and corners
/// whose field side is not a meshed region (inside another conductor or outside).</para>
/// <para>Rules (our own, documented here): the report distance is δ = <see cref="ReportDistanceFraction"/> × the local
/// gap (distance from the corner to the nearest conductor at another potential); the suggested fillet radius is
/// <see cref="FilletFraction"/> × the local gap, capped at half the shorter edge at the corner. A tenth of the gap
/// keeps the clearance almost unchanged while making the peak finite, so that it converges and can be checked.</para>
/// </remarks>
public static class SingularCornerDetector
{
    /// <summary>Tangent turns below this are treated as smooth joins (fillet tangency), radians.</summary>
    public const double SmoothTurnRadians = 1e-6;

    /// <summary>δ as a fraction of the local gap.</summary>
    public const double ReportDistanceFraction = 0.05;

    /// <summary>Suggested fillet radius as a fraction of the local gap.</summary>
    public const double FilletFraction = 0.1;

    private const double MinExcessRadians = 0.5 * Math.PI / 180;

    /// <summary>Detects the singular corners of a solved design and evaluates the recovered field near each.</summary>
    /// <param name="context">The analysis context.</param>
    /// <returns>The corners in design order.</returns>
    public static IReadOnlyList<SingularCorner> Detect(AnalysisContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        var outlines = ConductorOutline.Of(context.Design, context.ConductorPotentialVolts);
        var corners = FindCorners(context.Design);
        var junctions = FindJunctions(context);
        double same = 1e-9 * context.Design.Bounds.Diagonal;
        bool At(Point2 a, Point2 b) => Math.Sqrt(Sq(a.X - b.X) + Sq(a.Y - b.Y)) < same;
        var list = new List<SingularCorner>();
        foreach (var c in corners)
        {
            var (gap, delta, field, material, resolved) = Measure(context, outlines, c.ConductorIndex, c.Location, c.BisectorX, c.BisectorY);
            double fillet = Math.Min(FilletFraction * gap, 0.5 * c.ShorterEdgeMetres);
            double betaDeg = c.FieldSideAngleRadians * 180 / Math.PI;
            // A corner on a material interface takes the exponent of its sectors (the junction at the same point).
            var sectors = junctions.FirstOrDefault(j => At(j.Location, c.Location));
            double exponent = sectors is not null ? sectors.Lambda - 1 : Math.PI / c.FieldSideAngleRadians - 1;
            var inv = CultureInfo.InvariantCulture;
            string fieldText = field is double f
                ? string.Format(inv, "|E| = {0:G4} kV/mm at {1:G3} mm from the corner on the bisector{2}", f * 1e-6, delta * 1e3,
                    resolved ? "" : " (mesh coarser than that distance: refine for a resolved value)")
                : "the field near it could not be evaluated";
            string warning = string.Format(inv,
                "Sharp corner of '{0}' at {1}: the field-side angle is {2:F0}°, so the exact field is infinite there (it grows as r^{3:F3}) and any peak value at the corner is mesh-dependent; {4}. Round the corner with a fillet of about {5:G3} mm (a tenth of the local gap of {6:G3} mm).",
                c.ConductorName, c.Location.ToMillimetreString(), betaDeg, exponent, fieldText, fillet * 1e3, gap * 1e3);
            list.Add(new SingularCorner(c.ConductorName, c.ConductorIndex, c.Location, betaDeg, exponent, gap, fillet, delta, field, material, resolved, warning));
        }
        foreach (var j in junctions)
        {
            // A corner at the same place is reported once, as a corner (with the junction's exponent).
            if (list.Any(c => At(c.Location, j.Location))) continue;
            list.Add(Junction(context, outlines, j));
        }
        return list;
    }

    /// <summary>A junction found on the mesh: the conductor, the point, the bisector of its field side, the sectors
    /// (angle, material) from one conductor face to the other, and the exponent λ.</summary>
    private sealed record JunctionGeometry(int ConductorIndex, Point2 Location, double BisectorX, double BisectorY,
        IReadOnlyList<(double Angle, Material Material)> Sectors, double Lambda);

    /// <summary>Junctions with λ at or above this are not reported: |E| ∝ r^(λ−1) then grows by less than 15 % over six
    /// decades of distance (our own threshold; the sampled angles of a junction on a slightly curved surface put a
    /// right-angled contact at λ = 0.998 instead of 1).</summary>
    private const double MaxJunctionLambda = 0.99;

    /// <summary>Smallest sector angle treated as a wedge; thinner slivers (a body resting tangentially on another) are
    /// cusps, whose field is not a power of r, and are not classified.</summary>
    private const double MinSectorRadians = 2 * Math.PI / 180;

    /// <summary>
    /// Triple junctions: mesh vertices on a conductor surface that also lie on a material interface. The exact geometry
    /// is sampled on a small circle around each (a quarter of the shortest mesh edge there, 360 directions, every
    /// material boundary located by bisection); each run of field region between conductor faces that holds at least
    /// two materials gives its sectors to <see cref="WedgeExponent"/>, and λ &lt; <see cref="MaxJunctionLambda"/> is singular.
    /// </summary>
    private static List<JunctionGeometry> FindJunctions(AnalysisContext context)
    {
        var result = new List<JunctionGeometry>();
        var design = context.Design;
        var topo = context.Topology;
        var mesh = context.Mesh;
        const int n = 360; // one sample per degree: every sector wider than MinSectorRadians holds a sample
        for (int v = 0; v < mesh.VertexCount; v++)
        {
            if (topo.VertexConductor[v] < 0 || !topo.VertexOnInterface[v]) continue;
            double shortest = double.PositiveInfinity;
            foreach (int t in topo.TrianglesAround(v))
            {
                for (int i = 0; i < 3; i++)
                {
                    int w = mesh.Triangles[3 * t + i];
                    if (w != v) shortest = Math.Min(shortest, Math.Sqrt(Sq(mesh.X[w] - mesh.X[v]) + Sq(mesh.Y[w] - mesh.Y[v])));
                }
            }
            if (!double.IsFinite(shortest)) continue;
            double rho = 0.25 * shortest, x0 = mesh.X[v], y0 = mesh.Y[v];
            RegionHit At(double angle) => design.Classify(x0 + rho * Math.Cos(angle), y0 + rho * Math.Sin(angle));
            int Key(RegionHit h) => h.Kind switch { RegionKind.Conductor => -1, RegionKind.Background => 0, RegionKind.Dielectric => h.Index + 1, _ => int.MinValue };
            var keys = new int[n];
            for (int k = 0; k < n; k++) keys[k] = Key(At(2 * Math.PI * k / n));
            if (keys.Contains(int.MinValue)) continue; // on the enclosure wall or a symmetry plane: not a free junction
            int start = Array.IndexOf(keys, -1);
            if (start < 0) continue;
            // Walk once round from a conductor sample; every change of key is located by bisection.
            var boundaries = new List<(double Angle, int Before, int After)>();
            for (int k = 0; k < n; k++)
            {
                int a = (start + k) % n, b = (start + k + 1) % n;
                if (keys[a] == keys[b]) continue;
                double lo = 2 * Math.PI * (start + k) / n, hi = lo + 2 * Math.PI / n;
                for (int it = 0; it < 32; it++) // 1°/2^32: the edge to 4e-12 rad
                {
                    double mid = 0.5 * (lo + hi);
                    if (Key(At(mid)) == keys[a]) lo = mid; else hi = mid;
                }
                boundaries.Add((0.5 * (lo + hi), keys[a], keys[b]));
            }
            // Runs: from a boundary leaving the conductor to the next boundary entering it.
            for (int i = 0; i < boundaries.Count; i++)
            {
                if (boundaries[i].Before != -1) continue;
                var sectors = new List<(double Angle, Material Material)>();
                double first = boundaries[i].Angle;
                int j = i;
                bool closed = false;
                while (true)
                {
                    var (angle, _, after) = boundaries[j];
                    int next = (j + 1) % boundaries.Count;
                    double end = boundaries[next].Angle;
                    double width = end - angle;
                    if (width <= 0) width += 2 * Math.PI;
                    sectors.Add((width, after == 0 ? design.BackgroundMaterial : design.Dielectrics[after - 1].Material));
                    j = next;
                    if (boundaries[j].After == -1) { closed = true; break; }
                    if (j == i) break;
                }
                if (!closed || sectors.Select(s => s.Material.Name).Distinct().Count() < 2) continue;
                if (sectors.Any(s => s.Angle < MinSectorRadians)) continue;
                double lambda = WedgeExponent.Smallest(sectors.Select(s => (s.Angle, s.Material.RelativePermittivity)).ToArray());
                if (!(lambda < MaxJunctionLambda)) continue;
                double mid = first + 0.5 * sectors.Sum(s => s.Angle);
                result.Add(new JunctionGeometry(topo.VertexConductor[v], new Point2(x0, y0), Math.Cos(mid), Math.Sin(mid), sectors, lambda));
            }
        }
        return result;
    }

    /// <summary>
    /// What is reported at a singular point: the local gap (distance to the nearest outline at another potential, the
    /// design's size when there is none), the report distance δ, the recovered field and material at δ along the
    /// bisector, and whether the mesh there (the nearest vertex's mean edge length) is finer than δ/2.
    /// </summary>
    private static (double Gap, double Delta, double? Field, string? Material, bool Resolved) Measure(AnalysisContext context,
        IReadOnlyList<ConductorOutline> outlines, int conductorIndex, Point2 location, double bisectorX, double bisectorY)
    {
        var own = outlines.FirstOrDefault(o => o.ConductorIndex == conductorIndex);
        double gap = double.PositiveInfinity;
        foreach (var o in outlines)
        {
            if (own is null || o == own || !(Math.Abs(o.PotentialVolts - own.PotentialVolts) > 0)) continue;
            gap = Math.Min(gap, o.DistanceTo(location).Distance);
        }
        if (!double.IsFinite(gap)) gap = context.Design.Bounds.Diagonal;
        double delta = ReportDistanceFraction * gap;
        double? field = null;
        string? material = null;
        var mesh = context.Mesh;
        if (context.Recovered.TryEvaluate(location.X + delta * bisectorX, location.Y + delta * bisectorY, out double ex, out double ey, out int t))
        {
            field = Math.Sqrt(ex * ex + ey * ey);
            material = context.MaterialOfRegion(mesh.TriangleRegion[t])?.Name;
        }
        double h = double.PositiveInfinity, best = double.PositiveInfinity;
        for (int v = 0; v < mesh.VertexCount; v++)
        {
            double d = Sq(mesh.X[v] - location.X) + Sq(mesh.Y[v] - location.Y);
            if (d < best) { best = d; h = context.Topology.LocalSizeMetres[v]; }
        }
        return (gap, delta, field, material, h <= 0.5 * delta);
    }

    private static SingularCorner Junction(AnalysisContext context, IReadOnlyList<ConductorOutline> outlines, JunctionGeometry j)
    {
        var conductor = context.Design.Conductors[j.ConductorIndex];
        var (gap, delta, field, material, resolved) = Measure(context, outlines, j.ConductorIndex, j.Location, j.BisectorX, j.BisectorY);
        var inv = CultureInfo.InvariantCulture;
        double total = j.Sectors.Sum(s => s.Angle);
        string sectors = string.Join(", ", j.Sectors.Select(s => string.Format(inv, "{0} {1:F0}°", s.Material.Name, s.Angle * 180 / Math.PI)));
        string fieldText = field is double f
            ? string.Format(inv, "|E| = {0:G4} kV/mm at {1:G3} mm from it{2}", f * 1e-6, delta * 1e3,
                resolved ? "" : " (mesh coarser than that distance: refine for a resolved value)")
            : "the field near it could not be evaluated";
        string warning = string.Format(inv,
            "Triple junction of '{0}' at {1}: the materials meet the conductor as {2}, so the exact field is infinite there (it grows as r^{3:F3}) and any peak value at the junction is mesh-dependent; {4}. Make the denser dielectric meet the conductor at 90° or less, or recess the junction into a low-field pocket.",
            conductor.Name, j.Location.ToMillimetreString(), sectors, j.Lambda - 1, fieldText);
        return new SingularCorner(conductor.Name, j.ConductorIndex, j.Location, total * 180 / Math.PI, j.Lambda - 1, gap, 0, delta, field, material, resolved, warning)
        {
            Kind = SingularPointKind.TripleJunction,
        };
    }

    /// <summary>
    /// The sharp corners of a design whose field-side angle exceeds 180°, from the geometry alone (no field): location
    /// in metres and field-side angle in degrees. Useful before solving (e.g. to grade the mesh towards them).
    /// </summary>
    /// <param name="design">The design.</param>
    public static IReadOnlyList<(double X, double Y, double AngleDegrees, string ConductorName)> FindCornerPoints(Design design)
    {
        ArgumentNullException.ThrowIfNull(design);
        return FindCorners(design).Select(c => (c.Location.X, c.Location.Y, c.FieldSideAngleRadians * 180 / Math.PI, c.ConductorName)).ToArray();
    }

    /// <summary>The sharp re-entrant corners of a design's exact geometry.</summary>
    internal static List<CornerGeometry> FindCorners(Design design)
    {
        var result = new List<CornerGeometry>();
        var wall = design.Enclosure.Shape;
        double diag = design.Bounds.Diagonal;
        for (int k = 0; k < design.Conductors.Count; k++)
        {
            var conductor = design.Conductors[k];
            foreach (var contour in conductor.Shape.Contours)
                Scan(design, contour, conductor.Name, k, fieldOnLeft: false, wall, diag, result);
        }
        foreach (var contour in wall.Contours)
            Scan(design, contour, ConductorOutline.EnclosureName, -1, fieldOnLeft: true, wall, diag, result);
        return result;
    }

    private static void Scan(Design design, Contour contour, string name, int index, bool fieldOnLeft, Shape wall, double diag, List<CornerGeometry> result)
    {
        var segs = contour.Segments;
        int n = segs.Count;
        for (int i = 0; i < n; i++)
        {
            var a = segs[i];
            var b = segs[(i + 1) % n];
            if (fieldOnLeft && (a.Marker != BoundaryMarker.None || b.Marker != BoundaryMarker.None)) continue;
            var tin = a.TangentAt(1);
            var tout = b.TangentAt(0);
            double turn = Math.Atan2(Point2.Cross(tin, tout), Point2.Dot(tin, tout));
            if (Math.Abs(turn) < SmoothTurnRadians) continue;
            double beta = fieldOnLeft ? Math.PI - turn : Math.PI + turn;
            if (beta <= Math.PI + MinExcessRadians) continue;
            var p = a.End;
            if (!fieldOnLeft && wall.BoundaryDistanceTo(p) < 1e-7 * diag) continue;
            // Bisector of the field side: rotate the first bounding ray counter-clockwise by β/2. For conductors the
            // field side runs from the incoming ray (−t_in) round to t_out; for the wall from t_out round to −t_in.
            var ray = fieldOnLeft ? tout : new Point2(-tin.X, -tin.Y);
            double half = 0.5 * beta;
            double bx = ray.X * Math.Cos(half) - ray.Y * Math.Sin(half);
            double by = ray.X * Math.Sin(half) + ray.Y * Math.Cos(half);
            double shorter = Math.Min(a.Length, b.Length);
            double probe = 1e-4 * shorter;
            var hit = design.Classify(p.X + probe * bx, p.Y + probe * by);
            if (hit.Kind is not (RegionKind.Dielectric or RegionKind.Background)) continue;
            result.Add(new CornerGeometry(name, index, p, bx, by, beta, shorter));
        }
    }

    private static double Sq(double v) => v * v;
}
