using System.Globalization;
using Electrostat.Fem.Elements;
using Electrostat.Fem.Problem;
using Electrostat.Meshing;

namespace Electrostat.Fem.Assembly;

/// <summary>
/// A validated <see cref="ElectrostaticProblem"/> turned into flat arrays for assembly: the terminal each vertex
/// belongs to, a compact material index per triangle, the Kelvin merge pairs and the elements that touch a terminal.
/// </summary>
/// <remarks>
/// Terminals are numbered 0..N−1 for the conductors, <see cref="EnclosureTerminal"/> = N for the enclosure and
/// <see cref="InfinityTerminal"/> = N + 1 for the point at infinity of an axisymmetric Kelvin open boundary.
/// </remarks>
internal sealed class CompiledProblem
{
    private CompiledProblem(ElectrostaticProblem problem)
    {
        Problem = problem;
        Mesh = problem.Mesh;
        ConductorCount = problem.Conductors.Count;
        NodeTerminal = new int[Mesh.VertexCount];
        Array.Fill(NodeTerminal, -1);
        TriangleMaterial = new int[Mesh.TriangleCount];
    }

    public ElectrostaticProblem Problem { get; }

    public TriangleMesh Mesh { get; }

    public ProblemSymmetry Symmetry => Problem.Symmetry;

    public int ConductorCount { get; }

    public int EnclosureTerminal => ConductorCount;

    public int InfinityTerminal => ConductorCount + 1;

    public int TerminalCount => ConductorCount + 2;

    /// <summary>Terminal of each vertex, or −1.</summary>
    public int[] NodeTerminal { get; }

    /// <summary>Compact material index of each triangle.</summary>
    public int[] TriangleMaterial { get; }

    /// <summary>Absolute permittivity tensor (F/m) per compact material.</summary>
    public PermittivityTensor[] MaterialEpsilon { get; private set; } = [];

    /// <summary>Charge density (C/m³) per compact material.</summary>
    public double[] MaterialCharge { get; private set; } = [];

    /// <summary>Region attribute per compact material.</summary>
    public int[] MaterialRegion { get; private set; } = [];

    /// <summary>True when some material carries a volume charge.</summary>
    public bool HasCharge { get; private set; }

    /// <summary>Numerically integrated weights of the axisymmetric Kelvin image triangles (NaN elsewhere), or null.</summary>
    public double[]? KelvinWeights { get; private set; }

    /// <summary>Pairs of vertices to merge (Kelvin arc matches).</summary>
    public (int A, int B)[] MergePairs { get; private set; } = [];

    /// <summary>Whether the enclosure occurs in the mesh.</summary>
    public bool HasEnclosure { get; private set; }

    /// <summary>Enclosure potential, volts.</summary>
    public double EnclosurePotential { get; private set; }

    /// <summary>Potential at infinity (axisymmetric open boundary), volts.</summary>
    public double InfinityPotential { get; private set; }

    /// <summary>Vertex standing for infinity (the image centre), or −1.</summary>
    public int InfinityNode { get; private set; } = -1;

    /// <summary>Triangles with at least one vertex on a terminal, ascending.</summary>
    public int[] TerminalElements { get; private set; } = [];

    /// <summary>Number of vertices on each terminal.</summary>
    public int[] TerminalNodeCount { get; private set; } = [];

    /// <summary>The element weight W = ∫ w dA of triangle <paramref name="t"/> (see <see cref="P1Triangle"/>).</summary>
    public double ElementWeight(int t)
    {
        var kw = KelvinWeights;
        if (kw is not null && !double.IsNaN(kw[t]))
        {
            return kw[t];
        }
        var tri = Mesh.Triangles;
        var x = Mesh.X;
        var y = Mesh.Y;
        int a = tri[3 * t], b = tri[3 * t + 1], c = tri[3 * t + 2];
        return P1Triangle.Weight(Symmetry, x[a], y[a], x[b], y[b], x[c], y[c]);
    }

    /// <summary>Writes the stiffness of triangle <paramref name="t"/> into <paramref name="k"/> (9 entries).</summary>
    public void ElementStiffness(int t, Span<double> k)
    {
        var tri = Mesh.Triangles;
        var x = Mesh.X;
        var y = Mesh.Y;
        int a = tri[3 * t], b = tri[3 * t + 1], c = tri[3 * t + 2];
        P1Triangle.Stiffness(x[a], y[a], x[b], y[b], x[c], y[c], MaterialEpsilon[TriangleMaterial[t]], ElementWeight(t), k);
    }

    /// <summary>Validates the problem and compiles it; user errors throw <see cref="FieldProblemException"/>.</summary>
    public static CompiledProblem Compile(ElectrostaticProblem problem)
    {
        ArgumentNullException.ThrowIfNull(problem);
        ArgumentNullException.ThrowIfNull(problem.Mesh);
        var cp = new CompiledProblem(problem);
        cp.CheckGeometry();
        cp.CompileMaterials();
        cp.CompileBoundaries();
        if (problem.OpenBoundary is not null)
        {
            cp.CompileKelvin(problem.OpenBoundary);
        }
        cp.CollectTerminalElements();
        return cp;
    }

    private static string At(double x, double y) => string.Create(CultureInfo.InvariantCulture, $"({x:G6} m, {y:G6} m)");

    private void CheckGeometry()
    {
        var m = Mesh;
        if (m.TriangleCount == 0) throw new FieldProblemException("The mesh has no triangles: nothing to solve.");
        if (Problem.Symmetry == ProblemSymmetry.Planar && !(Problem.DepthMetres > 0 && double.IsFinite(Problem.DepthMetres)))
        {
            throw new FieldProblemException($"The planar depth {Problem.DepthMetres} m must be a positive number of metres.");
        }
        for (int i = 0; i < m.VertexCount; i++)
        {
            if (!double.IsFinite(m.X[i]) || !double.IsFinite(m.Y[i])) throw new FieldProblemException($"Mesh vertex {i} has a non-finite coordinate.");
            if (Problem.Symmetry == ProblemSymmetry.Axisymmetric && m.X[i] < 0)
            {
                throw new FieldProblemException($"Mesh vertex {i} at {At(m.X[i], m.Y[i])} has a negative radius; an axisymmetric design must lie in r >= 0 (x is the radius).");
            }
        }
        var tri = m.Triangles;
        for (int t = 0; t < m.TriangleCount; t++)
        {
            int a = tri[3 * t], b = tri[3 * t + 1], c = tri[3 * t + 2];
            if ((uint)a >= (uint)m.VertexCount || (uint)b >= (uint)m.VertexCount || (uint)c >= (uint)m.VertexCount)
            {
                throw new ArgumentException($"Triangle {t} refers to a vertex outside the mesh.", nameof(Problem));
            }
            if (!(P1Triangle.TwiceArea(m.X[a], m.Y[a], m.X[b], m.Y[b], m.X[c], m.Y[c]) > 0))
            {
                throw new FieldProblemException($"Triangle {t} near {At(m.X[a], m.Y[a])} is not counter-clockwise or has zero area; the mesh is invalid.");
            }
        }
    }

    private void CompileMaterials()
    {
        var index = new Dictionary<int, int>();
        var eps = new List<PermittivityTensor>();
        var rho = new List<double>();
        var regions = new List<int>();
        var m = Mesh;
        int lastRegion = 0, lastIndex = -1;
        for (int t = 0; t < m.TriangleCount; t++)
        {
            int region = m.TriangleRegion[t];
            // Neighbouring triangles usually share a region: skip the dictionary for runs.
            if (lastIndex >= 0 && region == lastRegion)
            {
                TriangleMaterial[t] = lastIndex;
                continue;
            }
            if (!index.TryGetValue(region, out int k))
            {
                if (!Problem.Materials.TryGetValue(region, out var mat) || mat is null)
                {
                    int v = m.Triangles[3 * t];
                    throw new FieldProblemException($"Region {region} (e.g. the triangle at {At(m.X[v], m.Y[v])}) has no material: add region {region} to the problem's materials.");
                }
                var p = mat.Permittivity;
                if (!p.IsPositiveDefinite)
                {
                    throw new FieldProblemException($"Region {region}: the relative permittivity ({p.Xx}, {p.Xy}, {p.Yy}) must be positive (a symmetric positive-definite tensor).");
                }
                if (!double.IsFinite(mat.ChargeDensityCoulombsPerCubicMetre))
                {
                    throw new FieldProblemException($"Region {region}: the charge density must be a finite number of C/m³.");
                }
                k = eps.Count;
                index.Add(region, k);
                double e0 = PhysicalConstants.VacuumPermittivity;
                eps.Add(new PermittivityTensor(p.Xx * e0, p.Xy * e0, p.Yy * e0));
                rho.Add(mat.ChargeDensityCoulombsPerCubicMetre);
                regions.Add(region);
                HasCharge |= mat.ChargeDensityCoulombsPerCubicMetre != 0;
            }
            TriangleMaterial[t] = k;
            lastRegion = region;
            lastIndex = k;
        }
        MaterialEpsilon = [.. eps];
        MaterialCharge = [.. rho];
        MaterialRegion = [.. regions];
    }

    private void CompileBoundaries()
    {
        var m = Mesh;
        var kelvin = Problem.OpenBoundary;
        for (int k = 0; k < ConductorCount; k++)
        {
            if (Problem.Conductors[k] is null) throw new ArgumentException($"Conductor {k} is null.", nameof(Problem));
        }
        double? enclosureV = null;
        for (int s = 0; s < m.SegmentCount; s++)
        {
            int tag = m.SegmentTag[s];
            int va = m.SegmentVertices[2 * s], vb = m.SegmentVertices[2 * s + 1];
            if (!Problem.Boundaries.TryGetValue(tag, out var role) || role is null)
            {
                if (kelvin is not null && (tag == kelvin.InteriorArcTag || tag == kelvin.ExteriorArcTag)) continue;
                throw new FieldProblemException($"Segment tag {tag} (e.g. the edge at {At(m.X[va], m.Y[va])}) has no boundary role: map it to a conductor, the enclosure or a natural boundary.");
            }
            int terminal;
            switch (role)
            {
                case NaturalBoundary:
                    continue;
                case ConductorBoundary cb:
                    if ((uint)cb.ConductorIndex >= (uint)ConductorCount)
                    {
                        throw new FieldProblemException($"Segment tag {tag} names conductor {cb.ConductorIndex}, but the problem has {ConductorCount} conductors (0..{ConductorCount - 1}).");
                    }
                    terminal = cb.ConductorIndex;
                    break;
                case EnclosureBoundary eb:
                    if (!double.IsFinite(eb.PotentialVolts)) throw new FieldProblemException($"Segment tag {tag}: the enclosure potential must be a finite number of volts.");
                    if (enclosureV is double v0 && v0 != eb.PotentialVolts)
                    {
                        throw new FieldProblemException($"Segment tag {tag} puts the enclosure at {eb.PotentialVolts} V but another enclosure tag has {v0} V: the enclosure is one conductor; model the other part as a fixed-potential conductor.");
                    }
                    enclosureV = eb.PotentialVolts;
                    terminal = EnclosureTerminal;
                    HasEnclosure = true;
                    break;
                default:
                    throw new ArgumentException($"Unknown boundary role {role.GetType().Name}.", nameof(Problem));
            }
            Mark(va, terminal);
            Mark(vb, terminal);
        }
        EnclosurePotential = enclosureV ?? 0;
        var counts = new int[TerminalCount];
        foreach (int t in NodeTerminal)
        {
            if (t >= 0) counts[t]++;
        }
        TerminalNodeCount = counts;
        for (int k = 0; k < ConductorCount; k++)
        {
            if (counts[k] == 0)
            {
                throw new FieldProblemException($"Conductor '{Problem.Conductors[k].Name}' (index {k}) touches no mesh segment: map its outline's segment tag to ConductorBoundary({k}).");
            }
        }
    }

    private void Mark(int v, int terminal)
    {
        int old = NodeTerminal[v];
        if (old >= 0 && old != terminal)
        {
            throw new FieldProblemException($"Mesh vertex {v} at {At(Mesh.X[v], Mesh.Y[v])} lies on both {TerminalName(old)} and {TerminalName(terminal)}: they touch (a short circuit). Separate them in the geometry or merge them into one conductor.");
        }
        NodeTerminal[v] = terminal;
    }

    /// <summary>Name of a terminal for messages.</summary>
    public string TerminalName(int terminal) =>
        terminal < ConductorCount ? $"conductor '{Problem.Conductors[terminal].Name}'"
        : terminal == EnclosureTerminal ? "the enclosure" : "the point at infinity";

    private void CompileKelvin(KelvinOpenBoundary kb)
    {
        var m = Mesh;
        double r = kb.RadiusMetres;
        if (!(r > 0 && double.IsFinite(r))) throw new FieldProblemException($"The open boundary radius {r} m must be positive.");
        if (Symmetry == ProblemSymmetry.Axisymmetric && (kb.InteriorCentreX != 0 || kb.ExteriorCentreX != 0))
        {
            throw new FieldProblemException("An axisymmetric open boundary must have both circle centres on the axis (x = r = 0).");
        }
        double tol = 1e-6 * r;
        if (Problem.Materials.TryGetValue(kb.ExteriorRegion, out var exteriorMaterial) && exteriorMaterial.ChargeDensityCoulombsPerCubicMetre != 0)
        {
            throw new FieldProblemException($"The open boundary's exterior region {kb.ExteriorRegion} stands for empty space outside the circle and cannot carry a volume charge: enlarge the circle so every charge lies inside it.");
        }
        var interior = ArcNodes(kb.InteriorArcTag, kb.InteriorCentreX, kb.InteriorCentreY, r, tol, "interior");
        var exterior = ArcNodes(kb.ExteriorArcTag, kb.ExteriorCentreX, kb.ExteriorCentreY, r, tol, "exterior");
        if (interior.Count != exterior.Count)
        {
            throw new FieldProblemException($"The open boundary's interior arc (tag {kb.InteriorArcTag}) has {interior.Count} vertices but the exterior arc (tag {kb.ExteriorArcTag}) has {exterior.Count}: mesh both as protected segments with the same divisions.");
        }
        var pairs = new (int, int)[interior.Count];
        for (int i = 0; i < interior.Count; i++)
        {
            if (Math.Abs(interior[i].Angle - exterior[i].Angle) > 1e-6)
            {
                int v = interior[i].Node;
                throw new FieldProblemException($"The open boundary's arcs do not match: interior vertex at {At(m.X[v], m.Y[v])} has no exterior vertex at the same angle. Mesh both arcs as protected segments with the same divisions.");
            }
            pairs[i] = (interior[i].Node, exterior[i].Node);
        }
        MergePairs = pairs;

        // The image centre stands for infinity.
        int best = -1;
        double bestD = double.MaxValue;
        for (int i = 0; i < m.VertexCount; i++)
        {
            double d = Math.Abs(m.X[i] - kb.ExteriorCentreX) + Math.Abs(m.Y[i] - kb.ExteriorCentreY);
            if (d < bestD) { bestD = d; best = i; }
        }
        if (bestD > tol)
        {
            throw new FieldProblemException($"The open boundary's image centre {At(kb.ExteriorCentreX, kb.ExteriorCentreY)} is not a mesh vertex: add a vertex there.");
        }
        InfinityNode = best;
        InfinityPotential = kb.PotentialAtInfinityVolts;
        if (Symmetry == ProblemSymmetry.Axisymmetric)
        {
            if (NodeTerminal[best] >= 0) throw new FieldProblemException("The open boundary's image centre lies on a conductor.");
            NodeTerminal[best] = InfinityTerminal;
            TerminalNodeCount[InfinityTerminal] = 1;
            var w = new double[m.TriangleCount];
            Array.Fill(w, double.NaN);
            var tri = m.Triangles;
            bool any = false;
            for (int t = 0; t < m.TriangleCount; t++)
            {
                if (m.TriangleRegion[t] != kb.ExteriorRegion) continue;
                int a = tri[3 * t], b = tri[3 * t + 1], c = tri[3 * t + 2];
                w[t] = KelvinWeight.Axisymmetric(m.X[a], m.Y[a], m.X[b], m.Y[b], m.X[c], m.Y[c], kb.ExteriorCentreY, r);
                any = true;
            }
            if (!any) throw new FieldProblemException($"The open boundary's exterior region {kb.ExteriorRegion} has no triangles.");
            KelvinWeights = w;
        }
    }

    private List<(double Angle, int Node)> ArcNodes(int tag, double cx, double cy, double r, double tol, string which)
    {
        var m = Mesh;
        var seen = new HashSet<int>();
        var list = new List<(double, int)>();
        for (int s = 0; s < m.SegmentCount; s++)
        {
            if (m.SegmentTag[s] != tag) continue;
            for (int e = 0; e < 2; e++)
            {
                int v = m.SegmentVertices[2 * s + e];
                if (!seen.Add(v)) continue;
                double dx = m.X[v] - cx, dy = m.Y[v] - cy;
                if (Math.Abs(Math.Sqrt(dx * dx + dy * dy) - r) > tol)
                {
                    throw new FieldProblemException($"The open boundary's {which} arc (tag {tag}) has a vertex at {At(m.X[v], m.Y[v])} that is not on the circle of radius {r} m about {At(cx, cy)}.");
                }
                double angle = Math.Atan2(dy, dx);
                // Both ends of the cut at ±π are the same direction; keep one representative.
                list.Add((angle > Math.PI - 1e-9 ? -Math.PI : angle, v));
            }
        }
        if (list.Count == 0) throw new FieldProblemException($"The open boundary's {which} arc tag {tag} occurs on no mesh segment.");
        list.Sort((p, q) => p.Item1.CompareTo(q.Item1));
        return list;
    }

    private void CollectTerminalElements()
    {
        var tri = Mesh.Triangles;
        var list = new List<int>();
        for (int t = 0; t < Mesh.TriangleCount; t++)
        {
            if (NodeTerminal[tri[3 * t]] >= 0 || NodeTerminal[tri[3 * t + 1]] >= 0 || NodeTerminal[tri[3 * t + 2]] >= 0)
            {
                list.Add(t);
            }
        }
        TerminalElements = [.. list];
    }
}
