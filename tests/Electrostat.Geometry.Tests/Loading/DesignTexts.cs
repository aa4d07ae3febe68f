namespace Electrostat.Geometry.Tests.Loading;

/// <summary>A small valid design used as the starting point of the malformed-input table.</summary>
internal static class DesignTexts
{
    public const string Base = """
        {
          "units": "mm",
          "symmetry": "planar",
          "parameters": { "gap": 5 },
          "materials": { "oil": { "relative_permittivity": 2.2, "breakdown_field": "10 kV/mm" } },
          "background": "oil",
          "enclosure": { "shape": { "type": "rectangle", "min": [-50, -50], "max": [50, 50] }, "potential": 0 },
          "conductors": [
            { "name": "hv", "potential": "10 kV", "shape": { "type": "circle", "center": [0, 10], "radius": 5 } },
            { "name": "gnd", "potential": 0, "shape": { "type": "rectangle", "min": [-20, -10], "max": [20, 0] } }
          ],
          "dielectrics": [
            { "name": "block", "material": "oil", "shape": { "type": "rectangle", "min": [-30, 20], "max": [30, 30] } }
          ]
        }
        """;

    /// <summary>The base design with each (old, new) replacement applied; every old text must occur.</summary>
    public static string With(params (string Old, string New)[] edits)
    {
        string s = Base;
        foreach (var (o, n) in edits)
        {
            if (!s.Contains(o, StringComparison.Ordinal)) throw new ArgumentException($"base design has no \"{o}\"");
            s = s.Replace(o, n, StringComparison.Ordinal);
        }
        return s;
    }

    /// <summary>1-based line and column of the first occurrence of a needle.</summary>
    public static (int Line, int Column) Find(string text, string needle)
    {
        int idx = text.IndexOf(needle, StringComparison.Ordinal);
        if (idx < 0) throw new ArgumentException($"needle \"{needle}\" not in text");
        int line = 1 + text[..idx].Count(ch => ch == '\n');
        int col = idx - (text.LastIndexOf('\n', Math.Max(0, idx - 1)) + 1) + 1;
        if (line == 1) col = idx + 1;
        return (line, col);
    }
}
