namespace Electrostat.Rendering.Drawing;

/// <summary>One recorded item of a <see cref="Sketch"/> (the concrete kinds are internal to the painters).</summary>
public abstract record SketchItem;
