using ErrorBudget.Core.Errors;
using ErrorBudget.Core.Geometry;
using ErrorBudget.Core.Numerics;
using ErrorBudget.Core.Random;
using ErrorBudget.Core.Simulation;

namespace ErrorBudget.Core.Tests.Simulation;

/// <summary>
/// The hot loop against closed forms, on a synthetic geometry whose S is known exactly:
/// one satellite at zenith and three on the horizon 120 deg apart. With unit range sigma,
/// (G^T G)^-1 gives sigma_E^2 = sigma_N^2 = 2/3 (uncorrelated: a circular horizontal error) and
/// sigma_U^2 = 4/3 (REFERENCE-VALUES section 9, closed form of G^T G = diag(1.5, 1.5) + [[1, 1], [1, 4]]).
/// </summary>
public sealed class PositionErrorSamplingTests
{
    private const int Trials = 200_000;
    private const double SketchAccuracy = 0.005;
    private const double ClockSigma = 0.6;
    private const double LocalSigma = 0.8; // sqrt(0.6^2 + 0.8^2) = 1: unit range sigma per satellite

    private static readonly Vec3[] Enu =
    [
        new(0, 0, 1),
        new(0, 1, 0),
        new(Math.Sin(2 * Math.PI / 3), Math.Cos(2 * Math.PI / 3), 0),
        new(Math.Sin(4 * Math.PI / 3), Math.Cos(4 * Math.PI / 3), 0),
    ];

    [Theory]
    [InlineData(true)]
    [InlineData(false)]
    public void Vpe_p95_matches_1_96_sigma_u_and_circular_hpe_p95_matches_rayleigh(bool simd)
    {
        var (acc, _) = Sample(commonClock: false, localSigma: LocalSigma, seed: 20261201, simd);

        double sigmaU = Math.Sqrt(4.0 / 3.0);
        double sigmaH = Math.Sqrt(2.0 / 3.0);

        // Vertical: |N(0, sigma_U)|, 95th percentile 1.95996 sigma_U (common practice; REFERENCE-VALUES section 9).
        double vpeExpected = 1.959964 * sigmaU;
        // Tolerance of a sample quantile: sd = sqrt(p (1 - p) / n) / f(x_p) (asymptotic normality of order
        // statistics). For |Z| at p = 0.95, f = 2 phi(1.96) / sigma = 0.11689 / sigma; allow 4.5 sd plus the
        // sketch's relative accuracy alpha.
        double vpeTol = 4.5 * Math.Sqrt(0.95 * 0.05 / Trials) / (0.116890 / sigmaU) + SketchAccuracy * vpeExpected;
        Assert.InRange(acc.Vpe.Quantile(0.95), vpeExpected - vpeTol, vpeExpected + vpeTol);

        // Horizontal, circular: Rayleigh, r95 = sigma sqrt(-2 ln 0.05) = 2.44775 sigma (common practice;
        // REFERENCE-VALUES section 9: r95 = 1.7308 drms with drms = sqrt(2) sigma). f(r95) = (r95 / sigma^2) * 0.05.
        double hpeExpected = sigmaH * Math.Sqrt(-2 * Math.Log(0.05));
        double hpeTol = 4.5 * Math.Sqrt(0.95 * 0.05 / Trials) / (hpeExpected / (sigmaH * sigmaH) * 0.05) + SketchAccuracy * hpeExpected;
        Assert.InRange(acc.Hpe.Quantile(0.95), hpeExpected - hpeTol, hpeExpected + hpeTol);
        Assert.Equal(Trials, acc.Hpe.Count);
    }

    [Theory]
    [InlineData(true)]
    [InlineData(false)]
    public void An_identical_clock_error_on_every_satellite_gives_no_position_error(bool simd)
    {
        // The receiver clock absorbs a common range error (common practice; DESIGN.md sign convention).
        // Through the engine's float conversion (the common part is taken out before rounding): <= 1e-6 m.
        var (acc, _) = Sample(commonClock: true, localSigma: 0.0, seed: 7, simd);
        Assert.True(acc.Hpe.Quantile(1.0) <= 1e-6, $"largest HPE {acc.Hpe.Quantile(1.0)} m");
        Assert.True(acc.Vpe.Quantile(1.0) <= 1e-6, $"largest VPE {acc.Vpe.Quantile(1.0)} m");

        // Rounded to float as it is, the common error must cancel inside S itself (its rows sum to zero),
        // up to float rounding: 4 satellites x 7 fused steps x 2^-24 x |S| (<= 1) x 6 sigma x 4.5 sigma
        // (the largest of 2e5 draws) = 4.5e-5 m.
        // The sketches count errors below 1 mm as zero, so the values are read from the integrity buffers.
        var (_, raw) = Sample(commonClock: true, localSigma: 0.0, seed: 7, simd, removeCommon: false);
        double floatBound = 4 * 7 * Math.Pow(2, -24) * 6.0 * 4.5;
        double largestH = raw.Integrity!.HpeValues.Max();
        double largestV = raw.Integrity!.VpeValues.Max();
        Assert.True(largestH <= floatBound, $"largest HPE {largestH} m");
        Assert.True(largestV <= floatBound, $"largest VPE {largestV} m");
        Assert.True(largestV > 0, "the raw float path does carry rounding: the bound above is what is tested");
    }

    [Theory]
    [InlineData(true)]
    [InlineData(false)]
    public void Errors_at_or_below_a_millimetre_count_as_zero(bool simd)
    {
        // SimulationSetup.PositionErrorResolutionMeters: sigma_U = 1e-4 m x sqrt(4/3), so the largest of
        // 2e5 draws (~4.9 sigma) stays below 1 mm and every sample lands in the zero bucket, but 1 cm does not.
        var (tiny, _) = Sample(commonClock: true, localSigma: 1e-4, seed: 8, simd);
        Assert.Equal(Trials, tiny.Vpe.ZeroCount);
        Assert.Equal(Trials, tiny.Hpe.ZeroCount);
        var (small, _) = Sample(commonClock: true, localSigma: 1e-2, seed: 8, simd);
        Assert.InRange(small.Vpe.ZeroCount, 1, Trials / 10);
    }

    [Fact]
    public void The_vector_and_scalar_twins_fill_the_same_buckets()
    {
        Assert.True(TrialSampler.WidePathAvailable, "this machine accelerates Vector512 (REFERENCE.md)");
        var (scalar, _) = Sample(commonClock: false, localSigma: LocalSigma, seed: 99, simd: false);
        // Both vector widths (eight and sixteen trials per vector) against the scalar twin.
        foreach (int bits in new[] { 256, 512 })
        {
            var (vector, _) = Sample(commonClock: false, localSigma: LocalSigma, seed: 99, simd: true, vectorBits: bits);
            Assert.Equal(scalar.Hpe.Count, vector.Hpe.Count);
            // The same float operations in the same order (FMA, square root and the FastMathSingle logarithm
            // are correctly rounded or bit-twinned): every bucket holds the same count.
            for (int key = vector.Hpe.KeyOf(1e-4); key <= vector.Hpe.KeyOf(100); key++)
            {
                Assert.Equal(scalar.Hpe.CountOf(key), vector.Hpe.CountOf(key));
                Assert.Equal(scalar.Vpe.CountOf(key), vector.Vpe.CountOf(key));
            }

            Assert.Equal(scalar.Vpe.ZeroCount, vector.Vpe.ZeroCount);
        }
    }

    [Fact]
    public void The_hot_loop_allocates_nothing_per_sample()
    {
        var (acc, s) = Sample(commonClock: false, localSigma: LocalSigma, seed: 5, simd: true);
        var satErrors = new float[4 * Trials * SatelliteErrorSampler.Components];
        // A first pass warms the JIT and grows the sketches to the range of these samples (growth is
        // the only allocation a sketch makes); the same pass again must then allocate nothing.
        void Pass()
        {
            for (int epoch = 2; epoch < 6; epoch++)
            {
                TileKernel.FillUserNormals(5, epoch, 0, 0, Trials, s);
                TrialSampler.SampleNarrow(4, Trials, satErrors, acc, 3, s);
                TrialSampler.SampleWide(4, Trials, satErrors, acc, 3, s);
                TrialSampler.SampleScalar(4, Trials, satErrors, acc, 3, s);
            }
        }

        Pass();
        long before = GC.GetAllocatedBytesForCurrentThread();
        Pass();
        Assert.Equal(0, GC.GetAllocatedBytesForCurrentThread() - before);
    }

    private static (CellAccumulator Cell, TileScratch Scratch) Sample(bool commonClock, double localSigma, ulong seed, bool simd, bool removeCommon = true, int vectorBits = 0)
    {
        const int m = 4;
        var s = new TileScratch(m, Trials, SketchAccuracy) { Integrity = new IntegrityScratch(Trials, 0) };
        for (int i = 0; i < m; i++)
        {
            s.Visible[i] = i;
            s.LineOfSight[i] = Enu[i];
            s.LineOfSightEnu[i] = Enu[i];
            s.SinElevation[i] = Enu[i].Z;
            s.Weights[i] = 1.0;
            s.TruthVariance[i] = localSigma * localSigma;
        }

        Assert.True(PositionSolution.TrySolve(s.LineOfSightEnu.AsSpan(0, m), s.Weights.AsSpan(0, m), s.Projection.AsSpan(0, 4 * m), s.Covariance4, out _));
        PositionSolution.ProjectCovariance(s.Projection.AsSpan(0, 4 * m), m, s.TruthVariance.AsSpan(0, m), s.Covariance3);
        PositionSolution.TryCholesky3(s.Covariance3, s.Cholesky3);
        TileKernel.BuildCoefficients(m, s);

        var satErrors = new double[m * Trials * SatelliteErrorSampler.Components];
        ulong clockKey = CounterRng.Key(seed, RandomPurpose.SatelliteClock, 0, 0, 0);
        double clockSigma = commonClock ? 6.0 : ClockSigma; // a large common error must still vanish
        for (int j = 0; j < Trials; j++)
        {
            for (int sat = 0; sat < m; sat++)
            {
                ulong index = commonClock ? (ulong)j : (ulong)(j * m + sat);
                satErrors[SatelliteErrorSampler.IndexOf(sat, 3, j, Trials)] = clockSigma * CounterRng.Normal(clockKey, index);
            }
        }

        var single = new float[satErrors.Length];
        if (removeCommon)
        {
            SingleErrors.Convert(satErrors, single, m, Trials, Trials, new double[Trials]);
        }
        else
        {
            for (int i = 0; i < satErrors.Length; i++)
            {
                single[i] = (float)satErrors[i];
            }
        }

        s.RoundForTrialLoop();

        TileKernel.FillUserNormals(seed, 0, 0, 0, Trials, s);
        var acc = new CellAccumulator(SketchAccuracy);
        if (simd)
        {
            Assert.True(TrialSampler.VectorPathAvailable, "this machine accelerates Vector256 (REFERENCE.md)");
            switch (vectorBits)
            {
                case 256: TrialSampler.SampleNarrow(m, Trials, single, acc, 1, s); break;
                case 512: TrialSampler.SampleWide(m, Trials, single, acc, 1, s); break;
                default: TrialSampler.SampleVector(m, Trials, single, acc, 1, s); break;
            }
        }
        else
        {
            TrialSampler.SampleScalar(m, Trials, single, acc, 1, s);
        }

        return (acc, s);
    }
}
