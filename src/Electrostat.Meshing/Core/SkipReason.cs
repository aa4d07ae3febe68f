namespace Electrostat.Meshing.Core;

/// <summary>Internal codes stored per triangle slot in <see cref="MeshCore.TSkip"/>.</summary>
internal static class SkipReason
{
    internal const byte None = 0;
    internal const byte SmallInputAngle = 1;
    internal const byte ProtectedSegment = 2;
    internal const byte TinyFeature = 3;
    internal const byte Degenerate = 4;
}
