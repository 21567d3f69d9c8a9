using ErrorBudget.Core.Integrity.Araim;
using ErrorBudget.Core.Random;
using ErrorBudget.Core.Tests.Geometry;

namespace ErrorBudget.Core.Tests.Integrity.Araim;

/// <summary>
/// The simplified exclusion of <see cref="AraimSolver.Test"/>: the candidate with the largest normalised
/// separation whose own residual χ² test passes is excluded and its subset solution is used.
/// </summary>
public class ExclusionTests
{
    /// <summary>Dot products of O(1) projections with O(50 m) errors: 1e-9 m is rounding only.</summary>
    private const double PositionTolerance = 1e-9;

    private static readonly AraimParameters SatelliteFaultsOnly = new() { PConst = 0.0 };

    private static double[] Apply(ReadOnlySpan<double> projection, int m, double[] error)
    {
        var x = new double[3];
        for (int q = 0; q < 3; q++)
        {
            for (int i = 0; i < m; i++)
            {
                x[q] += projection[(q * m) + i] * error[i];
            }
        }

        return x;
    }

    private static double[] NominalErrors(AraimSky sky, ulong key, int sample)
    {
        var error = new double[sky.Count];
        CounterRng.FillNormals(key, (ulong)(sample * sky.Count), error);
        for (int i = 0; i < error.Length; i++)
        {
            error[i] *= Math.Sqrt(sky.AccuracyVariance[i]);
        }

        return error;
    }

    [Fact]
    public void A_large_step_on_one_satellite_is_detected_and_that_satellite_excluded()
    {
        // A 50 m step is ~40 σ: every subset that keeps the satellite fails its χ² test (non-centrality in the
        // thousands) and the right subset passes unless a 4e-6 false alarm occurs, so all 200 samples must agree.
        var sky = AraimFixtures.RandomSky(new System.Random(51), 10, SatelliteFaultsOnly);
        var solver = new AraimSolver(12, SatelliteFaultsOnly);
        Assert.True(sky.Evaluate(solver, out _));
        ulong key = CounterRng.Key(99, RandomPurpose.Fault, 0, 0, 0);
        var position = new double[3];
        for (int s = 0; s < 200; s++)
        {
            int faulty = s % sky.Count;
            double[] error = NominalErrors(sky, key, s);
            error[faulty] += 50.0;

            DetectionResult d = solver.Test(error, position);
            Assert.True(d.Detected);
            Assert.True(d.ExcludedMode >= 0 && solver.Removes(d.ExcludedMode, faulty), $"sample {s}: mode {d.ExcludedMode} kept satellite {faulty}");
            double[] expected = Apply(solver.ModeProjection(d.ExcludedMode), sky.Count, error);
            for (int q = 0; q < 3; q++)
            {
                Assert.Equal(expected[q], position[q], PositionTolerance);
            }
        }
    }

    [Fact]
    public void Without_a_detection_nothing_is_excluded_and_the_all_in_view_error_is_returned()
    {
        var sky = AraimFixtures.RandomSky(new System.Random(52), 9, SatelliteFaultsOnly);
        var solver = new AraimSolver(12, SatelliteFaultsOnly);
        Assert.True(sky.Evaluate(solver, out _));
        ulong key = CounterRng.Key(98, RandomPurpose.UserLocal, 0, 0, 0);
        var position = new double[3];
        int quiet = 0;
        for (int s = 0; s < 200; s++)
        {
            double[] error = NominalErrors(sky, key, s);
            DetectionResult d = solver.Test(error, position);
            if (d.Detected)
            {
                continue; // false alarms (≤ 4e-6 each) are not this test's business
            }

            quiet++;
            Assert.Equal(-1, d.ExcludedMode);
            double[] expected = Apply(solver.AllInViewProjection, sky.Count, error);
            for (int q = 0; q < 3; q++)
            {
                Assert.Equal(expected[q], position[q], PositionTolerance);
            }
        }

        Assert.True(quiet >= 199);
    }

    [Fact]
    public void Exclusion_fails_when_the_remaining_subsets_have_no_redundancy()
    {
        // m = 5: each single-satellite subset keeps 4 satellites, χ² with 0 degrees of freedom cannot pass.
        // (Elevations differ: four satellites at one elevation would make the up and clock columns collinear.)
        var sky = AraimFixtures.Build(
            GeometryFixtures.FromAzEl((0, 85), (10, 30), (100, 15), (200, 45), (290, 60)), new int[5], SatelliteFaultsOnly, 0.75);
        var solver = new AraimSolver(8, SatelliteFaultsOnly);
        Assert.True(sky.Evaluate(solver, out AraimResult result));
        Assert.Equal(5, result.FaultModes);

        var error = new double[5];
        error[1] = 100.0;
        var position = new double[3];
        DetectionResult d = solver.Test(error, position);
        Assert.True(d.ExclusionFailed);
        double[] expected = Apply(solver.AllInViewProjection, 5, error);
        for (int q = 0; q < 3; q++)
        {
            Assert.Equal(expected[q], position[q], PositionTolerance);
        }
    }

    [Fact]
    public void Two_simultaneous_large_faults_cannot_be_excluded_by_a_single_satellite_subset()
    {
        // Every single-satellite subset keeps at least one faulted satellite, so every residual χ² test fails and
        // the alert stands (the rule must not fall back to the largest separation alone).
        var sky = AraimFixtures.RandomSky(new System.Random(54), 10, SatelliteFaultsOnly);
        var solver = new AraimSolver(12, SatelliteFaultsOnly);
        Assert.True(sky.Evaluate(solver, out _));
        ulong key = CounterRng.Key(96, RandomPurpose.Fault, 2, 0, 0);
        var position = new double[3];
        for (int s = 0; s < 50; s++)
        {
            double[] error = NominalErrors(sky, key, s);
            error[s % 10] += 50.0;
            error[(s + 3) % 10] -= 40.0;

            DetectionResult d = solver.Test(error, position);
            Assert.True(d.ExclusionFailed, $"sample {s}: excluded mode {d.ExcludedMode}");
            double[] expected = Apply(solver.AllInViewProjection, sky.Count, error);
            for (int q = 0; q < 3; q++)
            {
                Assert.Equal(expected[q], position[q], PositionTolerance);
            }
        }
    }

    [Fact]
    public void A_bias_common_to_one_constellation_is_removed_by_excluding_a_constellation()
    {
        // With one receiver clock, a bias common to constellation B is inconsistent with constellation A, so every
        // subset that mixes them fails its χ² test; either one-constellation subset absorbs the bias in its clock
        // (rows E, N, U of S sum to zero over the satellites used, PositionSolution remarks), so its position error
        // is that of the nominal errors alone.
        var p = new AraimParameters();
        var sky = AraimFixtures.TwoConstellations(new System.Random(53), 6, p);
        var solver = new AraimSolver(12, p);
        Assert.True(sky.Evaluate(solver, out _));
        ulong key = CounterRng.Key(97, RandomPurpose.Fault, 1, 0, 0);
        var position = new double[3];
        for (int s = 0; s < 100; s++)
        {
            double[] nominal = NominalErrors(sky, key, s);
            double[] error = [.. nominal.Select((e, i) => sky.Constellation[i] == sky.Constellation[^1] ? e + 30.0 : e)];

            DetectionResult d = solver.Test(error, position);
            Assert.True(d.Detected);
            Assert.True(d.ExcludedMode >= 0, $"sample {s}: exclusion failed");
            Assert.Equal(FaultModeKind.Constellation, solver.Mode(d.ExcludedMode).Kind);
            double[] expected = Apply(solver.ModeProjection(d.ExcludedMode), sky.Count, nominal);
            for (int q = 0; q < 3; q++)
            {
                Assert.Equal(expected[q], position[q], 1e-8); // the 30 m bias cancels to rounding
            }
        }
    }
}
