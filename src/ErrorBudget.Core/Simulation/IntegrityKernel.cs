using ErrorBudget.Core.Integrity;
using ErrorBudget.Core.Random;
using ErrorBudget.Core.Scenarios;

namespace ErrorBudget.Core.Simulation;

/// <summary>
/// The [integrity] side of one (epoch, user): protection levels from the geometry, availability,
/// the per-sample misleading-information tallies, the integrity diagrams and the samples of the
/// overbounding check. Called by <see cref="TileKernel"/> only when the scenario has [integrity].
/// </summary>
internal sealed class IntegrityKernel
{
    /// <summary>Elevation bins of the overbounding check: 10 deg wide, 0-10 ... 80-90.</summary>
    public const int ElevationBins = 9;

    private readonly IntegritySpec _spec;
    private readonly ulong _seed;
    private readonly int[] _shellOf;

    public IntegrityKernel(SimulationSetup setup)
    {
        _spec = setup.Scenario.Integrity ?? throw new ArgumentException("The scenario has no [integrity] table.", nameof(setup));
        _seed = setup.Seed;
        _shellOf = [.. setup.Scenario.Shells.SelectMany((shell, index) => Enumerable.Repeat(index, shell.Satellites))];
        OverboundGroups = setup.Scenario.Shells.Count * ElevationBins;
    }

    public IntegritySpec Spec => _spec;

    /// <summary>A worker's integrity buffers (with its own ARAIM solver when the method is ARAIM).</summary>
    public IntegrityScratch CreateScratch(SimulationSetup setup)
    {
        int satellites = setup.Scenario.TotalSatellites;
        Integrity.Araim.AraimSolver? solver = _spec.Method == ProtectionLevelMethod.Araim
            ? new Integrity.Araim.AraimSolver(Math.Max(4, satellites), AraimParameters)
            : null;
        return new IntegrityScratch(setup.LaneCapacity, OverboundGroups, satellites, solver);
    }

    /// <summary>The ARAIM user parameters of the scenario (baseline allocations, the scenario's priors).</summary>
    public Integrity.Araim.AraimParameters AraimParameters => new()
    {
        PSat = _spec.Araim.SatelliteFaultPrior,
        PConst = _spec.Araim.ConstellationFaultPrior,
        NominalBiasIntegrityMeters = _spec.Araim.NominalBiasMeters,
        PhmiVertical = _spec.Araim.PhmiVertical,
        PhmiHorizontal = _spec.Araim.PhmiHorizontal,
        PFalseAlarmVertical = _spec.Araim.FalseAlarmVertical,
        PFalseAlarmHorizontal = _spec.Araim.FalseAlarmHorizontal,
    };

    /// <summary>
    /// ARAIM protection levels of the visible set and availability (PL &lt;= AL; for lpv-200 also the EMT
    /// and sigma_acc criteria). False when the monitor cannot be evaluated (then: unavailable).
    /// </summary>
    public (double Hpl, double Vpl, bool Available) AraimLevels(int m, TileScratch s, IntegrityScratch x)
    {
        double uraVariance = _spec.Araim.UraSigmaMeters * _spec.Araim.UraSigmaMeters;
        double ureVariance = _spec.Araim.UreSigmaMeters * _spec.Araim.UreSigmaMeters;
        for (int i = 0; i < m; i++)
        {
            double local = s.IntegrityVariance[i] - uraVariance; // the assumed user-level variance
            x.Constellation[i] = _shellOf[s.Visible[i]];
            x.AccuracyVariance[i] = ureVariance + local;
            x.NominalBias[i] = _spec.Araim.NominalBiasMeters;
        }

        if (!x.Araim!.TryEvaluate(s.LineOfSightEnu.AsSpan(0, m), x.Constellation.AsSpan(0, m), s.IntegrityVariance.AsSpan(0, m),
                x.AccuracyVariance.AsSpan(0, m), x.NominalBias.AsSpan(0, m), out Integrity.Araim.AraimResult r))
        {
            return (double.NaN, double.NaN, false);
        }

        bool available = r.UnmonitoredWithinThreshold && IsAvailable(r.HplMeters, r.VplMeters)
            && (_spec.Service != "lpv-200" || Integrity.Araim.Lpv200Criteria.IsAvailable(r));
        return (r.HplMeters, r.VplMeters, available);
    }

    /// <summary>Overbounding groups: shells x elevation bins.</summary>
    public int OverboundGroups { get; }

    /// <summary>The group of a satellite of shell <paramref name="shell"/> at elevation sin <paramref name="sinElevation"/>.</summary>
    public static int OverboundGroup(int shell, double sinElevation)
    {
        double elevationDeg = Math.Asin(Math.Clamp(sinElevation, -1.0, 1.0)) * (180.0 / Math.PI);
        return (shell * ElevationBins) + Math.Clamp((int)(elevationDeg / 10.0), 0, ElevationBins - 1);
    }

    /// <summary>DO-229 weighted protection levels of the solved geometry and whether the service is available.</summary>
    public (double Hpl, double Vpl, bool Available) WeightedLevels(TileScratch s)
    {
        ProtectionLevels pl = WeightedProtectionLevels.Compute(s.Covariance4, _spec.KHorizontal, _spec.KVertical);
        return (pl.HplMeters, pl.VplMeters, IsAvailable(pl.HplMeters, pl.VplMeters));
    }

    /// <summary>PL &lt;= AL on every axis the service has (NaN levels: not available).</summary>
    public bool IsAvailable(double hpl, double vpl) =>
        hpl <= _spec.HorizontalAlertLimitMeters && (!_spec.HasVertical || vpl <= _spec.VerticalAlertLimitMeters);

    /// <summary>Geometry-level bookkeeping, once per epoch (first trial block).</summary>
    public static void CountEpoch(IntegrityCellAccumulator acc, double hpl, double vpl, bool available)
    {
        // Infinite or missing levels (ARAIM that cannot monitor the geometry) stay out of the PL
        // percentiles; such an epoch is unavailable.
        if (double.IsFinite(hpl) && double.IsFinite(vpl))
        {
            acc.SolvedEpochs++;
            acc.Hpl.Add(hpl);
            acc.Vpl.Add(vpl);
        }

        if (available)
        {
            acc.AvailableEpochs++;
        }
    }

    /// <summary>
    /// The block's samples against the protection levels (HPE and VPE of every trial in the scratch),
    /// and into the worker's integrity diagrams. <paramref name="flagged"/> marks trials the
    /// receiver's monitor flagged (no service for that sample); empty when there is no monitor.
    /// </summary>
    public void Tally(IntegrityCellAccumulator acc, IntegrityScratch x, int trials, double hpl, double vpl, bool available, ReadOnlySpan<bool> flagged)
    {
        ReadOnlySpan<double> h = x.HpeValues.AsSpan(0, trials);
        ReadOnlySpan<double> v = x.VpeValues.AsSpan(0, trials);
        double hal = _spec.HorizontalAlertLimitMeters;
        double val = _spec.HasVertical ? _spec.VerticalAlertLimitMeters : double.PositiveInfinity;
        long miH = 0, miV = 0, hmiH = 0, hmiV = 0, availableSamples = 0;
        for (int j = 0; j < trials; j++)
        {
            miH += h[j] > hpl ? 1 : 0;
            miV += v[j] > vpl ? 1 : 0;
            if (available && (flagged.IsEmpty || !flagged[j]))
            {
                availableSamples++;
                hmiH += h[j] > hal ? 1 : 0;
                hmiV += v[j] > val ? 1 : 0;
            }
        }

        acc.Samples += trials;
        acc.AvailableSamples += availableSamples;
        acc.MisleadingHorizontal += miH;
        acc.MisleadingVertical += miV;
        acc.HazardousHorizontal += hmiH;
        acc.HazardousVertical += hmiV;

        Span<int> bins = x.Bins.AsSpan(0, trials);
        x.Horizontal.BinsOf(h, bins);
        x.Horizontal.AddErrorBins(x.Horizontal.BinOf(hpl), bins);
        x.Vertical.BinsOf(v, bins);
        x.Vertical.AddErrorBins(x.Vertical.BinOf(vpl), bins);
    }

    /// <summary>
    /// The overbounding check's samples of one (epoch, user): for the block's trials with global index
    /// below [integrity] overbound_trials, each visible satellite's truth range error (satellite part
    /// from the shared errors plus an independent draw of the user-level part, which has the same
    /// distribution as in the position errors) divided by the receiver's integrity sigma, binned by
    /// shell and elevation.
    /// </summary>
    public void SampleOverbound(int m, EpochWork work, int user, TileScratch s, IntegrityScratch x, double[] integrityVariance)
    {
        int count = Math.Min(_spec.OverboundTrials - work.FirstTrial, work.BlockTrials);
        if (count <= 0)
        {
            return;
        }

        int stride = s.LaneCapacity;
        double[] err = work.SatelliteErrors;
        for (int i = 0; i < m; i++)
        {
            int sat = s.Visible[i];
            var u = s.LineOfSight[i];
            double truthSigma = Math.Sqrt(s.TruthVariance[i]);
            double inverseSigma = 1.0 / Math.Sqrt(integrityVariance[i]);
            OverboundHistogram histogram = x.Overbound[OverboundGroup(_shellOf[sat], s.SinElevation[i])];
            ulong key = CounterRng.Key(_seed, RandomPurpose.IntegrityCheck, work.Epoch, user, sat);
            int b = sat * 4 * stride;
            for (int j = 0; j < count; j++)
            {
                double range = err[b + (3 * stride) + j] + (u.X * err[b + j]) + (u.Y * err[b + stride + j]) + (u.Z * err[b + (2 * stride) + j]);
                double local = truthSigma * CounterRng.Normal(key, (ulong)(work.FirstTrial + j));
                histogram.Add(Math.Clamp((range + local) * inverseSigma, -OverboundHistogram.MaxMagnitude, OverboundHistogram.MaxMagnitude));
            }
        }
    }
}
