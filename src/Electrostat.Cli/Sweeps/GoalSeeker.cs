using System.Globalization;

namespace Electrostat.Cli.Sweeps;

/// <summary>
/// Finds the smallest (or largest) parameter value meeting a goal, assuming the goal's response is monotone in the
/// parameter: a scan of the range brackets the crossing, then interval search narrows the bracket to the tolerance.
/// </summary>
/// <remarks>
/// Each narrowing round solves <c>T</c> evenly spaced interior points at once (<c>T</c> = threads), shrinking the
/// bracket by <c>T + 1</c>; with one thread this is plain bisection (Press et al., Numerical Recipes, 3rd ed., §9.1,
/// bracketing and bisection). The answer is the meeting end of the final bracket, so the value reported was itself
/// solved and met the goal; the true threshold lies within the bracket.
/// </remarks>
internal static class GoalSeeker
{
    /// <summary>Runs the search.</summary>
    /// <param name="s">Sweep settings (threads = points per round).</param>
    /// <param name="axis">The single varied parameter; its steps give the initial scan (at least 2 points).</param>
    /// <param name="goal">The goal.</param>
    /// <param name="largest">True for the largest meeting value, false for the smallest.</param>
    /// <param name="tolerance">Bracket width to stop at, in the parameter's units.</param>
    /// <param name="done">Called after each case (progress).</param>
    /// <param name="token">Cancels between rounds and cases.</param>
    public static GoalResult Seek(SweepSettings s, SweepAxis axis, SweepGoal goal, bool largest, double tolerance, Action<SweepCase>? done, CancellationToken token)
    {
        var all = new List<SweepCase>();
        var c = CultureInfo.InvariantCulture;
        var warnings = new List<string>();
        List<SweepCase> Solve(IReadOnlyList<double> xs)
        {
            int start = all.Count;
            var cases = xs.Select((x, k) => (start + k, (IReadOnlyDictionary<string, double>)new Dictionary<string, double> { [axis.Name] = x })).ToList();
            var solved = CaseRunner.RunAll(s, cases, done, token);
            all.AddRange(solved);
            return solved;
        }
        double X(SweepCase sc) => sc.Parameters[axis.Name];

        // Scan, ordered from the side that should fail towards the side that should meet the goal.
        var scan = Solve(axis.Values()).OrderBy(X).ToList();
        if (largest) scan.Reverse();
        foreach (var bad in scan.Where(x => !x.Ok))
            warnings.Add(string.Create(c, $"case {axis.Name}={X(bad):G6} failed: {bad.Error}"));
        var verdicts = scan.Select(goal.Meets).ToList();
        int flips = 0;
        bool? previous = null;
        foreach (var v in verdicts.Where(v => v is not null))
        {
            if (previous is not null && v != previous) flips++;
            previous = v;
        }
        if (flips > 1) warnings.Add("the goal's response is not monotone over the scan; the answer is the first crossing from the " + (largest ? "upper" : "lower") + " end");

        int first = verdicts.FindIndex(v => v == true);
        string direction = largest ? "largest" : "smallest";
        if (first < 0)
            return new GoalResult(false, null, null, scan.LastOrDefault(x => x.Ok), $"no {axis.Name} in {Range(axis)} meets \"{goal.Text}\"; widen the range or change the design", warnings, all);
        if (first == 0)
            return new GoalResult(true, X(scan[0]), scan[0], null,
                string.Create(c, $"the goal holds already at {axis.Name}={X(scan[0]):G6}, the {(largest ? "upper" : "lower")} end of the range; extend the range to find the {direction} value"), warnings, all);
        int lastFail = verdicts.FindLastIndex(first - 1, v => v == false);
        if (lastFail < 0)
            return new GoalResult(false, null, scan[first], null, "every case before the first meeting value failed, so the crossing cannot be bracketed", warnings, all);
        SweepCase fail = scan[lastFail], meet = scan[first];
        while (Math.Abs(X(meet) - X(fail)) > tolerance)
        {
            token.ThrowIfCancellationRequested();
            int t = Math.Max(1, s.Threads);
            double a = X(fail), b = X(meet);
            var xs = Enumerable.Range(1, t).Select(k => a + (b - a) * k / (t + 1)).ToList();
            var inner = Solve(xs).OrderBy(sc => Math.Abs(X(sc) - a)).ToList(); // from the failing end towards the meeting end
            var failed = inner.FirstOrDefault(sc => !sc.Ok);
            if (failed is not null)
                return new GoalResult(false, null, meet, fail, string.Create(c, $"case {axis.Name}={X(failed):G6} inside the bracket failed ({failed.Error}); the threshold lies between {X(fail):G6} and {X(meet):G6}"), warnings, all);
            int j = inner.FindIndex(sc => goal.Meets(sc) == true);
            if (j < 0) fail = inner[^1];
            else
            {
                meet = inner[j];
                if (j > 0) fail = inner[j - 1];
            }
        }
        return new GoalResult(true, X(meet), meet, fail,
            string.Create(c, $"{direction} {axis.Name} meeting \"{goal.Text}\": {X(meet):G6} (bracket {X(fail):G6} fails, {X(meet):G6} meets; tolerance {tolerance:G3})"), warnings, all);
    }

    private static string Range(SweepAxis a) => string.Create(CultureInfo.InvariantCulture, $"{a.From:G6}..{a.To:G6}");
}
