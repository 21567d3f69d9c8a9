using MathNet.Numerics.Distributions;
using MathNet.Numerics.Random;

namespace ErrorBudget.Core.Tests.Clocks;

/// <summary>Standard normals from MathNet's Normal over a seeded Mersenne Twister (fixed seeds in every test).</summary>
internal sealed class SeededNormals
{
    private readonly Normal _normal;

    public SeededNormals(int seed)
    {
        _normal = new Normal(0.0, 1.0, new MersenneTwister(seed));
    }

    public double Next() => _normal.Sample();

    public void Fill(Span<double> destination)
    {
        for (int i = 0; i < destination.Length; i++)
        {
            destination[i] = _normal.Sample();
        }
    }
}
