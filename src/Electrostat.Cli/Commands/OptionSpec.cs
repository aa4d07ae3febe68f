namespace Electrostat.Cli.Commands;

/// <summary>Which options a command takes: options with a value (<c>--set a=1</c>, repeatable) and flags (<c>--quiet</c>).</summary>
/// <param name="ValueOptions">Names (without dashes) of options that take a value.</param>
/// <param name="Flags">Names (without dashes) of flags.</param>
/// <param name="MinPositionals">Least number of positional arguments.</param>
/// <param name="MaxPositionals">Largest number of positional arguments.</param>
internal sealed record OptionSpec(IReadOnlyCollection<string> ValueOptions, IReadOnlyCollection<string> Flags, int MinPositionals, int MaxPositionals);
