using ErrorBudget.Core.Integrity.Araim;
using ErrorBudget.Core.Random;
using ErrorBudget.Core.Statistics;

namespace ErrorBudget.Core.Simulation;

/// <summary>
/// The full per-satellite path used with ARAIM protection levels: each trial's range error of every
/// visible satellite (satellite-level errors plus its own user-level draw sigma_i z_i), the receiver's
/// solution-separation monitor on those ranges (detection, exclusion), and the position error of the
/// solution the receiver actually uses. Slower than <see cref="TrialSampler"/> (m normals and (m + modes)
/// projections per trial instead of three normals), which is why only ARAIM runs take it.
/// </summary>
internal static class AraimTrialSampler
{
    /// <summary>Key word c of a satellite's user-level stream: 3 + satellite, apart from the three ENU streams.</summary>
    private const int SatelliteStreamOffset = 3;

    public static void Sample(int m, EpochWork work, int user, ulong seed, CellAccumulator acc, long weight, TileScratch s)
    {
        IntegrityScratch x = s.Integrity!;
        AraimSolver solver = x.Araim!;
        IntegrityCellAccumulator integrity = acc.Integrity!;
        int trials = work.BlockTrials;
        int stride = s.LaneCapacity;
        double[] err = work.SatelliteErrors;
        Span<double> sigma = x.Sigma.AsSpan(0, m);
        for (int i = 0; i < m; i++)
        {
            ulong key = CounterRng.Key(seed, RandomPurpose.UserLocal, work.Epoch, user, SatelliteStreamOffset + s.Visible[i]);
            CounterRng.FillNormals(key, (ulong)work.FirstTrial, x.SatelliteNormals.AsSpan(i * stride, trials));
            sigma[i] = Math.Sqrt(s.TruthVariance[i]); // once per (epoch, user), not per trial
        }

        Span<double> ranges = x.Ranges.AsSpan(0, m);
        Span<double> position = stackalloc double[3];
        DDSketch mapping = acc.Hpe;
        long detections = 0, exclusions = 0, faultedSamples = 0, missed = 0;
        for (int j = 0; j < trials; j++)
        {
            bool faulted = false;
            for (int i = 0; i < m; i++)
            {
                int sat = s.Visible[i];
                int b = sat * 4 * stride;
                var u = s.LineOfSight[i];
                ranges[i] = err[b + (3 * stride) + j] + (u.X * err[b + j]) + (u.Y * err[b + stride + j]) + (u.Z * err[b + (2 * stride) + j])
                    + (sigma[i] * x.SatelliteNormals[(i * stride) + j]);
                faulted |= work.Faulted[(sat * stride) + j];
            }

            DetectionResult outcome = solver.Test(ranges, position);
            double e = position[0] + s.CommonOffset[0];
            double n = position[1] + s.CommonOffset[1];
            double up = position[2] + s.CommonOffset[2];
            double hpe = Math.Sqrt((e * e) + (n * n));
            double vpe = Math.Abs(up);
            s.KeysH[j] = hpe > SimulationSetup.PositionErrorResolutionMeters ? mapping.KeyOf(hpe) : DDSketch.ZeroKey;
            s.KeysV[j] = vpe > SimulationSetup.PositionErrorResolutionMeters ? mapping.KeyOf(vpe) : DDSketch.ZeroKey;
            x.HpeValues[j] = hpe;
            x.VpeValues[j] = vpe;
            // No service for this sample when the monitor alarms and cannot exclude.
            x.Flagged[j] = outcome.Detected && outcome.ExcludedMode < 0;
            detections += outcome.Detected ? 1 : 0;
            exclusions += outcome.Detected && outcome.ExcludedMode >= 0 ? 1 : 0;
            faultedSamples += faulted ? 1 : 0;
            missed += faulted && !outcome.Detected ? 1 : 0;
        }

        integrity.Detections += detections;
        integrity.Exclusions += exclusions;
        integrity.FaultedSamples += faultedSamples;
        integrity.MissedDetections += missed;
        TrialSampler.AddAll(acc, weight, s, trials);
    }
}
