using ErrorBudget.Core.Integrity;
using ErrorBudget.Core.Random;

namespace ErrorBudget.Core.Tests.Integrity;

public class IntegrityDiagramCountingTests
{
    private static IntegrityDiagram Filled(long stream, int epochs, int trials)
    {
        var d = new IntegrityDiagram(IntegrityDiagramAxis.Vertical);
        ulong key = CounterRng.Key(32, RandomPurpose.Spare, stream, 0, 0);
        var errors = new double[trials];
        var bins = new int[trials];
        for (int e = 0; e < epochs; e++)
        {
            double vpl = 5.0 + 30.0 * CounterRng.Uniform(key, (ulong)e);
            CounterRng.FillNormals(key, 1_000_000UL + (ulong)(e * trials), errors);
            for (int t = 0; t < trials; t++)
            {
                errors[t] = Math.Abs(vpl / 5.33 * errors[t]); // |N(0, sigma)| with VPL = 5.33 sigma
            }

            d.BinsOf(errors, bins);
            d.AddErrorBins(d.BinOf(vpl), bins);
        }

        return d;
    }

    [Fact]
    public void Add_and_AddErrorBins_count_cells_and_the_total()
    {
        var d = new IntegrityDiagram(IntegrityDiagramAxis.Horizontal);
        d.Add(41, 30);
        d.Add(41, 30, count: 4);
        d.AddErrorBins(41, [30, 30, 0, 121]);
        Assert.Equal(7, d.CountOf(41, 30));
        Assert.Equal(1, d.CountOf(41, 0));
        Assert.Equal(1, d.CountOf(41, 121));
        Assert.Equal(0, d.CountOf(30, 41));
        Assert.Equal(9, d.Total);
    }

    [Fact]
    public void Merged_diagrams_equal_the_diagram_of_all_samples()
    {
        IntegrityDiagram a = Filled(1, 300, 64), b = Filled(2, 200, 64), union = Filled(1, 300, 64);
        union.Merge(b); // Filled(1) again, then b: the same as a + b
        a.Merge(b);
        Assert.Equal(union.Total, a.Total);
        Assert.Equal(500 * 64, a.Total);
        Assert.Equal(union.NonEmptyCells().ToArray(), a.NonEmptyCells().ToArray());

        var byHand = new IntegrityDiagram(IntegrityDiagramAxis.Vertical);
        foreach (IntegrityDiagramCell c in Filled(1, 300, 64).NonEmptyCells().Concat(b.NonEmptyCells()))
        {
            byHand.Add(c.PlBin, c.ErrorBin, c.Count);
        }

        Assert.Equal(byHand.NonEmptyCells().ToArray(), a.NonEmptyCells().ToArray());
    }

    [Fact]
    public void Non_empty_cells_come_in_protection_level_then_error_order_and_sum_to_the_total()
    {
        IntegrityDiagram d = Filled(3, 400, 32);
        IntegrityDiagramCell[] cells = d.NonEmptyCells().ToArray();
        Assert.True(cells.Length > 100); // VPL spans ~16 bins, errors ~70: a real test of the order
        for (int i = 1; i < cells.Length; i++)
        {
            bool ascending = cells[i - 1].PlBin < cells[i].PlBin
                || (cells[i - 1].PlBin == cells[i].PlBin && cells[i - 1].ErrorBin < cells[i].ErrorBin);
            Assert.True(ascending, $"cell {i}: {cells[i - 1]} then {cells[i]}");
        }

        Assert.All(cells, c => Assert.True(c.Count > 0));
        Assert.Equal(d.Total, cells.Sum(c => c.Count));
        Assert.Equal(cells, Filled(3, 400, 32).NonEmptyCells().ToArray()); // deterministic
    }

    [Fact]
    public void Clear_empties_every_cell()
    {
        IntegrityDiagram d = Filled(4, 50, 16);
        d.Clear();
        Assert.Equal(0, d.Total);
        Assert.Empty(d.NonEmptyCells());
    }

    [Fact]
    public void Merging_another_axis_or_layout_and_adding_outside_the_bins_are_rejected()
    {
        var d = new IntegrityDiagram(IntegrityDiagramAxis.Vertical);
        Assert.Throws<ArgumentException>(() => d.Merge(new IntegrityDiagram(IntegrityDiagramAxis.Horizontal)));
        Assert.Throws<ArgumentException>(() => d.Merge(new IntegrityDiagram(IntegrityDiagramAxis.Vertical, binsPerDecade: 10)));
        Assert.Throws<ArgumentException>(() => d.Merge(new IntegrityDiagram(IntegrityDiagramAxis.Vertical, minMeters: 0.1)));
        Assert.Throws<ArgumentOutOfRangeException>(() => d.Add(122, 0));
        Assert.Throws<ArgumentOutOfRangeException>(() => d.Add(0, -1));
        Assert.Throws<ArgumentOutOfRangeException>(() => d.Add(0, 0, count: -1));
        Assert.Throws<ArgumentOutOfRangeException>(() => d.AddErrorBins(-1, [0]));
        Assert.Throws<IndexOutOfRangeException>(() => d.AddErrorBins(0, [122]));
    }
}
