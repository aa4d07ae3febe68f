using Electrostat.Analysis;
using Electrostat.Analysis.HotSpots;
using Electrostat.Fem.Problem;
using Electrostat.Geometry.Shapes;
using Electrostat.Rendering.Colour;
using Electrostat.Rendering.Contours;
using Electrostat.Rendering.Drawing;
using Electrostat.Rendering.Layout;
using SkiaSharp;

namespace Electrostat.Rendering.FieldMaps;

/// <summary>
/// Draws the field map of a solved design: |E| in viridis, equipotentials traced on the P1 potential, conductors,
/// dielectric outlines, numbered hot spots, colour bar (kV/mm) and scale bar (design units).
/// </summary>
/// <remarks>
/// Layout: a title line, the map area on the left, the colour bar on the right, the scale bar under the map. The
/// colour bar's ends are the smallest and largest |E| actually shaded (element values, or recovered corner values),
/// printed exactly. Only triangles of design regions are drawn (an open boundary's image disk is not).
/// </remarks>
public static class FieldMapRenderer
{
    private const double UniformSpread = 1e-3;
    private const float TitleHeight = 34, BottomMargin = 46, SideMargin = 16, BarAreaWidth = 118;
    private static readonly SKColor Ink = new(0x22, 0x26, 0x2b);
    private static readonly SKColor ConductorFill = new(0x9a, 0x9d, 0xa1);
    private static readonly SKColor ConductorEdge = new(0x4a, 0x4d, 0x52);
    private static readonly SKColor LineColour = new(0xff, 0xff, 0xff);
    private static readonly SKColor OutlineColour = new(0xf4, 0x6d, 0x43);
    private static readonly SKColor MarkerEdge = new(0xc0, 0x1b, 0x1b);

    /// <summary>Renders the map.</summary>
    /// <param name="context">The solved design.</param>
    /// <param name="hotSpots">Hot spots to mark (from the analysis report), highest first; may be empty.</param>
    /// <param name="options">Options; null for defaults.</param>
    public static FieldMapPicture Render(AnalysisContext context, IReadOnlyList<HotSpot> hotSpots, FieldMapOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(context);
        ArgumentNullException.ThrowIfNull(hotSpots);
        options ??= new FieldMapOptions();
        ArgumentOutOfRangeException.ThrowIfLessThan(options.WidthPixels, 200, nameof(options));
        var mesh = context.Mesh;
        var solution = context.Solution;
        bool axisymmetric = solution.Problem.Symmetry == ProblemSymmetry.Axisymmetric;
        bool mirror = axisymmetric && options.MirrorAxisymmetric && options.Window is null;

        // 1. Triangles to draw: design regions, inside the window.
        var (wMinX, wMinY, wMaxX, wMaxY) = options.Window ?? ViewBox(context);
        var shown = new List<int>();
        var tri = mesh.Triangles;
        for (int t = 0; t < mesh.TriangleCount; t++)
        {
            if (context.MaterialOfRegion(mesh.TriangleRegion[t]) is null) continue;
            int a = tri[3 * t], b = tri[3 * t + 1], c = tri[3 * t + 2];
            double lox = Math.Min(mesh.X[a], Math.Min(mesh.X[b], mesh.X[c])), hix = Math.Max(mesh.X[a], Math.Max(mesh.X[b], mesh.X[c]));
            double loy = Math.Min(mesh.Y[a], Math.Min(mesh.Y[b], mesh.Y[c])), hiy = Math.Max(mesh.Y[a], Math.Max(mesh.Y[b], mesh.Y[c]));
            if (hix < wMinX || lox > wMaxX || hiy < wMinY || loy > wMaxY) continue;
            shown.Add(t);
        }

        // 2. Field values per drawn corner and their range.
        var corner = new double[3 * shown.Count];
        var rec = options.Shading == FieldShading.Recovered ? context.Recovered : null;
        for (int k = 0; k < shown.Count; k++)
        {
            int t = shown[k];
            for (int i = 0; i < 3; i++)
                corner[3 * k + i] = rec is null ? solution.FieldMagnitude(t) : rec.SideMagnitude(rec.CornerSide[3 * t + i]);
        }
        double fMin = corner.Length > 0 ? corner.Min() : 0, fMax = corner.Length > 0 ? corner.Max() : 1;
        // A field uniform to 0.1 % (a plate gap) is shaded in one mid colour: spreading solver round-off over the
        // whole colour map would paint noise. The bar still prints the exact extremes.
        bool uniform = !(fMax - fMin > UniformSpread * Math.Abs(fMax));
        bool logScale = !uniform && (options.LogScale ?? fMax > options.AutoLogRatio * Median(corner));
        double logFloor = Math.Max(fMin, fMax * 1e-4);
        double ToT(double v) => uniform ? 0.5 : logScale
            ? Math.Log(Math.Max(v, logFloor) / logFloor) / Math.Log(fMax / logFloor)
            : (v - fMin) / (fMax - fMin);

        // 3. Layout.
        double viewMinX = mirror ? -wMaxX : wMinX;
        double dx = wMaxX - viewMinX, dy = wMaxY - wMinY;
        float mapW = options.WidthPixels - BarAreaWidth - 2 * SideMargin;
        float mapH = (float)Math.Clamp(mapW * dy / Math.Max(dx, 1e-12), 160, 1600);
        int height = (int)Math.Ceiling(TitleHeight + mapH + BottomMargin);
        var frame = MapFrame.Fit(viewMinX, wMinY, wMaxX, wMaxY, mapW, mapH, SideMargin, TitleHeight);
        var sketch = new Sketch(options.WidthPixels, height, SKColors.White);
        double[] signs = mirror ? [1, -1] : [1];
        SKPoint P(double x, double y, double s) => new((float)frame.PixelX(s * x), (float)frame.PixelY(y));

        // 4. Shading.
        foreach (double s in signs)
        {
            var pos = new SKPoint[3 * shown.Count];
            var col = new SKColor[3 * shown.Count];
            for (int k = 0; k < shown.Count; k++)
            {
                int t = shown[k];
                for (int i = 0; i < 3; i++)
                {
                    int v = tri[3 * t + i];
                    pos[3 * k + i] = P(mesh.X[v], mesh.Y[v], s);
                    col[3 * k + i] = Viridis.At(ToT(corner[3 * k + i]));
                }
            }
            sketch.ShadedTriangles(pos, col);
        }

        // 5. Mesh overlay.
        if (options.MeshOverlay)
        {
            foreach (double s in signs)
            {
                var ends = new SKPoint[6 * shown.Count];
                for (int k = 0; k < shown.Count; k++)
                {
                    int t = shown[k];
                    for (int i = 0; i < 3; i++)
                    {
                        int a = tri[3 * t + i], b = tri[3 * t + (i + 1) % 3];
                        ends[6 * k + 2 * i] = P(mesh.X[a], mesh.Y[a], s);
                        ends[6 * k + 2 * i + 1] = P(mesh.X[b], mesh.Y[b], s);
                    }
                }
                sketch.Segments(ends, new SKColor(0, 0, 0, 0x50), 0.5f);
            }
        }

        // 6. Equipotentials, traced on the shown triangles only.
        var phi = solution.PotentialVolts;
        double pMin = double.MaxValue, pMax = double.MinValue;
        foreach (double v in phi) { pMin = Math.Min(pMin, v); pMax = Math.Max(pMax, v); }
        var levels = RoundSteps.Inside(pMin, pMax, options.EquipotentialIntervals);
        var sub = new int[3 * shown.Count];
        for (int k = 0; k < shown.Count; k++) { sub[3 * k] = tri[3 * shown[k]]; sub[3 * k + 1] = tri[3 * shown[k] + 1]; sub[3 * k + 2] = tri[3 * shown[k] + 2]; }
        var lines = IsolineTracer.Trace(mesh.X, mesh.Y, sub, phi, levels);
        foreach (double s in signs)
        {
            var ends = new SKPoint[2 * lines.Count];
            for (int i = 0; i < lines.Count; i++)
            {
                ends[2 * i] = P(lines[i].X0, lines[i].Y0, s);
                ends[2 * i + 1] = P(lines[i].X1, lines[i].Y1, s);
            }
            sketch.Segments(ends, LineColour, 1.2f);
        }

        // 7. Dielectric outlines and conductors from the exact shapes.
        double chord = Math.Max(dx, dy) * 2e-4;
        foreach (var d in context.Design.Dielectrics)
        {
            foreach (double s in signs)
                foreach (var c in d.Shape.Contours) sketch.Polyline(Ring(c, chord, P, s), OutlineColour, 1.4f, closed: true, dashed: true);
        }
        for (int ci = 0; ci < context.Design.Conductors.Count; ci++)
        {
            var cond = context.Design.Conductors[ci];
            foreach (double s in signs)
                sketch.Area(cond.Shape.Contours.Select(c => Ring(c, chord, P, s)).ToArray(), ConductorFill, ConductorEdge, 1f);
        }

        // 8. Axis of an axisymmetric design.
        if (axisymmetric && 0 >= viewMinX && 0 <= wMaxX)
        {
            sketch.Polyline([P(0, wMinY, 1), P(0, wMaxY, 1)], Ink, 1f, dashed: true);
            sketch.Text(new SKPoint((float)frame.PixelX(0) + 4, (float)frame.PixelY(wMaxY) + 14), "axis (r = 0)", 11, Ink, halo: true);
        }

        // 9. Hot-spot markers first (they must sit exactly at their points), then labels placed round them:
        // conductor names and potentials, material names, equipotential values, each at the first free spot.
        var mapRect = new SKRect((float)frame.PixelX(viewMinX), (float)frame.PixelY(wMaxY), (float)frame.PixelX(wMaxX), (float)frame.PixelY(wMinY));
        var placer = new LabelPlacer(mapRect);
        var markers = new List<MarkerPlacement>();
        if (options.HotSpotMarkers)
        {
            foreach (var h in hotSpots)
            {
                if (h.XMetres < wMinX || h.XMetres > wMaxX || h.YMetres < wMinY || h.YMetres > wMaxY) continue;
                var at = P(h.XMetres, h.YMetres, 1);
                markers.Add(new MarkerPlacement(h.Rank, at.X, at.Y));
                placer.Reserve(new SKRect(at.X - 10, at.Y - 10, at.X + 10, at.Y + 10));
            }
        }
        var labels = new List<(SKPoint At, string Text, float Size, SKColor Colour)>();
        void Place(IEnumerable<SKPoint> candidates, string text, float size, SKColor colour)
        {
            foreach (var c in candidates)
            {
                var baseline = new SKPoint(c.X, c.Y + 0.35f * size);
                if (placer.TryPlace(LabelPlacer.BoxOf(baseline, text, size)))
                {
                    labels.Add((baseline, text, size, colour));
                    return;
                }
            }
        }
        static IEnumerable<SKPoint> Around(SKPoint p)
        {
            yield return p;
            for (int k = 1; k <= 4; k++)
            {
                yield return new SKPoint(p.X, p.Y + 15 * k);
                yield return new SKPoint(p.X, p.Y - 15 * k);
            }
        }
        for (int ci = 0; ci < context.Design.Conductors.Count; ci++)
        {
            var cond = context.Design.Conductors[ci];
            var bb = cond.Shape.Bounds;
            double cx = Math.Clamp(0.5 * (bb.MinX + bb.MaxX), wMinX, wMaxX), cy = Math.Clamp(0.5 * (bb.MinY + bb.MaxY), wMinY, wMaxY);
            double v = context.ConductorPotentialVolts(ci);
            Place(Around(P(cx, cy, 1)), double.IsNaN(v) ? cond.Name : $"{cond.Name} {Labels.Volts(v)}", 11, Ink);
        }
        foreach (var d in context.Design.Dielectrics)
        {
            var bb = d.Shape.Bounds;
            Place(Around(P(0.5 * (bb.MinX + bb.MaxX), 0.5 * (bb.MinY + bb.MaxY), 1)), d.MaterialName, 11, OutlineColour);
        }
        foreach (double level in options.LabelEquipotentials ? levels : [])
        {
            // Candidates: the midpoints of this level's longest pieces.
            var candidates = lines.Where(seg => seg.LevelVolts == level)
                .OrderByDescending(seg => Math.Abs(seg.X1 - seg.X0) + Math.Abs(seg.Y1 - seg.Y0))
                .Take(12)
                .Select(seg => P(0.5 * (seg.X0 + seg.X1), 0.5 * (seg.Y0 + seg.Y1), 1));
            Place(candidates, Labels.Volts(level), 10, Ink);
        }
        foreach (var (at, text, size, colour) in labels) sketch.Text(at, text, size, colour, TextAnchor.Middle, halo: true);

        // 10. The markers on top.
        foreach (var m in markers)
        {
            var at = new SKPoint((float)m.PixelX, (float)m.PixelY);
            sketch.Circle(at, 9, SKColors.White, MarkerEdge, 2);
            sketch.Text(new SKPoint(at.X, at.Y + 4), m.Rank.ToString(System.Globalization.CultureInfo.InvariantCulture), 11, MarkerEdge, TextAnchor.Middle);
        }

        // 11. Frame, title, colour bar, scale bar.
        sketch.Polyline([new(mapRect.Left, mapRect.Top), new(mapRect.Right, mapRect.Top), new(mapRect.Right, mapRect.Bottom), new(mapRect.Left, mapRect.Bottom)], Ink, 1f, closed: true);
        if (options.Title is string title) sketch.Text(new SKPoint(SideMargin, 22), title, 15, Ink);
        DrawColourBar(sketch, mapRect, fMin, fMax, logScale, logFloor, uniform);
        DrawScaleBar(sketch, frame, mapRect, context.Design.Units);

        return new FieldMapPicture(sketch, frame, fMin, fMax, logScale, lines, levels, markers);
    }

    // The whole design: the meshed field region and the enclosure (conductors at the edge lie outside the mesh).
    private static (double, double, double, double) ViewBox(AnalysisContext context)
    {
        var (minX, minY, maxX, maxY) = MeshBox(context);
        var b = context.Design.Bounds;
        return (Math.Min(minX, b.MinX), Math.Min(minY, b.MinY), Math.Max(maxX, b.MaxX), Math.Max(maxY, b.MaxY));
    }

    private static (double, double, double, double) MeshBox(AnalysisContext context)
    {
        var m = context.Mesh;
        double minX = double.MaxValue, minY = double.MaxValue, maxX = double.MinValue, maxY = double.MinValue;
        for (int t = 0; t < m.TriangleCount; t++)
        {
            if (context.MaterialOfRegion(m.TriangleRegion[t]) is null) continue;
            for (int i = 0; i < 3; i++)
            {
                int v = m.Triangles[3 * t + i];
                minX = Math.Min(minX, m.X[v]); maxX = Math.Max(maxX, m.X[v]);
                minY = Math.Min(minY, m.Y[v]); maxY = Math.Max(maxY, m.Y[v]);
            }
        }
        return (minX, minY, maxX, maxY);
    }

    private static double Median(double[] values)
    {
        if (values.Length == 0) return 0;
        var copy = (double[])values.Clone();
        Array.Sort(copy);
        return copy[copy.Length / 2];
    }

    private static SKPoint[] Ring(Contour contour, double chord, Func<double, double, double, SKPoint> p, double sign) =>
        contour.Flatten(chord).Select(q => p(q.X, q.Y, sign)).ToArray();

    private static void DrawColourBar(Sketch sketch, SKRect map, double fMin, double fMax, bool log, double logFloor, bool uniform)
    {
        float left = map.Right + 22, width = 18, top = map.Top + 18, bottom = map.Bottom - 4;
        float h = bottom - top;
        int steps = (int)Math.Max(h, 1);
        for (int i = 0; i < steps; i++)
        {
            // Row i from the bottom: t = (i + 0.5) / steps.
            sketch.Rectangle(new SKRect(left, bottom - i - 1, left + width, bottom - i), Viridis.At((i + 0.5) / steps));
        }
        sketch.Polyline([new(left, top), new(left + width, top), new(left + width, bottom), new(left, bottom)], Ink, 1, closed: true);
        sketch.Text(new SKPoint(left - 2, map.Top + 10), "|E| kV/mm", 11, Ink);
        // Extremes printed exactly (kV/mm), then round ticks between them.
        sketch.Text(new SKPoint(left + width + 4, top + 4), Labels.Number(fMax * 1e-6), 10, Ink);
        sketch.Text(new SKPoint(left + width + 4, bottom + 4), Labels.Number((log ? logFloor : fMin) * 1e-6), 10, Ink);
        // A log scale starts at 10⁻⁴ of the peak at most; the true minimum is then printed under the bar.
        if (log && logFloor > fMin) sketch.Text(new SKPoint(left - 2, bottom + 18), "min " + Labels.Number(fMin * 1e-6), 10, Ink);
        sketch.Text(new SKPoint(left - 2, bottom + (log && logFloor > fMin ? 31 : 18)), log ? "log scale" : "linear scale", 10, Ink);
        if (uniform)
        {
            sketch.Text(new SKPoint(left + width + 4, (top + bottom) / 2), "uniform", 10, Ink);
            return;
        }
        double lo = (log ? logFloor : fMin) * 1e-6, hi = fMax * 1e-6;
        IEnumerable<double> ticks = log
            ? Enumerable.Range(-12, 30).Select(k => Math.Pow(10, k)).Where(v => v > lo && v < hi)
            : RoundSteps.Inside(lo, hi, 5);
        foreach (double v in ticks)
        {
            double t = log ? Math.Log(v / lo) / Math.Log(hi / lo) : (v - lo) / (hi - lo);
            float y = bottom - (float)(t * h);
            if (y < top + 12 || y > bottom - 12) continue;
            sketch.Polyline([new(left + width, y), new(left + width + 3, y)], Ink, 1);
            sketch.Text(new SKPoint(left + width + 5, y + 4), Labels.Number(v), 10, Ink);
        }
    }

    private static void DrawScaleBar(Sketch sketch, MapFrame frame, SKRect map, Electrostat.Geometry.Model.LengthUnit unit)
    {
        double widthDesign = (map.Width * 0.25) / frame.PixelsPerMetre / unit.Metres;
        double step = RoundSteps.Step(widthDesign, 1);
        if (step > widthDesign) step /= 2;
        float len = (float)(step * unit.Metres * frame.PixelsPerMetre);
        float x0 = map.Left, y = map.Bottom + 22;
        sketch.Rectangle(new SKRect(x0, y - 4, x0 + len, y), Ink);
        sketch.Text(new SKPoint(x0 + len + 6, y + 1), $"{Labels.Number(step)} {unit.Symbol}", 11, Ink);
    }
}
