using ErrorBudget.Core.Errors;
using ErrorBudget.Core.Scenarios;

namespace ErrorBudget.Core.Tests.Errors;

public class MultipathModelsTests
{
    private const double SigmaTolerance = 1e-4;
    private const double Deg = Math.PI / 180.0;

    [Fact]
    public void Airborne_multipath_matches_the_published_curve()
    {
        // RTCA DO-229 appendix J.2.4 via REFERENCE-VALUES check 17: 0.13 + 0.53 e^(−0.5) = 0.4515 m.
        Assert.Equal(0.4515, MultipathModels.Airborne(5 * Deg), SigmaTolerance);
        // Same source: 0.13 + 0.53 e^(−9) = 0.13007 m.
        Assert.Equal(0.13007, MultipathModels.Airborne(90 * Deg), SigmaTolerance);
    }

    [Fact]
    public void Ground_multipath_follows_the_representative_designator_a_curve()
    {
        // RTCA DO-245A ground accuracy designator A, a0 = 0.5, a1 = 1.65, θ0 = 14.3° (from memory, representative):
        // θ = 0 gives a0 + a1 = 2.15 m; θ = 90° gives 0.5 + 1.65 e^(−90/14.3) = 0.50305 m (derived from the formula).
        Assert.Equal(2.15, MultipathModels.Ground(0.0), SigmaTolerance);
        Assert.Equal(0.50305, MultipathModels.Ground(90 * Deg), SigmaTolerance);
    }

    [Fact]
    public void Sigma_dispatches_on_the_model_and_none_gives_zero()
    {
        const double el = 23 * Deg;
        Assert.Equal(0.0, MultipathModels.Sigma(MultipathModel.None, el));
        Assert.Equal(MultipathModels.Airborne(el), MultipathModels.Sigma(MultipathModel.Airborne, el));
        Assert.Equal(MultipathModels.Ground(el), MultipathModels.Sigma(MultipathModel.Ground, el));
        Assert.Throws<ArgumentOutOfRangeException>(() => MultipathModels.Sigma((MultipathModel)42, el));
    }
}
