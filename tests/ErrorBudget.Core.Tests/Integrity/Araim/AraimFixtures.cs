using ErrorBudget.Core.Integrity.Araim;
using ErrorBudget.Core.Numerics;
using ErrorBudget.Core.Tests.Geometry;

namespace ErrorBudget.Core.Tests.Integrity.Araim;

/// <summary>One user's sky and ISM-derived error model, as the solver takes it.</summary>
internal sealed record AraimSky(Vec3[] LineOfSight, int[] Constellation, double[] IntegrityVariance, double[] AccuracyVariance, double[] Bias)
{
    public int Count => LineOfSight.Length;

    public bool Evaluate(AraimSolver solver, out AraimResult result) =>
        solver.TryEvaluate(LineOfSight, Constellation, IntegrityVariance, AccuracyVariance, Bias, out result);
}

/// <summary>Skies with the ARAIM nominal error model of REFERENCE-VALUES §5.</summary>
internal static class AraimFixtures
{
    /// <summary>σ_user factor for an L1/L5 iono-free pair, (f1⁴ + f5⁴)/(f1² − f5²)² = 2.588² (REFERENCE-VALUES §5, §8, derived).</summary>
    private const double IonoFreeFactor = 2.588;

    /// <summary>
    /// Local (troposphere + airborne) variance at elevation θ, m²: σ_tropo = 0.12 m · 1.001/√(0.002001 + sin²θ)
    /// (DO-229 appendix J, REFERENCE-VALUES §4, V*); σ_user = 2.588·√(σ_MP² + σ_noise²), σ_MP = 0.13 + 0.53 e^(−θ/10°)
    /// (V*), σ_noise = 0.15 + 0.43 e^(−θ/6.9°) (AAD-A coefficients, from memory).
    /// </summary>
    public static double LocalVariance(double elevationRad)
    {
        double s = Math.Sin(elevationRad), deg = elevationRad * 180.0 / Math.PI;
        double tropo = 0.12 * 1.001 / Math.Sqrt(0.002001 + (s * s));
        double mp = 0.13 + (0.53 * Math.Exp(-deg / 10.0));
        double noise = 0.15 + (0.43 * Math.Exp(-deg / 6.9));
        double user2 = IonoFreeFactor * IonoFreeFactor * ((mp * mp) + (noise * noise));
        return (tropo * tropo) + user2;
    }

    /// <summary>A sky from lines of sight: σ_URA everywhere, σ_URE = ratio·σ_URA, b_nom from the parameters.</summary>
    public static AraimSky Build(Vec3[] los, int[] constellation, AraimParameters p, double sigmaUraMeters)
    {
        int m = los.Length;
        var intVar = new double[m];
        var accVar = new double[m];
        var bias = new double[m];
        for (int i = 0; i < m; i++)
        {
            double local = LocalVariance(Math.Asin(los[i].Z));
            intVar[i] = p.IntegrityVariance(sigmaUraMeters, local);
            accVar[i] = p.AccuracyVariance(sigmaUraMeters, local);
            bias[i] = p.NominalBiasIntegrityMeters;
        }

        return new AraimSky(los, constellation, intVar, accVar, bias);
    }

    /// <summary>m satellites above 5°, each assigned to constellation 0 or 1 at random.</summary>
    public static AraimSky RandomSky(System.Random rng, int m, AraimParameters p, double sigmaUraMeters = 0.75)
    {
        Vec3[] los = GeometryFixtures.RandomSky(rng, m);
        int[] constellation = Enumerable.Range(0, m).Select(_ => rng.Next(2)).ToArray();
        return Build(los, constellation, p, sigmaUraMeters);
    }

    /// <summary>Two constellations of <paramref name="perConstellation"/> satellites each, azimuths spread out
    /// (each constellation alone is a good geometry), elevations random in [10°, 80°].</summary>
    public static AraimSky TwoConstellations(System.Random rng, int perConstellation, AraimParameters p, double sigmaUraMeters = 0.75)
    {
        var los = new List<Vec3>();
        var constellation = new List<int>();
        for (int c = 0; c < 2; c++)
        {
            for (int i = 0; i < perConstellation; i++)
            {
                double az = (360.0 * (i + (0.5 * c)) / perConstellation) + (20.0 * rng.NextDouble());
                double el = i == 0 ? 75.0 + (10.0 * rng.NextDouble()) : 10.0 + (60.0 * rng.NextDouble());
                los.Add(GeometryFixtures.LineOfSight(az, el));
                constellation.Add(c == 0 ? 7 : 3); // arbitrary ids
            }
        }

        return Build(los.ToArray(), constellation.ToArray(), p, sigmaUraMeters);
    }

    /// <summary>Clopper-Pearson interval of a binomial proportion k/n at two-sided level 1 − α (MathNet Beta quantiles).</summary>
    public static (double Low, double High) ClopperPearson(int k, int n, double alpha)
    {
        double low = k == 0 ? 0.0 : MathNet.Numerics.Distributions.Beta.InvCDF(k, n - k + 1, alpha / 2);
        double high = k == n ? 1.0 : MathNet.Numerics.Distributions.Beta.InvCDF(k + 1, n - k, 1 - (alpha / 2));
        return (low, high);
    }
}
