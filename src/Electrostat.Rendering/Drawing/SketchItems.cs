using SkiaSharp;

namespace Electrostat.Rendering.Drawing;

// The concrete sketch items: internal, read only by the two painters of this folder.
internal sealed record ShadedTrianglesItem(SKPoint[] Positions, SKColor[] Colours) : SketchItem;

internal sealed record PolylineItem(SKPoint[] Points, SKColor Stroke, float Width, bool Closed, SKColor? Fill, bool Dashed) : SketchItem;

internal sealed record SegmentsItem(SKPoint[] Endpoints, SKColor Stroke, float Width) : SketchItem;

internal sealed record CircleItem(SKPoint Centre, float Radius, SKColor Fill, SKColor Stroke, float Width) : SketchItem;

internal sealed record RectangleItem(SKRect Rect, SKColor Fill, SKColor? Stroke) : SketchItem;

internal sealed record TextItem(SKPoint At, string Text, float Size, SKColor Colour, TextAnchor Anchor, bool Halo, float RotationDegrees) : SketchItem;

internal sealed record AreaItem(SKPoint[][] Rings, SKColor Fill, SKColor Stroke, float Width) : SketchItem;
