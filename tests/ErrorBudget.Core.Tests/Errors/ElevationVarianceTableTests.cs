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
}
