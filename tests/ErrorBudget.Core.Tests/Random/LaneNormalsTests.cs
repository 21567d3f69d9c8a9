using ErrorBudget.Core.Random;

namespace ErrorBudget.Core.Tests.Random;

public class LaneNormalsTests
{
    // The same contract as CounterRng.FillNormals against the scalar Math form: FastMath256's log and
    // sin/cos are within about 1e-15 of Math's, times r <= 8.57.
    private const double TwinToleranceAbs = 1e-12;

    private static ulong[] KeysOf(int count, long epoch) =>
        Enumerable.Range(0, count).Select(t => CounterRng.Key(31, RandomPurpose.SatelliteOrbit, t, epoch, 7)).ToArray();

    [Theory]
    [InlineData(1)]
    [InlineData(2)]
    [InlineData(3)]
    [InlineData(4)]
    public void Each_lane_holds_the_first_normals_of_its_own_stream(int normals)
    {
        const int Lanes = 4096;
        const int Stride = Lanes + 4;
        ulong[] keys = KeysOf(Lanes, 11);
        var values = new double[normals * Stride];
        LaneNormals.FillHeads(keys, normals, values, Stride);
        double worst = 0;
        for (int j = 0; j < Lanes; j++)
        {
            for (int i = 0; i < normals; i++)
            {
                worst = Math.Max(worst, Math.Abs(values[(i * Stride) + j] - CounterRng.Normal(keys[j], (ulong)i)));
            }
        }

        Assert.True(worst <= TwinToleranceAbs, $"worst difference {worst:R}");
        Assert.All(values.Skip(((normals - 1) * Stride) + Lanes), v => Assert.Equal(0.0, v)); // nothing past the last row
    }

    [Fact]
    public void A_stream_gives_the_same_bits_in_every_lane_position()
    {
        ulong key = CounterRng.Key(5, RandomPurpose.SatelliteClock, 42, 3, 9);
        ulong[] others = KeysOf(3, 2);
        double[]? reference = null;
        for (int lane = 0; lane < LaneNormals.Lanes; lane++)
        {
            var keys = new ulong[LaneNormals.Lanes];
            for (int j = 0, o = 0; j < keys.Length; j++)
            {
                keys[j] = j == lane ? key : others[o++];
            }

            var values = new double[2 * LaneNormals.Lanes];
            LaneNormals.FillHeads(keys, 2, values, LaneNormals.Lanes);
            double[] mine = [values[lane], values[LaneNormals.Lanes + lane]];
            reference ??= mine;
            Assert.Equal(reference, mine); // exact
        }
    }

    [Fact]
    public void Finished_keys_are_the_stepwise_keys_bit_for_bit()
    {
        ulong start = CounterRng.KeyStart(8, RandomPurpose.SatelliteClock);
        ulong[] states = Enumerable.Range(0, 12).Select(t => CounterRng.KeyWithA(start, t)).ToArray();
        var keys = new ulong[12];
        LaneNormals.FinishKeys(states, CounterRng.WordB(17), keys);
        LaneNormals.FinishKeys(keys, CounterRng.WordC(4), keys);
        for (int t = 0; t < states.Length; t++)
        {
            Assert.Equal(CounterRng.Key(8, RandomPurpose.SatelliteClock, t, 17, 4), keys[t]);
        }
    }

    [Fact]
    public void Spans_that_are_not_whole_vectors_are_refused()
    {
        Assert.Throws<ArgumentException>(() => LaneNormals.FillHeads(new ulong[6], 1, new double[8], 6));
        Assert.Throws<ArgumentException>(() => LaneNormals.FinishKeys(new ulong[6], 0, new ulong[6]));
        Assert.Throws<ArgumentOutOfRangeException>(() => LaneNormals.FillHeads(new ulong[4], 5, new double[20], 4));
        Assert.Throws<ArgumentException>(() => LaneNormals.FillHeads(new ulong[4], 2, new double[7], 4));
    }
}
