using ErrorBudget.Core.Clocks;

namespace ErrorBudget.Core.Tests.Clocks;

public class FlickerFrequencyBankTests
{
    // Stated accuracy of the Gauss-Markov approximation of h-1/f (see FlickerFrequencyBank.MaxDeviationDb):
    private const double FullBandMaxDb = 0.7;     // over [1/T_max, 1/(2 dt)], limited by the Nyquist edge
    private const double InteriorMaxDb = 0.2;     // over [1/T_max, 1/(5 dt)]

    [Theory]
    [InlineData(1.0, 40.0, 5.0)]
    [InlineData(1.0, 1e3, 5.0)]
    [InlineData(1.0, 1e5, 5.0)]
    [InlineData(1.0, 1e6, 3.0)]
    [InlineData(30.0, 86400.0, 5.0)]
    [InlineData(300.0, 3 * 86400.0, 3.0)]
    public void Summed_psd_follows_h_minus1_over_f_within_the_stated_accuracy(double dt, double tMax, double polesPerDecade)
    {
        // Target S_y(f) = h-1 / f (IEEE Std 1139 flicker FM); exact AR(1) spectra summed, 400 points per decade.
        var bank = new FlickerFrequencyBank(3e-29, dt, tMax, polesPerDecade);
        Assert.InRange(bank.PoleCount, 1, FlickerFrequencyBank.MaxPoles);
        Assert.True(bank.MaxDeviationDb() <= FullBandMaxDb, $"full band {bank.MaxDeviationDb():F3} dB");
        double interior = bank.MaxDeviationDb(bank.LowFrequencyHz, 0.2 / dt);
        Assert.True(interior <= InteriorMaxDb, $"interior {interior:F3} dB");
    }

    [Fact]
    public void Psd_scales_linearly_with_h_minus1()
    {
        const double relTol = 1e-9;
        var a = new FlickerFrequencyBank(1e-29, 1.0, 1e4);
        var b = new FlickerFrequencyBank(4e-29, 1.0, 1e4);
        Assert.Equal(4 * a.Psd(1e-3), b.Psd(1e-3), relTol * b.Psd(1e-3));
    }

    [Fact]
    public void Stationary_sigma_is_the_ar1_variance()
    {
        // Derived: Var z = b^2 / (1 - phi^2) for z' = phi z + b n.
        var bank = new FlickerFrequencyBank(1e-29, 1.0, 1e4);
        for (int k = 0; k < bank.PoleCount; k++)
        {
            double expected = bank.InnovationSigma(k) / Math.Sqrt(1 - bank.Phi(k) * bank.Phi(k));
            Assert.Equal(expected, bank.StationarySigma(k), 1e-12 * expected);
        }
    }

    [Fact]
    public void Non_positive_h_minus1_is_rejected_with_its_key()
    {
        var ex = Assert.Throws<ClockDefinitionException>(() => new FlickerFrequencyBank(0, 1.0, 1e4));
        Assert.Equal("h-1", ex.Key);
    }
}
