namespace Electrostat.Bench;

/// <summary>
/// One benchmark suite (e.g. <c>mesh</c>, <c>solve</c>). Suites are discovered by reflection, so adding a
/// suite means adding one class; nothing else needs editing.
/// </summary>
internal interface IBenchSuite
{
    /// <summary>The name typed on the command line.</summary>
    string Name { get; }

    /// <summary>Runs the suite, printing one machine-readable line per case. Returns the process exit code.</summary>
    int Run(string[] args);
}
