namespace Electrostat.Cli.Tests.Workflow;

/// <summary>Small designs for the workflow tests, written to a fresh temporary folder per test.</summary>
internal sealed class WorkflowDesigns : IDisposable
{
    /// <summary>
    /// A strip of a wide parallel-plate gap in air: mirror planes at x = 0, x = w and above the upper plate make the
    /// field exactly uniform, E = V/d (Griffiths, Introduction to Electrodynamics, §2.5, parallel-plate capacitor).
    /// The air is declared as a preset with its breakdown field set to 3 kV/mm, so margin = 3 kV/mm · d / 10 kV
    /// = 0.3 · d (d in mm): margin ≥ 2 exactly when d ≥ 20/3 mm. Capacitance per metre C' = ε0 εr w / d.
    /// </summary>
    public const string PlateGap = """
        {
          "title": "uniform gap",
          "units": "mm",
          "symmetry": "planar",
          "parameters": { "w": 10, "d": 5, "plate": 1 },
          "materials": { "gap_air": { "preset": "air", "relative_permittivity": 1, "breakdown_field": "3 kV/mm" } },
          "background": "gap_air",
          "enclosure": {
            "shape": { "type": "rectangle", "min": [0, 0], "max": ["w", "d + plate"] },
            "potential": 0,
            "symmetry_planes": [ { "x": 0 }, { "x": "w" }, { "y": "d + plate" } ]
          },
          "conductors": [
            { "name": "upper", "potential": "10 kV", "shape": { "type": "rectangle", "min": [0, "d"], "max": ["w", "d + plate"] } }
          ],
          "checks": { "min_margin": 2 }
        }
        """;

    public WorkflowDesigns()
    {
        Folder = Path.Combine(Path.GetTempPath(), "electrostat-workflow-" + Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(Folder);
    }

    /// <summary>The temporary folder (deleted on dispose).</summary>
    public string Folder { get; }

    /// <summary>Writes a design into the folder and returns its path.</summary>
    public string Write(string name, string json)
    {
        string path = Path.Combine(Folder, name);
        File.WriteAllText(path, json);
        return path;
    }

    /// <summary>A path in the folder.</summary>
    public string PathOf(string name) => Path.Combine(Folder, name);

    public void Dispose()
    {
        try
        {
            Directory.Delete(Folder, true);
        }
        catch (IOException)
        {
            // A leftover temporary folder is harmless.
        }
    }
}
