using Electrostat.Numerics.Parallelism;

namespace Electrostat.Numerics.Tests.Parallelism;

public class WorkerLimitTests
{
    [Fact]
    public void Workers_WithoutScope_IsTheProcessorCountClamped()
        => Assert.Equal(Math.Clamp(Environment.ProcessorCount, 1, 16), WorkerLimit.Workers);

    [Fact]
    public void Scope_CapsWorkers_AndNestedScopesRestoreInOrder()
    {
        int outside = WorkerLimit.Workers;
        using (WorkerLimit.Scope(1))
        {
            Assert.Equal(1, WorkerLimit.Workers);
            using (WorkerLimit.Scope(3)) Assert.Equal(3, WorkerLimit.Workers);
            Assert.Equal(1, WorkerLimit.Workers);
        }
        Assert.Equal(outside, WorkerLimit.Workers);
    }

    [Fact]
    public async Task Scope_FlowsIntoTasksStartedInside_ButNotIntoOtherFlows()
    {
        var gate = new TaskCompletionSource();
        // A flow started before the scope keeps its own (uncapped) setting.
        var other = Task.Run(async () => { await gate.Task; return WorkerLimit.Workers; });
        int inside;
        using (WorkerLimit.Scope(1))
        {
            inside = await Task.Run(() => WorkerLimit.Workers);
            gate.SetResult();
            Assert.Equal(Math.Clamp(Environment.ProcessorCount, 1, 16), await other);
        }
        Assert.Equal(1, inside);
    }

    [Fact]
    public void MatrixBuiltOutsideAScope_SplitsItsRowsByTheScopesLimitInside()
    {
        // A matrix first used with all workers and then inside a one-worker scope must not keep the old split.
        var a = TestProblems.JitteredP1(120);
        var x = TestProblems.RandomVector(a.Rows, 1);
        var y = new double[a.Rows];
        a.Multiply(x, y);
        int outside = a.Partition.Count;
        using (WorkerLimit.Scope(1))
        {
            Assert.Equal(1, a.Partition.Count);
            var y1 = new double[a.Rows];
            a.Multiply(x, y1);
            Assert.Equal(y, y1); // same products, summed row by row in the same order
        }
        Assert.Equal(outside, a.Partition.Count);
    }

    [Fact]
    public void Scope_RejectsZero() => Assert.Throws<ArgumentOutOfRangeException>(() => WorkerLimit.Scope(0));
}
