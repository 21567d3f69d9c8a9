using ErrorBudget.Core.Clocks;

namespace ErrorBudget.Core.Tests.Clocks;

public class KasdinPowerLawNoiseTests
{
    private const double Exact = 1e-15;

    [Fact]
    public void Alpha_two_gives_all_ones()
    {
        // Kasdin 1995: h_k = h_{k-1} (alpha/2 + k - 1)/k; alpha = 2 is a running sum (REFERENCE-VALUES check 10).
        var h = new double[8];
        KasdinPowerLawNoise.Coefficients(2.0, h);
        Assert.All(h, v => Assert.Equal(1.0, v, Exact));
    }

    [Fact]
    public void Alpha_one_gives_the_flicker_sequence()
    {
        var h = new double[4];
        KasdinPowerLawNoise.Coefficients(1.0, h);
        Assert.Equal(new[] { 1.0, 0.5, 0.375, 0.3125 }, h);
    }

    [Fact]
    public void Alpha_zero_gives_a_delta()
    {
        var h = new double[5];
        KasdinPowerLawNoise.Coefficients(0.0, h);
        Assert.Equal(new[] { 1.0, 0.0, 0.0, 0.0, 0.0 }, h);
    }

    [Fact]
    public void Fft_convolution_equals_the_direct_sum()
    {
        // Derived: output[i] = s * sum_{k<=i} h_k n_{i-k}; zero padding makes the circular FFT convolution linear.
        const double tol = 1e-12;
        var normals = new double[300];
        new SeededNormals(11).Fill(normals);
        var output = new double[normals.Length];
        KasdinPowerLawNoise.Generate(1.0, 2.0, normals, output);
        var h = new double[normals.Length];
        KasdinPowerLawNoise.Coefficients(1.0, h);
        for (int i = 0; i < normals.Length; i += 37)
        {
            double direct = 0;
            for (int k = 0; k <= i; k++)
            {
                direct += h[k] * normals[i - k];
            }

            Assert.Equal(2.0 * direct, output[i], tol);
        }
    }

    [Fact]
    public void Alpha_two_output_is_a_random_walk_with_the_two_state_q22()
    {
        // Derived: s^2 = h (2 pi)^alpha dt^(alpha-1) / 2; alpha = 2 gives 2 pi^2 h-2 dt = Q22 (Brown & Hwang).
        const double h = 1e-33, dt = 30.0;
        double s = KasdinPowerLawNoise.InnovationSigma(2.0, h, dt);
        Assert.Equal(TwoStateProcessNoise.For(0, h, dt).Q22, s * s, 1e-12 * s * s);
        Assert.Equal(2e-24 / (2 * dt), Math.Pow(KasdinPowerLawNoise.InnovationSigma(0.0, 2e-24, dt), 2), 1e-36);
    }
}
