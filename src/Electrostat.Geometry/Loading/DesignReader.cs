using Electrostat.Geometry.Materials;
using Electrostat.Geometry.Model;
using Electrostat.Geometry.Quantities;
using Electrostat.Geometry.Shapes;
using Newtonsoft.Json;
using Newtonsoft.Json.Linq;

namespace Electrostat.Geometry.Loading;

/// <summary>Reads a design file's JSON into a <see cref="Design"/>, reporting every problem found.</summary>
internal sealed class DesignReader
{
    private static readonly string[] TopKeys =
        ["$schema", "title", "description", "units", "symmetry", "depth", "parameters", "materials", "background", "enclosure", "conductors", "dielectrics", "checks"];
    private static readonly string[] MaterialKeys = ["preset", "relative_permittivity", "breakdown_field", "description"];
    private static readonly string[] ConductorKeys = ["name", "potential", "floating", "charge", "shape"];
    private static readonly string[] DielectricKeys = ["name", "material", "shape"];
    private static readonly string[] ChecksKeys = ["min_margin", "min_clearance", "materials", "pairs"];
    private static readonly string[] MaterialCheckKeys = ["min_margin"];
    private static readonly string[] PairKeys = ["between", "min_clearance"];
    private static readonly string[] Symmetries = ["planar", "axisymmetric"];

    private readonly ProblemSink _sink;
    private readonly ReadContext _ctx;
    private readonly ShapeReader _shapes;
    private readonly string? _path;

    public DesignReader(string source, string? path)
    {
        _sink = new ProblemSink(source);
        _ctx = new ReadContext(_sink);
        _shapes = new ShapeReader(_ctx);
        _path = path;
    }

    public DesignLoadResult Read(string text, IReadOnlyDictionary<string, string>? overrides)
    {
        _sink.SetText(text);
        if (string.IsNullOrWhiteSpace(text))
        {
            _sink.Add(new DesignProblem(ProblemSeverity.Error, _sink.Source, "$", 0, 0, null, "the design file is empty",
                "start from an example in geometries/ or the complete example in docs/design-file.md"));
            return new DesignLoadResult(null, _sink.Problems);
        }
        JToken root;
        try
        {
            root = JToken.Parse(text, new JsonLoadSettings
            {
                CommentHandling = CommentHandling.Ignore,
                LineInfoHandling = LineInfoHandling.Load,
                DuplicatePropertyNameHandling = DuplicatePropertyNameHandling.Error,
            });
        }
        catch (JsonReaderException e)
        {
            string msg = e.Message;
            int cut = msg.IndexOf(" Path '", StringComparison.Ordinal);
            if (cut > 0) msg = msg[..cut];
            if (msg.StartsWith("Error reading JToken", StringComparison.Ordinal)) msg = "the file holds no JSON value (only comments or white space)";
            _sink.Add(new DesignProblem(ProblemSeverity.Error, _sink.Source, e.Path is { Length: > 0 } p ? "$." + p : "$", e.LineNumber, e.LinePosition, null,
                "JSON syntax error: " + msg.TrimEnd('.'), "fix the JSON syntax at this line and column (comments // and /* */ are allowed)"));
            return new DesignLoadResult(null, _sink.Problems);
        }
        var obj = _ctx.AsObject(root, "the design file");
        if (obj is null) return new DesignLoadResult(null, _sink.Problems);
        var design = ReadDesign(obj, overrides);
        return new DesignLoadResult(_sink.HasErrors ? null : design, _sink.Problems);
    }

    private Design? ReadDesign(JObject root, IReadOnlyDictionary<string, string>? overrides)
    {
        _ctx.CheckKeys(root, "the design file", TopKeys);
        string? title = root["title"] is null ? null : _ctx.String(root["title"], "title");
        if (root["description"] is { } desc) _ctx.String(desc, "description");

        // units
        var unitsToken = _ctx.Required(root, "units", "the design file", "add \"units\": \"mm\" (one of m, cm, mm, um, in, mil)");
        string? unitsText = _ctx.String(unitsToken, "units");
        if (unitsText is not null)
        {
            if (UnitTable.DesignLengthUnits.Contains(unitsText) && UnitTable.LengthMetres(unitsText) is double m)
                _ctx.Unit = new LengthUnit(unitsText, m);
            else
                _sink.Error(unitsToken, $"unknown length unit \"{unitsText}\"", Suggestions.Hint(unitsText, UnitTable.DesignLengthUnits));
        }

        // symmetry
        var symToken = _ctx.Required(root, "symmetry", "the design file", "add \"symmetry\": \"planar\" or \"axisymmetric\"");
        string? symText = _ctx.String(symToken, "symmetry");
        if (symText == "axisymmetric") _ctx.Symmetry = Symmetry.Axisymmetric;
        else if (symText is not null && symText != "planar")
            _sink.Error(symToken, $"unknown symmetry \"{symText}\"", Suggestions.Hint(symText, Symmetries));

        ReadParameters(root["parameters"], overrides);

        // depth
        double depth = 1.0;
        if (root["depth"] is { } depthToken)
        {
            if (_ctx.Symmetry == Symmetry.Axisymmetric)
                _sink.Error(root.Property("depth"), "\"depth\" applies to planar designs only", "remove \"depth\": an axisymmetric design covers the full revolution");
            else
                depth = _ctx.Quantity(depthToken, QuantityKind.Length, "depth", positive: true) ?? 1.0;
        }

        var materials = ReadMaterials(root["materials"]);
        AddReferencedPresets(root, materials);
        Material background = Material.Vacuum;
        if (root["background"] is { } bgToken)
        {
            string? bg = _ctx.String(bgToken, "background");
            if (bg is not null)
            {
                if (materials.TryGetValue(bg, out var mat)) background = mat;
                else if (bg == Material.Vacuum.Name) background = Material.Vacuum;
                else _sink.Error(bgToken, $"unknown material \"{bg}\" for the background", MaterialHint(bg, materials));
            }
        }
        else if (materials.TryGetValue(Material.Vacuum.Name, out var declaredVacuum))
        {
            background = declaredVacuum;
        }
        else
        {
            _sink.Note(root, "no \"background\" given: the space between bodies is vacuum (relative permittivity 1)",
                "add \"background\": \"<material>\" to fill it with e.g. air or oil");
        }

        var conductors = ReadConductors(root);
        var dielectrics = ReadDielectrics(root, materials);
        var enclosureToken = _ctx.Required(root, "enclosure", "the design file", "add \"enclosure\": {\"margin\": 10} for a grounded box around everything, or {\"shape\": {...}}");
        var checks = ReadChecks(root, materials);

        var validator = new DesignValidator(_ctx, _shapes);
        var enclosure = validator.BuildEnclosure(enclosureToken, conductors, dielectrics);
        if (enclosure is null) return null;

        // Cross-checks run on the bodies that were read, even after other errors, so that all problems come at once.
        var electrodes = validator.Validate(enclosure, conductors, dielectrics);
        if (_sink.HasErrors || electrodes is null) return null;

        var conductorModels = new List<Conductor>();
        for (int i = 0; i < conductors.Count; i++)
        {
            int e = electrodes.FindIndex(el => el.ConductorIndices.Contains(i));
            conductorModels.Add(new Conductor(conductors[i].Name, conductors[i].Shape, conductors[i].PotentialVolts, conductors[i].ChargeCoulombs, e));
        }
        var dielectricModels = dielectrics.Select(d => new Dielectric(d.Name, d.MaterialName == Material.Vacuum.Name && !materials.ContainsKey(d.MaterialName)
            ? Material.Vacuum : materials[d.MaterialName!], d.Shape)).ToList();
        var allMaterials = new Dictionary<string, Material>(materials, StringComparer.Ordinal);
        foreach (var m in dielectricModels.Select(d => d.Material).Append(background))
            allMaterials.TryAdd(m.Name, m); // the built-in vacuum, when used
        return new Design(_path, title, _ctx.Symmetry, _ctx.Unit, depth, new Dictionary<string, double>(_ctx.ParameterValues),
            allMaterials, background, enclosure, conductorModels, electrodes, dielectricModels, checks);
    }

    private void ReadParameters(JToken? token, IReadOnlyDictionary<string, string>? overrides)
    {
        var reserved = ExpressionsReserved();
        if (token is not null && _ctx.AsObject(token, "parameters") is JObject obj)
        {
            foreach (var prop in obj.Properties())
            {
                string name = prop.Name;
                if (!Expressions.ExpressionEvaluator.IsIdentifier(name))
                {
                    _sink.Error(prop, $"parameter name \"{name}\" is not a valid name", "use letters, digits and '_', starting with a letter or '_'");
                    continue;
                }
                if (reserved.Contains(name))
                {
                    _sink.Error(prop, $"parameter name \"{name}\" is reserved (a function, constant or unit)", $"rename it, e.g. \"{name}_value\"");
                    continue;
                }
                var v = prop.Value;
                if (v.Type is JTokenType.Integer or JTokenType.Float)
                    _ctx.DeclareParameter(name, v, v.ToString(Formatting.None), false);
                else if (v.Type == JTokenType.String)
                    _ctx.DeclareParameter(name, v, (string)v!, false);
                else
                    _sink.Error(v, $"parameter \"{name}\" must be a number or an expression string, found {ReadContext.Describe(v)}", "write e.g. 2.5 or \"gap / 2\"");
            }
        }
        if (overrides is not null)
        {
            foreach (var (name, text) in overrides)
            {
                if (!_ctx.HasParameter(name))
                {
                    _sink.Add(new DesignProblem(ProblemSeverity.Error, "--set", name, 0, 0, null,
                        $"--set {name}: the design has no parameter \"{name}\"",
                        _ctx.ParameterNames.Any() ? Suggestions.Hint(name, _ctx.ParameterNames.ToList()) : "the design declares no parameters"));
                    continue;
                }
                _ctx.DeclareParameter(name, new JValue(text), text, true);
            }
        }
        _ctx.EvaluateAllParameters();
    }

    private static HashSet<string> ExpressionsReserved()
    {
        var set = new HashSet<string>(Expressions.ExpressionEvaluator.ReservedNames, StringComparer.Ordinal);
        foreach (var s in UnitTable.AllSymbols) set.Add(s);
        return set;
    }

    private Dictionary<string, Material> ReadMaterials(JToken? token)
    {
        var result = new Dictionary<string, Material>(StringComparer.Ordinal);
        if (token is null) return result;
        if (_ctx.AsObject(token, "materials") is not JObject obj) return result;
        foreach (var prop in obj.Properties())
        {
            string what = $"material \"{prop.Name}\"";
            if (_ctx.AsObject(prop.Value, what) is not JObject m) continue;
            _ctx.CheckKeys(m, what, MaterialKeys);
            var preset = ReadPreset(m["preset"]);
            if (m["preset"] is not null && preset is null) continue;
            var epsToken = preset is not null ? m["relative_permittivity"]
                : _ctx.Required(m, "relative_permittivity", what, "add \"relative_permittivity\": a number ≥ 1, e.g. 4.4, or \"preset\": a built-in material (electrostat materials)");
            var eps = _ctx.Quantity(epsToken, QuantityKind.Dimensionless, "relative_permittivity", positive: true) ?? preset?.RelativePermittivity;
            double? breakdown = _ctx.Quantity(m["breakdown_field"], QuantityKind.Field, "breakdown_field", positive: true) ?? preset?.BreakdownFieldVoltsPerMetre;
            if (m["description"] is { } d) _ctx.String(d, "description");
            if (eps is null) continue;
            if (preset is not null && m["breakdown_field"] is null)
                _sink.Note(m["preset"], $"{what} takes the typical breakdown field of preset \"{preset.Name}\" ({UnitTable.Format(preset.BreakdownFieldVoltsPerMetre, QuantityKind.Field)})",
                    "typical, not rated: enter the rated \"breakdown_field\" of your own material (electrostat materials shows the caution)");
            if (eps < 1)
                _sink.Warning(epsToken, $"{what} has relative permittivity {eps:G6} < 1, unusual for a passive dielectric", "check the value");
            result[prop.Name] = new Material(prop.Name, eps.Value, breakdown);
        }
        return result;
    }

    private MaterialPreset? ReadPreset(JToken? token)
    {
        if (token is null) return null;
        string? name = _ctx.String(token, "preset");
        if (name is null) return null;
        var preset = MaterialPresets.Find(name);
        if (preset is null)
            _sink.Error(token, $"unknown material preset \"{name}\"", Suggestions.Hint(name, MaterialPresets.All.Select(p => p.Name).ToList()) + " (electrostat materials lists them)");
        return preset;
    }

    // A material name used but not declared resolves to the built-in preset of that name (except "vacuum", which keeps
    // the built-in vacuum without a breakdown field, as before presets existed; declare {"preset": "vacuum"} for that).
    private void AddReferencedPresets(JObject root, Dictionary<string, Material> materials)
    {
        var uses = new List<JToken>();
        if (root["background"] is { Type: JTokenType.String } bg) uses.Add(bg);
        if (root["dielectrics"] is JArray ds)
            foreach (var d in ds.OfType<JObject>())
                if (d["material"] is { Type: JTokenType.String } mt) uses.Add(mt);
        if (root["checks"] is JObject { } ch && ch["materials"] is JObject cm)
            foreach (var prop in cm.Properties()) uses.Add(prop);
        foreach (var use in uses)
        {
            string name = use is JProperty jp ? jp.Name : (string)use!;
            if (materials.ContainsKey(name) || name == Material.Vacuum.Name || MaterialPresets.Find(name) is not { } preset) continue;
            materials[name] = MaterialPresets.ToMaterial(preset, name);
            _sink.Note(use, $"material \"{name}\" is the built-in preset: relative permittivity {preset.RelativePermittivity.ToString("G6", System.Globalization.CultureInfo.InvariantCulture)}, typical breakdown field {UnitTable.Format(preset.BreakdownFieldVoltsPerMetre, QuantityKind.Field)}",
                $"typical, not rated: declare \"materials\": {{\"{name}\": {{\"preset\": \"{name}\", \"breakdown_field\": \"...\"}}}} with the rated value of your material (electrostat materials shows the caution)");
        }
    }

    private static string MaterialHint(string name, Dictionary<string, Material> materials)
    {
        var names = materials.Keys.Append(Material.Vacuum.Name).ToList();
        return Suggestions.Closest(name, names) is { } c ? $"did you mean '{c}'? Otherwise declare it under \"materials\"" : "declare it under \"materials\"";
    }

    private List<BodyDraft> ReadConductors(JObject root)
    {
        var result = new List<BodyDraft>();
        var arr = _ctx.AsArray(_ctx.Required(root, "conductors", "the design file", "add \"conductors\": [{\"name\": ..., \"potential\": ..., \"shape\": {...}}]"), "conductors");
        if (arr is null) return result;
        var names = new Dictionary<string, int>(StringComparer.Ordinal);
        for (int i = 0; i < arr.Count; i++)
        {
            string what = $"conductor {i}";
            if (_ctx.AsObject(arr[i], what) is not JObject c) continue;
            _ctx.CheckKeys(c, "a conductor", ConductorKeys);
            string? name = _ctx.String(_ctx.Required(c, "name", what, "add \"name\": \"...\""), "name");
            if (name is not null)
            {
                what = $"conductor \"{name}\"";
                if (names.TryGetValue(name, out int first))
                    _sink.Error(c["name"], $"duplicate conductor name \"{name}\" (also conductor {first})", "give every conductor its own name");
                else names[name] = i;
            }
            bool floating = c["floating"] is { } ft && (_ctx.Bool(ft, "floating") ?? false);
            double? potential = null, charge = null;
            bool ok = true;
            if (c["potential"] is { } pt)
            {
                if (floating)
                {
                    _sink.Error(pt.Parent, $"{what} has both \"potential\" and \"floating\": true", "remove one: a floating conductor's potential is computed");
                    ok = false;
                }
                potential = _ctx.Quantity(pt, QuantityKind.Potential, "potential");
                ok &= potential is not null;
            }
            else if (!floating)
            {
                _sink.Error(c, $"{what} has neither \"potential\" nor \"floating\": true", "add e.g. \"potential\": \"5 kV\", or \"floating\": true");
                ok = false;
            }
            if (c["charge"] is { } ct)
            {
                if (!floating)
                {
                    _sink.Error(ct.Parent, $"{what}: \"charge\" is only allowed on a floating conductor", "remove \"charge\" or replace \"potential\" by \"floating\": true");
                    ok = false;
                }
                charge = _ctx.Quantity(ct, QuantityKind.Charge, "charge");
                ok &= charge is not null;
            }
            var shape = _shapes.Read(_ctx.Required(c, "shape", what, "add \"shape\": {\"type\": ...}"), what);
            if (name is null || shape is null || !ok) continue;
            result.Add(new BodyDraft(name, shape, c, floating ? null : potential, floating ? (charge ?? 0.0) : null, null));
        }
        if (arr.Count == 0)
            _sink.Error(arr, "the design has no conductors", "add at least one conductor with a potential");
        return result;
    }

    private List<BodyDraft> ReadDielectrics(JObject root, Dictionary<string, Material> materials)
    {
        var result = new List<BodyDraft>();
        if (root["dielectrics"] is not { } token) return result;
        var arr = _ctx.AsArray(token, "dielectrics");
        if (arr is null) return result;
        var names = new Dictionary<string, int>(StringComparer.Ordinal);
        for (int i = 0; i < arr.Count; i++)
        {
            string what = $"dielectric {i}";
            if (_ctx.AsObject(arr[i], what) is not JObject d) continue;
            _ctx.CheckKeys(d, "a dielectric", DielectricKeys);
            string? name = _ctx.String(_ctx.Required(d, "name", what, "add \"name\": \"...\""), "name");
            if (name is not null)
            {
                what = $"dielectric \"{name}\"";
                if (names.TryGetValue(name, out int first))
                    _sink.Error(d["name"], $"duplicate dielectric name \"{name}\" (also dielectric {first})", "give every dielectric its own name");
                else names[name] = i;
            }
            var matToken = _ctx.Required(d, "material", what, "add \"material\": the name of a declared material");
            string? mat = _ctx.String(matToken, "material");
            bool ok = true;
            if (mat is not null && !materials.ContainsKey(mat) && mat != Material.Vacuum.Name)
            {
                _sink.Error(matToken, $"unknown material \"{mat}\" in {what}", MaterialHint(mat, materials));
                ok = false;
            }
            var shape = _shapes.Read(_ctx.Required(d, "shape", what, "add \"shape\": {\"type\": ...}"), what);
            if (name is null || mat is null || shape is null || !ok) continue;
            result.Add(new BodyDraft(name, shape, d, null, null, mat));
        }
        return result;
    }

    private DesignChecks ReadChecks(JObject root, Dictionary<string, Material> materials)
    {
        var token = root["checks"];
        if (token is null) return DesignChecks.None;
        if (_ctx.AsObject(token, "checks") is not JObject obj) return DesignChecks.None;
        _ctx.CheckKeys(obj, "checks", ChecksKeys);
        double? margin = _ctx.Quantity(obj["min_margin"], QuantityKind.Dimensionless, "min_margin", positive: true);
        double? clearance = _ctx.Quantity(obj["min_clearance"], QuantityKind.Length, "min_clearance", nonNegative: true);
        var perMaterial = new Dictionary<string, double>(StringComparer.Ordinal);
        if (obj["materials"] is { } mt && _ctx.AsObject(mt, "checks.materials") is JObject mo)
        {
            foreach (var prop in mo.Properties())
            {
                if (!materials.ContainsKey(prop.Name))
                    _sink.Error(prop, $"checks for unknown material \"{prop.Name}\"", MaterialHint(prop.Name, materials));
                if (_ctx.AsObject(prop.Value, $"checks for \"{prop.Name}\"") is not JObject po) continue;
                _ctx.CheckKeys(po, "a material check", MaterialCheckKeys);
                if (_ctx.Quantity(_ctx.Required(po, "min_margin", "a material check", "add \"min_margin\""), QuantityKind.Dimensionless, "min_margin", positive: true) is double v)
                    perMaterial[prop.Name] = v;
            }
        }
        var pairs = new List<ClearanceRule>();
        if (obj["pairs"] is { } pt && _ctx.AsArray(pt, "checks.pairs") is JArray pa)
        {
            // Names as written, including conductors whose shapes failed (their own errors are reported already).
            var conductorNames = (root["conductors"] as JArray ?? []).OfType<JObject>()
                .Select(c => c["name"]).Where(n => n?.Type == JTokenType.String).Select(n => ((string)n!).Trim()).ToList();
            foreach (var item in pa)
            {
                if (_ctx.AsObject(item, "a clearance pair") is not JObject po) continue;
                _ctx.CheckKeys(po, "a clearance pair", PairKeys);
                var between = _ctx.AsArray(_ctx.Required(po, "between", "a clearance pair", "add \"between\": [\"conductor a\", \"conductor b\"]"), "between");
                var value = _ctx.Quantity(_ctx.Required(po, "min_clearance", "a clearance pair", "add \"min_clearance\""), QuantityKind.Length, "min_clearance", nonNegative: true);
                if (between is null || value is null) continue;
                if (between.Count != 2)
                {
                    _sink.Error(between, "\"between\" must name exactly two conductors");
                    continue;
                }
                var a = _ctx.String(between[0], "conductor name");
                var b = _ctx.String(between[1], "conductor name");
                bool ok = a is not null && b is not null;
                foreach (var (n, t) in new[] { (a, between[0]), (b, between[1]) })
                {
                    if (n is not null && !conductorNames.Contains(n))
                    {
                        _sink.Error(t, $"unknown conductor \"{n}\"", Suggestions.Hint(n, conductorNames));
                        ok = false;
                    }
                }
                if (ok) pairs.Add(new ClearanceRule(a!, b!, value.Value));
            }
        }
        return new DesignChecks(margin, clearance, perMaterial, pairs);
    }
}
