using Electrostat.Geometry.Regions;
using Electrostat.Geometry.Shapes;

namespace Electrostat.Geometry.Model;

/// <summary>
/// A validated electrostatic design in SI units (metres, volts, V/m, coulombs, F/m): the input of meshing and solving.
/// Build it with <see cref="Loading.DesignLoader"/>.
/// </summary>
/// <remarks>
/// Conventions (stated once, here):
/// <list type="bullet">
/// <item>Planar designs: the drawing is a cross-section; per-unit-depth quantities (capacitance, charge) are per
/// metre, and totals are per-metre values times <see cref="DepthMetres"/>. When the file gives no depth it is 1 m, so
/// per-metre and total values coincide.</item>
/// <item>Axisymmetric designs: x is the radius r ≥ 0 and y is the axial coordinate z; quantities are totals for the
/// full revolution. Enclosure segments on r = 0 are marked <see cref="BoundaryMarker.Axis"/>.</item>
/// <item>Region priority (see <see cref="Classify(double, double)"/>): outside the enclosure, then conductors (first
/// containing one), then dielectrics (last containing entry wins), then the background material.</item>
/// <item>Conductors that touch and share a potential (or are both floating) form one <see cref="Electrode"/>.</item>
/// </list>
/// </remarks>
public sealed class Design
{
    private readonly Lazy<RegionModel> _regions;

    /// <summary>Creates a design from validated parts (the loader does the validation).</summary>
    public Design(
        string? sourcePath,
        string? title,
        Symmetry symmetry,
        LengthUnit units,
        double depthMetres,
        IReadOnlyDictionary<string, double> parameters,
        IReadOnlyDictionary<string, Material> materials,
        Material backgroundMaterial,
        Enclosure enclosure,
        IReadOnlyList<Conductor> conductors,
        IReadOnlyList<Electrode> electrodes,
        IReadOnlyList<Dielectric> dielectrics,
        DesignChecks checks)
    {
        ArgumentNullException.ThrowIfNull(units);
        ArgumentNullException.ThrowIfNull(parameters);
        ArgumentNullException.ThrowIfNull(materials);
        ArgumentNullException.ThrowIfNull(backgroundMaterial);
        ArgumentNullException.ThrowIfNull(enclosure);
        ArgumentNullException.ThrowIfNull(conductors);
        ArgumentNullException.ThrowIfNull(electrodes);
        ArgumentNullException.ThrowIfNull(dielectrics);
        ArgumentNullException.ThrowIfNull(checks);
        if (!(depthMetres > 0)) throw new ArgumentOutOfRangeException(nameof(depthMetres), "Depth must be positive.");
        SourcePath = sourcePath;
        Title = title;
        Symmetry = symmetry;
        Units = units;
        DepthMetres = depthMetres;
        Parameters = parameters;
        Materials = materials;
        BackgroundMaterial = backgroundMaterial;
        Enclosure = enclosure;
        Conductors = conductors;
        Electrodes = electrodes;
        Dielectrics = dielectrics;
        Checks = checks;
        _regions = new Lazy<RegionModel>(() => new RegionModel(this));
    }

    /// <summary>Path of the file the design was read from, or null when it came from text.</summary>
    public string? SourcePath { get; }

    /// <summary>Optional human-readable title from the file.</summary>
    public string? Title { get; }

    /// <summary>Planar or axisymmetric.</summary>
    public Symmetry Symmetry { get; }

    /// <summary>The length unit bare numbers were read in (for echoing values back to the user).</summary>
    public LengthUnit Units { get; }

    /// <summary>Out-of-plane length for planar totals, metres (1 m when not given; unused for axisymmetric).</summary>
    public double DepthMetres { get; }

    /// <summary>
    /// Parameter values after overrides, in the file's default units (lengths in <see cref="Units"/>, potentials in V,
    /// fields in V/m), exactly as expressions saw them.
    /// </summary>
    public IReadOnlyDictionary<string, double> Parameters { get; }

    /// <summary>Declared materials by name (plus the built-in vacuum when used as default background).</summary>
    public IReadOnlyDictionary<string, Material> Materials { get; }

    /// <summary>Material filling the enclosure wherever no dielectric or conductor is.</summary>
    public Material BackgroundMaterial { get; }

    /// <summary>The outer boundary of the domain.</summary>
    public Enclosure Enclosure { get; }

    /// <summary>Conductors in file order.</summary>
    public IReadOnlyList<Conductor> Conductors { get; }

    /// <summary>Electrodes (connected groups of conductors); <see cref="Conductor.ElectrodeIndex"/> points here.</summary>
    public IReadOnlyList<Electrode> Electrodes { get; }

    /// <summary>Dielectric bodies in file order (later wins where they overlap).</summary>
    public IReadOnlyList<Dielectric> Dielectrics { get; }

    /// <summary>Acceptance limits for later analysis.</summary>
    public DesignChecks Checks { get; }

    /// <summary>Exact bounds of the enclosure, metres.</summary>
    public BoundingBox Bounds => Enclosure.Shape.Bounds;

    /// <summary>Region assembly (areas, distances) computed with NetTopologySuite on first use.</summary>
    public RegionModel Regions => _regions.Value;

    /// <summary>
    /// Which region the point (x, y) (metres) is in, by the priority rule: outside the enclosure; else the first
    /// conductor containing it; else the last dielectric containing it; else background. Exact for lines and arcs;
    /// points exactly on a boundary may go to either side.
    /// </summary>
    public RegionHit Classify(double x, double y)
    {
        var p = new Point2(x, y);
        if (!Enclosure.Shape.Contains(p)) return new RegionHit(RegionKind.Outside, -1);
        for (int k = 0; k < Conductors.Count; k++)
            if (Conductors[k].Shape.Contains(p)) return new RegionHit(RegionKind.Conductor, k);
        for (int j = Dielectrics.Count - 1; j >= 0; j--)
            if (Dielectrics[j].Shape.Contains(p)) return new RegionHit(RegionKind.Dielectric, j);
        return new RegionHit(RegionKind.Background, -1);
    }

    /// <summary>The material at a point, or null outside the domain or inside a conductor.</summary>
    public Material? MaterialAt(double x, double y)
    {
        var hit = Classify(x, y);
        return hit.Kind switch
        {
            RegionKind.Dielectric => Dielectrics[hit.Index].Material,
            RegionKind.Background => BackgroundMaterial,
            _ => null,
        };
    }
}
