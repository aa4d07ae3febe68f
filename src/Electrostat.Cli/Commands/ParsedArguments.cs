namespace Electrostat.Cli.Commands;

/// <summary>
/// A command line split into positionals, options with values and flags. Accepts <c>--name value</c>,
/// <c>--name=value</c>, and <c>--</c> to end options. Repeated value options keep every value in order.
/// </summary>
internal sealed class ParsedArguments
{
    private readonly Dictionary<string, List<string>> _values = new(StringComparer.Ordinal);
    private readonly HashSet<string> _flags = new(StringComparer.Ordinal);
    private readonly List<string> _positionals = [];

    private ParsedArguments()
    {
    }

    /// <summary>Positional arguments in order.</summary>
    public IReadOnlyList<string> Positionals => _positionals;

    /// <summary>All values given for an option, in order (empty when absent).</summary>
    public IReadOnlyList<string> Values(string name) => _values.TryGetValue(name, out var v) ? v : [];

    /// <summary>True when a flag was given.</summary>
    public bool Has(string flag) => _flags.Contains(flag);

    /// <summary>Parses arguments against a spec.</summary>
    /// <exception cref="UsageException">Unknown option, missing value, or wrong number of positionals.</exception>
    public static ParsedArguments Parse(IReadOnlyList<string> args, OptionSpec spec)
    {
        var result = new ParsedArguments();
        bool optionsEnded = false;
        for (int i = 0; i < args.Count; i++)
        {
            string a = args[i];
            if (optionsEnded || !a.StartsWith("--", StringComparison.Ordinal) || a == "-")
            {
                result._positionals.Add(a);
                continue;
            }
            if (a == "--")
            {
                optionsEnded = true;
                continue;
            }
            string name = a[2..];
            string? value = null;
            int eq = name.IndexOf('=', StringComparison.Ordinal);
            if (eq >= 0)
            {
                value = name[(eq + 1)..];
                name = name[..eq];
            }
            if (spec.Flags.Contains(name))
            {
                if (value is not null) throw new UsageException($"option --{name} takes no value");
                result._flags.Add(name);
            }
            else if (spec.ValueOptions.Contains(name))
            {
                if (value is null)
                {
                    if (i + 1 >= args.Count) throw new UsageException($"option --{name} needs a value");
                    value = args[++i];
                }
                if (!result._values.TryGetValue(name, out var list)) result._values[name] = list = [];
                list.Add(value);
            }
            else
            {
                var known = spec.Flags.Concat(spec.ValueOptions).Select(o => "--" + o).ToList();
                throw new UsageException(known.Count == 0 ? $"unknown option --{name}" : $"unknown option --{name} (known: {string.Join(", ", known)})");
            }
        }
        if (result._positionals.Count < spec.MinPositionals) throw new UsageException("missing argument");
        if (result._positionals.Count > spec.MaxPositionals) throw new UsageException($"unexpected argument \"{result._positionals[spec.MaxPositionals]}\"");
        return result;
    }
}
