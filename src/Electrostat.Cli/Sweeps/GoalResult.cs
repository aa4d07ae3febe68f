namespace Electrostat.Cli.Sweeps;

/// <summary>The answer of a goal-seek.</summary>
/// <param name="Found">True when a bracket was found and narrowed to the tolerance.</param>
/// <param name="Value">The parameter value found: the end of the final bracket that meets the goal (so the answer
/// itself was solved and meets it); null when not found.</param>
/// <param name="Meeting">The bracketing case that meets the goal (evidence); null when none did.</param>
/// <param name="Failing">The bracketing case that does not; null when the goal holds over the whole range.</param>
/// <param name="Message">One line for the user: what was found, or why not.</param>
/// <param name="Warnings">Remarks such as a response that is not monotone over the scan.</param>
/// <param name="Cases">Every case solved, in evaluation order.</param>
internal sealed record GoalResult(bool Found, double? Value, SweepCase? Meeting, SweepCase? Failing, string Message, IReadOnlyList<string> Warnings, IReadOnlyList<SweepCase> Cases);
