using Electrostat.Geometry.Shapes;
using Newtonsoft.Json.Linq;

namespace Electrostat.Geometry.Loading;

/// <summary>A conductor or dielectric as read from the file, before the geometric cross-checks.</summary>
internal sealed record BodyDraft(
    string Name,
    Shape Shape,
    JToken Token,
    double? PotentialVolts,
    double? ChargeCoulombs,
    string? MaterialName);
