using ErrorBudget.Core.Integrity.Araim;

namespace ErrorBudget.Core.Tests.Integrity.Araim;

/// <summary>Inputs the solver rejects, and the order of calls it requires.</summary>
public class SolverContractTests
{
    private static readonly AraimParameters Baseline = new();

    [Fact]
    public void Test_before_a_successful_evaluation_is_an_error()
    {
        var solver = new AraimSolver(8, Baseline);
        Assert.Throws<InvalidOperationException>(() => solver.Test(new double[6], new double[3]));
        Assert.Equal(0, solver.ModeCount);
    }

    [Fact]
    public void Unusable_variances_and_short_skies_return_false_and_disable_test()
    {
        var sky = AraimFixtures.RandomSky(new System.Random(81), 6, Baseline);
        var solver = new AraimSolver(8, Baseline);
        Assert.True(sky.Evaluate(solver, out _));

        double[] badVariance = [.. sky.IntegrityVariance];
        badVariance[2] = 0.0;
        Assert.False((sky with { IntegrityVariance = badVariance }).Evaluate(solver, out AraimResult result));
        Assert.Equal(default, result);
        Assert.Throws<InvalidOperationException>(() => solver.Test(new double[6], new double[3]));

        double[] badBias = [.. sky.Bias];
        badBias[0] = -1.0;
        Assert.False((sky with { Bias = badBias }).Evaluate(solver, out _));

        var three = new AraimSky(sky.LineOfSight[..3], sky.Constellation[..3], sky.IntegrityVariance[..3], sky.AccuracyVariance[..3], sky.Bias[..3]);
        Assert.False(three.Evaluate(solver, out _));
    }

    [Fact]
    public void Mismatched_spans_or_too_many_satellites_throw()
    {
        var sky = AraimFixtures.RandomSky(new System.Random(82), 9, Baseline);
        var solver = new AraimSolver(8, Baseline);
        Assert.Throws<ArgumentOutOfRangeException>(() => sky.Evaluate(solver, out _));

        var small = new AraimSky(sky.LineOfSight[..6], sky.Constellation[..5], sky.IntegrityVariance[..6], sky.AccuracyVariance[..6], sky.Bias[..6]);
        Assert.Throws<ArgumentException>(() => small.Evaluate(solver, out _));

        var ok = small with { Constellation = sky.Constellation[..6] };
        Assert.True(ok.Evaluate(solver, out _));
        Assert.Throws<ArgumentException>(() => solver.Test(new double[5], new double[3]));
        Assert.Throws<ArgumentOutOfRangeException>(() => solver.Test(new double[6], new double[2]));
        Assert.Throws<ArgumentOutOfRangeException>(() => solver.Mode(solver.ModeCount));
    }
}
