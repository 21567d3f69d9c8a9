using ErrorBudget.Core.Errors;
using ErrorBudget.Core.Scenarios;

namespace ErrorBudget.Core.Tests.Errors;

public sealed class ElevationVarianceTableTests
{
    public static TheoryData<IonosphereMode, MultipathModel> Models => new()
    {
        { IonosphereMode.SingleFrequency, MultipathModel.Airborne },
        { IonosphereMode.DualFrequency, MultipathModel.Ground },
        { IonosphereMode.SingleFrequency, MultipathModel.None },
    };

    [Theory]
    [MemberData(nameof(Models))]
    public void The_table_stays_within_5e_4_relative_of_the_model_at_every_elevation(IonosphereMode iono, MultipathModel multipath)
    {
        var model = UserErrorModel.From(new UserEnvironmentSpec(iono, 2.0, FrequencyPair.L1L5, 0.12, multipath, 0.36));
        var table = new ElevationVarianceTable(model);
        double worst = 0;
        for (double elDeg = 0.0; elDeg <= 90.0; elDeg += 0.0137)
        {
            double el = elDeg * Math.PI / 180;
            double exact = model.RangeVariance(el);
            worst = Math.Max(worst, Math.Abs(table.At(Math.Sin(el)) - exact) / exact);
        }

        // The promise in the table's documentation (linear interpolation of a smooth function).
        Assert.True(worst <= 5e-4, $"worst relative error {worst:E2}");
    }

    [Fact]
    public void The_interleaved_pair_gives_the_bits_of_its_two_tables()
    {
        var truth = new ElevationVarianceTable(UserErrorModel.From(new UserEnvironmentSpec(IonosphereMode.SingleFrequency, 2.0, FrequencyPair.L1L5, 0.12, MultipathModel.Airborne, 0.36)));
        var assumed = new ElevationVarianceTable(UserErrorModel.From(new UserEnvironmentSpec(IonosphereMode.DualFrequency, 1.0, FrequencyPair.L1L5, 0.2, MultipathModel.Ground, 0.5)));
        var pair = new ElevationVariancePair(truth, assumed);
        // Every node, points between nodes, both ends and values outside [0, 1] (clamped).
        var points = Enumerable.Range(0, 40_001).Select(k => k / 40_000.0).Concat([-0.5, 1.5, 1.0 - 1e-17, double.Epsilon]);
        foreach (double sinEl in points)
        {
            pair.At(sinEl, out double t, out double a);
            Assert.Equal(BitConverter.DoubleToInt64Bits(truth.At(sinEl)), BitConverter.DoubleToInt64Bits(t));
            Assert.Equal(BitConverter.DoubleToInt64Bits(assumed.At(sinEl)), BitConverter.DoubleToInt64Bits(a));
        }
    }
}
