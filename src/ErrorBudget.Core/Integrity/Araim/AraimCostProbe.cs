using System.Diagnostics;
using ErrorBudget.Core.Geodesy;
using ErrorBudget.Core.Grid;
using ErrorBudget.Core.Numerics;
using ErrorBudget.Core.Orbits;
using ErrorBudget.Core.Random;
using ErrorBudget.Core.Scenarios;

namespace ErrorBudget.Core.Integrity.Araim;

/// <summary>
/// Measures the solution-separation algorithm alone on a scenario's real geometry (issue 5, Speed):
/// for every user at a few epochs, the PL evaluation (all subsets, thresholds, PL search) once per
/// (epoch, user), and the detection test on a number of sampled range vectors. One thread.
/// </summary>
internal static class AraimCostProbe
{
    /// <summary>Mean cost in microseconds of one evaluation per user-epoch and of one detection test per trial.</summary>
    public static (double EvaluateMicroseconds, double TestMicroseconds, long UserEpochs) Measure(Scenario scenario, int epochs, int trialsPerUserEpoch)
    {
        var grid = ServiceGrid.From(scenario.Grid);
        var constellation = Constellation.FromShells(scenario.Shells);
        int satellites = scenario.TotalSatellites;
        int[] shellOf = [.. scenario.Shells.SelectMany((shell, index) => Enumerable.Repeat(index, shell.Satellites))];
        var states = new SatelliteState[satellites];
        var solver = new AraimSolver(Math.Max(4, satellites), new AraimParameters());
        var los = new Vec3[satellites];
        var constellationOf = new int[satellites];
        var integrity = new double[satellites];
        var accuracy = new double[satellites];
        var bias = new double[satellites];
        var ranges = new double[satellites];
        Span<double> position = stackalloc double[3];
        double sinMask = Math.Sin(scenario.Grid.MaskDeg * Math.PI / 180.0);
        double start = EarthRotation.EarthRotationAngle(scenario.Run.StartUtc);
        long evaluateTicks = 0, testTicks = 0, evaluated = 0, tested = 0;
        ulong key = CounterRng.Key(scenario.Run.Seed, RandomPurpose.Spare, 0, 0, 0);
        ulong counter = 0;
        for (int e = 0; e < epochs; e++)
        {
            constellation.Propagate(scenario.Run.EpochTimeSeconds(e * Math.Max(1, scenario.Run.Epochs / epochs)), start, states);
            foreach (GridCell cell in grid.Cells)
            {
                int m = 0;
                for (int s = 0; s < satellites; s++)
                {
                    Vec3 d = states[s].PositionEcef - cell.Frame.Origin;
                    Vec3 enu = cell.Frame.ToEnu(d / d.Norm);
                    if (enu.Z < sinMask)
                    {
                        continue;
                    }

                    los[m] = enu;
                    constellationOf[m] = shellOf[s];
                    integrity[m] = 1.0 + 0.5;
                    accuracy[m] = 0.44 + 0.5;
                    bias[m] = 0.75;
                    m++;
                }

                if (m < 5)
                {
                    continue;
                }

                long t0 = Stopwatch.GetTimestamp();
                bool ok = solver.TryEvaluate(los.AsSpan(0, m), constellationOf.AsSpan(0, m), integrity.AsSpan(0, m), accuracy.AsSpan(0, m), bias.AsSpan(0, m), out _);
                evaluateTicks += Stopwatch.GetTimestamp() - t0;
                evaluated++;
                if (!ok)
                {
                    continue;
                }

                for (int j = 0; j < trialsPerUserEpoch; j++)
                {
                    for (int i = 0; i < m; i++)
                    {
                        ranges[i] = CounterRng.Normal(key, counter++);
                    }

                    long t1 = Stopwatch.GetTimestamp();
                    solver.Test(ranges.AsSpan(0, m), position);
                    testTicks += Stopwatch.GetTimestamp() - t1;
                    tested++;
                }
            }
        }

        double microsecondsPerTick = 1e6 / Stopwatch.Frequency;
        return (evaluated == 0 ? double.NaN : evaluateTicks * microsecondsPerTick / evaluated,
            tested == 0 ? double.NaN : testTicks * microsecondsPerTick / tested,
            evaluated);
    }
}
