using SkiaSharp;

namespace Electrostat.Rendering.Drawing;

/// <summary>Keeps labels from overlapping: each accepted label reserves its box, and a candidate that would overlap
/// a reserved box is refused so the caller can try the next position.</summary>
internal sealed class LabelPlacer(SKRect bounds)
{
    private readonly List<SKRect> _taken = [];

    /// <summary>Reserves a box unconditionally (markers, which must stay where they are).</summary>
    public void Reserve(SKRect box) => _taken.Add(box);

    /// <summary>The baseline anchor's text box (middle-anchored text of the given size), with a small gap round it.</summary>
    public static SKRect BoxOf(SKPoint baselineMiddle, string text, float size)
    {
        float w = PngPainter.MeasureText(text, size);
        return new SKRect(baselineMiddle.X - w / 2 - 2, baselineMiddle.Y - size, baselineMiddle.X + w / 2 + 2, baselineMiddle.Y + 0.3f * size);
    }

    /// <summary>Reserves the box and returns true when it lies inside the bounds and overlaps nothing reserved.</summary>
    public bool TryPlace(SKRect box)
    {
        if (box.Left < bounds.Left || box.Right > bounds.Right || box.Top < bounds.Top || box.Bottom > bounds.Bottom) return false;
        foreach (var t in _taken)
        {
            if (t.IntersectsWith(box)) return false;
        }
        _taken.Add(box);
        return true;
    }
}
